/**
 * The seam set being painted in the studio, with undo and redo.
 *
 * State = the runs the designer drew (each run a vertex polyline along mesh edges, so a whole run can be erased) and
 * the accept/reject decision per suggestion id. The seam edges are the union of the runs' edges, kept as a
 * reference count per edge id (two runs may share an edge; erasing one keeps the edge) plus a 0/1 flag array the
 * viewer and the live-pieces step read directly. Runs are immutable, so a history step is a list of run references
 * and undo/redo only touches the edges of runs that differ between two steps.
 */
import type { StudioMesh } from "./studio-mesh";
import { edgeBetween } from "./studio-mesh";

export interface SeamRun {
  /** unique within this seam set, increasing */
  id: number;
  /** vertex chain, ≥ 2 vertices, consecutive vertices joined by a mesh edge */
  vertices: Uint32Array;
  /** edge ids along the chain (vertices.length − 1) */
  edges: Uint32Array;
  /** id of the suggestion this run came from, if any */
  suggestionId?: string;
}

export type SuggestionDecision = "accepted" | "rejected";

interface Step {
  runs: readonly SeamRun[];
  decisions: ReadonlyMap<string, SuggestionDecision>;
  label: string;
}

/** Most undo steps kept. Our choice: plenty for a painting session, bounded memory. */
export const UNDO_LIMIT = 500;

export class SeamSet {
  /** #E number of runs using each edge */
  readonly edgeRefs: Uint32Array;
  /** #E 1 where the edge is a seam (edgeRefs > 0): the array the viewer colours and live pieces read */
  readonly onSeam: Uint8Array;
  private current: Step;
  private past: Step[] = [];
  private future: Step[] = [];
  private nextId = 1;
  private listeners = new Set<() => void>();
  private seamEdges = 0;
  /** increases on every change (for React's useSyncExternalStore snapshot) */
  revision = 0;

  constructor(readonly sm: StudioMesh) {
    this.edgeRefs = new Uint32Array(sm.edgeCount);
    this.onSeam = new Uint8Array(sm.edgeCount);
    this.current = { runs: [], decisions: new Map(), label: "start" };
  }

  get runs(): readonly SeamRun[] {
    return this.current.runs;
  }

  /** Number of distinct seam edges. */
  get seamEdgeCount(): number {
    return this.seamEdges;
  }

  get canUndo(): boolean {
    return this.past.length > 0;
  }

  get canRedo(): boolean {
    return this.future.length > 0;
  }

  /** What undo would take back, e.g. "add run", or null. */
  get undoLabel(): string | null {
    return this.past.length > 0 ? this.current.label : null;
  }

  get redoLabel(): string | null {
    return this.future.length > 0 ? this.future[this.future.length - 1].label : null;
  }

  decision(suggestionId: string): SuggestionDecision | null {
    return this.current.decisions.get(suggestionId) ?? null;
  }

