import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { QueryInterface, Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import { logger } from '../lib/logger';

const here = path.dirname(fileURLToPath(import.meta.url));

export type MigrationContext = { queryInterface: QueryInterface; sequelize: Sequelize };
export type Migration = (params: { context: MigrationContext }) => Promise<void>;

export function createMigrator(sequelize: Sequelize) {
  return new Umzug<MigrationContext>({
    migrations: {
      glob: ['migrations/*.ts', { cwd: here, ignore: ['**/*.test.ts'] }],
      // Our own import (not umzug's) so the .ts files load under tsx and under vitest alike.
      resolve: ({ name, path: file }) => {
        const load = async () => (await import(file!)) as { up: Migration; down: Migration };
        return {
          name,
          up: async ({ context }) => (await load()).up({ context }),
          down: async ({ context }) => (await load()).down({ context }),
        };
      },
    },
    context: { queryInterface: sequelize.getQueryInterface(), sequelize },
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: {
      info: (m) => logger.debug(m, 'migration'),
      warn: (m) => logger.warn(m, 'migration'),
      error: (m) => logger.error(m, 'migration'),
      debug: (m) => logger.trace(m, 'migration'),
    },
  });
}

export async function migrate(sequelize: Sequelize): Promise<string[]> {
  const done = await createMigrator(sequelize).up();
  return done.map((m) => m.name);
}
