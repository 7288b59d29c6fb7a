import { createHash } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { ensureDebianPackages, START_PACKAGES, TEST_PACKAGES } from "./apt";
import { buildIfStale } from "./build";
import { lockOrFail, type Lock } from "./lock";
import { elapsedSeconds, fail, info, step as runStep, warn } from "./log";
import { assertPortFree } from "./ports";
import { ensureDatabase, initCluster, isCluster, resolvePgLocation, startPostgres, stopPostgres } from "./postgres";
import { getProfile, type Profile, type ProfileName } from "./profiles";
import { startRedis, stopRedis } from "./redis";
import { startS3Fake } from "./s3-fake";
import { loadOrCreateSecrets, type StackSecrets } from "./secrets";
import { run } from "./sh";
import { startSmtpFake } from "./smtp-fake";
import { childEnv, stackEnv } from "./stack-env";
import { killLeftover, supervise, waitForHttp, type Supervised } from "./supervisor";
import { formatVitestCounts, readVitestCounts, type VitestCounts } from "./vitest-summary";

/**
 * `npm start`, `npm run dev`, `npm test` and `npm run test:stack`: set up what is missing, start the local stack
 * (PostgreSQL, Redis, S3 fake, SMTP fake), migrate, build, run the web app and the worker; for `test`, run the
 * vitest projects against it. Everything started here is stopped on Ctrl-C / SIGTERM or when the tests end.
 */
export type Mode = "start" | "dev" | "test" | "test-stack";

const DEMO_ACCOUNTS = ["owner", "designer", "reviewer", "fabricator"].map((r) => `${r}@peelform.test`);

type Cleanup = { name: string; fn: () => Promise<unknown> };

export async function main(mode: Mode, args: string[], root: string): Promise<number> {
  const profileName: ProfileName = mode === "test" || mode === "test-stack" ? "test" : mode;
  const profile = getProfile(profileName, root);
  const cleanups: Cleanup[] = [];
  let shuttingDown: Promise<void> | null = null;
  const shutdown = (reason: string) => {
    shuttingDown ??= (async () => {
      info(`▶ stopping everything this run started (${reason})`);
      for (const { name, fn } of cleanups.reverse()) {
        try {
          await fn();
        } catch (error) {
          warn(`could not stop ${name}: ${(error as Error).message}`);
        }
      }
      info("✔ stopped");
    })();
    return shuttingDown;
  };
  let interrupted: ((signal: string) => void) | null = null;
  const onSignal = (signal: NodeJS.Signals) => {
    if (shuttingDown) {
      info(`${signal} again: still stopping, please wait`);
      return;
    }
    interrupted?.(signal);
  };
  process.on("SIGINT", onSignal);
  process.on("SIGTERM", onSignal);
  const interruptedPromise = new Promise<string>((resolve) => (interrupted = resolve));

  info(`Peelform ${mode}: data in ${path.relative(root, profile.dataDir) || "."}, ports web ${profile.ports.web}, ` +
    `PostgreSQL ${profile.ports.pg}, Redis ${profile.ports.redis}, S3 fake ${profile.ports.s3}, SMTP fake ${profile.ports.smtp}`);

  let lock: Lock | undefined;
  try {
    const abort = { aborted: false };
    const setup = bringUp(mode, profile, cleanups, abort);
    const outcome = await Promise.race([setup.then(() => null), interruptedPromise]);
    if (outcome !== null) {
      // Let the running step end first (a terminal Ctrl-C ends npm/next/apt children too), so nothing starts after
      // the shutdown; give up waiting after a minute.
      abort.aborted = true;
      await Promise.race([setup.catch(() => undefined), new Promise((r) => setTimeout(r, 60_000))]);
      await shutdown(`${outcome} during set-up`);
      return 130;
    }
    lock = await setup.then((s) => s.lock);
    const { env, web, worker } = await setup;

    if (mode === "test") {
      const { code, summary } = await runVitest(profile, env, args);
      if (code !== 0) printLogTails(profile);
      await shutdown("tests finished");
      info(`npm test finished in ${elapsedSeconds().toFixed(0)} s with exit code ${code}`);
      // The counts alone on the last line, for whoever reads the end of the log.
      if (summary) process.stdout.write(`${summary}\n`);
      return code;
    }

    printRunning(mode, profile);
    const reason = await Promise.race([
      interruptedPromise,
      web.exited.then((code) => `web app exited with code ${code}`),
    ]);
    void worker;
    await shutdown(reason);
    return reason.startsWith("web app exited") ? 1 : 0;
  } catch (error) {
    fail(error instanceof Error ? error.message : String(error));
    await shutdown("set-up failed");
    return 1;
  } finally {
    lock?.release();
  }
}

