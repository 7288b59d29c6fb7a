import path from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { Umzug, SequelizeStorage, type MigrationParams } from "umzug";
import type { QueryInterface, Sequelize } from "sequelize";
import { getSequelize } from "@/lib/db/sequelize";

/**
 * Schema migrations: every `migrations/*.ts` file (sorted by name, so name them `YYYYMMDDHHMMSS-what.ts`) exporting
 * `up({ context })` and `down({ context })` where context is Sequelize's QueryInterface. Runs under tsx and vitest;
 * applied names are recorded in the `SequelizeMeta` table. A later feature adds its tables with a new file there.
 */
export type MigrationContext = QueryInterface;
export type Migration = (params: MigrationParams<MigrationContext>) => Promise<void>;

const MIGRATIONS_DIR = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../migrations");

function createMigrator(sequelize: Sequelize = getSequelize()) {
  return new Umzug<MigrationContext>({
    migrations: {
      glob: ["*.ts", { cwd: MIGRATIONS_DIR, ignore: ["*.d.ts", "*.test.ts"] }],
      resolve: ({ name, path: filePath, context }) => {
        const load = async () => (await import(pathToFileURL(filePath!).href)) as { up: Migration; down: Migration };
        return {
          name,
          up: async (params) => (await load()).up({ ...params, context }),
          down: async (params) => (await load()).down({ ...params, context }),
        };
      },
    },
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize }),
    logger: undefined,
  });
}

/** Options shared by the functions below; `sequelize` targets another database (tests of a fresh database). */
export interface MigratorOptions {
  sequelize?: Sequelize;
}

/** Applies every pending migration; returns the names applied. */
export async function migrateUp(opts: MigratorOptions = {}): Promise<string[]> {
  const done = await createMigrator(opts.sequelize).up();
  return done.map((m) => m.name);
}

/**
 * Reverts migrations: by default the last one; `{ to: 0 }` reverts all, `{ to: "name" }` down to and including that
 * one, `{ step: n }` the last n. Returns the names reverted.
 */
export async function migrateDown(opts: MigratorOptions & { to?: string | 0; step?: number } = {}): Promise<string[]> {
  const migrator = createMigrator(opts.sequelize);
  const done =
    opts.to !== undefined
      ? await migrator.down({ to: opts.to })
      : await migrator.down({ step: opts.step ?? 1 });
  return done.map((m) => m.name);
}

/** Names of applied and pending migrations (for scripts and health output). */
export async function migrationStatus(opts: MigratorOptions = {}): Promise<{ executed: string[]; pending: string[] }> {
  const migrator = createMigrator(opts.sequelize);
  const [executed, pending] = await Promise.all([migrator.executed(), migrator.pending()]);
  return { executed: executed.map((m) => m.name), pending: pending.map((m) => m.name) };
}
