"use client";

import { useEffect } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { scanKeys } from "@/components/scans/use-scan-queries";
import { errorMessage } from "@/lib/client/api-fetch";
import { useScanStatus } from "@/lib/client/patterns/use-scan-status";
import type { ScanDto } from "@/lib/scans/scans";
import { describeIntake } from "./describe-intake";

const TONE = { ok: "text-kraft-900", note: "text-kraft-700", warn: "text-ember-700 font-medium" } as const;
const MARK = { ok: "✓", note: "•", warn: "!" } as const;

/** After an upload: polls the scan until the intake has read it, then shows the intake report in plain words. */
export function IntakeStatus({ initial }: { initial: ScanDto }) {
  const scan = useScanStatus(initial.id, initial);
  const client = useQueryClient();
  const s = scan.data ?? initial;
  useEffect(() => {
    if (s.status !== "processing") void client.invalidateQueries({ queryKey: scanKeys.scans(s.projectId) });
  }, [s.status, s.projectId, client]);

  return (
    <div className="flex flex-col gap-2 border border-kraft-200 bg-kraft-50 px-3 py-2" data-testid="intake-status" data-status={s.status}>
      <p className="flex flex-wrap items-baseline justify-between gap-2 text-sm">
        <span className="font-bold break-all">{s.name}</span>
        <span role="status" className={`text-xs font-bold uppercase tracking-wider ${s.status === "failed" ? "text-ember-700" : s.status === "ready" ? "text-foam-800" : "text-kraft-700"}`}>
          {s.status === "processing" ? "reading the mesh…" : s.status}
        </span>
      </p>
      {scan.isError ? <p role="alert" className="text-xs text-ember-700">Could not check the scan: {errorMessage(scan.error)}</p> : null}
      {s.status === "failed" ? <p role="alert" className="text-sm text-ember-700">{s.error ?? "The mesh could not be read."}</p> : null}
      {s.status === "ready" && s.report ? (
        <ul className="flex flex-col gap-1 text-xs" aria-label="Intake report">
          {describeIntake(s.report).map((l) => (
            <li key={l.text} className={`flex gap-2 ${TONE[l.tone]}`}>
              <span aria-hidden="true" className="w-3 flex-none text-center">{MARK[l.tone]}</span>
              <span>{l.text}</span>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
