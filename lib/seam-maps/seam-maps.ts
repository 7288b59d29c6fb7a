import { AppError } from "@/lib/errors/app-error";
import { isGeometryError } from "@/lib/geometry/errors";
import { resolveSeams } from "@/lib/geometry/seams/parse-seams";
import { cutPieces } from "@/lib/geometry/topology/cut-pieces";
import type { IntakeResult } from "@/lib/geometry/intake/read-mesh";
import { getSequelize } from "@/lib/db/sequelize";
import { findScan } from "@/lib/scans/scans";
import { loadIntake } from "@/lib/scans/load-intake";
import { Scan, SeamMap } from "@/models";
import type { SeamMapPiece } from "@/models/seam-map";

export interface SeamMapDto {
  id: string;
  scanId: string;
  version: number;
  seams: [number, number][];
  edgeCount: number;
  pieces: SeamMapPiece[];
  createdAt: string;
}

export function toSeamMapDto(m: SeamMap): SeamMapDto {
  return { id: m.id, scanId: m.scanId, version: m.version, seams: m.seams, edgeCount: m.edgeCount, pieces: m.pieces, createdAt: m.createdAt.toISOString() };
}

/**
 * The pieces a seam list cuts the working mesh into: label, face count, disk or not, and for a non-disk the
 * problem sentence and a suggested cut in input-file vertex ids (the ids the viewer and seam files use).
 */
export function describePieces(intake: IntakeResult, seamEdges: Uint32Array): SeamMapPiece[] {
  const nv = intake.mesh.positions.length / 3;
  const workingToInput = new Int32Array(nv).fill(-1);
  for (let i = 0; i < intake.inputToWorking.length; i++) {
    const w = intake.inputToWorking[i];
    if (w < nv && workingToInput[w] < 0) workingToInput[w] = i;
  }
  return cutPieces(intake.mesh, seamEdges).map((p) => ({
    label: p.label,
    faces: p.faces.length,
    isDisk: p.topology.isDisk,
    boundaryLoops: p.topology.boundaryLoops,
    genus: p.topology.genus,
    problem: p.topology.problem,
    suggestedCut: p.topology.suggestedCut?.map(([a, b]) => [workingToInput[a], workingToInput[b]] as [number, number]) ?? null,
  }));
}

/**
 * PUT /api/scans/[id]/seams: checks every pair is an edge of the scan's working mesh, works out the pieces and
 * saves a new version (previous versions stay). The scan row is locked while the next version number is taken, so
 * two saves at once get consecutive versions instead of a conflict.
 * @throws AppError VALIDATION naming the bad pair; CONFLICT while the scan is not ready
 */
export async function saveSeamMap(shopId: string, userId: string, scanId: string, seams: [number, number][]): Promise<SeamMapDto> {
  const scan = await findScan(shopId, scanId);
  const intake = await loadIntake(scan);
  let edges: Uint32Array;
  try {
    edges = resolveSeams(seams, intake);
  } catch (e) {
    if (isGeometryError(e)) throw new AppError("VALIDATION", `seams: ${e.message}`);
    throw e;
  }
  const pieces = describePieces(intake, edges);
  const saved = await getSequelize().transaction(async (transaction) => {
    await Scan.findByPk(scan.id, { transaction, lock: transaction.LOCK.UPDATE });
    const latest = (await SeamMap.max("version", { where: { scanId: scan.id }, transaction })) as number | null;
    return SeamMap.create(
      { scanId: scan.id, createdById: userId, version: (latest ?? 0) + 1, seams, edgeCount: edges.length / 2, pieces },
      { transaction },
    );
  });
  return toSeamMapDto(saved);
}

/** A version of the scan's seams (the latest when `version` is undefined); null when the scan has none saved. */
export async function findSeamMap(scanId: string, version?: number): Promise<SeamMap | null> {
  getSequelize();
  if (version !== undefined) {
    const m = await SeamMap.findOne({ where: { scanId, version } });
    if (!m) throw new AppError("VALIDATION", `seamMapVersion: this scan has no seam-map version ${version}.`);
    return m;
  }
  return SeamMap.findOne({ where: { scanId }, order: [["version", "DESC"]] });
}
