/** Number formatting for pattern documents (millimetre-based, with inches beside where a fabricator may need them). */

/** "6 mm", "2.5 mm". */
export function formatLength(mm: number): string {
  const r = Math.round(mm * 10) / 10;
  return `${Number.isInteger(r) ? r.toFixed(0) : r.toFixed(1)} mm`;
}

/** "123.4 cm²" (areas under 1 cm² in mm²). */
export function formatArea(mm2: number): string {
  if (mm2 < 100) return `${mm2.toFixed(0)} mm\u00b2`;
  return `${(mm2 / 100).toFixed(1)} cm\u00b2`;
}

/** "1234 mm (48.6 in)". */
export function formatLengthWithInches(mm: number): string {
  return `${mm.toFixed(0)} mm (${(mm / 25.4).toFixed(1)} in)`;
}

/** "4.2 %" from a fraction. */
export function formatPercent(fraction: number, digits = 1): string {
  return `${(fraction * 100).toFixed(digits)} %`;
}

/** YYYY-MM-DD in UTC. */
export function formatDate(d: Date): string {
  return d.toISOString().slice(0, 10);
}
