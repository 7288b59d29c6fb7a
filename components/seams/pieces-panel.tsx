import { pieceColor } from "@/components/viewer/piece-palette";
import type { LivePieces } from "./live-pieces";

/** The live pieces: count, letters in their colours, and the problem of every piece that cannot lie flat. */
export function PiecesPanel({ pieces, busy }: { pieces: LivePieces | null; busy: boolean }) {
  const list = pieces?.pieces ?? [];
  const problems = list.filter((p) => !p.isDisk);
  return (
    <div className="flex flex-col gap-2 text-xs">
      <p className="text-sm">
        <span data-testid="piece-count" data-count={pieces ? list.length : ""} className="font-bold">{pieces ? list.length : "…"}</span>{" "}
        {list.length === 1 ? "piece" : "pieces"}
        {problems.length ? <span className="text-ember-700"> · {problems.length} will not lie flat</span> : null}
        {busy ? <span className="text-kraft-700"> · cutting…</span> : null}
      </p>
      <ul className="flex max-h-28 flex-wrap gap-1 overflow-auto" aria-label="Pieces">
        {list.slice(0, 200).map((p) => (
          <li key={p.label} className={`flex items-center gap-1 border px-1.5 py-0.5 ${p.isDisk ? "border-kraft-200" : "border-ember-700"}`} title={`${p.faceCount} faces`}>
            <span className="inline-block h-3 w-3 border border-kraft-700" style={{ background: pieceColor(p.index) }} aria-hidden="true" />
            <span className="font-bold">{p.label}</span>
            {!p.isDisk ? <span className="text-ember-700" aria-label="problem">!</span> : null}
          </li>
        ))}
      </ul>
      {problems.length ? (
        <ul className="flex flex-col gap-1" aria-label="Pieces that will not lie flat" data-testid="piece-problems">
          {problems.slice(0, 8).map((p) => (
            <li key={p.label} className="border-l-4 border-ember-700 bg-kraft-50 px-2 py-1">
              <span className="font-bold">{p.label}:</span> {p.problem ?? "This piece is not a disk and cannot be flattened without another seam."}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
