// Migrates and seeds the demo into the dev database (or DATABASE_URL). Safe to run again.
import { createSequelize } from '../server/db/sequelize';
import { seedDemo } from '../server/db/seed/seed-demo';
import { seedReference } from '../server/db/seed/seed-reference';
import { migrate } from '../server/db/umzug';
import { devDatabaseUrl } from './lib/dev-database';
import { say } from './lib/log';

const { url } = await devDatabaseUrl();
const sequelize = createSequelize(url);
const applied = await migrate(sequelize);
const { created } = await seedDemo(sequelize);
await seedReference(sequelize);
await sequelize.close();
say(`migrations applied: ${applied.length}; demo rows created: ${created}`);
