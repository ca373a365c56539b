// Runs the migrations in server/db/migrations with umzug. Its default loader cannot import
// .ts files under vitest, so `resolve` does the import() itself.
import { Umzug, SequelizeStorage } from 'umzug';
import type { QueryInterface, Sequelize } from 'sequelize';
import { readdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const here = path.dirname(fileURLToPath(import.meta.url));
const dir = path.join(here, 'migrations');

export type Migration = { up: (qi: QueryInterface) => Promise<void>; down: (qi: QueryInterface) => Promise<void> };

export function migrator(sequelize: Sequelize) {
  const files = readdirSync(dir).filter((f) => /^\d{3}-.*\.ts$/.test(f)).sort();
  return new Umzug<QueryInterface>({
    migrations: files.map((f) => {
      const load = async () => (await import(pathToFileURL(path.join(dir, f)).href)) as Migration;
      return {
        name: f,
        up: async ({ context }) => (await load()).up(context),
        down: async ({ context }) => (await load()).down(context),
      };
    }),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

export async function migrate(sequelize: Sequelize): Promise<string[]> {
  const done = await migrator(sequelize).up();
  return done.map((m) => m.name);
}
