/**
 * Module Web Worker that keeps the studio's piece recomputation off the main thread. Create it with
 * `new Worker(new URL("./pieces-worker.ts", import.meta.url), { type: "module" })` (pieces-client.ts does), send
 * the mesh once, then seam flags on every change. Messages: pieces-protocol.ts.
 */
import { createPiecesHandler, type PiecesRequest, type PiecesResponse } from "./pieces-protocol";

/** The part of a dedicated worker's global scope used here (the repo's TypeScript lib is "dom", not "webworker"). */
interface WorkerScope {
  onmessage: ((event: MessageEvent<PiecesRequest>) => void) | null;
  postMessage(message: PiecesResponse, transfer: Transferable[]): void;
}

const scope = self as unknown as WorkerScope;
const handle = createPiecesHandler((message, transfer) => scope.postMessage(message, transfer));
scope.onmessage = (event) => handle(event.data);
