/** The seam tools and their keys: one table, read by the key handler and by the legend on screen. */
export type ToolId = "trace" | "lift" | "span" | "orbit";

export type StudioCommand =
  | { kind: "tool"; tool: ToolId }
  | { kind: "finish" }
  | { kind: "close-loop" }
  | { kind: "undo" }
  | { kind: "redo" }
  | { kind: "toggle-crease" }
  | { kind: "toggle-mesh-lines" }
  | { kind: "fit" };

export interface KeyBinding {
  /** shown in the legend */
  keys: string;
  what: string;
  command: StudioCommand;
  /** only for roles that may edit seams */
  editing: boolean;
}

export const KEY_BINDINGS: readonly KeyBinding[] = [
  { keys: "T", what: "Trace a seam: click points, the seam follows the edges", command: { kind: "tool", tool: "trace" }, editing: true },
  { keys: "L", what: "Lift: click a seam run to take it off", command: { kind: "tool", tool: "lift" }, editing: true },
  { keys: "R", what: "Span: measure between two clicked points", command: { kind: "tool", tool: "span" }, editing: false },
  { keys: "O", what: "Orbit only (clicks pick nothing)", command: { kind: "tool", tool: "orbit" }, editing: false },
  { keys: "Enter", what: "Finish the run being traced (also Esc)", command: { kind: "finish" }, editing: true },
  { keys: "C", what: "Close the run back to where it started", command: { kind: "close-loop" }, editing: true },
  { keys: "K", what: "Keep to creases (snap to sharp edges) on/off", command: { kind: "toggle-crease" }, editing: true },
  { keys: "Ctrl Z", what: "Undo", command: { kind: "undo" }, editing: true },
  { keys: "Ctrl Y", what: "Redo (also Ctrl Shift Z)", command: { kind: "redo" }, editing: true },
  { keys: "F", what: "Fit the scan in view", command: { kind: "fit" }, editing: false },
  { keys: "G", what: "Mesh lines (wireframe) on/off", command: { kind: "toggle-mesh-lines" }, editing: false },
];

/** The command of a key press, or null. Typing in form fields never triggers tools. */
export function commandForKey(e: KeyboardEvent, canEdit: boolean): StudioCommand | null {
  const t = e.target as HTMLElement | null;
  if (t && (t.tagName === "INPUT" || t.tagName === "TEXTAREA" || t.tagName === "SELECT" || t.isContentEditable)) return null;
  const mod = e.ctrlKey || e.metaKey;
  const k = e.key.toLowerCase();
  let c: StudioCommand | null = null;
  if (mod && k === "z") c = e.shiftKey ? { kind: "redo" } : { kind: "undo" };
  else if (mod && k === "y") c = { kind: "redo" };
  else if (mod || e.altKey) return null;
  else if (k === "t") c = { kind: "tool", tool: "trace" };
  else if (k === "l") c = { kind: "tool", tool: "lift" };
  else if (k === "r") c = { kind: "tool", tool: "span" };
  else if (k === "o") c = { kind: "tool", tool: "orbit" };
  else if (k === "enter" || k === "escape") c = { kind: "finish" };
  else if (k === "c") c = { kind: "close-loop" };
  else if (k === "k") c = { kind: "toggle-crease" };
  else if (k === "f") c = { kind: "fit" };
  else if (k === "g") c = { kind: "toggle-mesh-lines" };
  if (!c) return null;
  if (!canEdit && KEY_BINDINGS.some((b) => b.editing && b.command.kind === c!.kind && (c!.kind !== "tool" || (b.command.kind === "tool" && b.command.tool === c!.tool)))) return null;
  return c;
}
