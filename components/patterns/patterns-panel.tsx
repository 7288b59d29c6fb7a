"use client";

import { Panel } from "@/components/ui/panel";
import { errorMessage } from "@/lib/client/api-fetch";
import { formatTimestamp } from "@/lib/client/format";
import { usePatterns } from "@/components/scans/use-scan-queries";
import { findFoamMaterial } from "@/lib/patterns/materials";

const REVIEW_LABEL = { pending: "awaiting review", approved: "approved", changes_requested: "changes requested" } as const;

/** The project's patterns the viewer may see, with status, review status and download links. */
export function PatternsPanel({ projectId }: { projectId: string }) {
  const patterns = usePatterns(projectId);
  return (
    <Panel title="Patterns">
      {patterns.isError ? <p role="alert" className="text-sm text-ember-700">Could not load the patterns: {errorMessage(patterns.error)}</p> : null}
      {patterns.data && patterns.data.length === 0 ? <p className="text-sm text-kraft-700">No patterns yet.</p> : null}
      <ul>
        {(patterns.data ?? []).map((p) => (
          <li key={p.id} className="flex flex-col gap-1 border-b border-kraft-200 py-3 last:border-b-0">
            <div className="flex flex-wrap items-baseline justify-between gap-2 text-sm">
              <span>
                {p.pieceCount} piece{p.pieceCount === 1 ? "" : "s"}, {findFoamMaterial(p.params.material)?.name ?? p.params.material}, {p.params.thicknessMm} mm
                {p.seamMapVersion ? `, seams v${p.seamMapVersion}` : ""}
              </span>
              <span className="text-xs uppercase tracking-wider text-kraft-700">{p.status === "ready" ? REVIEW_LABEL[p.reviewStatus] : p.status}</span>
            </div>
            <p className="text-xs text-kraft-700">{formatTimestamp(p.createdAt)}</p>
            {p.status === "failed" && p.error ? <p className="text-xs text-ember-700">{p.error}</p> : null}
            {p.downloads ? (
              <p className="flex flex-wrap gap-4 text-sm">
                <a className="font-bold underline" href={`/patterns/${p.id}`}>Open pattern</a>
                <a className="underline" href={p.downloads.pdf}>PDF</a>
                <a className="underline" href={p.downloads.svg}>SVG</a>
                <a className="underline" href={p.downloads.json}>Report (JSON)</a>
              </p>
            ) : null}
          </li>
        ))}
      </ul>
    </Panel>
  );
}
