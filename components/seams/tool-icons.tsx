/** Small line icons of our own for the seam tools (24×24, stroke = currentColor). */
const base = { width: 20, height: 20, viewBox: "0 0 24 24", fill: "none", stroke: "currentColor", strokeWidth: 2, strokeLinecap: "round", strokeLinejoin: "round", "aria-hidden": true } as const;

/** Trace: a needle drawing a dotted stitch line. */
export function TraceIcon() {
  return (<svg {...base}><path d="M4 20l5-5" /><path d="M9 15l9-9 2 2-9 9z" /><path d="M3 12h2M7 9h2M11 5h2" /></svg>);
}
/** Lift: a line being peeled up from the surface. */
export function LiftIcon() {
  return (<svg {...base}><path d="M3 19h10" /><path d="M13 19c3 0 5-3 6-8" /><path d="M16 8l3 3 3-3" /></svg>);
}
/** Span: calipers across two dots. */
export function SpanIcon() {
  return (<svg {...base}><circle cx="5" cy="17" r="2" /><circle cx="19" cy="7" r="2" /><path d="M7 15.5l10-7" strokeDasharray="2 2" /><path d="M4 5v4M2 7h4" /></svg>);
}
/** Orbit: an eye in a turning ring. */
export function OrbitIcon() {
  return (<svg {...base}><path d="M2 12s4-6 10-6 10 6 10 6-4 6-10 6S2 12 2 12z" /><circle cx="12" cy="12" r="2.5" /></svg>);
}
export function UndoIcon() {
  return (<svg {...base}><path d="M9 7L4 12l5 5" /><path d="M4 12h10a6 6 0 010 12" transform="translate(0 -6)" /></svg>);
}
export function RedoIcon() {
  return (<svg {...base}><path d="M15 7l5 5-5 5" /><path d="M20 12H10a6 6 0 000 12" transform="translate(0 -6)" /></svg>);
}
/** Close: a loop joined back to its start. */
export function LoopIcon() {
  return (<svg {...base}><path d="M6 16a6 6 0 1 1 6 3" /><circle cx="12" cy="19" r="1.5" /></svg>);
}
/** Snap: a crease with a magnet tick. */
export function CreaseIcon() {
  return (<svg {...base}><path d="M3 18l9-12 9 12" /><path d="M12 6v5" strokeDasharray="1.5 2" /></svg>);
}
/** Fit: four corner brackets. */
export function FitIcon() {
  return (<svg {...base}><path d="M4 9V4h5M15 4h5v5M20 15v5h-5M9 20H4v-5" /></svg>);
}
