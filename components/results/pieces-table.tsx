"use client";

import { createColumnHelper, createSortedRowModel, rowSortingFeature, sortFn_alphanumeric, tableFeatures, useTable, type SortFn } from "@tanstack/react-table";
import type { LengthUnit } from "@/lib/geometry/mesh";
import type { PieceRow } from "@/lib/client/patterns/piece-rows";
import { formatPercent } from "@/lib/client/patterns/stretch-scale";

const features = tableFeatures({
  rowSortingFeature,
  sortedRowModel: createSortedRowModel(),
  sortFns: { alphanumeric: sortFn_alphanumeric },
});

const helper = createColumnHelper<typeof features, PieceRow>();

/** Numbers with null (not flattened) always last. */
const nullableNumber: SortFn<typeof features, PieceRow> = (a, b, id) => {
  const x = a.getValue<number | null>(id), y = b.getValue<number | null>(id);
  return (x ?? Number.POSITIVE_INFINITY) - (y ?? Number.POSITIVE_INFINITY);
};

const byLength: SortFn<typeof features, PieceRow> = (a, b, id) => {
  const x = a.getValue<string>(id), y = b.getValue<string>(id);
  return x.length - y.length || (x < y ? -1 : x > y ? 1 : 0);
};

/** Column definitions; area units come from the table's meta at render time via the header text. */
function columnsFor(units: LengthUnit) {
  return helper.columns([
    helper.accessor("label", { header: "Piece", sortFn: byLength, cell: (c) => <span className="font-bold">{c.getValue()}</span> }),
    helper.accessor("area", { header: `Area (${units}²)`, sortFn: nullableNumber, cell: (c) => c.getValue().toLocaleString("en-GB", { maximumFractionDigits: 1 }) }),
    helper.accessor("maxStretch", { header: "Max stretch", sortFn: nullableNumber, sortDescFirst: true, cell: (c) => formatPercent(c.getValue()) }),
    helper.accessor("p95Stretch", { header: "95th pct stretch", sortFn: nullableNumber, sortDescFirst: true, cell: (c) => formatPercent(c.getValue()) }),
    helper.accessor("conformalError", { header: "Angle error", sortFn: nullableNumber, sortDescFirst: true, cell: (c) => formatPercent(c.getValue(), 2) }),
    helper.accessor("bevelRuns", {
      header: "Bevel runs",
      sortFn: nullableNumber,
      cell: (c) => `${c.getValue()} (${c.row.original.angledRuns} angled)`,
    }),
    helper.accessor((r) => r.flags.join("; "), {
      id: "flags",
      header: "Flags",
      sortFn: "alphanumeric",
      cell: (c) => (c.row.original.flags.length ? c.row.original.flags.join("; ") : <span className="text-kraft-500">none</span>),
    }),
  ]);
}

const SORT_MARK = { asc: "▲", desc: "▼" } as const;

/**
 * The pieces of a pattern, sortable by any column (click or Enter/Space on a header). A row is a toggle: clicking
 * it, or Enter/Space while it has focus, picks the piece out in the flat sheet and the 3D view.
 */
export function PiecesTable({ rows, units, selected, onSelect }: {
  rows: PieceRow[];
  units: LengthUnit;
  selected: string | null;
  onSelect: (label: string | null) => void;
}) {
  const table = useTable({ features, columns: columnsFor(units), data: rows, enableSortingRemoval: true });

  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[44rem] border-collapse text-sm" aria-label="Pieces">
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id} className="border-b-2 border-kraft-500">
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                return (
                  <th key={header.id} scope="col" aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : "none"} className="px-2 py-2 text-left align-bottom">
                    <button
                      type="button"
                      onClick={header.column.getToggleSortingHandler()}
                      className="inline-flex items-center gap-1 text-xs font-bold uppercase tracking-wider text-kraft-700 hover:text-foam-800 focus-visible:outline-2 focus-visible:outline-foam-600"
                    >
                      <table.FlexRender header={header} />
                      <span aria-hidden="true" className="w-3 text-foam-800">{sorted ? SORT_MARK[sorted] : ""}</span>
                    </button>
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => {
            const on = row.original.label === selected;
            return (
              <tr
                key={row.id}
                tabIndex={0}
                aria-selected={on}
                data-piece-row={row.original.label}
                onClick={() => onSelect(on ? null : row.original.label)}
                onKeyDown={(e) => {
                  if (e.key === "Enter" || e.key === " ") {
                    e.preventDefault();
                    onSelect(on ? null : row.original.label);
                  }
                }}
                className={`cursor-pointer border-b border-kraft-200 focus-visible:outline-2 focus-visible:-outline-offset-2 focus-visible:outline-foam-600 ${
                  on ? "bg-foam-400/25" : row.original.overLimit ? "bg-ember-500/10 hover:bg-kraft-100" : "hover:bg-kraft-100"
                }`}
              >
                {row.getAllCells().map((cell) => (
                  <td key={cell.id} className={`px-2 py-2 align-top ${cell.column.id === "flags" ? "text-xs" : "tabular-nums"}`}>
                    <table.FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
