import Link from "next/link";
import { Wordmark } from "@/components/brand/wordmark";
import { buttonClass } from "@/components/ui/button-styles";

export default function NotFound() {
  return (
    <div className="grid-paper flex min-h-dvh flex-col items-center justify-center gap-6 px-6 text-center">
      <Wordmark />
      <div className="border border-kraft-200 bg-white px-8 py-6 shadow-[6px_6px_0_0_#e2cfa8]">
        <p className="text-xs font-bold uppercase tracking-[0.3em] text-ember-700">404</p>
        <h1 className="mt-2 text-xl font-bold text-foam-800">This piece is not on the sheet.</h1>
        <p className="mt-2 text-sm text-kraft-700">The page does not exist, or it belongs to a shop you are not in.</p>
        <Link href="/" className={buttonClass("secondary", "mt-5")}>
          Back to the start
        </Link>
      </div>
    </div>
  );
}
