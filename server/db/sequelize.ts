import { Sequelize } from 'sequelize';
import { logger } from '../lib/logger';

export function createSequelize(databaseUrl: string): Sequelize {
  return new Sequelize(databaseUrl, {
    dialect: 'postgres',
    logging: (sql) => logger.trace({ sql }, 'sql'),
    define: { underscored: true },
    pool: { max: 10, min: 0, idle: 10_000 },
  });
}
