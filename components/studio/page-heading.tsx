import type { ReactNode } from "react";

/** The title row of a studio screen: an eyebrow, the h1, a line of context and actions at the right. */
export function PageHeading({ eyebrow, title, lead, actions }: { eyebrow?: string; title: string; lead?: ReactNode; actions?: ReactNode }) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div className="min-w-0">
        {eyebrow ? <p className="text-xs font-bold uppercase tracking-[0.25em] text-ember-700">{eyebrow}</p> : null}
        <h1 className="mt-1 break-words text-2xl font-bold tracking-tight text-foam-800">{title}</h1>
        {lead ? <p className="mt-1 text-sm text-kraft-700">{lead}</p> : null}
      </div>
      {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
    </div>
  );
}
