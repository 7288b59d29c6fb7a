import { SAFETY_CAUTIONS } from "@/lib/safety/cautions";

/**
 * A short version of the shop cautions beside the downloads (the first line of each; the full text is in the
 * footer of every studio screen and on each pattern's cover).
 */
export function WorkshopCautions() {
  return (
    <section aria-labelledby="cautions-heading" className="border-l-4 border-ember-500 bg-white px-4 py-3">
      <h2 id="cautions-heading" className="text-xs font-bold uppercase tracking-wider text-ember-700">Before you cut and glue</h2>
      <ul className="mt-2 flex flex-col gap-1 text-xs text-kraft-900">
        {SAFETY_CAUTIONS.map((c) => (
          <li key={c.id} data-caution={c.id}>
            <span className="font-bold">{c.title}:</span> {c.lines[0]}{" "}
            {c.lines[1] ? <span className="text-kraft-700">{c.lines[1]}</span> : null}
          </li>
        ))}
      </ul>
      <p className="mt-2 text-xs"><a href="#safety-heading" className="underline text-foam-800">All cautions</a></p>
    </section>
  );
}
