"use client";

import { useCallback, useEffect, useMemo, useRef, useState, useSyncExternalStore } from "react";
import { Panel } from "@/components/ui/panel";
import { Button } from "@/components/ui/button";
import { useToast } from "@/components/toast/toast-provider";
import { ScanViewerLoader } from "@/components/viewer/scan-viewer-loader";
import type { LineLayer, PieceTag, SurfacePick, Vec3 } from "@/components/viewer/viewer-types";
import { FlattenPanel } from "@/components/flatten-form/flatten-panel";
import { errorMessage } from "@/lib/client/api-fetch";
import { useSaveSeams } from "@/lib/client/scans/use-seam-maps";
import { useViewerMesh } from "@/lib/client/scans/use-viewer-mesh";
import type { LengthUnit, TriMesh } from "@/lib/geometry/mesh";
import { createSeamPathFinder, DEFAULT_SHARP_THRESHOLD_DEG } from "@/lib/studio/seam-path";
import { SeamSet } from "@/lib/studio/seam-set";
import { chainsFromPairs } from "@/lib/studio/seams-json";
import { buildStudioMesh, edgeBetween } from "@/lib/studio/studio-mesh";
import { stretchLimitOf } from "@/lib/studio/dart-suggestions";
import { fitMirrorPlane, mirrorRuns, mirrorVertices, type MirrorAxis } from "@/lib/studio/mirror-map";
import { pendingSuggestions, type SeamSuggestion } from "@/lib/studio/suggestion";
import { KeyLegend } from "./key-legend";
import { MirrorPanel } from "./mirror-panel";
import { describeLivePieces, type LivePieces } from "./live-pieces";
import { PiecesPanel } from "./pieces-panel";
import { chainSegments, flaggedSegments, pairFlags, pieceOutline } from "./seam-segments";
import { commandForKey, type StudioCommand, type ToolId } from "./studio-keys";
import { SuggestionsPanel } from "./suggestions-panel";
import { ToolBar } from "./tool-bar";
import { useStudioWork } from "./use-studio-worker";
import { VersionsPanel, type SeamVersion } from "./versions-panel";
import { ViewPanel } from "./view-panel";

export interface StudioScan {
  id: string;
  projectId: string;
  name: string;
  units: LengthUnit;
  faceCount: number | null;
}

const SEAM_INK = "#231a10";
const ADDED = "#1f9d55";
const REMOVED = "#c2410c";
const HIGHLIGHT = "#e0602a";
const TAG_LIMIT = 80;

/** The scan page's interactive part: loads the viewer mesh, then the workbench. */
export function ScanStudio({ scan, canEdit, canFlatten, versions }: { scan: StudioScan; canEdit: boolean; canFlatten: boolean; versions: SeamVersion[] }) {
  const mesh = useViewerMesh(scan.id);
  if (mesh.isError) return <p role="alert" className="border border-ember-700 bg-white p-4 text-sm text-ember-700">The scan could not be loaded: {errorMessage(mesh.error)}</p>;
  if (!mesh.data) return <div className="grid h-[540px] place-items-center border border-kraft-200 bg-white text-sm text-kraft-700" aria-busy="true">Loading the scan ({scan.faceCount?.toLocaleString("en-US") ?? "?"} faces)…</div>;
  return <Workbench scan={scan} mesh={mesh.data} canEdit={canEdit} canFlatten={canFlatten} initialVersions={versions} />;
}

