/** Shown while a studio screen loads on the server. */
export default function StudioLoading() {
  return (
    <div role="status" aria-live="polite" className="flex flex-col gap-6">
      <span className="sr-only">Loading…</span>
      <div aria-hidden="true" className="flex flex-col gap-2">
        <span className="h-3 w-32 animate-pulse bg-kraft-200" />
        <span className="h-7 w-64 animate-pulse bg-kraft-200" />
      </div>
      <div aria-hidden="true" className="h-48 animate-pulse border border-kraft-200 bg-white" />
    </div>
  );
}
