import { getEnv } from "@/lib/env";

/**
 * Where the database lives, from the validated environment (lib/env.ts). Read at first use (not at import) so
 * `next build` can import route modules without a database, and tests point DATABASE_URL at their own cluster.
 */
export function databaseUrl(): string {
  return getEnv().DATABASE_URL;
}
