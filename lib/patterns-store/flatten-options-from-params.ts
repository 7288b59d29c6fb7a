import type { FlattenOptionsInput } from "@/lib/geometry/pipeline/flatten-options";
import { findFoamMaterial } from "@/lib/patterns/materials";
import type { FlattenParams } from "@/lib/validations/flatten";

/**
 * The geometry core's options for a pattern's parameters: thickness and tick spacing as millimetre lengths, the
 * stretch warning limit from the chosen foam.
 */
export function flattenOptionsFromParams(p: FlattenParams): FlattenOptionsInput {
  const material = findFoamMaterial(p.material);
  return {
    ...(p.units ? { units: p.units } : {}),
    ...(p.scale !== undefined ? { scale: p.scale } : {}),
    ...(p.targetWidth !== undefined ? { targetWidth: p.targetWidth, targetAxis: p.targetAxis } : {}),
    thickness: `${p.thicknessMm}mm`,
    scanFace: p.scanFace,
    tickSpacing: `${p.tickSpacingMm}mm`,
    mirror: p.mirror ?? null,
    ...(material ? { stretchLimit: material.stretchLimit } : {}),
  };
}
