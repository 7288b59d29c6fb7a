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
import { closeSequelize, getSequelize } from "@/lib/db/sequelize";
import { clearQueueSettings } from "@/lib/jobs/queue-settings";
import { closeJobQueues, enqueueFlatten } from "@/lib/jobs/queues";
import { QUEUE_NAMES } from "@/lib/queue/connection";
import { closeRateLimitStore } from "@/lib/rate-limit/default-store";
import { decodeViewerMesh } from "@/lib/scans/mesh-binary";
import { FLATTEN_PROGRESS } from "@/lib/patterns-store/process-flatten";
import { Pattern, PatternPiece } from "@/models";
import type { PipelinePieceReport, PipelineReport } from "@/lib/geometry/pipeline/flatten-mesh";
import { call, errorOf } from "@/tests/integration/api/support/call";
import { latestMailTo } from "@/tests/integration/api/support/mailbox";
import { createProjectIn, createShopWithRoles, ensureSchema, type ShopFixture } from "@/tests/integration/api/support/fixtures";
import { freshPrefix, JobWatcher, postForm, scanForm, seamedTubeObj } from "./support/job-fixtures";
import { spawnWorker, type SpawnedWorker } from "./support/spawn-worker";

/**
 * The queue end to end against the real PostgreSQL, Redis, S3 fake and SMTP fake: upload → intake job → seams →
 * flatten job (progress in order) → pattern rows and documents → e-mail; bad input fails once with its sentence.
 * The worker is a separate process on a fresh BullMQ prefix (QUEUE_PREFIX), like one more worker machine.
 */
const prefix = freshPrefix("flow");
let worker: SpawnedWorker;
let intakeEvents: JobWatcher;
let flattenEvents: JobWatcher;
let mailEvents: JobWatcher;
let f: ShopFixture;
let projectId: string;

// Demo mesh: an open tube of radius 50 mm, 120 mm long, 32 segments, 4 bands, seam along one side.
const N = 32, bands = 4, radius = 50, height = 120;
const tube = seamedTubeObj(radius, height, N, bands);

beforeAll(async () => {
  process.env.QUEUE_PREFIX = prefix;
  clearQueueSettings();
  await ensureSchema();
  f = await createShopWithRoles();
  projectId = (await createProjectIn(f.shop.id, "Harbour parade lantern fish")).id;
  intakeEvents = new JobWatcher(QUEUE_NAMES.scanIntake, prefix);
  flattenEvents = new JobWatcher(QUEUE_NAMES.flatten, prefix);
  mailEvents = new JobWatcher(QUEUE_NAMES.mail, prefix);
  await Promise.all([intakeEvents.ready(), flattenEvents.ready(), mailEvents.ready()]);
  worker = await spawnWorker({ QUEUE_PREFIX: prefix });
});

afterAll(async () => {
  await worker?.stop();
  await Promise.all([intakeEvents?.close(), flattenEvents?.close(), mailEvents?.close()]);
  await closeJobQueues();
  await closeRateLimitStore();
  await closeSequelize();
  delete process.env.QUEUE_PREFIX;
  clearQueueSettings();
});

async function uploadReady(bytes: string | Uint8Array, name: string): Promise<string> {
  const res = await postForm(projectScans.POST, `/api/projects/${projectId}/scans`, f.cookies.designer, { id: projectId }, scanForm(bytes, name));
  expect(res.status, await res.clone().text()).toBe(201);
  const scan = (await res.json()) as { id: string; status: string };
  expect(scan.status).toBe("processing");
  const outcome = await intakeEvents.outcome(scan.id);
  expect(outcome.ok, outcome.value).toBe(true);
  return scan.id;
}

let scanId = "";
let patternId = "";

