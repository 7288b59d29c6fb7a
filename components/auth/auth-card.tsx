import type { ReactNode } from "react";

/** The sheet every auth screen sits on: a title, a short line under it, the form, and links below. */
export function AuthCard({ title, lead, children, footer }: { title: string; lead?: ReactNode; children: ReactNode; footer?: ReactNode }) {
  return (
    <div className="border border-kraft-200 bg-white shadow-[6px_6px_0_0_#e2cfa8]">
      <div className="border-b-2 border-dashed border-kraft-200 px-6 py-5">
        <h1 className="text-xl font-bold tracking-tight text-foam-800">{title}</h1>
        {lead ? <p className="mt-1 text-sm text-kraft-700">{lead}</p> : null}
      </div>
      <div className="px-6 py-5">{children}</div>
      {footer ? <div className="border-t border-kraft-200 bg-kraft-50 px-6 py-4 text-sm">{footer}</div> : null}
    </div>
  );
}
