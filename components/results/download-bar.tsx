import { buttonClass } from "@/components/ui/button-styles";
import { PAPER_SIZES } from "@/lib/patterns/paper-sizes";

const TILED = ["letter", "a4", "a3", "tabloid"] as const;

/** Download links of a finished pattern: the PDF tiled on each office paper, full size, SVG and the JSON report. */
export function DownloadBar({ patternId }: { patternId: string }) {
  const base = `/api/patterns/${patternId}`;
  const link = buttonClass("secondary", "px-3 py-1.5 text-xs");
  return (
    <nav aria-label="Downloads" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center gap-2">
        <span className="mr-1 text-xs font-bold uppercase tracking-wider text-kraft-700">PDF, tiled</span>
        {TILED.map((p) => (
          <a key={p} className={link} href={`${base}/pdf?paper=${p}`} download data-download={`pdf-${p}`}>
            {PAPER_SIZES[p].name}
          </a>
        ))}
      </div>
      <div className="flex flex-wrap items-center gap-2">
        <span className="mr-1 text-xs font-bold uppercase tracking-wider text-kraft-700">Whole sheet</span>
        <a className={link} href={`${base}/pdf?paper=full`} download data-download="pdf-full">PDF full size (plotter)</a>
        <a className={link} href={`${base}/svg`} download data-download="svg">SVG</a>
        <a className={link} href={`${base}/json`} download data-download="json">Report (JSON)</a>
      </div>
    </nav>
  );
}
