import Link from "next/link";
import { buttonClass } from "@/components/ui/button-styles";

const steps = [
  { n: "01", title: "Bring a mesh", text: "Upload the OBJ or STL of your sculpt or scan and give it real units." },
  { n: "02", title: "Draw seams", text: "Paint seam lines on the model where the foam should split so each piece lies flat." },
  { n: "03", title: "Peel flat", text: "Each piece is flattened with a stretch report, bevel angles along every seam and foam thickness allowed for." },
  { n: "04", title: "Sign off", text: "A reviewer checks the distortion and approves the pattern or asks for changes." },
  { n: "05", title: "Cut and glue", text: "Fabricators print true-scale pieces with registration ticks, a cut list and an assembly sheet." },
] as const;

/** The public front page: what Peelform does, in five steps, with the way in. */
export function ProductIntro() {
  return (
    <div className="mx-auto flex max-w-5xl flex-col gap-12 px-6 py-10 sm:py-16">
      <section className="grid items-center gap-10 md:grid-cols-[1.2fr_1fr]">
        <div className="flex flex-col gap-6">
          <p className="text-xs font-bold uppercase tracking-[0.3em] text-ember-700">sculpt → seams → flat foam</p>
          <h1 className="text-3xl font-bold leading-tight tracking-tight text-foam-800 sm:text-4xl">
            Turn a small sculpt into a full-size foam build, piece by piece.
          </h1>
          <p className="max-w-prose text-sm leading-relaxed text-kraft-700">
            Peelform is the pattern bench for prop, costume and creature shops. Mark seams on a 3D model, get flat
            pieces at true scale with their stretch, bevels and registration marks, and hand the approved set to the
            people with the knives.
          </p>
          <div className="flex flex-wrap gap-3">
            <Link href="/sign-in" className={buttonClass("primary")}>
              Sign in
            </Link>
            <Link href="/sign-up" className={buttonClass("secondary")}>
              Create a shop
            </Link>
          </div>
        </div>
        <ScaleCard />
      </section>

      <section aria-labelledby="how-heading" className="flex flex-col gap-4">
        <h2 id="how-heading" className="text-sm font-bold uppercase tracking-wider text-kraft-700">
          How a build moves through the shop
        </h2>
        <ol className="grid gap-3 sm:grid-cols-2 lg:grid-cols-5">
          {steps.map((s) => (
            <li key={s.n} className="flex flex-col gap-2 border border-kraft-200 bg-white p-4 shadow-[3px_3px_0_0_#e2cfa8]">
              <span className="text-xs font-bold text-ember-700">{s.n}</span>
              <span className="text-sm font-bold text-foam-800">{s.title}</span>
              <span className="text-xs leading-relaxed text-kraft-700">{s.text}</span>
            </li>
          ))}
        </ol>
      </section>
    </div>
  );
}

/** A worked scale example, the sum every fabricator does by hand. */
function ScaleCard() {
  return (
    <figure className="border border-kraft-200 bg-white p-5 shadow-[6px_6px_0_0_#e2cfa8]">
      <figcaption className="text-xs font-bold uppercase tracking-wider text-kraft-700">Scale check</figcaption>
      <dl className="mt-4 grid grid-cols-[auto_1fr] gap-x-4 gap-y-2 text-sm">
        <dt className="text-kraft-700">sculpt width</dt>
        <dd className="text-right font-bold">4 in</dd>
        <dt className="text-kraft-700">build width</dt>
        <dd className="text-right font-bold">10 in</dd>
        <dt className="cut-line col-span-2 mt-2 pt-2 text-kraft-700">scale = target ÷ original</dt>
        <dd className="col-span-2 text-right text-2xl font-bold text-foam-800">250 %</dd>
      </dl>
    </figure>
  );
}
