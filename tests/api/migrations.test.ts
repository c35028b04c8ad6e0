import { QueryTypes } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { createMigrator } from '../../server/db/umzug';
import { useTestDatabase } from '../setup/database';

const db = useTestDatabase();

describe('migrations', () => {
  it('run down to nothing and up again', async () => {
    const migrator = createMigrator(db.sequelize);
    const applied = (await migrator.executed()).map((m) => m.name);
    expect(applied.length).toBeGreaterThan(0);
    await migrator.down({ to: 0 });
    const tables = await db.sequelize.query(`SELECT table_name FROM information_schema.tables WHERE table_schema = 'public' AND table_name <> 'schema_migrations'`, { type: QueryTypes.SELECT });
    expect(tables).toEqual([]);
    await migrator.up();
    expect((await migrator.executed()).map((m) => m.name)).toEqual(applied);
  });
});
