/**
 * Piece colours of our own: twelve muted workshop tints (kraft, teal, clay, sage, …) that stay apart from the seam
 * ink (near-black), the trace colour (amber) and the warning colour (ember), cycled by piece index.
 */
export const PIECE_PALETTE: readonly string[] = [
  "#8fb8b0", "#d8b88a", "#b7a3c9", "#a9c48e", "#e0a58c", "#9bb0d3",
  "#cfc37e", "#c99bb0", "#86c2c9", "#c4ab94", "#a7c7a9", "#d5a0a0",
];

/** Surface colour before any piece is known (the scan as uploaded). */
export const BARE_COLOR = "#cdbfa6";

export function pieceColor(index: number): string {
  return PIECE_PALETTE[index % PIECE_PALETTE.length];
}
