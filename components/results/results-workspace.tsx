"use client";

import { useMemo, useState } from "react";
import { Panel } from "@/components/ui/panel";
import type { LengthUnit } from "@/lib/geometry/mesh";
import type { PipelinePieceReport } from "@/lib/geometry/pipeline/flatten-mesh";
import { errorMessage } from "@/lib/client/api-fetch";
import { pieceRows } from "@/lib/client/patterns/piece-rows";
import { useHeatmaps } from "@/lib/client/patterns/use-heatmaps";
import { FlatSheet } from "./flat-sheet";
import { PiecesTable } from "./pieces-table";
import { ScanHeatView } from "./scan-heat-view";
import { StretchLegend } from "./stretch-legend";

/**
 * The interactive part of the results screen: flat sheet and 3D scan with the same stretch heat map, the legend,
 * and the pieces table. One picked piece is shared by all three.
 */
export function ResultsWorkspace({ patternId, scanId, meshUrl, pieces, units, limit, materialName }: {
  patternId: string;
  scanId: string;
  meshUrl: string | null;
  pieces: PipelinePieceReport[];
  units: LengthUnit;
  limit: number;
  materialName: string;
}) {
  const [selected, setSelected] = useState<string | null>(null);
  const flatLabels = useMemo(() => pieces.filter((p) => p.flattenable).map((p) => p.label), [pieces]);
  const allLabels = useMemo(() => pieces.map((p) => p.label), [pieces]);
  const outlines = useMemo(() => new Map(pieces.map((p) => [p.label, p.outline])), [pieces]);
  const rows = useMemo(() => pieceRows(pieces, limit), [pieces, limit]);
  const heat = useHeatmaps(patternId, flatLabels);
  const picked = selected ? pieces.find((p) => p.label === selected) : undefined;

  return (
    <div className="flex flex-col gap-6">
      <div className="grid gap-6 lg:grid-cols-2">
        <Panel title="Flat pieces">
          {heat.error ? <p role="alert" className="mb-2 text-sm text-ember-700">Some stretch maps could not be loaded: {errorMessage(heat.error)}</p> : null}
          {heat.loading && heat.byLabel.size === 0 ? <p className="text-sm text-kraft-700">Loading the stretch maps…</p> : null}
          {heat.byLabel.size > 0 ? (
            <FlatSheet labels={flatLabels} maps={heat.byLabel} outlines={outlines} limit={limit} units={units} selected={selected} onSelect={setSelected} />
          ) : null}
        </Panel>
        <Panel title="On the scan">
          <ScanHeatView scanId={scanId} meshUrl={meshUrl} labels={allLabels} maps={heat.byLabel} limit={limit} selected={selected} />
        </Panel>
      </div>
      <Panel>
        <div className="grid gap-4 md:grid-cols-[2fr_1fr] md:items-end">
          <StretchLegend limit={limit} materialName={materialName} />
          <p className="text-xs text-kraft-700" aria-live="polite">
            {picked
              ? `Piece ${picked.label}: ${picked.bevels.length} seam run${picked.bevels.length === 1 ? "" : "s"}${picked.bevels.length ? ` (to ${[...new Set(picked.bevels.map((b) => b.neighbor))].join(", ")})` : ""}, ${picked.ticks.length} registration marks.`
              : "No piece picked: click one in the table or on the sheet."}
          </p>
        </div>
      </Panel>
      <Panel title={`Pieces (${pieces.length})`}>
        <PiecesTable rows={rows} units={units} selected={selected} onSelect={setSelected} />
      </Panel>
    </div>
  );
}
