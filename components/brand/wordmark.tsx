import Link from "next/link";

/**
 * The Peelform mark: a flat piece with one corner peeled back along a dashed seam.
 * Drawn inline so it needs no request and inherits the text colour.
 */
export function PeelMark({ className = "h-7 w-7" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true" focusable="false">
      <path d="M4 4h24v14L18 28H4z" fill="currentColor" opacity="0.18" />
      <path d="M4 4h24v14L18 28H4z" fill="none" stroke="currentColor" strokeWidth="2" strokeLinejoin="round" />
      <path d="M28 18L18 28l-1-9z" fill="#e0602a" stroke="currentColor" strokeWidth="1.5" strokeLinejoin="round" />
      <path d="M9 10h12M9 15h8" stroke="currentColor" strokeWidth="1.5" strokeDasharray="2 2" />
    </svg>
  );
}

export function Wordmark({ href = "/", tone = "dark" }: { href?: string; tone?: "dark" | "light" }) {
  return (
    <Link
      href={href}
      className={`inline-flex items-center gap-2 text-lg font-bold tracking-tight ${tone === "light" ? "text-white" : "text-foam-800"}`}
    >
      <PeelMark />
      <span>peelform</span>
    </Link>
  );
}
