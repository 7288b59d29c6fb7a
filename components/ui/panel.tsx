import type { ReactNode } from "react";

/** A white sheet with a kraft border and a hard offset shadow: the basic surface of every screen. */
export function Panel({ title, actions, children, className = "", headingLevel = 2 }: {
  title?: ReactNode;
  actions?: ReactNode;
  children: ReactNode;
  className?: string;
  headingLevel?: 2 | 3;
}) {
  const Heading = headingLevel === 2 ? "h2" : "h3";
  return (
    <section className={`border border-kraft-200 bg-white shadow-[4px_4px_0_0_#e2cfa8] ${className}`}>
      {title || actions ? (
        <header className="flex flex-wrap items-center justify-between gap-3 border-b border-kraft-200 px-5 py-3">
          {title ? <Heading className="text-sm font-bold uppercase tracking-wider text-kraft-700">{title}</Heading> : <span />}
          {actions ? <div className="flex flex-wrap items-center gap-2">{actions}</div> : null}
        </header>
      ) : null}
      <div className="px-5 py-4">{children}</div>
    </section>
  );
}
