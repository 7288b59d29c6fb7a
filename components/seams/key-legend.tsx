import { KEY_BINDINGS } from "./studio-keys";

/** The visible list of keys for the seam tools. */
export function KeyLegend({ canEdit }: { canEdit: boolean }) {
  const rows = KEY_BINDINGS.filter((b) => canEdit || !b.editing);
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-xs text-kraft-900" aria-label="Keyboard shortcuts">
      {rows.map((b) => (
        <div key={b.keys} className="contents">
          <dt><kbd className="border border-kraft-500 bg-kraft-50 px-1 font-bold text-kraft-900">{b.keys}</kbd></dt>
          <dd>{b.what}</dd>
        </div>
      ))}
    </dl>
  );
}
