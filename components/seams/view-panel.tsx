"use client";

import { LENGTH_UNITS, type LengthUnit } from "@/lib/geometry/mesh";
import { convertLength, formatLength } from "@/lib/studio/measure";

/** Size of the scan's bounding box in the chosen units, mesh lines, and the timing readout. */
export function ViewPanel(props: {
  size: [number, number, number];
  scanUnits: LengthUnit;
  shownUnits: LengthUnit;
  onShownUnits: (u: LengthUnit) => void;
  wireframe: boolean;
  onWireframe: (on: boolean) => void;
  faces: number;
  span: number | null;
  stats: { pickMs: number | null; piecesMs: number | null; pathMs: number | null };
}) {
  const fmt = (v: number) => formatLength(convertLength(v, props.scanUnits, props.shownUnits), props.shownUnits).replace(/ \S+$/, "");
  return (
    <div className="flex flex-col gap-2 text-xs">
      <div className="flex items-center gap-2">
        <span className="font-bold uppercase tracking-wider text-kraft-700">Size</span>
        <span data-testid="scan-size">{fmt(props.size[0])} × {fmt(props.size[1])} × {fmt(props.size[2])} {props.shownUnits}</span>
      </div>
      <div className="flex items-center gap-2">
        <label htmlFor="shown-units" className="font-bold uppercase tracking-wider text-kraft-700">Units</label>
        <select id="shown-units" value={props.shownUnits} onChange={(e) => props.onShownUnits(e.target.value as LengthUnit)} className="border border-kraft-500 bg-white px-1 py-0.5">
          {LENGTH_UNITS.map((u) => <option key={u} value={u}>{u}</option>)}
        </select>
        <span className="text-kraft-700">(scan drawn in {props.scanUnits})</span>
      </div>
      {props.span !== null ? <p data-testid="span-length"><span className="font-bold">Span:</span> {fmt(props.span)} {props.shownUnits} (straight line)</p> : null}
      <label className="flex items-center gap-2">
        <input type="checkbox" checked={props.wireframe} onChange={(e) => props.onWireframe(e.target.checked)} className="accent-foam-600" />
        Mesh lines (G)
      </label>
      <p className="font-mono text-[11px] text-kraft-700" data-testid="viewer-stats">
        {props.faces.toLocaleString("en-US")} faces · pick {props.stats.pickMs === null ? "–" : `${props.stats.pickMs.toFixed(2)} ms`} · path {props.stats.pathMs === null ? "–" : `${props.stats.pathMs.toFixed(1)} ms`} · pieces {props.stats.piecesMs === null ? "–" : `${props.stats.piecesMs.toFixed(1)} ms`}
      </p>
    </div>
  );
}