  /** Calls `listener` after every change; returns the unsubscribe function. */
  subscribe(listener: () => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  /**
   * Makes a run from a vertex chain (e.g. SeamPathFinder.through(...).vertices).
   * @throws RangeError when two consecutive vertices are not joined by a mesh edge or the chain has < 2 vertices
   */
  makeRun(vertices: ArrayLike<number>, suggestionId?: string): SeamRun {
    if (vertices.length < 2) throw new RangeError("A seam run needs at least two vertices.");
    const vs = Uint32Array.from(vertices as ArrayLike<number>);
    const edges = new Uint32Array(vs.length - 1);
    for (let i = 0; i + 1 < vs.length; i++) {
      const e = edgeBetween(this.sm, vs[i], vs[i + 1]);
      if (e < 0) throw new RangeError(`Vertices ${vs[i]} and ${vs[i + 1]} are not joined by a mesh edge.`);
      edges[i] = e;
    }
    return { id: this.nextId++, vertices: vs, edges, suggestionId };
  }

  /** Adds a run drawn through picked points; returns it. */
  addRun(vertices: ArrayLike<number>): SeamRun {
    const run = this.makeRun(vertices);
    this.commit({ ...this.current, runs: [...this.current.runs, run], label: "add run" });
    return run;
  }

  /** Adds several runs as one undo step (mirroring, loading); chains with fewer than 2 vertices are skipped. */
  addRuns(chains: readonly ArrayLike<number>[], label = "add runs"): SeamRun[] {
    const runs = chains.filter((c) => c.length >= 2).map((c) => this.makeRun(c));
    if (runs.length > 0) this.commit({ ...this.current, runs: [...this.current.runs, ...runs], label });
    return runs;
  }

  /**
   * Extends the last run by a chain that starts at its last vertex (the path to the next picked point).
   * With no runs, starts one.
   * @throws RangeError when the chain does not start where the last run ends
   */
  extendLastRun(vertices: ArrayLike<number>): SeamRun {
    const runs = this.current.runs;
    const last = runs[runs.length - 1];
    if (!last) return this.addRun(vertices);
    const end = last.vertices[last.vertices.length - 1];
    if (vertices.length === 0 || vertices[0] !== end) {
      throw new RangeError(`The extension must start at vertex ${end}, where the last run ends.`);
    }
    if (vertices.length === 1) return last;
    const joined = new Uint32Array(last.vertices.length + vertices.length - 1);
    joined.set(last.vertices);
    for (let i = 1; i < vertices.length; i++) joined[last.vertices.length + i - 1] = vertices[i];
    const run = this.makeRun(joined, last.suggestionId);
    this.commit({ ...this.current, runs: [...runs.slice(0, -1), run], label: "extend run" });
    return run;
  }

  /** Removes a whole run; false when no run has that id. */
  eraseRun(id: number): boolean {
    const runs = this.current.runs;
    const i = runs.findIndex((r) => r.id === id);
    if (i < 0) return false;
    const run = runs[i];
    const decisions = new Map(this.current.decisions);
    if (run.suggestionId && !runs.some((r, k) => k !== i && r.suggestionId === run.suggestionId)) decisions.delete(run.suggestionId);
    this.commit({ runs: [...runs.slice(0, i), ...runs.slice(i + 1)], decisions, label: "erase run" });
    return true;
  }

  /** Run ids that use an edge (for "erase the run under the cursor"). */
  runsOnEdge(edge: number): number[] {
    const out: number[] = [];
    for (const r of this.current.runs) if (r.edges.includes(edge)) out.push(r.id);
    return out;
  }

  /** Removes one edge from every run that uses it, splitting those runs in two; false when it is not a seam edge. */
  eraseEdge(edge: number): boolean {
    if (!(edge >= 0 && edge < this.onSeam.length) || this.onSeam[edge] === 0) return false;
    const runs: SeamRun[] = [];
    for (const r of this.current.runs) {
      if (!r.edges.includes(edge)) { runs.push(r); continue; }
      let start = 0;
      for (let i = 0; i <= r.edges.length; i++) {
        if (i === r.edges.length || r.edges[i] === edge) {
          if (i > start) runs.push(this.makeRun(r.vertices.subarray(start, i + 1), r.suggestionId));
          start = i + 1;
        }
      }
    }
    this.commit({ ...this.current, runs, label: "erase edge" });
    return true;
  }

  /** Removes all runs (suggestion decisions stay, so rejected suggestions stay hidden). */
  clear(): void {
    if (this.current.runs.length === 0) return;
    this.commit({ ...this.current, runs: [], label: "clear" });
  }

  /** Accepts a suggestion: its chain becomes a run, and the decision is recorded (one undo step). */
  acceptSuggestion(suggestion: { id: string; vertices: ArrayLike<number> }): SeamRun {
    const run = this.makeRun(suggestion.vertices, suggestion.id);
    const decisions = new Map(this.current.decisions).set(suggestion.id, "accepted");
    this.commit({ runs: [...this.current.runs, run], decisions, label: "accept suggestion" });
    return run;
  }

  /** Rejects a suggestion (hidden from then on); removes its runs if it had been accepted (one undo step). */
  rejectSuggestion(id: string): void {
    const decisions = new Map(this.current.decisions).set(id, "rejected");
    this.commit({ runs: this.current.runs.filter((r) => r.suggestionId !== id), decisions, label: "reject suggestion" });
  }

  /** Replaces everything with the given runs as a fresh start (loading a saved version); clears the history. */
  reset(chains: readonly ArrayLike<number>[] = []): void {
    const runs = chains.filter((c) => c.length >= 2).map((c) => this.makeRun(c));
    this.apply({ runs, decisions: new Map(), label: "start" });
    this.past = [];
    this.future = [];
    this.emit();
  }

  undo(): boolean {
    const prev = this.past.pop();
    if (!prev) return false;
    this.future.push(this.current);
    this.apply(prev);
    this.emit();
    return true;
  }

  redo(): boolean {
    const next = this.future.pop();
    if (!next) return false;
    this.past.push(this.current);
    this.apply(next);
    this.emit();
    return true;
  }

  /** Distinct seam edges as vertex pairs in run order (the PUT /api/scans/[id]/seams body's `seams`). */
  seamPairs(): [number, number][] {
    const seen = new Uint8Array(this.onSeam.length);
    const out: [number, number][] = [];
    for (const r of this.current.runs) {
      for (let i = 0; i < r.edges.length; i++) {
        const e = r.edges[i];
        if (seen[e]) continue;
        seen[e] = 1;
        out.push([r.vertices[i], r.vertices[i + 1]]);
      }
    }
    return out;
  }

  /** 2 per distinct seam edge, vertex ids (the form cutPieces and flattenMesh take). */
  seamVertexPairs(): Uint32Array {
    return new Uint32Array(this.seamPairs().flat());
  }

  private commit(next: Step): void {
    this.past.push(this.current);
    if (this.past.length > UNDO_LIMIT) this.past.shift();
    this.future = [];
    this.apply(next);
    this.emit();
  }

  /** Moves the edge counts from the current step to `next`, touching only runs that differ. */
  private apply(next: Step): void {
    const before = new Set(this.current.runs);
    const after = new Set(next.runs);
    for (const r of this.current.runs) if (!after.has(r)) this.count(r, -1);
    for (const r of next.runs) if (!before.has(r)) this.count(r, 1);
    this.current = next;
  }

  private count(r: SeamRun, delta: 1 | -1): void {
    const refs = this.edgeRefs, flag = this.onSeam;
    for (let i = 0; i < r.edges.length; i++) {
      const e = r.edges[i];
      const was = refs[e];
      refs[e] = was + delta;
      if (was === 0 && delta === 1) { flag[e] = 1; this.seamEdges++; }
      else if (was === 1 && delta === -1) { flag[e] = 0; this.seamEdges--; }
    }
  }

  private emit(): void {
    this.revision++;
    for (const l of this.listeners) l();
  }
}
