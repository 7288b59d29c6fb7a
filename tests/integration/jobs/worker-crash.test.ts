import "@/tests/support/test-env";
import fs from "node:fs/promises";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as projectScans from "@/app/api/projects/[id]/scans/route";
import * as seamsRoute from "@/app/api/scans/[id]/seams/route";
import * as flattenRoute from "@/app/api/scans/[id]/flatten/route";
import * as jobRoute from "@/app/api/jobs/[id]/route";
import { closeSequelize, getSequelize } from "@/lib/db/sequelize";
import { clearQueueSettings } from "@/lib/jobs/queue-settings";
import { closeJobQueues, getJobQueue } from "@/lib/jobs/queues";
import { QUEUE_NAMES } from "@/lib/queue/connection";
import { closeRateLimitStore } from "@/lib/rate-limit/default-store";
import { FLATTEN_PROGRESS } from "@/lib/patterns-store/process-flatten";
import { Pattern, PatternPiece } from "@/models";
import { call } from "@/tests/integration/api/support/call";
import { createProjectIn, createShopWithRoles, ensureSchema, type ShopFixture } from "@/tests/integration/api/support/fixtures";
import { freshPrefix, JobWatcher, postForm, scanForm, seamedTubeObj } from "./support/job-fixtures";
import { spawnWorker, type SpawnedWorker } from "./support/spawn-worker";

/**
 * A worker process killed (SIGKILL) in the middle of a flatten: BullMQ's stalled-job check hands the job to another
 * worker process, which completes it exactly once, with one row per piece and one e-mail. Lock and stalled-check
 * times are short here (JOB_LOCK_DURATION_MS, JOB_STALLED_INTERVAL_MS) so the recovery takes seconds.
 */
const prefix = freshPrefix("crash");
const timing = { QUEUE_PREFIX: prefix, JOB_LOCK_DURATION_MS: "2000", JOB_STALLED_INTERVAL_MS: "1000" };
let first: SpawnedWorker | undefined;
let second: SpawnedWorker | undefined;
let flattenEvents: JobWatcher;
let intakeEvents: JobWatcher;
let mailEvents: JobWatcher;
let f: ShopFixture;
let scanId: string;

// A larger tube (256 × 48 → 24 576 faces), cut along two opposite rulings into two half-tubes A and B, so the
// flatten runs long enough to be killed and stores more than one piece.
const N = 256, bands = 48;
const mesh = seamedTubeObj(60, 150, N, bands);
const seams: [number, number][] = [...mesh.seams, ...mesh.seams.map(([a, b]) => [a + N / 2, b + N / 2] as [number, number])];

beforeAll(async () => {
  process.env.QUEUE_PREFIX = prefix;
  clearQueueSettings();
  await ensureSchema();
  f = await createShopWithRoles();
  const projectId = (await createProjectIn(f.shop.id, "Tidepool crab shell")).id;
  flattenEvents = new JobWatcher(QUEUE_NAMES.flatten, prefix);
  intakeEvents = new JobWatcher(QUEUE_NAMES.scanIntake, prefix);
  mailEvents = new JobWatcher(QUEUE_NAMES.mail, prefix);
  await Promise.all([flattenEvents.ready(), intakeEvents.ready(), mailEvents.ready()]);
  first = await spawnWorker(timing);
  const res = await postForm(projectScans.POST, "/x", f.cookies.designer, { id: projectId }, scanForm(mesh.obj, "crab-shell.obj"));
  scanId = ((await res.json()) as { id: string }).id;
  expect((await intakeEvents.outcome(scanId)).ok).toBe(true);
  const saved = await call(seamsRoute.PUT, "PUT", "/x", { cookie: f.cookies.designer, params: { id: scanId }, json: { seams } });
  expect((await saved.json()).pieces.map((p: { label: string; isDisk: boolean }) => [p.label, p.isDisk])).toEqual([["A", true], ["B", true]]);
});

afterAll(async () => {
  await first?.stop();
  await second?.stop();
  await Promise.all([flattenEvents?.close(), intakeEvents?.close(), mailEvents?.close()]);
  await closeJobQueues();
  await closeRateLimitStore();
  await closeSequelize();
  delete process.env.QUEUE_PREFIX;
  clearQueueSettings();
});

async function mailsMentioning(text: string): Promise<number> {
  const dir = process.env.MAIL_DIR!;
  let n = 0;
  for (const name of (await fs.readdir(dir)).filter((x) => x.endsWith(".eml"))) {
    if ((await fs.readFile(path.join(dir, name), "utf8")).includes(text)) n++;
  }
  return n;
}

describe("worker killed mid-job", () => {
  let patternId = "";

  it("is picked up by another worker and completes exactly once", async () => {
    const res = await call(flattenRoute.POST, "POST", "/x", { cookie: f.cookies.designer, params: { id: scanId }, json: { thicknessMm: 4, material: "eva" } });
    expect(res.status).toBe(202);
    patternId = ((await res.json()) as { patternId: string }).patternId;

    await flattenEvents.progressAtLeast(patternId, FLATTEN_PROGRESS.parsed);
    first!.child.kill("SIGKILL");
    await first!.exited;
    getSequelize();
    // killed in the middle: nothing was stored yet
    expect((await Pattern.findByPk(patternId))?.status).toBe("processing");
    const mid = await (await call(jobRoute.GET, "GET", "/x", { cookie: f.cookies.designer, params: { id: patternId } })).json();
    expect(["active", "queued"]).toContain(mid.state);

    second = await spawnWorker(timing);
    const outcome = await flattenEvents.outcome(patternId);
    expect(outcome.ok, outcome.value).toBe(true);
    await second.waitForOutput(`flatten: job ${patternId} done`);
    expect(first!.output()).not.toContain(`job ${patternId} done`);

    const job = await getJobQueue(QUEUE_NAMES.flatten).getJob(patternId);
    expect(job?.stalledCounter).toBeGreaterThanOrEqual(1);
    const pieces = await PatternPiece.findAll({ where: { patternId }, order: [["position", "ASC"]] });
    expect(pieces.map((p) => p.label)).toEqual(["A", "B"]);
    expect((await Pattern.findByPk(patternId))?.status).toBe("ready");
    const status = await (await call(jobRoute.GET, "GET", "/x", { cookie: f.cookies.designer, params: { id: patternId } })).json();
    expect(status).toEqual({ state: "completed", progress: 100, patternId, error: null });

    expect((await mailEvents.outcome(`pattern-ready-${patternId}`)).ok).toBe(true);
    expect(await mailsMentioning(`/patterns/${patternId}`)).toBe(1);
  });

  it("running the same job again replaces its rows instead of adding to them", async () => {
    const before = await PatternPiece.findAll({ where: { patternId } });
    await Pattern.update({ status: "processing" }, { where: { id: patternId } });
    const job = (await getJobQueue(QUEUE_NAMES.flatten).getJob(patternId))!;
    const again = flattenEvents.outcomeAfter(patternId);
    await job.retry("completed");
    expect((await again).ok).toBe(true);
    const after = await PatternPiece.findAll({ where: { patternId }, order: [["position", "ASC"]] });
    expect(after.map((p) => p.label)).toEqual(["A", "B"]);
    expect(after.map((p) => p.id).some((id) => before.some((b) => b.id === id))).toBe(false);
    expect(await PatternPiece.count({ where: { patternId } })).toBe(2);
    // the notice went out once: its mail job id is taken
    expect(await mailsMentioning(`/patterns/${patternId}`)).toBe(1);
  });
});
