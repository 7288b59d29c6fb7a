/**
 * Messages between the studio page and the pieces worker (pieces-worker.ts), and the handler that answers them.
 * The handler is plain code so tests run it without a Worker; the worker file only wires it to `self`.
 *
 * Order of work for a seam change: the piece counts and colours go out first (`pieces`), then, one piece per task so
 * a newer request is not held up, the sentence and suggested cut of each piece that is not a disk (`explanation`).
 * Results of a request that a newer one replaced are dropped.
 */
import type { TriMesh } from "@/lib/geometry/mesh";
import type { PieceTopology } from "@/lib/geometry/topology/piece-mesh";
import { createLivePiecesComputer, explainPiece, type LivePieces, type LivePiecesComputer } from "./live-pieces";
import { suggestDarts } from "./dart-suggestions";
import { suggestSharpSeams } from "./sharp-suggestions";
import { createStretchEstimator, type PieceStretchEstimate, type StretchEstimator } from "./stretch-estimate";
import type { SeamSuggestion } from "./suggestion";
import { buildStudioMesh, type StudioMesh } from "./studio-mesh";

export type PiecesRequest =
  | { type: "mesh"; positions: Float64Array; triangles: Uint32Array }
  | { type: "pieces"; requestId: number; onSeam: Uint8Array; explain?: boolean }
  | { type: "suggest"; requestId: number; onSeam: Uint8Array; thresholdDeg: number; stretchLimit: number; minLengthFraction?: number };

/** LivePieces without the per-corner classes (kept in the worker). */
export type LivePiecesSummary = Omit<LivePieces, "cornerClass">;

export type PiecesResponse =
  | { type: "ready"; vertexCount: number; faceCount: number; edgeCount: number; ms: number }
  | { type: "pieces"; requestId: number; pieces: LivePiecesSummary; ms: number }
  | { type: "explanation"; requestId: number; piece: number; label: string; topology: PieceTopology; ms: number }
  | { type: "suggestions"; requestId: number; sharp: SeamSuggestion[]; darts: SeamSuggestion[]; estimates: PieceStretchEstimate[]; ms: number }
  | { type: "error"; requestId: number | null; message: string };

export type PostResponse = (message: PiecesResponse, transfer: Transferable[]) => void;

/** Defers a task (setTimeout 0 in browsers and Node). */
export type Defer = (task: () => void) => void;

export function createPiecesHandler(post: PostResponse, defer: Defer = (t) => setTimeout(t, 0)): (req: PiecesRequest) => void {
  let sm: StudioMesh | null = null;
  let computer: LivePiecesComputer | null = null;
  let estimator: StretchEstimator | null = null;
  let latestPieces = -1;
  let cached: { onSeam: Uint8Array; live: LivePieces } | null = null;

  const livePieces = (onSeam: Uint8Array): LivePieces => {
    if (cached && sameFlags(cached.onSeam, onSeam)) return cached.live;
    const live = computer!.compute(onSeam);
    cached = { onSeam: onSeam.slice(), live };
    return live;
  };

  const fail = (requestId: number | null, e: unknown) => post({ type: "error", requestId, message: e instanceof Error ? e.message : String(e) }, []);

  return (req) => {
    const requestId = req.type === "mesh" ? null : req.requestId;
    try {
      if (req.type === "mesh") {
        const t = performance.now();
        const mesh: TriMesh = { positions: req.positions, triangles: req.triangles };
        sm = buildStudioMesh(mesh);
        computer = createLivePiecesComputer(sm);
        estimator = null;
        cached = null;
        post({ type: "ready", vertexCount: sm.vertexCount, faceCount: sm.faceCount, edgeCount: sm.edgeCount, ms: performance.now() - t }, []);
        return;
      }
      if (!sm || !computer) throw new Error("Send the mesh before asking for pieces.");
      if (req.type === "pieces") {
        latestPieces = Math.max(latestPieces, req.requestId);
        const t = performance.now();
        const live = livePieces(req.onSeam);
        const pieces: LivePiecesSummary = {
          count: live.count, labels: live.labels, facePiece: live.facePiece.slice(), pieceFaceStart: live.pieceFaceStart.slice(),
          pieceFaces: live.pieceFaces.slice(), vertices: live.vertices.slice(), edges: live.edges.slice(),
          boundaryLoops: live.boundaryLoops.slice(), eulerCharacteristic: live.eulerCharacteristic.slice(), genus: live.genus.slice(),
          isDisk: live.isDisk.slice(), method: live.method,
        };
        post({ type: "pieces", requestId: req.requestId, pieces, ms: performance.now() - t }, [pieces.facePiece.buffer, pieces.pieceFaces.buffer]);
        if (req.explain === false) return;
        const mesh = sm;
        const todo = Array.from(live.isDisk).flatMap((d, p) => (d ? [] : [p]));
        const next = () => {
          const p = todo.shift();
          if (p === undefined || req.requestId !== latestPieces) return;
          try {
            const t0 = performance.now();
            const topology = explainPiece(mesh, live, p);
            post({ type: "explanation", requestId: req.requestId, piece: p, label: live.labels[p], topology, ms: performance.now() - t0 }, []);
          } catch (e) {
            fail(req.requestId, e);
          }
          defer(next);
        };
        defer(next);
        return;
      }
      const t = performance.now();
      estimator ??= createStretchEstimator(sm);
      const live = livePieces(req.onSeam);
      const estimates = estimator.estimate(live, req.onSeam);
      const sharp = suggestSharpSeams(sm, { thresholdDeg: req.thresholdDeg, onSeam: req.onSeam, minLengthFraction: req.minLengthFraction });
      const darts = suggestDarts(sm, estimates, req.stretchLimit);
      post({ type: "suggestions", requestId: req.requestId, sharp, darts, estimates, ms: performance.now() - t }, []);
    } catch (e) {
      fail(requestId, e);
    }
  };
}

function sameFlags(a: Uint8Array, b: Uint8Array): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}
