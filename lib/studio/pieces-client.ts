/**
 * Browser-side client of the pieces worker: send the mesh once, then ask for pieces or suggestions; only the answer
 * to the newest request of each kind resolves with data, older ones resolve with null (the designer moved on).
 * Use from a client component (it creates a Worker); call `dispose()` on unmount.
 */
import type { TriMesh } from "@/lib/geometry/mesh";
import type { PieceTopology } from "@/lib/geometry/topology/piece-mesh";
import type { LivePiecesSummary, PiecesRequest, PiecesResponse } from "./pieces-protocol";
import type { PieceStretchEstimate } from "./stretch-estimate";
import type { SeamSuggestion } from "./suggestion";

export interface PiecesClient {
  /** Resolves when the worker has built the mesh connectivity. The arrays are copied, not transferred. */
  ready: Promise<{ vertexCount: number; faceCount: number; edgeCount: number; ms: number }>;
  pieces(onSeam: Uint8Array): Promise<{ pieces: LivePiecesSummary; ms: number } | null>;
  suggestions(onSeam: Uint8Array, thresholdDeg: number, stretchLimit: number): Promise<{ sharp: SeamSuggestion[]; darts: SeamSuggestion[]; estimates: PieceStretchEstimate[]; ms: number } | null>;
  /** Called with each non-disk piece's sentence and suggested cut, after its `pieces` answer. */
  onExplanation(listener: (piece: number, label: string, topology: PieceTopology) => void): () => void;
  dispose(): void;
}

export function createPiecesClient(mesh: TriMesh): PiecesClient {
  const worker = new Worker(new URL("./pieces-worker.ts", import.meta.url), { type: "module" });
  const send = (req: PiecesRequest, transfer: Transferable[] = []) => worker.postMessage(req, transfer);
  let nextId = 1;
  let latestPieces = 0, latestSuggest = 0;
  const waiting = new Map<number, (r: PiecesResponse | null) => void>();
  const explanationListeners = new Set<(piece: number, label: string, topology: PieceTopology) => void>();
  let resolveReady!: (v: { vertexCount: number; faceCount: number; edgeCount: number; ms: number }) => void;
  let rejectReady!: (e: Error) => void;
  const ready = new Promise<{ vertexCount: number; faceCount: number; edgeCount: number; ms: number }>((res, rej) => { resolveReady = res; rejectReady = rej; });

  worker.onmessage = (event: MessageEvent<PiecesResponse>) => {
    const m = event.data;
    if (m.type === "ready") { resolveReady(m); return; }
    if (m.type === "explanation") {
      if (m.requestId === latestPieces) for (const l of explanationListeners) l(m.piece, m.label, m.topology);
      return;
    }
    if (m.type === "error" && m.requestId === null) { rejectReady(new Error(m.message)); return; }
    const id = m.requestId;
    if (id === null) return;
    const done = waiting.get(id);
    if (!done) return;
    waiting.delete(id);
    done(m);
  };
  worker.onerror = (event) => rejectReady(new Error(event.message || "The pieces worker failed to start."));
  send({ type: "mesh", positions: mesh.positions.slice(), triangles: mesh.triangles.slice() });

  const ask = (req: PiecesRequest & { requestId: number }, onSeam: Uint8Array): Promise<PiecesResponse | null> =>
    new Promise((resolve) => {
      for (const [id, r] of waiting) {
        // a newer request of the same kind supersedes older ones
        if ((req.type === "pieces" && id === latestPieces) || (req.type === "suggest" && id === latestSuggest)) { waiting.delete(id); r(null); }
      }
      if (req.type === "pieces") latestPieces = req.requestId; else latestSuggest = req.requestId;
      waiting.set(req.requestId, resolve);
      send(req, [onSeam.buffer]);
    });

  return {
    ready,
    async pieces(onSeam) {
      const flags = onSeam.slice();
      const m = await ask({ type: "pieces", requestId: nextId++, onSeam: flags }, flags);
      if (!m) return null;
      if (m.type === "error") throw new Error(m.message);
      return m.type === "pieces" ? { pieces: m.pieces, ms: m.ms } : null;
    },
    async suggestions(onSeam, thresholdDeg, stretchLimit) {
      const flags = onSeam.slice();
      const m = await ask({ type: "suggest", requestId: nextId++, onSeam: flags, thresholdDeg, stretchLimit }, flags);
      if (!m) return null;
      if (m.type === "error") throw new Error(m.message);
      return m.type === "suggestions" ? { sharp: m.sharp, darts: m.darts, estimates: m.estimates, ms: m.ms } : null;
    },
    onExplanation(listener) {
      explanationListeners.add(listener);
      return () => explanationListeners.delete(listener);
    },
    dispose() {
      for (const r of waiting.values()) r(null);
      waiting.clear();
      worker.terminate();
    },
  };
}
