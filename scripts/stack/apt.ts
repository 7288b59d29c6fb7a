import { run } from "./sh";
import { info } from "./log";

/** Debian packages each stack needs. Tests also need a browser, PDF rasteriser and the WOFF2 converter. */
export const START_PACKAGES = ["postgresql", "redis-server"];
export const TEST_PACKAGES = [...START_PACKAGES, "chromium", "poppler-utils", "woff2"];

async function isInstalled(pkg: string): Promise<boolean> {
  const result = await run("dpkg-query", ["-W", "-f=${Status}", pkg], { allowFailure: true });
  return result.code === 0 && result.stdout.includes("install ok installed");
}

/**
 * Installs the missing packages with apt-get (one `apt-get update` first). Needs root, which the developer
 * machines and CI have; elsewhere it names the packages to install by hand.
 */
export async function ensureDebianPackages(packages: string[]): Promise<void> {
  const missing: string[] = [];
  for (const pkg of packages) if (!(await isInstalled(pkg))) missing.push(pkg);
  if (missing.length === 0) {
    info(`  all present: ${packages.join(", ")}`);
    return;
  }
  if (process.getuid?.() !== 0) {
    throw new Error(`missing Debian packages: ${missing.join(", ")}. Install them with: sudo apt-get install -y ${missing.join(" ")}`);
  }
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  info(`  installing ${missing.join(", ")} (apt-get update first)`);
  await run("apt-get", ["update"], { env, timeoutMs: 10 * 60_000 });
  await run("apt-get", ["install", "-y", "--no-install-recommends", ...missing], { env, timeoutMs: 20 * 60_000 });
  // Debian's postgresql package creates and starts a cluster of its own on port 5432; we use our own clusters only.
  info(`  installed ${missing.join(", ")}`);
}
