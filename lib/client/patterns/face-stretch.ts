import type { HeatmapArrays } from "@/lib/scans/mesh-binary";

export interface FaceStretch {
  /** #F working face → stretch s1 − 1 of its piece's triangle (fraction); NaN where no flattened piece covers it */
  stretch: Float32Array;
  /** #F working face → index into `labels`, −1 none */
  piece: Int32Array;
}

/**
 * Spreads the per-piece heat maps over the working mesh's faces through each map's working face ids, so the 3D
 * view colours the scan exactly like the flat sheet.
 * @param faceCount  F of the working (viewer) mesh
 * @param labels     piece labels in report order (the index stored in `piece`)
 */
export function faceStretch(faceCount: number, labels: readonly string[], maps: ReadonlyMap<string, HeatmapArrays>): FaceStretch {
  const stretch = new Float32Array(faceCount).fill(Number.NaN);
  const piece = new Int32Array(faceCount).fill(-1);
  labels.forEach((label, k) => {
    const h = maps.get(label);
    if (!h) return;
    for (let t = 0; t < h.faces.length; t++) {
      const f = h.faces[t];
      if (f >= faceCount) continue;
      stretch[f] = h.s1[t] - 1;
      piece[f] = k;
    }
  });
  return { stretch, piece };
}
