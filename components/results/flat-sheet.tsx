"use client";

import { useMemo } from "react";
import type { LengthUnit } from "@/lib/geometry/mesh";
import type { HeatmapArrays } from "@/lib/scans/mesh-binary";
import { SHEET_BANDS, bandOf, bandStretch, stretchColourHex } from "@/lib/client/patterns/stretch-scale";

interface SheetPiece {
  label: string;
  /** one SVG path per colour band: [band, d] */
  bands: [number, string][];
  outline: string;
  cx: number;
  cy: number;
  size: number;
}

/** A scale bar length that reads well in the pattern's units: 1-2-5 steps, about a fifth of the sheet width. */
function niceLength(width: number): number {
  const raw = width / 5;
  const p = 10 ** Math.floor(Math.log10(raw));
  const m = raw / p;
  return (m >= 5 ? 5 : m >= 2 ? 2 : 1) * p;
}

const fmt = (x: number) => (Math.round(x * 100) / 100).toString();

/**
 * The laid-out pieces drawn at true proportions in the pattern's units (one SVG user unit = one pattern unit; a
 * scale bar gives the size), each triangle filled with its stretch colour. Triangles are grouped by colour band
 * into one path per band and piece so large pieces stay light. Layout y points up; SVG y down, so y is mirrored.
 */