interface RunningStack {
  env: Record<string, string>;
  web: Supervised;
  worker: Supervised;
  lock: Lock;
}

async function bringUp(mode: Mode, profile: Profile, cleanups: Cleanup[], abort: { aborted: boolean }): Promise<RunningStack> {
  const root = profile.root;
  /** A step that is not started once a signal asked us to stop. */
  const step = <T>(name: string, fn: () => Promise<T>): Promise<T> => {
    if (abort.aborted) return Promise.reject(new Error(`interrupted before ${name}`));
    return runStep(name, fn);
  };
  const lockId = createHash("sha256").update(profile.dataDir).digest("hex").slice(0, 12);
  const lock = lockOrFail(path.join(root, "node_modules", ".cache", "peelform", `stack-${lockId}.lock`), `the data folder ${profile.dataDir}`);
  cleanups.push({ name: "lock", fn: async () => lock.release() });
  const runDir = path.join(profile.dataDir, "run");
  // A web app or worker left by a run that was killed outright would keep its port and serve an old build.
  for (const name of ["web", "worker"]) await killLeftover(runDir, name, root);

  await step("Debian packages", () => ensureDebianPackages(mode === "start" || mode === "dev" ? START_PACKAGES : TEST_PACKAGES));

  if (profile.fresh) await step("fresh test data folder", () => wipeTestData(profile));

  const secrets = await step("secrets", async () => {
    const { secrets, created } = loadOrCreateSecrets(profile.dataDir);
    info(created ? `  generated ${path.join(profile.dataDir, "secrets.json")} (mode 600)` : "  using the secrets of the data folder");
    return secrets;
  });

  const pgData = await step("PostgreSQL", () => bringUpPostgres(profile, secrets, cleanups));
  await step("Redis", async () => {
    const redisOpts = { dir: path.join(profile.dataDir, "redis"), port: profile.ports.redis, password: secrets.redisPassword, persistent: !profile.fresh };
    const { alreadyRunning } = await startRedis(redisOpts);
    info(alreadyRunning ? `  adopted a redis-server left running on port ${profile.ports.redis}` : `  redis-server on 127.0.0.1:${profile.ports.redis}${redisOpts.persistent ? " (appendonly)" : ""}`);
    cleanups.push({ name: "Redis", fn: async () => (await stopRedis(redisOpts)) && info("  Redis stopped") });
  });
  await step("S3 and SMTP fakes", async () => {
    const s3 = await startS3Fake({ dir: path.join(profile.dataDir, "s3"), port: profile.ports.s3, bucket: profile.bucket });
    cleanups.push({ name: "S3 fake", fn: () => s3.close() });
    const smtp = await startSmtpFake({ mailDir: path.join(profile.dataDir, "mail"), port: profile.ports.smtp });
    cleanups.push({ name: "SMTP fake", fn: () => smtp.close() });
    info(`  S3 fake on 127.0.0.1:${profile.ports.s3} (bucket ${profile.bucket}), SMTP fake on 127.0.0.1:${profile.ports.smtp} → ${path.relative(root, path.join(profile.dataDir, "mail"))}/*.eml`);
  });

  const env = stackEnv(profile, secrets, mode === "dev" ? "development" : "production");
  const envFile = path.join(profile.dataDir, "stack-env.json");
  fs.writeFileSync(envFile, JSON.stringify(env, null, 2) + "\n", { mode: 0o600 });
  cleanups.push({ name: "env file", fn: async () => profile.fresh && fs.rmSync(envFile, { force: true }) });

  await step("database schema and demo data", async () => {
    await ensureDatabase({ pgData, port: profile.ports.pg, database: profile.database, fresh: profile.fresh });
    await run(path.join(root, "node_modules", ".bin", "tsx"), ["scripts/stack/db-setup.ts", "--seed"], {
      cwd: root,
      env: childEnv(env),
      inherit: true,
      timeoutMs: 10 * 60_000,
    });
  });

  if (mode !== "dev") await step("build", () => buildIfStale(root, childEnv(env)));

  const logDir = path.join(profile.dataDir, "logs");
  fs.mkdirSync(logDir, { recursive: true });
  const output = (name: string) => (profile.fresh ? path.join(logDir, `${name}.log`) : "console");
  const { web, worker } = await step("web app and worker", async () => {
    await assertPortFree(profile.ports.web, "the web app", profile.fresh ? "TEST_PORT" : "PORT");
    const nextBin = path.join(root, "node_modules", ".bin", "next");
    const web = supervise({
      name: "web",
      command: nextBin,
      args: [mode === "dev" ? "dev" : "start", "-H", "127.0.0.1", "-p", String(profile.ports.web)],
      cwd: root,
      env: childEnv(env),
      restart: false,
      output: output("web"),
      runDir,
    });
    cleanups.push({ name: "web app", fn: () => web.stop() });
    // `node --import tsx` is `tsx workers/main.ts` without tsx's extra relay process: one pid to signal.
    const worker = supervise({
      name: "worker",
      command: process.execPath,
      args: ["--import", "tsx", "workers/main.ts"],
      cwd: root,
      env: childEnv(env),
      restart: true,
      output: output("worker"),
      runDir,
    });
    cleanups.push({ name: "worker", fn: () => worker.stop(35_000) });
    const status = await waitForHttp(`http://127.0.0.1:${profile.ports.web}/`, mode === "dev" ? 180_000 : 90_000, web);
    info(`  web app answers on http://127.0.0.1:${profile.ports.web}/ (HTTP ${status})`);
    const health = await fetch(`http://127.0.0.1:${profile.ports.web}/api/health`).then(
      async (r) => `${r.status} ${await r.text()}`,
      (e: Error) => e.message,
    );
    info(`  /api/health: ${health}`);
    return { web, worker };
  });
  return { env, web, worker, lock };
}