function Workbench({ scan, mesh, canEdit, canFlatten, initialVersions }: { scan: StudioScan; mesh: TriMesh; canEdit: boolean; canFlatten: boolean; initialVersions: SeamVersion[] }) {
  const toast = useToast();
  const sm = useMemo(() => buildStudioMesh(mesh), [mesh]);
  const finder = useMemo(() => createSeamPathFinder(sm), [sm]);
  const work = useStudioWork(mesh, sm);
  const [versions, setVersions] = useState(initialVersions);
  const set = useMemo(() => {
    const s = new SeamSet(sm);
    const latest = initialVersions[0];
    if (latest) {
      try { s.reset(chainsFromPairs(sm, latest.seams)); } catch (err) { console.warn("saved seams do not fit this mesh:", err); }
    }
    return s;
    // the saved map is read once per mesh
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [sm]);
  const revision = useSyncExternalStore(useCallback((l: () => void) => set.subscribe(l), [set]), () => set.revision, () => 0);
  const [savedRevision, setSavedRevision] = useState(set.revision);

  const [tool, setTool] = useState<ToolId>(canEdit ? "trace" : "orbit");
  const [crease, setCrease] = useState(false);
  const [threshold, setThreshold] = useState(DEFAULT_SHARP_THRESHOLD_DEG);
  const [anchor, setAnchor] = useState<number | null>(null);
  const [runOpen, setRunOpen] = useState(false);
  const [spanPts, setSpanPts] = useState<Vec3[]>([]);
  const [wireframe, setWireframe] = useState(false);
  const [fitKey, setFitKey] = useState(0);
  const [shownUnits, setShownUnits] = useState<LengthUnit>(scan.units);
  const [highlight, setHighlight] = useState<string | null>(null);
  const [mirrorOn, setMirrorOn] = useState(false);
  const [mirrorAxis, setMirrorAxis] = useState<MirrorAxis>("x");
  const middle = (a: MirrorAxis) => fitMirrorPlane(sm, a);
  const [mirrorOffset, setMirrorOffset] = useState(() => middle("x"));
  const [compare, setCompare] = useState<number | null>(null);
  const [stats, setStats] = useState<{ pickMs: number | null; pathMs: number | null; piecesMs: number | null }>({ pickMs: null, pathMs: null, piecesMs: null });
  const [pieces, setPieces] = useState<LivePieces | null>(null);
  const [cutting, setCutting] = useState(false);
  const save = useSaveSeams(scan.id);

  // live pieces: recounted by the pieces worker after every seam change; only the newest answer lands
  useEffect(() => {
    if (!work) return;
    setCutting(true);
    const t0 = performance.now();
    let live = true;
    work.pieces(set.onSeam).then(
      (r) => {
        if (!r || !live) return;
        const next = describeLivePieces(sm, r.pieces, r.ms);
        const total = performance.now() - t0;
        console.debug(`[peelform viewer] pieces: ${next.pieces.length} in ${r.ms.toFixed(1)} ms in the ${work.where}, ${total.toFixed(1)} ms round trip (${sm.faceCount} faces)`);
        setPieces(next);
        setStats((s) => ({ ...s, piecesMs: total }));
        setCutting(false);
      },
      (err: unknown) => { if (live) { setCutting(false); toast.error(`Pieces could not be counted: ${errorMessage(err)}`); } },
    );
    return () => { live = false; };
  }, [sm, work, set, revision, toast]);
  useEffect(() => {
    if (!work) return;
    return work.onExplanation((piece, label, topology) =>
      setPieces((prev) => {
        if (!prev || prev.pieces[piece]?.label !== label) return prev;
        return { ...prev, pieces: prev.pieces.map((p) => (p.index === piece ? { ...p, problem: topology.problem } : p)) };
      }),
    );
  }, [work]);

  const [material, setMaterial] = useState("eva");
  const [suggestions, setSuggestions] = useState<SeamSuggestion[]>([]);
  // suggestions wait for the recount, so they never hold up the pieces answer in the worker's queue
  useEffect(() => {
    if (!work || !pieces) return;
    let live = true;
    const timer = window.setTimeout(() => {
      work.suggestions(set.onSeam, threshold, stretchLimitOf(material)).then(
        (r) => { if (r && live) setSuggestions([...r.darts, ...r.sharp]); },
        (err: unknown) => console.warn("[peelform viewer] suggestions failed:", err),
      );
    }, 150);
    return () => { live = false; window.clearTimeout(timer); };
  }, [work, set, pieces, threshold, material]);
  const decision = useCallback((id: string) => set.decision(id), [set, revision]); // eslint-disable-line react-hooks/exhaustive-deps

  const finishRun = useCallback(() => { setAnchor(null); setRunOpen(false); }, []);

  const onPick = useCallback((pick: SurfacePick) => {
    setStats((s) => ({ ...s, pickMs: pick.ms }));
    if (tool === "orbit") return;
    if (tool === "span") {
      setSpanPts((pts) => (pts.length >= 2 ? [pick.point] : [...pts, pick.point]));
      return;
    }
    if (!canEdit) return;
    if (tool === "lift") {
      const candidates: number[] = [];
      for (let k = sm.vertexEdgeOffsets[pick.vertex]; k < sm.vertexEdgeOffsets[pick.vertex + 1]; k++) candidates.push(sm.vertexEdges[k]);
      for (let k = 0; k < 3; k++) candidates.push(sm.sideEdge[3 * pick.face + k]);
      const edge = candidates.find((e) => set.onSeam[e]);
      if (edge === undefined) { toast.show("No seam under that point: click on a seam line to lift its run."); return; }
      const runs = set.runsOnEdge(edge);
      set.eraseRun(runs[runs.length - 1]);
      finishRun();
      return;
    }
    // trace
    if (anchor === null) { setAnchor(pick.vertex); setRunOpen(false); return; }
    if (anchor === pick.vertex) return;
    const t0 = performance.now();
    const path = finder.find(anchor, pick.vertex, { snapToSharp: crease, sharpThresholdDeg: threshold });
    const pathMs = performance.now() - t0;
    setStats((s) => ({ ...s, pathMs }));
    if (!path) { toast.error("Those two points are on separate parts of the scan; a seam cannot join them."); return; }
    if (runOpen) set.extendLastRun(path.vertices); else set.addRun(path.vertices);
    setRunOpen(true);
    setAnchor(pick.vertex);
  }, [tool, canEdit, sm, set, finder, anchor, runOpen, crease, threshold, toast, finishRun]);

  const closeLoop = useCallback(() => {
    const last = set.runs[set.runs.length - 1];
    if (!runOpen || anchor === null || !last) return;
    const path = finder.find(anchor, last.vertices[0], { snapToSharp: crease, sharpThresholdDeg: threshold });
    if (path && path.vertices.length > 1) set.extendLastRun(path.vertices);
    finishRun();
  }, [set, runOpen, anchor, finder, crease, threshold, finishRun]);

  const run = useCallback((c: StudioCommand) => {
    switch (c.kind) {
      case "tool": setTool(c.tool); finishRun(); if (c.tool !== "span") setSpanPts([]); break;
      case "finish": finishRun(); break;
      case "close-loop": closeLoop(); break;
      case "undo": set.undo(); finishRun(); break;
      case "redo": set.redo(); finishRun(); break;
      case "toggle-crease": setCrease((v) => !v); break;
      case "toggle-mesh-lines": setWireframe((v) => !v); break;
      case "fit": setFitKey((k) => k + 1); break;
    }
  }, [set, finishRun, closeLoop]);

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const c = commandForKey(e, canEdit);
      if (!c) return;
      e.preventDefault();
      run(c);
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [run, canEdit]);

  const dirty = revision !== savedRevision;
  useEffect(() => {
    if (!dirty || !canEdit) return;
    const warn = (e: BeforeUnloadEvent) => { e.preventDefault(); };
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [dirty, canEdit]);

  const onSave = () => {
    const rev = set.revision;
    const seams = set.seamPairs();
    save.mutate(seams, {
      onSuccess: (dto) => {
        setVersions((v) => [{ version: dto.version, createdAt: dto.createdAt, edgeCount: dto.edgeCount, seams: dto.seams }, ...v]);
        setSavedRevision(rev);
        toast.success(`Seams saved as version ${dto.version} (${dto.pieces.length} ${dto.pieces.length === 1 ? "piece" : "pieces"}).`);
      },
      onError: (err) => toast.error(errorMessage(err)),
    });
  };

  // layers
  const seamSegs = useMemo(() => flaggedSegments(sm, set.onSeam), [sm, set, revision]); // eslint-disable-line react-hooks/exhaustive-deps
  const compareVersion = versions.find((v) => v.version === compare) ?? null;
  const diff = useMemo(() => {
    if (!compareVersion) return null;
    const old = pairFlags(sm, compareVersion.seams, edgeBetween);
    const added = new Uint8Array(sm.edgeCount), removed = new Uint8Array(sm.edgeCount);
    let na = 0, nr = 0;
    for (let e = 0; e < sm.edgeCount; e++) {
      if (set.onSeam[e] && !old[e]) { added[e] = 1; na++; }
      if (!set.onSeam[e] && old[e]) { removed[e] = 1; nr++; }
    }
    return { added: flaggedSegments(sm, added), removed: flaggedSegments(sm, removed), na, nr };
  }, [sm, set, compareVersion, revision]); // eslint-disable-line react-hooks/exhaustive-deps
  const openSuggestions = useMemo(() => pendingSuggestions(suggestions, (id) => set.decision(id)).slice(0, 40), [suggestions, set, revision]); // eslint-disable-line react-hooks/exhaustive-deps
  const suggestionSegs = useMemo(() => chainSegments(sm, openSuggestions.map((s) => s.vertices)), [sm, openSuggestions]);
  const highlighted = openSuggestions.find((s) => s.id === highlight) ?? null;
  const outline = useMemo(() => {
    if (!pieces || pieces.pieces.every((p) => p.isDisk)) return new Float32Array(0);
    const flagged = new Uint8Array(pieces.pieces.length);
    for (const p of pieces.pieces) flagged[p.index] = p.isDisk ? 0 : 1;
    return pieceOutline(sm, pieces.facePiece, flagged);
  }, [sm, pieces]);

  const lines: LineLayer[] = [
    { id: "seams", positions: seamSegs, color: SEAM_INK, width: 3.5 },
    { id: "suggested", positions: suggestionSegs, color: "#2f7f86", width: 2, dashed: true },
    { id: "flagged", positions: outline, color: "#a23c12", width: 4.5 },
  ];
  if (highlighted) lines.push({ id: "highlight", positions: chainSegments(sm, [highlighted.vertices]), color: HIGHLIGHT, width: 6, onTop: true });
  if (diff) {
    lines.push({ id: "added", positions: diff.added, color: ADDED, width: 5.5 });
    lines.push({ id: "removed", positions: diff.removed, color: REMOVED, width: 5.5, dashed: true });
  }
  if (spanPts.length === 2) lines.push({ id: "span", positions: new Float32Array([...spanPts[0], ...spanPts[1]]), color: "#1d4e89", width: 3, onTop: true });

  const markers: { position: Vec3; color: string }[] = spanPts.map((position) => ({ position, color: "#1d4e89" }));
  if (anchor !== null) {
    const p = mesh.positions;
    markers.push({ position: [p[3 * anchor], p[3 * anchor + 1], p[3 * anchor + 2]], color: HIGHLIGHT });
  }
  const tags: PieceTag[] = (pieces?.pieces ?? []).slice(0, TAG_LIMIT).map((p) => ({ key: p.label, position: p.anchor, text: p.isDisk ? p.label : `${p.label} !`, flagged: !p.isDisk }));

  const size: [number, number, number] = [sm.bbox[3] - sm.bbox[0], sm.bbox[4] - sm.bbox[1], sm.bbox[5] - sm.bbox[2]];
  const span = spanPts.length === 2 ? Math.hypot(spanPts[0][0] - spanPts[1][0], spanPts[0][1] - spanPts[1][1], spanPts[0][2] - spanPts[1][2]) : null;
  const axisK = mirrorAxis === "x" ? 0 : mirrorAxis === "y" ? 1 : 2;

  const hint = !canEdit
    ? "Read-only: orbit with a drag, zoom with the wheel or a pinch, measure with Span."
    : tool === "trace"
      ? anchor === null ? "Click the surface to start a seam." : "Click the next point; Enter finishes, C closes the run back to its start."
      : tool === "lift" ? "Click a seam line to lift its whole run." : tool === "span" ? "Click two points to measure between them." : "Drag to orbit, right-drag to pan, wheel to zoom.";

  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_320px]">
        <div className="flex min-w-0 flex-col gap-2">
          <ToolBar
            tool={tool}
            canEdit={canEdit}
            crease={crease}
            canUndo={set.canUndo}
            canRedo={set.canRedo}
            runOpen={runOpen}
            onTool={(t) => run({ kind: "tool", tool: t })}
            onUndo={() => run({ kind: "undo" })}
            onRedo={() => run({ kind: "redo" })}
            onCloseLoop={closeLoop}
            onFinish={finishRun}
            onCrease={() => setCrease((v) => !v)}
            onFit={() => setFitKey((k) => k + 1)}
          />
          <div
            className={`relative h-[min(62dvh,560px)] min-h-[340px] border border-kraft-500 bg-white ${tool === "orbit" ? "cursor-grab" : "cursor-crosshair"}`}
            data-testid="scan-viewer"
            data-piece-count={pieces ? pieces.pieces.length : undefined}
            data-seam-edges={set.seamEdgeCount}
            data-pick-ms={stats.pickMs ?? undefined}
            data-pieces-ms={stats.piecesMs ?? undefined}
          >
            <ScanViewerLoader
              mesh={mesh}
              facePiece={pieces?.facePiece ?? null}
              lines={lines}
              tags={tags}
              markers={markers}
              mirror={mirrorOn ? { axis: mirrorAxis, offset: mirrorOffset } : null}
              wireframe={wireframe}
              fitKey={fitKey}
              picking={tool !== "orbit"}
              onPick={onPick}
            />
            <p className="pointer-events-none absolute bottom-2 left-2 bg-white/85 px-2 py-1 text-xs text-kraft-900" aria-live="polite">{hint}</p>
          </div>
          <div className="flex flex-wrap items-center gap-3">
            {canEdit ? (
              <Button onClick={onSave} busy={save.isPending} disabled={!dirty && versions.length > 0} data-testid="save-seams">
                Save seams as v{(versions[0]?.version ?? 0) + 1}
              </Button>
            ) : null}
            <span className="text-xs text-kraft-700" data-testid="seam-status">
              {set.seamEdgeCount} seam edges in {set.runs.length} {set.runs.length === 1 ? "run" : "runs"}
              {canEdit ? (dirty ? " · not saved" : versions.length ? ` · saved as v${versions[0].version}` : "") : ""}
            </span>
          </div>
        </div>
        <div className="flex flex-col gap-3">
          <Panel title="Pieces" headingLevel={3}><PiecesPanel pieces={pieces} busy={cutting} /></Panel>
          <Panel title="Suggested seams" headingLevel={3}>
            <SuggestionsPanel
              threshold={threshold}
              onThreshold={setThreshold}
              material={material}
              onMaterial={setMaterial}
              suggestions={suggestions}
              decision={decision}
              units={scan.units}
              highlight={highlight}
              onHighlight={setHighlight}
              onAccept={(s: SeamSuggestion) => { set.acceptSuggestion({ id: s.id, vertices: s.vertices }); finishRun(); }}
              onReject={(s: SeamSuggestion) => { set.rejectSuggestion(s.id); finishRun(); }}
              canEdit={canEdit}
            />
          </Panel>
          <Panel title="Mirror" headingLevel={3}>
            {renderMirror()}
          </Panel>
        </div>
      </div>
      <div className="grid gap-4 lg:grid-cols-3">
        <Panel title="View" headingLevel={3}>
          <ViewPanel size={size} scanUnits={scan.units} shownUnits={shownUnits} onShownUnits={setShownUnits} wireframe={wireframe} onWireframe={setWireframe} faces={sm.faceCount} span={span} stats={stats} />
        </Panel>
        <Panel title="Versions" headingLevel={3}>
          <VersionsPanel
            versions={versions}
            compare={compare}
            onCompare={setCompare}
            diff={diff ? { added: diff.na, removed: diff.nr } : null}
            onLoad={(v) => { try { set.reset(chainsFromPairs(sm, v.seams)); setSavedRevision(set.revision); finishRun(); } catch (err) { toast.error(errorMessage(err)); } }}
            canEdit={canEdit}
          />
        </Panel>
        <Panel title="Keys" headingLevel={3}><KeyLegend canEdit={canEdit} /></Panel>
      </div>
      {canFlatten ? (
        <Panel title="Flatten into a pattern">
          <FlattenPanel scanId={scan.id} units={scan.units} savedVersion={versions[0]?.version ?? null} unsaved={dirty} />
        </Panel>
      ) : null}
    </div>
  );

  function renderMirror() {
    return (
      <MirrorPanel
        enabled={mirrorOn}
        onEnabled={setMirrorOn}
        axis={mirrorAxis}
        onAxis={(a) => { setMirrorAxis(a); setMirrorOffset(middle(a)); }}
        offset={mirrorOffset}
        onOffset={setMirrorOffset}
        range={[sm.bbox[axisK], sm.bbox[3 + axisK]]}
        onMiddle={() => setMirrorOffset(middle(mirrorAxis))}
        onMirror={(side) => {
          const vm = mirrorVertices(sm, { axis: mirrorAxis, offset: mirrorOffset });
          const made = mirrorRuns(sm, vm, set.runs, { from: side === 1 ? "positive" : "negative", finder });
          if (made.chains.length === 0) {
            toast.show(made.failed ? `No seam edge found its mirror image (${made.failed} without a partner): is the plane in the middle of a symmetric scan?` : "No seam runs on that side of the plane to copy.");
            return;
          }
          set.addRuns(made.chains, "mirror seams");
          finishRun();
          toast.success(`Mirrored ${made.mirrored + made.bridged} seam edges${made.failed ? `; ${made.failed} had no mirror image` : ""}.`);
        }}
        canEdit={canEdit}
        units={scan.units}
      />
    );
  }
}
