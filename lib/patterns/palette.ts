/**
 * Piece colours for the assembly views: twelve mid-tone hues spaced around the colour wheel in steps of 150°
 * (so neighbouring letters differ strongly), at lightness that stays readable with a black letter on top.
 */

function hslToRgb(h: number, s: number, l: number): [number, number, number] {
  const k = (n: number) => (n + h / 30) % 12;
  const a = s * Math.min(l, 1 - l);
  const f = (n: number) => l - a * Math.max(-1, Math.min(k(n) - 3, Math.min(9 - k(n), 1)));
  return [f(0), f(8), f(4)];
}

/** Base colour of piece `index`, RGB components 0…1. */
export function pieceColor(index: number): [number, number, number] {
  const hue = (index * 150 + (Math.floor(index / 12) * 37)) % 360;
  const light = index % 2 === 0 ? 0.68 : 0.6;
  return hslToRgb(hue, 0.55, light);
}

/** Colour for faces that belong to no piece. */
export const NO_PIECE_COLOR: [number, number, number] = [0.8, 0.8, 0.8];

/** "#rrggbb" from RGB 0…1. */
export function toHex(rgb: [number, number, number]): string {
  return "#" + rgb.map((c) => Math.round(Math.max(0, Math.min(1, c)) * 255).toString(16).padStart(2, "0")).join("");
}
