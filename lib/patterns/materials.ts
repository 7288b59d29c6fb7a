/**
 * Foam materials a pattern can be cut from, with the stretch a piece may show before the flat pattern no longer
 * lies on the form without visible puckering or gaps. The UI lists these; the pattern cover flags pieces whose
 * `maxStretch` exceeds the chosen material's limit.
 *
 * Limits are fractions (0.04 = 4 %). // Common practice: shop rules of thumb for how far each foam can be eased,
 * heat-formed or compressed into shape; they vary with density and brand, so the UI lets the reviewer judge.
 */

export interface FoamMaterial {
  id: string;
  name: string;
  /** largest acceptable maxStretch (s1 − 1), fraction */
  stretchLimit: number;
  /** thicknesses commonly stocked, millimetres */
  commonThicknessMm: readonly number[];
  note: string;
}

export const FOAM_MATERIALS: readonly FoamMaterial[] = [
  // Common practice
  { id: "eva", name: "EVA foam", stretchLimit: 0.05, commonThicknessMm: [2, 4, 6, 8, 10, 12], note: "Closed-cell; heat-forms a little, edges bevel cleanly." },
  // Common practice
  { id: "eva-hd", name: "High-density EVA foam", stretchLimit: 0.03, commonThicknessMm: [2, 3, 5, 10], note: "Stiffer, holds detail, forgives less stretch." },
  // Common practice
  { id: "craft-foam", name: "Craft foam sheet", stretchLimit: 0.06, commonThicknessMm: [1, 2, 3], note: "Thin EVA sheet; bends and heat-shapes easily." },
  // Common practice
  { id: "upholstery-foam", name: "Upholstery foam", stretchLimit: 0.1, commonThicknessMm: [6, 12, 25, 50], note: "Open-cell polyurethane; compresses into shape, glue with spray or brushed contact cement." },
  // Common practice
  { id: "pe-foam", name: "Polyethylene foam", stretchLimit: 0.02, commonThicknessMm: [3, 6, 10, 25], note: "Closed-cell and springy; hardly stretches cold." },
] as const;

/** The strictest limit in the table, used when the material is not in it. */
export const STRICTEST_STRETCH_LIMIT: number = Math.min(...FOAM_MATERIALS.map((m) => m.stretchLimit));

/** Finds a material by id or by name (case-insensitive), or null. */
export function findFoamMaterial(idOrName: string): FoamMaterial | null {
  const k = idOrName.trim().toLowerCase();
  return FOAM_MATERIALS.find((m) => m.id === k || m.name.toLowerCase() === k) ?? null;
}
