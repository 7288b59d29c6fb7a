/**
 * Where the app under test runs: E2E_BASE_URL when set (any running Peelform, e.g. a developer's own), else the
 * production build of the test stack (tests/support/test-env.ts reads its environment).
 */
export async function e2eBaseUrl(): Promise<string> {
  const explicit = process.env.E2E_BASE_URL?.trim();
  if (explicit) return explicit.replace(/\/+$/, "");
  const { appUrl } = await import("../../support/test-env");
  return appUrl();
}

/** Demo accounts of the seeded demo shop (lib/db/seed-demo.ts); the password is the same for all. */
export const DEMO_PASSWORD = "peelform-demo";
export const DEMO_ROLES = ["owner", "designer", "reviewer", "fabricator"] as const;
export type DemoRole = (typeof DEMO_ROLES)[number];
export const demoEmail = (role: DemoRole | "outsider") => `${role}@peelform.test`;
