import { describe, expect, it } from "vitest";
import { uvSphere } from "@/lib/geometry/shapes/uv-sphere";
import { cutPieces } from "@/lib/geometry/topology/cut-pieces";
import { createPiecesHandler, type PiecesResponse } from "@/lib/studio/pieces-protocol";
import { buildStudioMesh } from "@/lib/studio/studio-mesh";
import { chainPairs, meridian, ring, seamFlags } from "./fixtures";

/** Runs the worker's handler in-process with a manual task queue, as the worker would. */
function harness() {
  const out: PiecesResponse[] = [];
  const tasks: (() => void)[] = [];
  const handle = createPiecesHandler((m) => out.push(m), (t) => tasks.push(t));
  const drain = () => { while (tasks.length) tasks.shift()!(); };
  return { out, handle, drain };
}

describe("pieces worker protocol", () => {
  const B = 8, S = 12;
  const mesh = uvSphere({ radius: 1, latitudeBands: B, longitudeSegments: S });
  const sm = buildStudioMesh(mesh);

  it("mesh → ready; seams → pieces, then a sentence per non-disk piece equal to cutPieces'", () => {
    const { out, handle, drain } = harness();
    handle({ type: "pieces", requestId: 1, onSeam: new Uint8Array(sm.edgeCount) });
    expect(out.pop()).toMatchObject({ type: "error", requestId: 1, message: /Send the mesh/ });
    handle({ type: "mesh", positions: mesh.positions, triangles: mesh.triangles });
    expect(out.pop()).toMatchObject({ type: "ready", faceCount: sm.faceCount, edgeCount: sm.edgeCount });
    const pairs = [...chainPairs(ring(S, 2)), ...chainPairs(ring(S, 6)), ...chainPairs(meridian(B, S, 0)).slice(2, 4)]; // cap, band with a slit, cap
    handle({ type: "pieces", requestId: 2, onSeam: seamFlags(sm, pairs) });
    const first = out.shift()!;
    if (first.type !== "pieces") throw new Error(`got ${first.type}`);
    const ref = cutPieces(mesh, new Uint32Array(pairs.flat()));
    expect(first.pieces.labels).toEqual(ref.map((p) => p.label));
    expect(first.pieces.isDisk).toEqual(Uint8Array.from(ref.map((p) => (p.topology.isDisk ? 1 : 0))));
    drain();
    const explained = out.filter((m) => m.type === "explanation");
    const nonDisk = ref.filter((p) => !p.topology.isDisk);
    expect(nonDisk.length).toBeGreaterThan(0);
    expect(explained.map((m) => (m.type === "explanation" ? [m.label, m.topology] : null))).toEqual(nonDisk.map((p) => [p.label, p.topology]));
  });

  it("a newer request stops the explanations of an older one", () => {
    const { out, handle, drain } = harness();
    handle({ type: "mesh", positions: mesh.positions, triangles: mesh.triangles });
    handle({ type: "pieces", requestId: 1, onSeam: new Uint8Array(sm.edgeCount) });
    handle({ type: "pieces", requestId: 2, onSeam: seamFlags(sm, chainPairs(ring(S, 4))), explain: false });
    drain();
    expect(out.filter((m) => m.type === "explanation").length).toBe(0);
  });

  it("suggestions: sharp chains and darts for the current seams", () => {
    const { out, handle } = harness();
    handle({ type: "mesh", positions: mesh.positions, triangles: mesh.triangles });
    handle({ type: "suggest", requestId: 3, onSeam: seamFlags(sm, chainPairs(ring(S, B / 2))), thresholdDeg: 40, stretchLimit: 0.05 });
    const m = out.pop()!;
    if (m.type !== "suggestions") throw new Error(`got ${m.type}`);
    expect(m.sharp).toEqual([]); // a 12-segment sphere turns by at most 360°/12 = 30° across an edge
    expect(m.darts.length).toBe(2);
    expect(m.estimates.map((e) => e.label)).toEqual(["A", "B"]);
  });
});

describe("pieces worker protocol: kinds of request", () => {
  it("a suggestion request does not cancel the explanations of the latest pieces request", () => {
    const B = 8, S = 12;
    const mesh = uvSphere({ radius: 1, latitudeBands: B, longitudeSegments: S });
    const out: PiecesResponse[] = [];
    const tasks: (() => void)[] = [];
    const handle = createPiecesHandler((m) => out.push(m), (t) => tasks.push(t));
    handle({ type: "mesh", positions: mesh.positions, triangles: mesh.triangles });
    const sm = buildStudioMesh(mesh);
    handle({ type: "pieces", requestId: 1, onSeam: new Uint8Array(sm.edgeCount) });
    handle({ type: "suggest", requestId: 2, onSeam: new Uint8Array(sm.edgeCount), thresholdDeg: 40, stretchLimit: 0.05 });
    while (tasks.length) tasks.shift()!();
    expect(out.filter((m) => m.type === "explanation").map((m) => (m.type === "explanation" ? m.topology.problem : ""))).toEqual([expect.stringMatching(/^closed surface/)]);
  });
});
