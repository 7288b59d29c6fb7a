/**
 * Places rectangles on a sheet in rows (shelf packing, tallest first): fill a row left to right, start a new row
 * above it when the next box would pass the sheet width. Source: "next-fit decreasing height" (NFDH) of
 * E. G. Coffman et al., "Performance bounds for level-oriented two-dimensional packing algorithms", SIAM J. Comput.
 * 9(4) 1980.
 */

export interface PackBox {
  width: number;
  height: number;
}

/**
 * @param boxes       sizes, output units
 * @param gap         clearance between boxes and rows, output units
 * @param sheetWidth  row width limit, output units (a box wider than the sheet gets a row of its own)
 * @returns           #boxes×2 lower-left corners (x right, y up), input order
 */
export function packRows(boxes: PackBox[], gap: number, sheetWidth: number): Float64Array {
  const out = new Float64Array(boxes.length * 2);
  const order = boxes.map((_, i) => i).sort((a, b) => boxes[b].height - boxes[a].height || a - b);
  let x = 0, y = 0, rowHeight = 0;
  for (const i of order) {
    const b = boxes[i];
    if (x > 0 && x + b.width > sheetWidth) {
      y += rowHeight + gap;
      x = 0;
      rowHeight = 0;
    }
    out[2 * i] = x;
    out[2 * i + 1] = y;
    x += b.width + gap;
    if (b.height > rowHeight) rowHeight = b.height;
  }
  return out;
}
