import type { ReactNode } from "react";
import { Wordmark } from "@/components/brand/wordmark";

/** Sign-in, sign-up, invitation and password screens: one narrow sheet on millimetre paper. */
export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <div className="grid-paper flex min-h-dvh flex-col">
      <header className="px-6 py-5">
        <Wordmark />
      </header>
      <main id="main" className="flex flex-1 items-start justify-center px-4 pb-16 pt-6 sm:pt-12">
        <div className="w-full max-w-md">{children}</div>
      </main>
    </div>
  );
}
