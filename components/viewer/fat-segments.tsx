"use client";

import { useEffect, useMemo } from "react";
import { LineMaterial } from "three/examples/jsm/lines/LineMaterial.js";
import { LineSegments2 } from "three/examples/jsm/lines/LineSegments2.js";
import { LineSegmentsGeometry } from "three/examples/jsm/lines/LineSegmentsGeometry.js";

/**
 * Thick screen-space line segments over the surface.
 * @param positions 6 per segment (start xyz, end xyz), scan units
 * @param width line width in CSS pixels
 */
export function FatSegments({ positions, color, width, dashed = false, onTop = false }: { positions: Float32Array; color: string; width: number; dashed?: boolean; onTop?: boolean }) {
  const line = useMemo(() => {
    const geometry = new LineSegmentsGeometry();
    const material = new LineMaterial({ color, linewidth: width, dashed, dashSize: 3, gapSize: 2, depthTest: !onTop, transparent: onTop });
    const obj = new LineSegments2(geometry, material);
    obj.renderOrder = onTop ? 10 : 2;
    obj.frustumCulled = false;
    return obj;
  }, [color, width, dashed, onTop]);
  useEffect(() => {
    if (positions.length >= 6) {
      line.geometry.setPositions(positions);
      if (dashed) line.computeLineDistances();
    }
    line.visible = positions.length >= 6;
  }, [line, positions, dashed]);
  useEffect(() => () => { line.geometry.dispose(); line.material.dispose(); }, [line]);
  return <primitive object={line} />;
}
