import "@/tests/support/test-env";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as projectScans from "@/app/api/projects/[id]/scans/route";
import * as projectPatterns from "@/app/api/projects/[id]/patterns/route";
import * as scanRoute from "@/app/api/scans/[id]/route";
import * as meshRoute from "@/app/api/scans/[id]/mesh/route";
import * as seamsRoute from "@/app/api/scans/[id]/seams/route";
import * as flattenRoute from "@/app/api/scans/[id]/flatten/route";
import * as jobRoute from "@/app/api/jobs/[id]/route";
import * as patternRoute from "@/app/api/patterns/[id]/route";
import * as pdfRoute from "@/app/api/patterns/[id]/pdf/route";
import * as svgRoute from "@/app/api/patterns/[id]/svg/route";
import * as jsonRoute from "@/app/api/patterns/[id]/json/route";
import * as reviewsRoute from "@/app/api/patterns/[id]/reviews/route";
import type { RouteHandler } from "@/lib/api/route-handler";
import { closeSequelize } from "@/lib/db/sequelize";
import { clearQueueSettings } from "@/lib/jobs/queue-settings";
import { closeJobQueues } from "@/lib/jobs/queues";
import { ACTIONS, can } from "@/lib/permissions/permissions";
import { ROLES, type Role } from "@/lib/permissions/roles";
import { QUEUE_NAMES } from "@/lib/queue/connection";
import { closeRateLimitStore } from "@/lib/rate-limit/default-store";
import { call, errorOf } from "@/tests/integration/api/support/call";
import { createProjectIn, createShopWithRoles, ensureSchema, type ShopFixture } from "@/tests/integration/api/support/fixtures";
import { freshPrefix, JobWatcher, postForm, scanForm, seamedTubeObj } from "@/tests/integration/jobs/support/job-fixtures";
import { spawnWorker, type SpawnedWorker } from "@/tests/integration/jobs/support/spawn-worker";

/**
 * The scan, seam, flatten, job and pattern routes × every role and signed out, like the platform's matrix
 * (tests/integration/api/route-permissions.test.ts): the expected status comes from the handler's action and
 * can(). The targets are a ready scan and an approved pattern, so every role that may read sees them.
 */
const prefix = freshPrefix("matrix");
let worker: SpawnedWorker;
let f: ShopFixture;
let projectId = "";
let scanId = "";
let patternId = "";
const tube = seamedTubeObj(30, 60, 16, 2);

interface Case {
  name: string;
  handler: RouteHandler;
  method: string;
  success: number;
  /** fabricators read approved patterns only; this target is approved, so the action alone decides */
  run: (cookie: string | undefined) => Promise<Response>;
}

const cases = (): Case[] => [
  { name: "GET /api/projects/[id]/scans", handler: projectScans.GET, method: "GET", success: 200, run: (cookie) => call(projectScans.GET, "GET", "/x", { cookie, params: { id: projectId } }) },
  { name: "POST /api/projects/[id]/scans", handler: projectScans.POST, method: "POST", success: 201, run: (cookie) => postForm(projectScans.POST, "/x", cookie ?? "", { id: projectId }, scanForm(tube.obj, "m.obj")) },
  { name: "GET /api/projects/[id]/patterns", handler: projectPatterns.GET, method: "GET", success: 200, run: (cookie) => call(projectPatterns.GET, "GET", "/x", { cookie, params: { id: projectId } }) },
  { name: "GET /api/scans/[id]", handler: scanRoute.GET, method: "GET", success: 200, run: (cookie) => call(scanRoute.GET, "GET", "/x", { cookie, params: { id: scanId } }) },
  { name: "GET /api/scans/[id]/mesh", handler: meshRoute.GET, method: "GET", success: 200, run: (cookie) => call(meshRoute.GET, "GET", "/x", { cookie, params: { id: scanId } }) },
  { name: "GET /api/scans/[id]/seams", handler: seamsRoute.GET, method: "GET", success: 200, run: (cookie) => call(seamsRoute.GET, "GET", "/x", { cookie, params: { id: scanId } }) },
  { name: "PUT /api/scans/[id]/seams", handler: seamsRoute.PUT, method: "PUT", success: 200, run: (cookie) => call(seamsRoute.PUT, "PUT", "/x", { cookie, params: { id: scanId }, json: { seams: tube.seams } }) },
  { name: "POST /api/scans/[id]/flatten", handler: flattenRoute.POST, method: "POST", success: 202, run: (cookie) => call(flattenRoute.POST, "POST", "/x", { cookie, params: { id: scanId }, json: { thicknessMm: 4 } }) },
  { name: "GET /api/jobs/[id]", handler: jobRoute.GET, method: "GET", success: 200, run: (cookie) => call(jobRoute.GET, "GET", "/x", { cookie, params: { id: patternId } }) },
  { name: "GET /api/patterns/[id]", handler: patternRoute.GET, method: "GET", success: 200, run: (cookie) => call(patternRoute.GET, "GET", "/x", { cookie, params: { id: patternId } }) },
  { name: "GET /api/patterns/[id]/pdf", handler: pdfRoute.GET, method: "GET", success: 200, run: (cookie) => call(pdfRoute.GET, "GET", "/x", { cookie, params: { id: patternId } }) },
  { name: "GET /api/patterns/[id]/svg", handler: svgRoute.GET, method: "GET", success: 200, run: (cookie) => call(svgRoute.GET, "GET", "/x", { cookie, params: { id: patternId } }) },
  { name: "GET /api/patterns/[id]/json", handler: jsonRoute.GET, method: "GET", success: 200, run: (cookie) => call(jsonRoute.GET, "GET", "/x", { cookie, params: { id: patternId } }) },
  { name: "POST /api/patterns/[id]/reviews", handler: reviewsRoute.POST, method: "POST", success: 201, run: (cookie) => call(reviewsRoute.POST, "POST", "/x", { cookie, params: { id: patternId }, json: { decision: "approve" } }) },
];

