"use client";

import { useEffect, useMemo } from "react";
import { LineMaterial } from "three/examples/jsm/lines/LineMaterial.js";
import { LineSegments2 } from "three/examples/jsm/lines/LineSegments2.js";
import { LineSegmentsGeometry } from "three/examples/jsm/lines/LineSegmentsGeometry.js";

/**
 * Thick screen-space line segments over the surface.
 * A new geometry is made for every change: the renderer caches the instance count of an instanced geometry, so
 * refilling the old one with more segments would still draw only the first ones.
 * @param positions 6 per segment (start xyz, end xyz), scan units
 * @param width line width in CSS pixels
 */
export function FatSegments({ positions, color, width, dashed = false, onTop = false }: { positions: Float32Array; color: string; width: number; dashed?: boolean; onTop?: boolean }) {
  const material = useMemo(
    () => new LineMaterial({ color, linewidth: width, dashed, dashSize: 3, gapSize: 2, depthTest: !onTop, transparent: onTop }),
    [color, width, dashed, onTop],
  );
  const line = useMemo(() => {
    const obj = new LineSegments2(new LineSegmentsGeometry(), material);
    obj.renderOrder = onTop ? 10 : 2;
    obj.frustumCulled = false;
    return obj;
  }, [material, onTop]);
  useEffect(() => {
    const old = line.geometry;
    const g = new LineSegmentsGeometry();
    if (positions.length >= 6) g.setPositions(positions);
    line.geometry = g;
    if (dashed && positions.length >= 6) line.computeLineDistances();
    line.visible = positions.length >= 6;
    old.dispose();
  }, [line, positions, dashed]);
  useEffect(() => () => { line.geometry.dispose(); }, [line]);
  useEffect(() => () => material.dispose(), [material]);
  return <primitive object={line} />;
}