async function bringUpPostgres(profile: Profile, secrets: StackSecrets, cleanups: Cleanup[]): Promise<string> {
  const location = await resolvePgLocation(profile.dataDir, profile.root, profile.name);
  if (location.fallbackReason) warn(`  ${location.fallbackReason}`);
  const opts = { pgData: location.pgData, port: profile.ports.pg, password: secrets.pgPassword, fsync: profile.fsync };
  if (await initCluster(opts)) info(`  created a new cluster in ${location.pgData}`);
  const { alreadyRunning } = await startPostgres(opts);
  info(alreadyRunning
    ? `  adopted the cluster left running on port ${opts.port}`
    : `  postgres on 127.0.0.1:${opts.port}, fsync ${opts.fsync ? "on" : "off (throw-away test cluster)"}`);
  cleanups.push({ name: "PostgreSQL", fn: async () => (await stopPostgres(opts.pgData)) && info("  PostgreSQL stopped") });
  return location.pgData;
}

/** Stops whatever an earlier test run left running in .data-test, then deletes the folder (and a fallback cluster). */
async function wipeTestData(profile: Profile): Promise<void> {
  if (!fs.existsSync(profile.dataDir)) return;
  const location = await resolvePgLocation(profile.dataDir, profile.root, profile.name);
  if (isCluster(location.pgData) && (await stopPostgres(location.pgData))) info("  stopped a test cluster left running");
  const secretsFile = path.join(profile.dataDir, "secrets.json");
  if (fs.existsSync(secretsFile)) {
    const { secrets } = loadOrCreateSecrets(profile.dataDir);
    if (await stopRedis({ port: profile.ports.redis, password: secrets.redisPassword, persistent: false })) info("  stopped a test redis left running");
  }
  fs.rmSync(profile.dataDir, { recursive: true, force: true });
  if (location.fallbackReason) fs.rmSync(path.dirname(location.pgData), { recursive: true, force: true });
}

