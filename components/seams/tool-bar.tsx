"use client";

import type { ReactNode } from "react";
import { CreaseIcon, FitIcon, LiftIcon, LoopIcon, OrbitIcon, RedoIcon, SpanIcon, TraceIcon, UndoIcon } from "./tool-icons";
import type { ToolId } from "./studio-keys";

const TOOLS: { id: ToolId; name: string; key: string; icon: ReactNode; editing: boolean }[] = [
  { id: "trace", name: "Trace", key: "T", icon: <TraceIcon />, editing: true },
  { id: "lift", name: "Lift", key: "L", icon: <LiftIcon />, editing: true },
  { id: "span", name: "Span", key: "R", icon: <SpanIcon />, editing: false },
  { id: "orbit", name: "Orbit", key: "O", icon: <OrbitIcon />, editing: false },
];

const btn =
  "inline-flex items-center gap-1.5 border px-2.5 py-1.5 text-xs font-bold focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-foam-600 disabled:opacity-40";

/** The tool strip above the viewer: tools (one active), then run and history actions. */
export function ToolBar(props: {
  tool: ToolId;
  canEdit: boolean;
  crease: boolean;
  canUndo: boolean;
  canRedo: boolean;
  runOpen: boolean;
  onTool: (t: ToolId) => void;
  onUndo: () => void;
  onRedo: () => void;
  onCloseLoop: () => void;
  onFinish: () => void;
  onCrease: () => void;
  onFit: () => void;
}) {
  const tools = TOOLS.filter((t) => props.canEdit || !t.editing);
  return (
    <div className="flex flex-wrap items-center gap-1.5" role="toolbar" aria-label="Seam tools">
      <div role="radiogroup" aria-label="Tool" className="flex flex-wrap gap-1.5">
        {tools.map((t) => (
          <button
            key={t.id}
            type="button"
            role="radio"
            aria-checked={props.tool === t.id}
            data-testid={`tool-${t.id}`}
            className={`${btn} ${props.tool === t.id ? "border-foam-800 bg-foam-800 text-white" : "border-kraft-500 bg-white text-kraft-900 hover:bg-kraft-100"}`}
            onClick={() => props.onTool(t.id)}
            title={`${t.name} (${t.key})`}
          >
            {t.icon}
            {t.name}
            <kbd className="opacity-70">{t.key}</kbd>
          </button>
        ))}
      </div>
      {props.canEdit ? (
        <>
          <span className="mx-1 h-6 w-px bg-kraft-200" aria-hidden="true" />
          <button type="button" className={`${btn} border-kraft-500 bg-white`} onClick={props.onUndo} disabled={!props.canUndo} title="Undo (Ctrl Z)"><UndoIcon />Undo</button>
          <button type="button" className={`${btn} border-kraft-500 bg-white`} onClick={props.onRedo} disabled={!props.canRedo} title="Redo (Ctrl Shift Z)"><RedoIcon />Redo</button>
          <button type="button" className={`${btn} border-kraft-500 bg-white`} onClick={props.onCloseLoop} disabled={!props.runOpen} title="Close the run (C)"><LoopIcon />Close</button>
          <button type="button" className={`${btn} border-kraft-500 bg-white`} onClick={props.onFinish} disabled={!props.runOpen} title="Finish the run (Enter)">Finish</button>
          <button
            type="button"
            aria-pressed={props.crease}
            className={`${btn} ${props.crease ? "border-foam-800 bg-kraft-100 text-foam-800" : "border-kraft-500 bg-white"}`}
            onClick={props.onCrease}
            title="Keep to creases: seams prefer sharp edges (K)"
          >
            <CreaseIcon />Creases
          </button>
        </>
      ) : null}
      <span className="mx-1 h-6 w-px bg-kraft-200" aria-hidden="true" />
      <button type="button" className={`${btn} border-kraft-500 bg-white`} onClick={props.onFit} title="Fit view (F)"><FitIcon />Fit</button>
    </div>
  );
}
