"use client";

import { useEffect, useState } from "react";
import type { TriMesh } from "@/lib/geometry/mesh";
import { createLivePiecesComputer } from "@/lib/studio/live-pieces";
import { createPiecesClient, type PiecesClient } from "@/lib/studio/pieces-client";
import type { LivePiecesSummary } from "@/lib/studio/pieces-protocol";
import { suggestDarts } from "@/lib/studio/dart-suggestions";
import { suggestSharpSeams } from "@/lib/studio/sharp-suggestions";
import { createStretchEstimator } from "@/lib/studio/stretch-estimate";
import type { SeamSuggestion } from "@/lib/studio/suggestion";
import type { StudioMesh } from "@/lib/studio/studio-mesh";

export interface StudioWork {
  pieces(onSeam: Uint8Array): Promise<{ pieces: LivePiecesSummary; ms: number } | null>;
  suggestions(onSeam: Uint8Array, thresholdDeg: number, stretchLimit: number): Promise<{ sharp: SeamSuggestion[]; darts: SeamSuggestion[] } | null>;
  onExplanation: PiecesClient["onExplanation"];
  /** "worker" normally; "main thread" when the browser could not start the worker */
  where: "worker" | "main thread";
}

/** Same answers as the worker, on this thread (for a browser that refuses module workers). */
function mainThreadWork(sm: StudioMesh): StudioWork {
  const computer = createLivePiecesComputer(sm);
  const estimator = createStretchEstimator(sm);
  return {
    where: "main thread",
    async pieces(onSeam) {
      const t0 = performance.now();
      const live = computer.compute(onSeam);
      return { pieces: live, ms: performance.now() - t0 };
    },
    async suggestions(onSeam, thresholdDeg, stretchLimit) {
      const live = computer.compute(onSeam);
      return { sharp: suggestSharpSeams(sm, { thresholdDeg, onSeam }), darts: suggestDarts(sm, estimator.estimate(live, onSeam), stretchLimit) };
    },
    onExplanation: () => () => {},
  };
}

/**
 * Two pieces workers of lib/studio for this mesh, one for live pieces and explanations, one for suggestions (off
 * the main thread), or null while they start. Falls back to the same code on the main thread if the worker cannot start.
 */
export function useStudioWork(mesh: TriMesh, sm: StudioMesh): StudioWork | null {
  const [work, setWork] = useState<StudioWork | null>(null);
  useEffect(() => {
    let cancelled = false;
    let client: PiecesClient | null = null;
    let suggester: PiecesClient | null = null;
    try {
      client = createPiecesClient(mesh);
      // a second worker for suggestions: the stretch estimate on a large scan takes a while, and the live pieces
      // must never queue behind it
      suggester = createPiecesClient(mesh);
    } catch (err) {
      console.warn("[peelform viewer] pieces worker unavailable, counting on the main thread:", err);
    }
    if (!client || !suggester) { client?.dispose(); setWork(mainThreadWork(sm)); return; }
    const c = client, sc = suggester;
    Promise.all([c.ready, sc.ready]).then(([r]) => r).then(
      (r) => {
        console.debug(`[peelform viewer] pieces worker ready in ${r.ms.toFixed(1)} ms (${r.faceCount} faces)`);
        if (!cancelled) setWork({ where: "worker", pieces: (s) => c.pieces(s), suggestions: (s, t, l) => sc.suggestions(s, t, l), onExplanation: (l) => c.onExplanation(l) });
      },
      (err: unknown) => {
        console.warn("[peelform viewer] pieces worker failed, counting on the main thread:", err);
        if (!cancelled) setWork(mainThreadWork(sm));
      },
    );
    return () => { cancelled = true; c.dispose(); sc.dispose(); setWork(null); };
  }, [mesh, sm]);
  return work;
}
