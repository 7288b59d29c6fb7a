/**
 * Console output of the stack scripts: numbered steps with timings, so a CI log reads top to bottom.
 * Every line is prefixed with the elapsed time since the script started.
 */
// scripts/bootstrap.mjs passes its own start time, so the clock also counts its npm ci.
const startedAt = Number(process.env.PEELFORM_STARTED_AT) || Date.now();

function clock(): string {
  const s = (Date.now() - startedAt) / 1000;
  return `[${s.toFixed(1).padStart(6)}s]`;
}

export function info(message: string): void {
  process.stdout.write(`${clock()} ${message}\n`);
}

export function warn(message: string): void {
  process.stdout.write(`${clock()} WARNING: ${message}\n`);
}

export function fail(message: string): void {
  process.stderr.write(`${clock()} ERROR: ${message}\n`);
}

/** Runs `fn` as a named step and prints its duration ("▶ name" … "✔ name (1.2 s)"). */
export async function step<T>(name: string, fn: () => Promise<T>): Promise<T> {
  const t0 = Date.now();
  info(`▶ ${name}`);
  try {
    const result = await fn();
    info(`✔ ${name} (${((Date.now() - t0) / 1000).toFixed(1)} s)`);
    return result;
  } catch (error) {
    fail(`✖ ${name} failed after ${((Date.now() - t0) / 1000).toFixed(1)} s`);
    throw error;
  }
}

/** Seconds since the script started, for the closing summary. */
export function elapsedSeconds(): number {
  return (Date.now() - startedAt) / 1000;
}
