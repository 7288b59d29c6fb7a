/**
 * Thread entry of the CPU-heavy part of the scan and flatten jobs. Running it off the worker's main thread keeps
 * BullMQ's lock renewal and progress updates going while a large mesh is parsed or flattened (a blocked event loop
 * would let the lock lapse and the job be taken up twice). Receives one ComputeRequest, posts progress and one
 * result or error, then exits.
 */
import { parentPort, workerData } from "node:worker_threads";
import { isGeometryError } from "@/lib/geometry/errors";
import { readMesh } from "@/lib/geometry/intake/read-mesh";
import { resolveSeams } from "@/lib/geometry/seams/parse-seams";
import { flattenMesh } from "@/lib/geometry/pipeline/flatten-mesh";
import { renderPatternPdf, renderPatternSvg } from "@/lib/patterns";
import { patternDocumentInput } from "@/lib/patterns-store/document-input";
import type { ComputeRequest, FlattenResponse, IntakeResponse, ThreadMessage } from "./compute-messages";

const post = (m: ThreadMessage, transfer: ArrayBuffer[] = []) => parentPort!.postMessage(m, transfer);

async function run(req: ComputeRequest): Promise<void> {
  if (req.kind === "intake") {
    const intake = await readMesh(req.bytes, { units: req.units });
    const result: IntakeResponse = {
      report: intake.report,
      positions: intake.mesh.positions,
      triangles: intake.mesh.triangles,
      inputToWorking: intake.inputToWorking,
    };
    post({ type: "result", result }, [result.positions.buffer as ArrayBuffer, result.triangles.buffer as ArrayBuffer, result.inputToWorking.buffer as ArrayBuffer]);
    return;
  }
  const intake = {
    mesh: { positions: req.positions, triangles: req.triangles },
    report: req.meshReport,
    inputToWorking: req.inputToWorking,
  };
  const seamEdges = resolveSeams(req.seams, intake);
  post({ type: "progress", step: "parsed", fraction: 0 });
  const flat = flattenMesh(intake, seamEdges, req.options, (step, fraction) => post({ type: "progress", step, fraction }));
  const input = patternDocumentInput(flat.report, flat.facePiece, intake.mesh, req.meta);
  const svg = renderPatternSvg(input);
  post({ type: "progress", step: "svg", fraction: 1 });
  const pdf = await renderPatternPdf(input, { paper: req.paper, overlapMm: req.overlapMm });
  post({ type: "progress", step: "pdf", fraction: 1 });
  const result: FlattenResponse = { report: flat.report, pieces: flat.pieces, facePiece: flat.facePiece, svg, pdf: new Uint8Array(pdf) };
  post({ type: "result", result });
}

run(workerData as ComputeRequest).catch((e: unknown) => {
  if (isGeometryError(e)) post({ type: "error", geometry: true, code: e.code, message: e.message });
  else post({ type: "error", geometry: false, code: "CRASH", message: e instanceof Error ? `${e.name}: ${e.message}` : String(e) });
});
