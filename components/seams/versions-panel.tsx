"use client";

import { formatDateTime } from "./format-time";

export interface SeamVersion {
  version: number;
  createdAt: string;
  edgeCount: number;
  seams: [number, number][];
}

/** Saved seam-map versions, newest first; choosing one shows what changed against the seams on screen. */
export function VersionsPanel(props: {
  versions: SeamVersion[];
  compare: number | null;
  onCompare: (v: number | null) => void;
  diff: { added: number; removed: number } | null;
  onLoad: (v: SeamVersion) => void;
  canEdit: boolean;
}) {
  if (props.versions.length === 0) return <p className="text-xs text-kraft-700">No saved versions yet.</p>;
  return (
    <div className="flex flex-col gap-2 text-xs">
      <ul className="flex max-h-40 flex-col gap-1 overflow-auto" aria-label="Saved versions" data-testid="seam-versions">
        {props.versions.map((v) => (
          <li key={v.version} className={`flex items-center gap-2 border px-2 py-1 ${props.compare === v.version ? "border-foam-800 bg-kraft-100" : "border-kraft-200"}`}>
            <span className="font-bold">v{v.version}</span>
            <span className="flex-1 text-kraft-700">{formatDateTime(v.createdAt)} · {v.edgeCount} edges</span>
            <button
              type="button"
              aria-pressed={props.compare === v.version}
              className="border border-kraft-500 px-1.5 hover:bg-kraft-100 focus-visible:outline-2 focus-visible:outline-foam-600"
              onClick={() => props.onCompare(props.compare === v.version ? null : v.version)}
            >
              {props.compare === v.version ? "Hide" : "Compare"}
            </button>
            {props.canEdit ? (
              <button type="button" className="border border-kraft-500 px-1.5 hover:bg-kraft-100 focus-visible:outline-2 focus-visible:outline-foam-600" onClick={() => props.onLoad(v)}>
                Open
              </button>
            ) : null}
          </li>
        ))}
      </ul>
      {props.diff ? (
        <p className="flex flex-wrap gap-3" aria-live="polite">
          <span><span className="mr-1 inline-block h-2 w-4 align-middle" style={{ background: "#1f9d55" }} aria-hidden="true" />{props.diff.added} edges added since v{props.compare}</span>
          <span><span className="mr-1 inline-block h-2 w-4 align-middle" style={{ background: "#c2410c" }} aria-hidden="true" />{props.diff.removed} edges removed</span>
        </p>
      ) : null}
    </div>
  );
}
