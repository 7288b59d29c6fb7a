import path from "node:path";

/**
 * The two local stacks. `start` (and `dev`) keep a user's data in .data/ and use fsync; `test` is thrown away and
 * rebuilt on every `npm test` in .data-test/. Ports differ so both can run at the same time on one machine.
 *
 *              web    PostgreSQL  Redis  S3 fake  SMTP fake
 *   start/dev  3000   54329       63799  54369    54325
 *   test       3100   54339       63809  54379    54335
 *
 * Each port can be overridden from the environment (PORT, PG_PORT, REDIS_PORT, S3_PORT, SMTP_PORT), e.g. to run a
 * second clone next to the first.
 */
export type ProfileName = "start" | "dev" | "test";

export interface StackPorts {
  web: number;
  pg: number;
  redis: number;
  s3: number;
  smtp: number;
}

export interface Profile {
  name: ProfileName;
  /** Absolute repository root (the folder that holds package.json). */
  root: string;
  /** Absolute data folder: <root>/.data or <root>/.data-test (PEELFORM_DATA_DIR overrides). */
  dataDir: string;
  ports: StackPorts;
  /** Database name inside the cluster. */
  database: string;
  /** fsync=off only for the throw-away test cluster. */
  fsync: boolean;
  /** Wipe the data folder before starting (test stack only). */
  fresh: boolean;
  /** Bucket created in the S3 fake. */
  bucket: string;
}

function portFromEnv(name: string, fallback: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === "") return fallback;
  const port = Number(raw);
  if (!Number.isInteger(port) || port < 1 || port > 65535) {
    throw new Error(`${name} must be a TCP port number (1-65535), got "${raw}"`);
  }
  return port;
}

export function getProfile(name: ProfileName, root: string): Profile {
  const test = name === "test";
  const base: StackPorts = test
    ? { web: 3100, pg: 54339, redis: 63809, s3: 54379, smtp: 54335 }
    : { web: 3000, pg: 54329, redis: 63799, s3: 54369, smtp: 54325 };
  const ports: StackPorts = {
    web: portFromEnv(test ? "TEST_PORT" : "PORT", base.web),
    pg: portFromEnv(test ? "TEST_PG_PORT" : "PG_PORT", base.pg),
    redis: portFromEnv(test ? "TEST_REDIS_PORT" : "REDIS_PORT", base.redis),
    s3: portFromEnv(test ? "TEST_S3_PORT" : "S3_PORT", base.s3),
    smtp: portFromEnv(test ? "TEST_SMTP_PORT" : "SMTP_PORT", base.smtp),
  };
  const override = test ? process.env.PEELFORM_TEST_DATA_DIR : process.env.PEELFORM_DATA_DIR;
  const dataDir = path.resolve(root, override || (test ? ".data-test" : ".data"));
  return {
    name,
    root,
    dataDir,
    ports,
    database: test ? "peelform_test" : "peelform",
    fsync: !test,
    fresh: test,
    bucket: "peelform",
  };
}
