/**
 * Workshop safety cautions shown by the app and printed on every pattern (full text on the cover, a one-line
 * reminder on every other page). Plain data so the web screens, the PDF writer and the SVG writer share one text.
 *
 * Keep each line short (it is set in a monospace font on a Letter page, about 80 characters at most) and use only
 * characters covered by the bundled JetBrains Mono latin subset (no arrows, no ≤/≥).
 */

export interface SafetyCaution {
  /** stable id, for React keys and tests */
  id: "adhesive" | "tools" | "codes";
  title: string;
  lines: readonly string[];
}

export const SAFETY_CAUTIONS: readonly SafetyCaution[] = [
  {
    id: "adhesive",
    title: "Contact cement and solvents",
    lines: [
      "Solvent-based contact cement is flammable and its vapour is harmful to breathe.",
      "Work outdoors or with strong ventilation, and wear an organic-vapour respirator.",
      "No flames, pilot lights or sparks nearby: vapour is heavier than air and travels.",
      "Read the product's safety data sheet (SDS) before use and follow it.",
    ],
  },
  {
    id: "tools",
    title: "Blades, hot knives and heat guns",
    lines: [
      "Blades, hot knives and heat guns cause cuts and burns.",
      "Cut away from your body and keep your other hand behind the blade.",
      "Use a heat-resistant surface; let hot knives and heat guns cool before setting down.",
      "Heated foam gives off fumes: ventilate when heat-forming or hot-cutting.",
    ],
  },
  {
    id: "codes",
    title: "Codes and licensed practice",
    lines: [
      "These patterns are a guide. Local codes, venue rules and licensed practice come first",
      "(e.g. fire ratings for stage and display pieces, structural loads for worn builds).",
    ],
  },
] as const;

/** One line for pages that have no room for the full cautions (every pattern page carries it). */
export const SAFETY_REMINDER =
  "Safety: contact cement is flammable - ventilate, organic-vapour respirator, no flames; blades and heat burn. See cover.";

/** The cautions as plain text lines (title, then its lines), for text outputs such as SVG `<desc>`. */
export function safetyCautionsText(): string[] {
  const out: string[] = [];
  for (const c of SAFETY_CAUTIONS) {
    out.push(c.title.toUpperCase());
    for (const l of c.lines) out.push(l);
  }
  return out;
}
