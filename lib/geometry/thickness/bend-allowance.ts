/**
 * Sheet-metal bend allowance, the developed length of the neutral layer through one bend.
 * Source: BA = θ·(R + K·T) (Machinery's Handbook, sheet-metal section; worked example at
 * https://machinecalcs.com/bend-allowance-k-factor: 90°, R = 3 mm, T = 2 mm, K = 0.33 → 5.75 mm).
 *
 * @param angleDeg     bend angle A, degrees (rotation of the sheet; 90 for flanges meeting square)
 * @param insideRadius R, any length unit
 * @param thickness    T, same unit
 * @param k            K-factor (0…1), the neutral layer's distance from the inside face as a fraction of T
 * @returns            BA, same unit as R and T
 */
export function bendAllowance(angleDeg: number, insideRadius: number, thickness: number, k: number): number {
  return ((angleDeg * Math.PI) / 180) * (insideRadius + k * thickness);
}
