import { describe, expect, it } from "vitest";
import { flatGrid } from "@/lib/geometry/shapes/flat-grid";
import { uvSphere } from "@/lib/geometry/shapes/uv-sphere";
import { cutPieces } from "@/lib/geometry/topology/cut-pieces";
import { createSeamPathFinder } from "@/lib/studio/seam-path";
import { SeamSet } from "@/lib/studio/seam-set";
import { chainsFromPairs, loadSeamsJson, seamSetToJson } from "@/lib/studio/seams-json";
import { computeLivePieces } from "@/lib/studio/live-pieces";
import { buildStudioMesh, edgeBetween } from "@/lib/studio/studio-mesh";
import { meridian, ring } from "./fixtures";

const grid = () => buildStudioMesh(flatGrid({ faces: 200, size: 10 })); // 10 × 10 cells, vertex (i, r) = 11r + i
const edgesOf = (set: SeamSet) => Array.from(set.onSeam).flatMap((f, e) => (f ? [e] : []));

describe("seam set editing", () => {
  it("add, extend, erase run, erase edge, clear, with undo and redo at every step", () => {
    const sm = grid();
    const set = new SeamSet(sm);
    const finder = createSeamPathFinder(sm);
    let changes = 0;
    set.subscribe(() => changes++);
    const r1 = set.addRun(finder.find(0, 5)!.vertices); // bottom row, 5 edges
    expect(set.seamEdgeCount).toBe(5);
    set.extendLastRun(finder.find(5, 5 + 11 * 4)!.vertices); // then up 4
    expect(set.runs.length).toBe(1);
    expect(set.seamEdgeCount).toBe(9);
    expect(() => set.extendLastRun([3, 4])).toThrow(/must start at vertex 49/);
    const r2 = set.addRun([110, 111, 112]); // top-left, 2 edges
    expect(set.seamEdgeCount).toBe(11);
    const s3 = edgesOf(set);
    expect(set.eraseRun(set.runs[0].id)).toBe(true);
    expect(set.seamEdgeCount).toBe(2);
    expect(set.undoLabel).toBe("erase run");
    set.undo();
    expect(edgesOf(set)).toEqual(s3);
    set.redo();
    expect(set.seamEdgeCount).toBe(2);
    set.undo();
    // erase one edge in the middle of the first run: it splits in two
    const middle = edgeBetween(sm, 2, 3);
    expect(set.eraseEdge(middle)).toBe(true);
    expect(set.runs.length).toBe(3);
    expect(set.seamEdgeCount).toBe(10);
    expect(set.onSeam[middle]).toBe(0);
    expect(set.eraseEdge(middle)).toBe(false);
    set.clear();
    expect(set.seamEdgeCount).toBe(0);
    expect(set.runs.length).toBe(0);
    // undo back to the start, then redo all the way
    const counts: number[] = [];
    while (set.canUndo) { set.undo(); counts.push(set.seamEdgeCount); }
    expect(counts).toEqual([10, 11, 9, 5, 0]);
    expect(set.canRedo).toBe(true);
    const redone: number[] = [];
    while (set.canRedo) { set.redo(); redone.push(set.seamEdgeCount); }
    expect(redone).toEqual([5, 9, 11, 10, 0]);
    // a new edit after undo drops the redo branch
    set.undo();
    set.addRun([0, 1]);
    expect(set.canRedo).toBe(false);
    expect(changes).toBeGreaterThan(10);
    expect(r1.id).not.toBe(r2.id);
  });

  it("two runs sharing an edge: erasing one keeps the shared edge", () => {
    const set = new SeamSet(grid());
    const a = set.addRun([0, 1, 2, 3]);
    set.addRun([2, 3, 4]);
    expect(set.seamEdgeCount).toBe(4);
    set.eraseRun(a.id);
    expect(set.seamEdgeCount).toBe(2);
    expect(set.onSeam[edgeBetween(set.sm, 2, 3)]).toBe(1);
  });

  it("refuses chains that are not along mesh edges", () => {
    const set = new SeamSet(grid());
    expect(() => set.addRun([0, 2])).toThrow(/not joined by a mesh edge/);
    expect(() => set.addRun([0])).toThrow(/at least two/);
    expect(set.canUndo).toBe(false);
  });

  it("accepting and rejecting suggestions are undoable steps with a decision per id", () => {
    const set = new SeamSet(grid());
    const s = { id: "ridge:0-3:3:0", vertices: Uint32Array.of(0, 1, 2, 3) };
    set.acceptSuggestion(s);
    expect(set.decision(s.id)).toBe("accepted");
    expect(set.seamEdgeCount).toBe(3);
    set.rejectSuggestion(s.id);
    expect(set.decision(s.id)).toBe("rejected");
    expect(set.seamEdgeCount).toBe(0);
    set.undo();
    expect(set.decision(s.id)).toBe("accepted");
    set.undo();
    expect(set.decision(s.id)).toBeNull();
    expect(set.seamEdgeCount).toBe(0);
  });
});

describe("seam JSON", () => {
  it("round trip: save → load gives the same edges, runs and JSON; the pieces match cutPieces on the saved pairs", () => {
    const B = 8, S = 12;
    const mesh = uvSphere({ radius: 1, latitudeBands: B, longitudeSegments: S });
    const sm = buildStudioMesh(mesh);
    const set = new SeamSet(sm);
    set.addRun(meridian(B, S, 0));
    set.addRun(ring(S, 3));
    set.addRun([1 + 4 * S + 5, 1 + 5 * S + 5, 1 + 6 * S + 5]);
    const json = seamSetToJson(set);
    expect(json.seams.length).toBe(set.seamEdgeCount);
    const again = new SeamSet(sm);
    loadSeamsJson(again, JSON.stringify(json));
    expect(edgesOf(again)).toEqual(edgesOf(set));
    expect(new Set(again.runs.map((r) => Array.from(r.vertices).join(","))).size).toBe(again.runs.length);
    const key = (pairs: [number, number][]) => pairs.map(([a, b]) => (a < b ? `${a}-${b}` : `${b}-${a}`)).sort();
    expect(key(seamSetToJson(again).seams)).toEqual(key(json.seams));
    const reloaded = seamSetToJson(again);
    const third = new SeamSet(sm);
    loadSeamsJson(third, JSON.stringify(reloaded));
    expect(seamSetToJson(third)).toEqual(reloaded);
    expect(again.canUndo).toBe(false); // a load is a fresh start
    const live = computeLivePieces(sm, again.onSeam);
    const ref = cutPieces(mesh, new Uint32Array(json.seams.flat()));
    expect(live.labels).toEqual(ref.map((p) => p.label));
  });

  it("a closed ring reloads as one closed run; bad pairs are named", () => {
    const S = 10;
    const sm = buildStudioMesh(uvSphere({ radius: 1, latitudeBands: 4, longitudeSegments: S }));
    const chains = chainsFromPairs(sm, ring(S, 2).slice(0, -1).map((v, i, a) => [v, a[(i + 1) % a.length]] as [number, number]));
    expect(chains.length).toBe(1);
    expect(chains[0].length).toBe(S + 1);
    expect(chains[0][0]).toBe(chains[0][S]);
    const set = new SeamSet(sm);
    expect(() => loadSeamsJson(set, '{"seams": [[1, 2], [1, 30]]}')).toThrow(/Seam 2 of 2 \(\[1, 30\]\) is not an edge/);
    expect(() => loadSeamsJson(set, '{"seams": [[1, 999]]}')).toThrow(/out of range/);
    expect(() => loadSeamsJson(set, '{"seams": [[1, 2]')).toThrow(/not valid JSON/);
  });
});
