/**
 * Peelform's stretch colour scale for heat maps and their legend. The value is a triangle's stretch s1 − 1
 * (fraction; s1 = largest singular value of its 3D → 2D map), read against the foam's limit:
 *   0            deep teal   (the piece lies flat as drawn)
 *   limit / 2    pale sand
 *   limit        amber       (the material's limit: the legend marks it)
 *   2 × limit    brick red   and beyond (clamped)
 * A triangle that only shrinks (s1 < 1) shows as 0; compression is reported in the pieces table. Colours are linear
 * in sRGB between stops.
 */

/** Stops as [position in units of the limit, r, g, b (0–255)]. */
export const STRETCH_STOPS: readonly (readonly [number, number, number, number])[] = [
  [0, 0x1d, 0x6b, 0x63],
  [0.5, 0xf1, 0xe3, 0xb5],
  [1, 0xe3, 0x90, 0x2c],
  [2, 0x9b, 0x23, 0x23],
];

/** Largest stretch the scale shows, in units of the limit. */
export const SCALE_TOP = 2;

/**
 * Writes the colour of `stretch` (s1 − 1, fraction) against `limit` (fraction, > 0) into out[o..o+2] as 0–1 floats.
 * No allocation: called once per triangle.
 */
export function stretchColourInto(stretch: number, limit: number, out: Float32Array | number[], o: number): void {
  const t = Math.min(SCALE_TOP, Math.max(0, Number.isFinite(stretch) ? stretch / limit : 0));
  let i = 0;
  while (i < STRETCH_STOPS.length - 2 && t > STRETCH_STOPS[i + 1][0]) i++;
  const a = STRETCH_STOPS[i], b = STRETCH_STOPS[i + 1];
  const f = (t - a[0]) / (b[0] - a[0]);
  out[o] = (a[1] + (b[1] - a[1]) * f) / 255;
  out[o + 1] = (a[2] + (b[2] - a[2]) * f) / 255;
  out[o + 2] = (a[3] + (b[3] - a[3]) * f) / 255;
}

/** The colour as a CSS hex string (SVG fills, legend). */
export function stretchColourHex(stretch: number, limit: number): string {
  const c = [0, 0, 0];
  stretchColourInto(stretch, limit, c, 0);
  return `#${c.map((x) => Math.round(x * 255).toString(16).padStart(2, "0")).join("")}`;
}

/** Number of colour bands the flat sheet groups triangles into (one SVG path per band and piece). */
export const SHEET_BANDS = 40;

/** Band index 0…SHEET_BANDS−1 of a stretch value, and the stretch at a band's middle. */
export function bandOf(stretch: number, limit: number): number {
  const t = Math.min(SCALE_TOP, Math.max(0, Number.isFinite(stretch) ? stretch / limit : 0));
  return Math.min(SHEET_BANDS - 1, Math.floor((t / SCALE_TOP) * SHEET_BANDS));
}
export function bandStretch(band: number, limit: number): number {
  return ((band + 0.5) / SHEET_BANDS) * SCALE_TOP * limit;
}

/** "4.2 %" from a fraction. */
export function formatPercent(fraction: number | null | undefined, digits = 1): string {
  if (fraction === null || fraction === undefined || !Number.isFinite(fraction)) return "—";
  return `${(fraction * 100).toFixed(digits)} %`;
}
