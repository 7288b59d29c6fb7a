/**
 * The live pieces as the viewer shows them: lib/studio's live-pieces summary (from the pieces worker, or computed
 * here when no worker can start), a point to hang each letter on (the centre of the piece's face nearest its
 * area-weighted centroid, so the tag sits on the surface even on a curved piece), and the sentence of each piece
 * that is not a disk (filled in as the worker's explanations arrive).
 */
import type { Vec3 } from "@/components/viewer/viewer-types";
import type { LivePiecesSummary } from "@/lib/studio/pieces-protocol";
import type { StudioMesh } from "@/lib/studio/studio-mesh";

export interface LivePiece {
  index: number;
  label: string;
  faceCount: number;
  isDisk: boolean;
  /** null for a disk, and for a non-disk until its explanation arrives */
  problem: string | null;
  anchor: Vec3;
}

export interface LivePieces {
  facePiece: Int32Array;
  pieces: LivePiece[];
  /** time of the recount, milliseconds (performance.now), as measured where it ran */
  ms: number;
}

export function describeLivePieces(sm: StudioMesh, live: LivePiecesSummary, ms: number): LivePieces {
  const p = sm.mesh.positions, t = sm.mesh.triangles;
  const pieces: LivePiece[] = [];
  for (let index = 0; index < live.count; index++) {
    const s = live.pieceFaceStart[index], e = live.pieceFaceStart[index + 1];
    let cx = 0, cy = 0, cz = 0, area = 0;
    for (let i = s; i < e; i++) {
      const f = live.pieceFaces[i];
      const a = 3 * t[3 * f], b = 3 * t[3 * f + 1], c = 3 * t[3 * f + 2];
      const ux = p[b] - p[a], uy = p[b + 1] - p[a + 1], uz = p[b + 2] - p[a + 2];
      const vx = p[c] - p[a], vy = p[c + 1] - p[a + 1], vz = p[c + 2] - p[a + 2];
      const w = Math.hypot(uy * vz - uz * vy, uz * vx - ux * vz, ux * vy - uy * vx) + 1e-30;
      cx += w * (p[a] + p[b] + p[c]); cy += w * (p[a + 1] + p[b + 1] + p[c + 1]); cz += w * (p[a + 2] + p[b + 2] + p[c + 2]);
      area += 3 * w;
    }
    cx /= area; cy /= area; cz /= area;
    let anchor: Vec3 = [cx, cy, cz], bestD = Infinity;
    for (let i = s; i < e; i++) {
      const f = live.pieceFaces[i];
      const a = 3 * t[3 * f], b = 3 * t[3 * f + 1], c = 3 * t[3 * f + 2];
      const mx = (p[a] + p[b] + p[c]) / 3, my = (p[a + 1] + p[b + 1] + p[c + 1]) / 3, mz = (p[a + 2] + p[b + 2] + p[c + 2]) / 3;
      const d = (mx - cx) ** 2 + (my - cy) ** 2 + (mz - cz) ** 2;
      if (d < bestD) { bestD = d; anchor = [mx, my, mz]; }
    }
    pieces.push({ index, label: live.labels[index], faceCount: e - s, isDisk: live.isDisk[index] === 1, problem: null, anchor });
  }
  return { facePiece: live.facePiece, pieces, ms };
}