beforeAll(async () => {
  process.env.QUEUE_PREFIX = prefix;
  clearQueueSettings();
  await ensureSchema();
  f = await createShopWithRoles();
  projectId = (await createProjectIn(f.shop.id)).id;
  const intake = new JobWatcher(QUEUE_NAMES.scanIntake, prefix);
  const flatten = new JobWatcher(QUEUE_NAMES.flatten, prefix);
  await Promise.all([intake.ready(), flatten.ready()]);
  worker = await spawnWorker({ QUEUE_PREFIX: prefix });
  try {
    const up = await postForm(projectScans.POST, "/x", f.cookies.designer, { id: projectId }, scanForm(tube.obj, "matrix.obj"));
    scanId = ((await up.json()) as { id: string }).id;
    expect((await intake.outcome(scanId)).ok).toBe(true);
    await call(seamsRoute.PUT, "PUT", "/x", { cookie: f.cookies.designer, params: { id: scanId }, json: { seams: tube.seams } });
    const q = await call(flattenRoute.POST, "POST", "/x", { cookie: f.cookies.designer, params: { id: scanId }, json: { thicknessMm: 4 } });
    patternId = ((await q.json()) as { patternId: string }).patternId;
    expect((await flatten.outcome(patternId)).ok).toBe(true);
    const approved = await call(reviewsRoute.POST, "POST", "/x", { cookie: f.cookies.reviewer, params: { id: patternId }, json: { decision: "approve" } });
    expect(approved.status).toBe(201);
  } finally {
    await Promise.all([intake.close(), flatten.close()]);
  }
});

afterAll(async () => {
  await worker?.stop();
  await closeJobQueues();
  await closeRateLimitStore();
  await closeSequelize();
  delete process.env.QUEUE_PREFIX;
  clearQueueSettings();
});

describe("scan and pattern routes × role", () => {
  it("every route needs a session and an action from the permission table", () => {
    for (const c of cases()) {
      expect(c.handler.routeOptions.auth, c.name).toBe("required");
      expect(ACTIONS, c.name).toContain(c.handler.routeOptions.action);
    }
  });

  for (const role of [...ROLES, null] as (Role | null)[]) {
    it(`as ${role ?? "signed out"}: the status can() implies`, async () => {
      for (const c of cases()) {
        const action = c.handler.routeOptions.action!;
        const expected = role === null ? 401 : can(role, action) ? c.success : 403;
        const res = await c.run(role ? f.cookies[role] : undefined);
        expect(res.status, `${c.name} as ${role ?? "signed out"}: ${res.status >= 400 ? JSON.stringify(await res.clone().json()) : ""}`).toBe(expected);
        if (expected >= 400) expect((await errorOf(res)).code).toBe(expected === 401 ? "UNAUTHENTICATED" : "FORBIDDEN");
      }
    });
  }
});
