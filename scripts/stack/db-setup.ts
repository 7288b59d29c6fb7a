/**
 * Child process of `npm start` / `npm test`: applies the migrations (lib/db/migrator.ts) and loads the demo data
 * (lib/db/seed-demo.ts) against DATABASE_URL. Runs apart from the bootstrap so the database pool closes with it.
 * Until one of those modules exists in the repository it is skipped with a log line; an error inside one fails.
 */
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");

function say(message: string): void {
  process.stdout.write(`  ${message}\n`);
}

async function load<T>(relative: string): Promise<T | null> {
  const file = path.join(root, relative);
  if (!fs.existsSync(file)) return null;
  return (await import(pathToFileURL(file).href)) as T;
}

async function main(): Promise<void> {
  const seed = process.argv.includes("--seed");
  const migrator = await load<{ migrateUp: () => Promise<string[]> }>("lib/db/migrator.ts");
  if (!migrator) say("skipped migrations: lib/db/migrator.ts is not in the repository yet");
  else {
    const applied = await migrator.migrateUp();
    say(applied.length ? `applied ${applied.length} migration(s): ${applied.join(", ")}` : "schema up to date (no pending migrations)");
  }
  if (seed) {
    const seeder = await load<{ seedDemo: () => Promise<unknown> }>("lib/db/seed-demo.ts");
    if (!seeder) say("skipped demo data: lib/db/seed-demo.ts is not in the repository yet");
    else {
      await seeder.seedDemo();
      say("demo data present (seedDemo)");
    }
  }
  const db = await load<{ closeSequelize?: () => Promise<void> }>("lib/db/sequelize.ts");
  await db?.closeSequelize?.();
}

main().then(
  () => process.exit(0),
  (error: unknown) => {
    process.stderr.write(`database set-up failed: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
    process.exit(1);
  },
);