describe("scans: upload and intake", () => {
  it("an OBJ upload is stored, processed by the worker and served as a compact mesh", async () => {
    scanId = await uploadReady(tube.obj, "lantern-fish-body.obj");
    const res = await call(scanRoute.GET, "GET", `/api/scans/${scanId}`, { cookie: f.cookies.fabricator, params: { id: scanId } });
    expect(res.status).toBe(200);
    const scan = await res.json();
    // Source: a tube of N segments and `bands` bands has N·(bands+1) vertices and 2·N·bands triangles
    expect(scan).toMatchObject({ id: scanId, status: "ready", error: null, vertexCount: N * (bands + 1), faceCount: 2 * N * bands, format: "obj", units: "mm" });
    expect(scan.report.boundaryLoops).toBe(2);
    expect(scan.report.eulerCharacteristic).toBe(0);

    const mesh = await call(meshRoute.GET, "GET", `/api/scans/${scanId}/mesh`, { cookie: f.cookies.designer, params: { id: scanId } });
    expect(mesh.headers.get("content-type")).toBe("application/octet-stream");
    const decoded = decodeViewerMesh(new Uint8Array(await mesh.arrayBuffer()));
    expect(decoded.positions.length / 3).toBe(N * (bands + 1));
    expect(decoded.triangles.length / 3).toBe(2 * N * bands);
    // vertex 0 of the file is (radius, 0, 0): ring 0, angle 0 (the viewer's seam indices are file indices)
    expect([...decoded.positions.slice(0, 3)]).toEqual([radius, 0, 0]);

    const list = await call(projectScans.GET, "GET", `/api/projects/${projectId}/scans`, { cookie: f.cookies.reviewer, params: { id: projectId } });
    expect(((await list.json()).scans as { id: string }[]).map((s) => s.id)).toContain(scanId);
  });

  it("checks the type by content: a PNG named .obj is refused, a binary STL named .png is accepted", async () => {
    const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 73, 72, 68, 82]);
    const res = await postForm(projectScans.POST, "/x", f.cookies.designer, { id: projectId }, scanForm(png, "head.obj"));
    expect(res.status).toBe(422);
    const err = await errorOf(res);
    expect(err.code).toBe("VALIDATION");
    expect(err.message).toMatch(/^file: The file is neither OBJ nor STL/);

    const { writeBinaryStl } = await import("@/lib/geometry/intake/write-mesh");
    const { cylinderTube } = await import("@/lib/geometry/shapes/cylinder-tube");
    const stl = writeBinaryStl(cylinderTube({ radius: 10, height: 20, segments: 8 }));
    const ok = await postForm(projectScans.POST, "/x", f.cookies.owner, { id: projectId }, scanForm(stl, "photo.png"));
    expect(ok.status).toBe(201);
    const id = ((await ok.json()) as { id: string; format: string }).id;
    expect((await intakeEvents.outcome(id)).ok).toBe(true);
    const scan = await (await call(scanRoute.GET, "GET", "/x", { cookie: f.cookies.owner, params: { id } })).json();
    expect(scan.format).toBe("stl-binary");
    expect(scan.faceCount).toBe(16);
  });

  it("refuses uploads over the limit with 413 and a clear sentence, with or without Content-Length", async () => {
    process.env.SCAN_MAX_BYTES = "4096";
    clearQueueSettings();
    try {
      const big = "v 0 0 0\n".repeat(1000); // 8000 bytes
      const res = await postForm(projectScans.POST, "/x", f.cookies.designer, { id: projectId }, scanForm(big, "big.obj"));
      expect(res.status).toBe(413);
      const err = await errorOf(res);
      expect(err.code).toBe("PAYLOAD_TOO_LARGE");
      expect(err.message).toMatch(/larger than the upload limit of 4 KiB/);

      // the same body as a stream (no Content-Length): counted as it arrives
      const form = await new Response(scanForm(big, "big.obj"));
      const type = form.headers.get("content-type")!;
      const body = form.body!;
      const req = new Request(new URL("/x", "http://127.0.0.1"), { method: "POST", headers: { cookie: f.cookies.designer, "content-type": type }, body, duplex: "half" } as RequestInit);
      const streamed = await projectScans.POST(req, { params: Promise.resolve({ id: projectId }) });
      expect(streamed.status).toBe(413);
    } finally {
      delete process.env.SCAN_MAX_BYTES;
      clearQueueSettings();
    }
  });

  it("a mesh the intake cannot read ends as a failed scan with one sentence, without retries", async () => {
    const res = await postForm(projectScans.POST, "/x", f.cookies.designer, { id: projectId }, scanForm("v 0 0 0\nv 1 0 0\nf 1 2 9\n", "torn.obj"));
    expect(res.status).toBe(201);
    const id = ((await res.json()) as { id: string }).id;
    const outcome = await intakeEvents.outcome(id);
    expect(outcome.ok).toBe(false);
    const scan = await (await call(scanRoute.GET, "GET", "/x", { cookie: f.cookies.designer, params: { id } })).json();
    expect(scan.status).toBe("failed");
    expect(scan.error).toMatch(/vertex 9/);
    expect(scan.error).toBe(outcome.value);
    expect(scan.error.trim().split("\n").length).toBe(1);
    const { getJobQueue } = await import("@/lib/jobs/queues");
    const job = await getJobQueue(QUEUE_NAMES.scanIntake).getJob(id);
    expect(job?.attemptsMade).toBe(1);
  });
});

