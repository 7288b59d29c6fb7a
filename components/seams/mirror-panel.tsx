"use client";

import type { MirrorAxis } from "@/lib/studio/mirror-map";

/** Mirror plane: axis and offset (or the scan's middle), shown in the viewer; copies one half's seams to the other. */
export function MirrorPanel(props: {
  enabled: boolean;
  onEnabled: (on: boolean) => void;
  axis: MirrorAxis;
  onAxis: (a: MirrorAxis) => void;
  offset: number;
  onOffset: (v: number) => void;
  range: [number, number];
  onMiddle: () => void;
  onMirror: (side: 1 | -1) => void;
  canEdit: boolean;
  units: string;
}) {
  const [lo, hi] = props.range;
  const step = (hi - lo) / 200 || 0.001;
  return (
    <div className="flex flex-col gap-2 text-xs">
      <label className="flex items-center gap-2">
        <input type="checkbox" checked={props.enabled} onChange={(e) => props.onEnabled(e.target.checked)} className="accent-foam-600" />
        Show the mirror plane
      </label>
      {props.enabled ? (
        <>
          <fieldset className="flex items-center gap-2">
            <legend className="sr-only">Mirror axis</legend>
            {(["x", "y", "z"] as const).map((a) => (
              <label key={a} className="flex items-center gap-1">
                <input type="radio" name="mirror-axis" value={a} checked={props.axis === a} onChange={() => props.onAxis(a)} className="accent-foam-600" />
                {a.toUpperCase()}
              </label>
            ))}
            <button type="button" className="ml-auto border border-kraft-500 px-1.5 hover:bg-kraft-100" onClick={props.onMiddle}>Middle</button>
          </fieldset>
          <label className="flex flex-col gap-1" htmlFor="mirror-offset">
            <span>{props.axis.toUpperCase()} = {props.offset.toPrecision(4)} {props.units}</span>
            <input id="mirror-offset" type="range" min={lo} max={hi} step={step} value={props.offset} onChange={(e) => props.onOffset(Number(e.target.value))} className="accent-foam-600" />
          </label>
          {props.canEdit ? (
            <div className="flex gap-1.5">
              <button type="button" className="flex-1 border border-foam-800 px-1.5 py-1 font-bold text-foam-800 hover:bg-kraft-100" onClick={() => props.onMirror(1)}>
                Copy +{props.axis.toUpperCase()} → −{props.axis.toUpperCase()}
              </button>
              <button type="button" className="flex-1 border border-foam-800 px-1.5 py-1 font-bold text-foam-800 hover:bg-kraft-100" onClick={() => props.onMirror(-1)}>
                Copy −{props.axis.toUpperCase()} → +{props.axis.toUpperCase()}
              </button>
            </div>
          ) : null}
        </>
      ) : null}
    </div>
  );
}
