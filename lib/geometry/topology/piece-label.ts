/** Piece label for a 0-based index: 0 → A, 25 → Z, 26 → AA, 27 → AB, … (bijective base 26, like spreadsheet columns). */
export function pieceLabel(index: number): string {
  let n = index + 1;
  let s = "";
  while (n > 0) {
    const r = (n - 1) % 26;
    s = String.fromCharCode(65 + r) + s;
    n = Math.floor((n - 1) / 26);
  }
  return s;
}