describe("seam maps", () => {
  it("saves versions (never overwriting) and answers the pieces they make", async () => {
    const none = await call(seamsRoute.PUT, "PUT", "/x", { cookie: f.cookies.designer, params: { id: scanId }, json: { seams: [] } });
    expect(none.status).toBe(200);
    const v1 = await none.json();
    expect(v1.version).toBe(1);
    // without a seam the tube is an annulus: one piece, two boundary loops, not a disk
    expect(v1.pieces).toHaveLength(1);
    expect(v1.pieces[0]).toMatchObject({ label: "A", isDisk: false, boundaryLoops: 2 });
    expect(v1.pieces[0].problem).toMatch(/\.$/);

    const res = await call(seamsRoute.PUT, "PUT", "/x", { cookie: f.cookies.designer, params: { id: scanId }, json: { seams: tube.seams } });
    const v2 = await res.json();
    expect(v2.version).toBe(2);
    expect(v2.edgeCount).toBe(bands);
    expect(v2.pieces).toEqual([expect.objectContaining({ label: "A", isDisk: true, boundaryLoops: 1, problem: null, faces: 2 * N * bands })]);

    const latest = await (await call(seamsRoute.GET, "GET", "/x", { cookie: f.cookies.reviewer, params: { id: scanId } })).json();
    expect(latest.version).toBe(2);
    const { SeamMap } = await import("@/models");
    getSequelize();
    expect((await SeamMap.findAll({ where: { scanId }, order: [["version", "ASC"]] })).map((m) => m.seams.length)).toEqual([0, bands]);
  });

  it("names a pair that is not an edge of the mesh", async () => {
    const res = await call(seamsRoute.PUT, "PUT", "/x", { cookie: f.cookies.designer, params: { id: scanId }, json: { seams: [[0, 1], [0, 2 * N + 5]] } });
    expect(res.status).toBe(422);
    expect((await errorOf(res)).message).toMatch(/^seams: Seam 2 of 2 \(\[0, 69\]\) is not an edge/);
  });
});