/**
 * Without arguments the projects run one after another — unit, integration, e2e — each in its own vitest run, so
 * the browser tests never share the machine's two cores (or the demo data) with the integration tests. With
 * arguments (`npm test -- --project integration tests/integration/stack`) they go to one vitest run as given.
 */
async function runVitest(profile: Profile, env: Record<string, string>, args: string[]): Promise<{ code: number; summary: string | null }> {
  // vitest sets NODE_ENV=test itself; the app processes run as production.
  const { NODE_ENV: _appNodeEnv, ...testEnv } = childEnv({ ...env, PEELFORM_TEST_STACK: "1" });
  const runs = args.length ? [{ label: args.join(" "), args }] : ["unit", "integration", "e2e"].map((p) => ({ label: p, args: ["--project", p] }));
  const total: VitestCounts = { passed: 0, failed: 0, skipped: 0 };
  let code = 0;
  let counted = false;
  for (const [i, r] of runs.entries()) {
    const reportFile = path.join(profile.dataDir, `vitest-report-${i}.json`);
    const vitestArgs = ["run", "--reporter=default", "--reporter=json", `--outputFile.json=${reportFile}`, ...r.args];
    const result = await runStep(`vitest ${r.label}`, () =>
      run(path.join(profile.root, "node_modules", ".bin", "vitest"), vitestArgs, { cwd: profile.root, env: testEnv as NodeJS.ProcessEnv, inherit: true, allowFailure: true }),
    ).catch(() => ({ code: 1 }));
    const counts = readVitestCounts(reportFile);
    if (counts) {
      counted = true;
      total.passed += counts.passed;
      total.failed += counts.failed;
      total.skipped += counts.skipped;
      info(`  ${r.label}: ${formatVitestCounts(counts).replace("vitest: ", "")}${result.code ? ` (exit ${result.code})` : ""}`);
    } else if (result.code) {
      total.failed += 1; // vitest could not even write its report
    }
    if (result.code !== 0) code = result.code;
  }
  return { code, summary: counted || code ? formatVitestCounts(total) : null };
}

function printLogTails(profile: Profile): void {
  for (const name of ["web", "worker"]) {
    const file = path.join(profile.dataDir, "logs", `${name}.log`);
    if (!fs.existsSync(file)) continue;
    const tail = fs.readFileSync(file, "utf8").trim().split("\n").slice(-30);
    info(`--- last ${tail.length} lines of ${path.relative(profile.root, file)} ---`);
    for (const line of tail) process.stdout.write(`  ${line}\n`);
  }
}

function printRunning(mode: Mode, profile: Profile): void {
  const url = `http://127.0.0.1:${profile.ports.web}`;
  const lines = [
    "",
    `  Peelform is running at ${url}`,
    `  Demo accounts (password peelform-demo): ${DEMO_ACCOUNTS.join(", ")}; outsider@peelform.test owns a second shop`,
    `  E-mails are not sent out: they land in ${path.relative(profile.root, path.join(profile.dataDir, "mail"))}/ (dev mailbox)`,
    mode === "test-stack"
      ? `  Test stack: run e.g. \`npx vitest run --project integration\` in another shell (env in ${path.relative(profile.root, path.join(profile.dataDir, "stack-env.json"))})`
      : `  Data stays in ${path.relative(profile.root, profile.dataDir)}/ between runs.`,
    "  Ctrl-C stops everything.",
    "",
  ];
  process.stdout.write(lines.join("\n") + "\n");
}
