import { SCALE_TOP, STRETCH_STOPS, formatPercent } from "@/lib/client/patterns/stretch-scale";

/** The heat-map colour scale, 0 to twice the foam's limit, with the limit marked. */
export function StretchLegend({ limit, materialName }: { limit: number; materialName: string }) {
  const gradient = `linear-gradient(to right, ${STRETCH_STOPS.map(([t, r, g, b]) => `rgb(${r} ${g} ${b}) ${(t / SCALE_TOP) * 100}%`).join(", ")})`;
  const ticks = [0, 0.5, 1, 1.5, 2];
  return (
    <div className="flex flex-col gap-1" data-testid="stretch-legend">
      <p className="text-xs font-bold uppercase tracking-wider text-kraft-700">Stretch (s1 − 1) of each triangle</p>
      <div className="relative pt-5">
        <span
          className="absolute top-0 -translate-x-1/2 whitespace-nowrap text-[11px] font-bold text-ember-700"
          style={{ left: `${(1 / SCALE_TOP) * 100}%` }}
        >
          {materialName} limit {formatPercent(limit, 0)}
        </span>
        <div className="relative h-4 w-full border border-kraft-700" style={{ backgroundImage: gradient }} role="img" aria-label={`Colour scale from 0 % (teal) through sand and amber at the ${formatPercent(limit, 0)} limit to brick red at ${formatPercent(2 * limit, 0)} and more`}>
          <span className="absolute -top-1 bottom-[-4px] w-0.5 -translate-x-1/2 bg-ember-700" style={{ left: `${(1 / SCALE_TOP) * 100}%` }} />
        </div>
        <div className="relative h-4 text-[11px] text-kraft-700">
          {ticks.map((t) => (
            <span
              key={t}
              className={`absolute whitespace-nowrap ${t === 0 ? "" : t === SCALE_TOP ? "-translate-x-full" : "-translate-x-1/2"}`}
              style={{ left: `${(t / SCALE_TOP) * 100}%` }}
            >
              {t === SCALE_TOP ? "≥ " : ""}{formatPercent(t * limit, 1)}
            </span>
          ))}
        </div>
      </div>
    </div>
  );
}