describe("queued flattening", () => {
  it("202 { jobId, patternId }, progress in order, pattern stored, documents and e-mail", async () => {
    const res = await call(flattenRoute.POST, "POST", "/x", {
      cookie: f.cookies.designer,
      params: { id: scanId },
      json: { material: "eva", thicknessMm: 6, scanFace: "outer", scale: 1, paper: "a4", overlapMm: 10, tickSpacingMm: 50 },
    });
    expect(res.status).toBe(202);
    const body = (await res.json()) as { jobId: string; patternId: string };
    patternId = body.patternId;
    expect(body.jobId).toBe(patternId);
    const outcome = await flattenEvents.outcome(body.jobId);
    expect(outcome.ok, outcome.value).toBe(true);

    const steps = flattenEvents.progress.get(body.jobId) ?? [];
    const P = FLATTEN_PROGRESS;
    // in order and each once: started, parsed, cut, the (one) piece flattened, laid out, documents, stored, done
    expect(steps.slice(0, 3)).toEqual([P.started, P.parsed, P.cut]);
    expect(steps.slice(-4)).toEqual([P.laidOut, P.documents, P.stored, P.done]);
    expect(steps).toContain(P.flattenTo);
    for (let i = 1; i < steps.length; i++) expect(steps[i], `step ${i} of ${steps.join(", ")}`).toBeGreaterThan(steps[i - 1]);

    const job = await (await call(jobRoute.GET, "GET", "/x", { cookie: f.cookies.reviewer, params: { id: body.jobId } })).json();
    expect(job).toEqual({ state: "completed", progress: 100, patternId, error: null });

    const pattern = await (await call(patternRoute.GET, "GET", "/x", { cookie: f.cookies.reviewer, params: { id: patternId } })).json();
    expect(pattern).toMatchObject({ id: patternId, status: "ready", reviewStatus: "pending", seamMapVersion: 2, reviews: [] });
    expect(pattern.params).toMatchObject({ material: "eva", thicknessMm: 6, paper: "a4" });
    expect(pattern.pieces).toHaveLength(1);
    const piece = pattern.pieces[0] as PipelinePieceReport;
    expect(piece).toMatchObject({ label: "A", flattenable: true, count: 1 });
    // Source: a cylinder is developable; cut along a ruling it unrolls to a rectangle as wide as the N-gon's
    // perimeter 2·N·r·sin(π/N), measured on the neutral surface r = 50 − 6 + 0.5·6 = 47 mm (outer face scanned);
    // within 0.5 %: the offset of a coarse 32-gon and the layout's bounding box add a few tenths of a millimetre
    expect(piece.placement.width / (2 * N * 47 * Math.sin(Math.PI / N))).toBeCloseTo(1, 2);
    expect(piece.placement.height).toBeCloseTo(height, 1);
    expect(piece.metrics!.maxStretch).toBeLessThan(1e-3);
    // 120 mm seam, ticks every 50 mm: floor(120 / 50) = 2 per side, both sides on this piece
    expect(piece.ticks.length).toBe(4);

    const rows = await PatternPiece.findAll({ where: { patternId } });
    expect(rows.map((r) => r.label)).toEqual(["A"]);
    expect(rows[0].heatmapKey).toBe(`patterns/${patternId}/pieces/A.bin`);

    const json = await call(jsonRoute.GET, "GET", "/x", { cookie: f.cookies.reviewer, params: { id: patternId } });
    expect(json.headers.get("content-disposition")).toMatch(/^attachment; filename="harbour-parade-lantern-fish-lantern-fish-body-[0-9a-f]{8}-report\.json"$/);
    const report = (await json.json()) as PipelineReport;
    expect(report.pieces[0].outline).toEqual(piece.outline);
    expect(report.mesh.faces).toBe(2 * N * bands);

    const pdf = await call(pdfRoute.GET, "GET", "/x", { cookie: f.cookies.reviewer, params: { id: patternId } });
    expect(pdf.status).toBe(200);
    expect(pdf.headers.get("content-type")).toBe("application/pdf");
    expect(pdf.headers.get("content-disposition")).toMatch(/-a4\.pdf"$/);
    const pdfBytes = Buffer.from(await pdf.arrayBuffer());
    expect(pdfBytes.subarray(0, 5).toString()).toBe("%PDF-");
    // another paper is rendered on request
    const letter = await call(pdfRoute.GET, "GET", "/x?paper=letter", { cookie: f.cookies.reviewer, params: { id: patternId } });
    expect(letter.status).toBe(200);
    expect(letter.headers.get("content-disposition")).toMatch(/-letter\.pdf"$/);
    const bad = await call(pdfRoute.GET, "GET", "/x?paper=b5", { cookie: f.cookies.reviewer, params: { id: patternId } });
    expect(bad.status).toBe(422);

    const svg = await call(svgRoute.GET, "GET", "/x", { cookie: f.cookies.reviewer, params: { id: patternId } });
    expect(svg.headers.get("content-type")).toBe("image/svg+xml");
    expect(await svg.text()).toMatch(/<g id="A" class="piece"/);

    const mail = await mailEvents.outcome(`pattern-ready-${patternId}`);
    expect(mail.ok, mail.value).toBe(true);
    const message = await latestMailTo(f.users.designer.email);
    expect(message?.subject).toBe("Pattern ready: Harbour parade lantern fish");
    expect(message?.text).toContain(`${process.env.APP_URL}/patterns/${patternId}`);
  });

  it("refuses bad parameters with 422 naming the field, and a missing seam-map version", async () => {
    const bad = await call(flattenRoute.POST, "POST", "/x", { cookie: f.cookies.designer, params: { id: scanId }, json: { thicknessMm: 6, scale: 2, targetWidth: "30cm" } });
    expect(bad.status).toBe(422);
    expect((await errorOf(bad)).message).toMatch(/^targetWidth: Give either scale or targetWidth/);
    const missing = await call(flattenRoute.POST, "POST", "/x", { cookie: f.cookies.designer, params: { id: scanId }, json: { thicknessMm: 6, seamMapVersion: 9 } });
    expect(missing.status).toBe(422);
    expect((await errorOf(missing)).message).toMatch(/no seam-map version 9/);
  });

  it("input that can never flatten fails once (no retry) with its sentence, and e-mails the person who queued it", async () => {
    getSequelize();
    const scan = await (await import("@/models")).Scan.findByPk(scanId);
    const p = await Pattern.create({
      shopId: f.shop.id, projectId, scanId, createdById: f.users.owner.id, seamMapVersion: null,
      // a length the geometry core refuses ("30 parsecs") reaches the worker only through a stored row
      params: { material: "eva", thicknessMm: 6, scanFace: "outer", targetAxis: "x", paper: "letter", overlapMm: 10, tickSpacingMm: 50, mirror: null, targetWidth: "30 parsecs" },
    });
    expect(scan?.status).toBe("ready");
    await enqueueFlatten(p.id);
    const outcome = await flattenEvents.outcome(p.id);
    expect(outcome.ok).toBe(false);
    expect(outcome.value).toMatch(/parsecs/);
    const job = await (await call(jobRoute.GET, "GET", "/x", { cookie: f.cookies.owner, params: { id: p.id } })).json();
    expect(job.state).toBe("failed");
    expect(job.error).toBe(outcome.value);
    const { getJobQueue } = await import("@/lib/jobs/queues");
    expect((await getJobQueue(QUEUE_NAMES.flatten).getJob(p.id))?.attemptsMade).toBe(1);
    expect((await mailEvents.outcome(`pattern-failed-${p.id}`)).ok).toBe(true);
    const message = await latestMailTo(f.users.owner.email);
    expect(message?.subject).toBe("Pattern failed: Harbour parade lantern fish");
    expect(message?.text).toContain(outcome.value);
  });
});

describe("reviews and who sees what", () => {
  it("a fabricator sees no pending pattern (404) until a reviewer approves it", async () => {
    const asFab = () => call(patternRoute.GET, "GET", "/x", { cookie: f.cookies.fabricator, params: { id: patternId } });
    expect((await asFab()).status).toBe(404);
    expect((await call(pdfRoute.GET, "GET", "/x", { cookie: f.cookies.fabricator, params: { id: patternId } })).status).toBe(404);
    const listed = await (await call(projectPatterns.GET, "GET", "/x", { cookie: f.cookies.fabricator, params: { id: projectId } })).json();
    expect(listed.patterns).toEqual([]);

    const ask = await call(reviewsRoute.POST, "POST", "/x", { cookie: f.cookies.reviewer, params: { id: patternId }, json: { decision: "request_changes" } });
    expect(ask.status).toBe(422);
    expect((await errorOf(ask)).message).toMatch(/^comment: /);
    const changes = await call(reviewsRoute.POST, "POST", "/x", { cookie: f.cookies.reviewer, params: { id: patternId }, json: { decision: "request_changes", comment: "Add a dart at the tail." } });
    expect(changes.status).toBe(201);
    expect((await changes.json()).reviewStatus).toBe("changes_requested");
    expect((await asFab()).status).toBe(404);

    const approve = await call(reviewsRoute.POST, "POST", "/x", { cookie: f.cookies.reviewer, params: { id: patternId }, json: { decision: "approve", comment: "Dart not needed at 6 mm." } });
    const approved = await approve.json();
    expect(approved.reviewStatus).toBe("approved");
    expect(approved.reviews.map((r: { decision: string }) => r.decision)).toEqual(["request_changes", "approve"]);
    expect(approved.reviews[1].reviewer.name).toBe(f.users.reviewer.name);

    const seen = await asFab();
    expect(seen.status).toBe(200);
    expect((await seen.json()).reviewStatus).toBe("approved");
    const pdf = await call(pdfRoute.GET, "GET", "/x", { cookie: f.cookies.fabricator, params: { id: patternId } });
    expect(pdf.status).toBe(200);
    const list = await (await call(projectPatterns.GET, "GET", "/x", { cookie: f.cookies.fabricator, params: { id: projectId } })).json();
    expect(list.patterns.map((p: { id: string }) => p.id)).toEqual([patternId]);
    // others see every pattern of the project, the failed one too
    const all = await (await call(projectPatterns.GET, "GET", "/x", { cookie: f.cookies.designer, params: { id: projectId } })).json();
    expect(all.patterns.length).toBe(2);
  });

  it("a fabricator may not upload, edit seams, flatten, review or read jobs (403)", async () => {
    const c = f.cookies.fabricator;
    expect((await postForm(projectScans.POST, "/x", c, { id: projectId }, scanForm(tube.obj, "x.obj"))).status).toBe(403);
    expect((await call(seamsRoute.PUT, "PUT", "/x", { cookie: c, params: { id: scanId }, json: { seams: tube.seams } })).status).toBe(403);
    expect((await call(flattenRoute.POST, "POST", "/x", { cookie: c, params: { id: scanId }, json: { thicknessMm: 6 } })).status).toBe(403);
    expect((await call(reviewsRoute.POST, "POST", "/x", { cookie: c, params: { id: patternId }, json: { decision: "approve" } })).status).toBe(403);
    expect((await call(jobRoute.GET, "GET", "/x", { cookie: c, params: { id: patternId } })).status).toBe(403);
  });

  it("another shop gets 404 for every scan, seam, job and pattern route of this shop", async () => {
    const other = await createShopWithRoles();
    const c = other.cookies.owner;
    const cases: [string, Promise<Response>][] = [
      ["scan", call(scanRoute.GET, "GET", "/x", { cookie: c, params: { id: scanId } })],
      ["mesh", call(meshRoute.GET, "GET", "/x", { cookie: c, params: { id: scanId } })],
      ["seams GET", call(seamsRoute.GET, "GET", "/x", { cookie: c, params: { id: scanId } })],
      ["seams PUT", call(seamsRoute.PUT, "PUT", "/x", { cookie: c, params: { id: scanId }, json: { seams: [] } })],
      ["flatten", call(flattenRoute.POST, "POST", "/x", { cookie: c, params: { id: scanId }, json: { thicknessMm: 6 } })],
      ["job", call(jobRoute.GET, "GET", "/x", { cookie: c, params: { id: patternId } })],
      ["pattern", call(patternRoute.GET, "GET", "/x", { cookie: c, params: { id: patternId } })],
      ["pdf", call(pdfRoute.GET, "GET", "/x", { cookie: c, params: { id: patternId } })],
      ["svg", call(svgRoute.GET, "GET", "/x", { cookie: c, params: { id: patternId } })],
      ["json", call(jsonRoute.GET, "GET", "/x", { cookie: c, params: { id: patternId } })],
      ["review", call(reviewsRoute.POST, "POST", "/x", { cookie: c, params: { id: patternId }, json: { decision: "approve" } })],
      ["scans list", call(projectScans.GET, "GET", "/x", { cookie: c, params: { id: projectId } })],
      ["patterns list", call(projectPatterns.GET, "GET", "/x", { cookie: c, params: { id: projectId } })],
      ["upload", postForm(projectScans.POST, "/x", c, { id: projectId }, scanForm(tube.obj, "x.obj"))],
    ];
    for (const [name, pending] of cases) {
      const res = await pending;
      expect(res.status, name).toBe(404);
      expect((await errorOf(res)).code, name).toBe("NOT_FOUND");
    }
    expect(await Pattern.count({ where: { scanId } })).toBe(2);
  });
});
