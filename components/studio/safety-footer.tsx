import { SAFETY_CAUTIONS } from "@/lib/safety/cautions";

/**
 * Workshop cautions at the foot of every studio screen. The text is the shared copy from lib/safety/cautions.ts,
 * the same lines the pattern documents print.
 */
export function SafetyFooter() {
  return (
    <footer className="mt-auto border-t-2 border-dashed border-kraft-500 bg-kraft-100" aria-labelledby="safety-heading">
      <div className="mx-auto max-w-6xl px-4 py-6 sm:px-6">
        <h2 id="safety-heading" className="flex items-center gap-2 text-xs font-bold uppercase tracking-wider text-ember-700">
          <span aria-hidden="true" className="inline-flex h-5 w-5 items-center justify-center bg-ember-700 text-white">
            !
          </span>
          Shop safety
        </h2>
        <div className="mt-3 grid gap-5 md:grid-cols-3">
          {SAFETY_CAUTIONS.map((c) => (
            <section key={c.id} aria-label={c.title} data-caution={c.id}>
              <h3 className="text-sm font-bold text-kraft-900">{c.title}</h3>
              <ul className="mt-1 flex flex-col gap-1 text-xs leading-relaxed text-kraft-700">
                {sentences(c.lines).map((line) => (
                  <li key={line}>{line}</li>
                ))}
              </ul>
            </section>
          ))}
        </div>
      </div>
    </footer>
  );
}

/** The shared copy wraps long sentences over several lines (for print); join those back into one sentence. */
function sentences(lines: readonly string[]): string[] {
  const out: string[] = [];
  for (const line of lines) {
    const prev = out.length ? out[out.length - 1] : null;
    if (prev !== null && !/[.!?:)]$/.test(prev)) out[out.length - 1] = `${prev} ${line}`;
    else out.push(line);
  }
  return out;
}
