import type { ReactNode } from "react";
import { Wordmark } from "@/components/brand/wordmark";

/** Developer-only screens. They answer 404 unless their feature flag is on. */
export default function DevLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col bg-kraft-50">
      <header className="border-b-2 border-dashed border-ember-500 bg-white">
        <div className="mx-auto flex max-w-5xl flex-wrap items-center justify-between gap-3 px-4 py-3 sm:px-6">
          <Wordmark />
          <p className="border border-ember-500 px-2 py-0.5 text-xs font-bold uppercase tracking-wider text-ember-700">
            Development only
          </p>
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-5xl flex-1 px-4 py-8 sm:px-6">
        {children}
      </main>
    </div>
  );
}