export function FlatSheet({ labels, maps, outlines, limit, units, selected, onSelect }: {
  labels: readonly string[];
  maps: ReadonlyMap<string, HeatmapArrays>;
  /** report outlines by label, layout coordinates */
  outlines: ReadonlyMap<string, [number, number][]>;
  limit: number;
  units: LengthUnit;
  selected: string | null;
  onSelect: (label: string | null) => void;
}) {
  const sheet = useMemo(() => {
    let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
    for (const label of labels) {
      const h = maps.get(label);
      if (!h) continue;
      for (let i = 0; i < h.uv.length; i += 2) {
        if (h.uv[i] < minX) minX = h.uv[i];
        if (h.uv[i] > maxX) maxX = h.uv[i];
        if (h.uv[i + 1] < minY) minY = h.uv[i + 1];
        if (h.uv[i + 1] > maxY) maxY = h.uv[i + 1];
      }
    }
    if (!Number.isFinite(minX)) return null;
    const X = (x: number) => fmt(x - minX);
    const Y = (y: number) => fmt(maxY - y);
    const pieces: SheetPiece[] = [];
    for (const label of labels) {
      const h = maps.get(label);
      if (!h) continue;
      const parts: string[][] = Array.from({ length: SHEET_BANDS }, () => []);
      const { uv, triangles, s1 } = h;
      let pMinX = Infinity, pMinY = Infinity, pMaxX = -Infinity, pMaxY = -Infinity;
      for (let t = 0; t < s1.length; t++) {
        const a = triangles[3 * t], b = triangles[3 * t + 1], c = triangles[3 * t + 2];
        parts[bandOf(s1[t] - 1, limit)].push(`M${X(uv[2 * a])} ${Y(uv[2 * a + 1])}L${X(uv[2 * b])} ${Y(uv[2 * b + 1])}L${X(uv[2 * c])} ${Y(uv[2 * c + 1])}Z`);
      }
      for (let i = 0; i < uv.length; i += 2) {
        pMinX = Math.min(pMinX, uv[i]); pMaxX = Math.max(pMaxX, uv[i]);
        pMinY = Math.min(pMinY, uv[i + 1]); pMaxY = Math.max(pMaxY, uv[i + 1]);
      }
      const ol = outlines.get(label) ?? [];
      pieces.push({
        label,
        bands: parts.flatMap((p, band) => (p.length ? [[band, p.join("")] as [number, string]] : [])),
        outline: ol.length ? `M${ol.map(([x, y]) => `${X(x)} ${Y(y)}`).join("L")}Z` : "",
        cx: (pMinX + pMaxX) / 2 - minX,
        cy: maxY - (pMinY + pMaxY) / 2,
        size: Math.min(pMaxX - pMinX, pMaxY - pMinY),
      });
    }
    const width = maxX - minX, height = maxY - minY;
    return { pieces, width, height, bar: niceLength(width) };
  }, [labels, maps, outlines, limit]);

  if (!sheet) return <p className="text-sm text-kraft-700">No flattened piece to draw yet.</p>;
  const pad = Math.max(sheet.width, sheet.height) * 0.04;
  const stroke = Math.max(sheet.width, sheet.height) / 400;
  const barY = sheet.height + pad * 1.6;

  return (
    <figure className="flex flex-col gap-2">
      <svg
        data-testid="flat-sheet"
        role="group"
        aria-label={`Flat pieces at scale, ${fmt(sheet.width)} × ${fmt(sheet.height)} ${units}`}
        viewBox={`${fmt(-pad)} ${fmt(-pad)} ${fmt(sheet.width + 2 * pad)} ${fmt(sheet.height + 3.2 * pad)}`}
        className="h-auto max-h-[28rem] w-full bg-kraft-50"
        onClick={(e) => {
          if (e.target === e.currentTarget) onSelect(null);
        }}
      >
        {sheet.pieces.map((p) => {
          const dim = selected !== null && selected !== p.label;
          const on = selected === p.label;
          return (
            <g
              key={p.label}
              role="button"
              tabIndex={0}
              aria-pressed={on}
              aria-label={`Piece ${p.label}`}
              data-piece={p.label}
              className="cursor-pointer focus:outline-none [&:focus-visible>path.piece-edge]:stroke-foam-400"
              opacity={dim ? 0.3 : 1}
              onClick={() => onSelect(on ? null : p.label)}
              onKeyDown={(e) => {
                if (e.key === "Enter" || e.key === " ") {
                  e.preventDefault();
                  onSelect(on ? null : p.label);
                }
              }}
            >
              {p.bands.map(([band, d]) => (
                <path key={band} d={d} fill={stretchColourHex(bandStretch(band, limit), limit)} stroke={stretchColourHex(bandStretch(band, limit), limit)} strokeWidth={stroke * 0.3} />
              ))}
              {p.outline ? <path className="piece-edge" d={p.outline} fill="none" stroke={on ? "#11463f" : "#3a2a12"} strokeWidth={on ? stroke * 3 : stroke} strokeLinejoin="round" /> : null}
              <text
                x={p.cx}
                y={p.cy}
                textAnchor="middle"
                dominantBaseline="central"
                fontSize={Math.max(p.size * 0.28, stroke * 8)}
                fontWeight={700}
                fill="#faf6ef"
                stroke="#3a2a12"
                strokeWidth={stroke * 1.2}
                paintOrder="stroke"
                pointerEvents="none"
              >
                {p.label}
              </text>
            </g>
          );
        })}
        <g aria-hidden="true">
          <line x1={0} x2={sheet.bar} y1={barY} y2={barY} stroke="#3a2a12" strokeWidth={stroke * 2} />
          <line x1={0} x2={0} y1={barY - pad * 0.3} y2={barY + pad * 0.3} stroke="#3a2a12" strokeWidth={stroke * 1.5} />
          <line x1={sheet.bar} x2={sheet.bar} y1={barY - pad * 0.3} y2={barY + pad * 0.3} stroke="#3a2a12" strokeWidth={stroke * 1.5} />
          <text x={sheet.bar + pad * 0.4} y={barY} dominantBaseline="central" fontSize={pad * 0.8} fill="#3a2a12">
            {fmt(sheet.bar)} {units}
          </text>
        </g>
      </svg>
      <figcaption className="text-xs text-kraft-700">
        Sheet {fmt(sheet.width)} × {fmt(sheet.height)} {units}. Click a piece (or a table row) to pick it out.
      </figcaption>
    </figure>
  );
}
