import { appUrl } from "@/tests/support/test-env";
import { describe, expect, it } from "vitest";

/** GET /api/health on the production build of the test stack. */
describe("GET /api/health", () => {
  it("reports PostgreSQL, Redis and storage up", async () => {
    const response = await fetch(`${appUrl()}/api/health`);
    expect(response.status).toBe(200);
    expect(response.headers.get("cache-control")).toContain("no-store");
    const body = (await response.json()) as { ok: boolean; checks: Record<string, { ok: boolean; ms: number }> };
    expect(body.ok).toBe(true);
    expect(Object.keys(body.checks).sort()).toEqual(["db", "redis", "storage"]);
    for (const check of Object.values(body.checks)) expect(check.ok).toBe(true);
  });
});
