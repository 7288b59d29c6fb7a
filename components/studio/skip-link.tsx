/** First focusable element on studio screens: jumps past the header for keyboard users. */
export function SkipLink() {
  return (
    <a
      href="#main"
      className="sr-only z-50 bg-white px-4 py-2 text-sm font-bold text-foam-800 focus:not-sr-only focus:fixed focus:left-4 focus:top-4"
    >
      Skip to content
    </a>
  );
}
