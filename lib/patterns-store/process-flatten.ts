import { isGeometryError } from "@/lib/geometry/errors";
import { getSequelize } from "@/lib/db/sequelize";
import { enqueueNoticeMail } from "@/lib/jobs/notify-mail";
import { runCompute } from "@/lib/jobs/run-compute";
import { loadIntake } from "@/lib/scans/load-intake";
import { flattenParamsSchema } from "@/lib/validations/flatten";
import { flattenOptionsFromParams } from "@/lib/patterns-store/flatten-options-from-params";
import { patternNotice } from "@/lib/patterns-store/pattern-mail";
import { storeFlattenResult } from "@/lib/patterns-store/store-result";
import { Pattern, PatternPiece, Project, Scan, SeamMap, User } from "@/models";

/** Thrown for input that can never flatten (the processor turns it into UnrecoverableError). */
export class BadFlattenInput extends Error {}

/** Progress in percent, reported at these steps. */
export const FLATTEN_PROGRESS = {
  started: 2,
  parsed: 8,
  cut: 12,
  /** pieces flattened: 12 → 80 by the share of faces done */
  flattenFrom: 12,
  flattenTo: 80,
  laidOut: 84,
  documents: 90,
  stored: 97,
  done: 100,
} as const;

function progressOf(step: string, fraction: number): number | null {
  const P = FLATTEN_PROGRESS;
  switch (step) {
    case "parsed":
      return P.parsed;
    case "cut":
      return P.cut;
    case "flatten":
      return Math.round(P.flattenFrom + (P.flattenTo - P.flattenFrom) * Math.min(1, Math.max(0, (fraction - 0.05) / 0.85)));
    case "layout":
    case "marks":
    case "done":
      return P.laidOut;
    case "svg":
    case "pdf":
      return P.documents;
    default:
      return null;
  }
}

async function notify(pattern: Pattern, outcome: Parameters<typeof patternNotice>[0]["outcome"]): Promise<void> {
  if (!pattern.createdById) return;
  const [user, project, scan] = await Promise.all([
    User.findByPk(pattern.createdById),
    Project.findByPk(pattern.projectId),
    Scan.findByPk(pattern.scanId),
  ]);
  if (!user) return;
  await enqueueNoticeMail(
    `pattern-${outcome.ok ? "ready" : "failed"}-${pattern.id}`,
    patternNotice({ to: user.email, name: user.name, patternId: pattern.id, projectName: project?.name ?? "your project", scanName: scan?.name ?? "scan", outcome }),
  );
}

async function readyOutcome(patternId: string) {
  const p = await Pattern.findByPk(patternId);
  const report = (p?.report ?? {}) as { warnings?: string[] };
  const pieces = await PatternPiece.findAll({ where: { patternId }, attributes: ["flattenable"] });
  return { ok: true as const, pieces: pieces.length, notFlat: pieces.filter((x) => !x.flattenable).length, warnings: report.warnings?.length ?? 0 };
}

/**
 * The flatten job: pattern row → scan intake copy and seam map → flattenMesh, SVG and PDF in a compute thread
 * (progress at each step) → documents and pieces stored (storeFlattenResult: overwrite + one transaction) → e-mail
 * to the person who queued it. A pattern already "ready" (a retry after the commit) only makes sure the e-mail is
 * queued. Bad input marks the pattern "failed" with the sentence and throws BadFlattenInput; other errors are
 * thrown as they are (retried), and on the last attempt the pattern is marked failed first.
 */
export async function processFlatten(
  patternId: string,
  job: { progress: (pct: number) => Promise<void>; lastAttempt: boolean },
): Promise<{ pieces: number } | null> {
  getSequelize();
  const pattern = await Pattern.findByPk(patternId);
  if (!pattern) return null;
  if (pattern.status === "ready") {
    const outcome = await readyOutcome(pattern.id);
    await notify(pattern, outcome);
    await job.progress(FLATTEN_PROGRESS.done);
    return { pieces: outcome.pieces };
  }
  const fail = async (error: string) => {
    await pattern.update({ status: "failed", error });
    await notify(pattern, { ok: false, error });
  };
  try {
    await pattern.update({ status: "processing", error: null });
    await job.progress(FLATTEN_PROGRESS.started);
    const params = flattenParamsSchema.safeParse(pattern.params);
    if (!params.success) throw new BadFlattenInput(`The stored flatten parameters are not valid (${params.error.issues[0]?.message ?? "unknown field"}).`);
    const [scan, project, seamMap] = await Promise.all([
      Scan.findByPk(pattern.scanId),
      Project.findByPk(pattern.projectId),
      pattern.seamMapId ? SeamMap.findByPk(pattern.seamMapId) : Promise.resolve(null),
    ]);
    if (!scan || !project) throw new BadFlattenInput("The scan or project of this pattern was deleted.");
    if (pattern.seamMapId && !seamMap) throw new BadFlattenInput("The seam map of this pattern was deleted.");
    if (scan.status !== "ready") throw new BadFlattenInput(scan.error ? `The scan could not be read: ${scan.error}` : "The scan is not ready.");
    const intake = await loadIntake(scan);

    // progress updates are chained so they reach Redis in order, and only sent when the percentage grows
    let last: number = FLATTEN_PROGRESS.started;
    let chain = Promise.resolve();
    const report = (pct: number) => {
      if (pct <= last) return;
      last = pct;
      chain = chain.then(() => job.progress(pct)).catch(() => undefined);
    };
    const result = await runCompute(
      {
        kind: "flatten",
        positions: intake.mesh.positions,
        triangles: intake.mesh.triangles,
        inputToWorking: intake.inputToWorking,
        meshReport: intake.report,
        seams: seamMap?.seams ?? [],
        options: flattenOptionsFromParams(params.data),
        meta: {
          projectName: project.name,
          scanName: scan.name,
          material: params.data.material,
          thicknessMm: params.data.thicknessMm,
          createdAt: pattern.createdAt,
        },
        paper: params.data.paper,
        overlapMm: params.data.overlapMm,
      },
      (step, fraction) => {
        const pct = progressOf(step, fraction);
        if (pct !== null) report(pct);
      },
    );
    await chain;
    const stored = await storeFlattenResult(pattern.id, result, params.data.paper);
    if (!stored) return null;
    await job.progress(FLATTEN_PROGRESS.stored);
    const notFlat = result.report.pieces.filter((p) => !p.flattenable).length;
    await notify(pattern, { ok: true, pieces: result.report.pieces.length, notFlat, warnings: result.report.warnings.length });
    await job.progress(FLATTEN_PROGRESS.done);
    return { pieces: result.report.pieces.length };
  } catch (e) {
    if (e instanceof BadFlattenInput || isGeometryError(e)) {
      await fail(e.message);
      throw new BadFlattenInput(e.message);
    }
    if (job.lastAttempt) await fail("The pattern could not be made because of a problem on our side; queue it again.").catch(() => undefined);
    throw e;
  }
}
