"use client";

import { FOAM_MATERIALS } from "@/lib/patterns/materials";
import type { SeamSuggestion } from "@/lib/studio/suggestion";

const KIND_LABEL = { ridge: "Ridge", valley: "Valley", dart: "Dart" } as const;
const KIND_CLASS = { ridge: "bg-foam-800 text-white", valley: "bg-kraft-700 text-white", dart: "bg-ember-700 text-white" } as const;

/**
 * Suggested seams: sharp ridges and valleys at the chosen turn threshold, and darts where a piece would stretch
 * more than the chosen foam allows (lib/studio). Each can be taken (becomes a seam run) or dropped (hidden);
 * pointing at one highlights it in the viewer.
 */
export function SuggestionsPanel(props: {
  threshold: number;
  onThreshold: (deg: number) => void;
  material: string;
  onMaterial: (id: string) => void;
  suggestions: SeamSuggestion[];
  decision: (id: string) => "accepted" | "rejected" | null;
  units: string;
  highlight: string | null;
  onHighlight: (id: string | null) => void;
  onAccept: (s: SeamSuggestion) => void;
  onReject: (s: SeamSuggestion) => void;
  canEdit: boolean;
}) {
  const open = props.suggestions.filter((s) => props.decision(s.id) === null);
  const shown = open.slice(0, 40);
  return (
    <div className="flex flex-col gap-2 text-xs">
      <label className="flex flex-col gap-1" htmlFor="suggest-threshold">
        <span className="font-bold uppercase tracking-wider text-kraft-700">Turn at least {props.threshold}°</span>
        <input
          id="suggest-threshold"
          type="range"
          min={5}
          max={120}
          step={1}
          value={props.threshold}
          onChange={(e) => props.onThreshold(Number(e.target.value))}
          className="accent-foam-600"
          aria-describedby="suggest-threshold-hint"
        />
        <span id="suggest-threshold-hint" className="text-kraft-700">How far the surface turns from flat at an edge before it counts as a crease.</span>
      </label>
      <label className="flex flex-col gap-1" htmlFor="suggest-material">
        <span className="font-bold uppercase tracking-wider text-kraft-700">Darts for</span>
        <select id="suggest-material" value={props.material} onChange={(e) => props.onMaterial(e.target.value)} className="border border-kraft-500 bg-white px-1 py-1">
          {FOAM_MATERIALS.map((m) => <option key={m.id} value={m.id}>{m.name} (≤ {Math.round(m.stretchLimit * 100)} % stretch)</option>)}
        </select>
      </label>
      <p aria-live="polite">{open.length} suggested {open.length === 1 ? "seam" : "seams"}{open.length > shown.length ? ` (first ${shown.length} shown)` : ""}</p>
      <ul className="flex max-h-56 flex-col gap-1 overflow-auto" aria-label="Suggested seams" data-testid="suggestions">
        {shown.map((s) => (
          <li
            key={s.id}
            className={`flex items-center gap-2 border px-2 py-1 ${props.highlight === s.id ? "border-ember-500 bg-kraft-100" : "border-kraft-200"}`}
            onMouseEnter={() => props.onHighlight(s.id)}
            onMouseLeave={() => props.onHighlight(null)}
            onFocus={() => props.onHighlight(s.id)}
          >
            <span className={`px-1 font-bold ${KIND_CLASS[s.kind]}`}>{KIND_LABEL[s.kind]}</span>
            <span className="flex-1" title={s.reason}>
              {s.length.toPrecision(3)} {props.units}
              {s.kind === "dart" ? (s.estimatedStretch !== undefined ? ` · piece ${s.piece ?? ""} ~${(s.estimatedStretch * 100).toFixed(0)} %` : "") : ` · ${Math.abs(s.meanDihedral - 180).toFixed(0)}°`}
            </span>
            {props.canEdit ? (
              <>
                <button type="button" className="border border-foam-800 px-1.5 font-bold text-foam-800 hover:bg-kraft-100 focus-visible:outline-2 focus-visible:outline-foam-600" onClick={() => props.onAccept(s)} aria-label={`Accept ${KIND_LABEL[s.kind].toLowerCase()} seam, ${s.length.toPrecision(3)} ${props.units}`}>Take</button>
                <button type="button" className="border border-kraft-500 px-1.5 hover:bg-kraft-100 focus-visible:outline-2 focus-visible:outline-foam-600" onClick={() => props.onReject(s)} aria-label={`Reject ${KIND_LABEL[s.kind].toLowerCase()} seam`}>Drop</button>
              </>
            ) : null}
          </li>
        ))}
      </ul>
    </div>
  );
}
