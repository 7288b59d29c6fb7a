"use client";

import { Panel } from "@/components/ui/panel";
import { errorMessage } from "@/lib/client/api-fetch";
import type { ScanDto } from "@/lib/scans/scans";
import { FlattenForm } from "./flatten-form";
import { ScanDropzone } from "@/components/upload/scan-dropzone";
import { useScans } from "./use-scan-queries";

const STATUS_STYLE: Record<ScanDto["status"], string> = {
  processing: "border-kraft-500 text-kraft-700",
  ready: "border-foam-600 text-foam-800",
  failed: "border-ember-700 text-ember-700",
};

function ScanRow({ scan, projectId, canFlatten }: { scan: ScanDto; projectId: string; canFlatten: boolean }) {
  return (
    <li className="flex flex-col gap-3 border-b border-kraft-200 py-3 last:border-b-0">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <span className="font-bold break-all">{scan.name}</span>
        <span className={`border px-2 py-0.5 text-xs uppercase tracking-wider ${STATUS_STYLE[scan.status]}`}>{scan.status}</span>
      </div>
      {scan.status === "ready" ? (
        <p className="text-xs text-kraft-700">
          {scan.faceCount?.toLocaleString()} faces, {scan.vertexCount?.toLocaleString()} vertices, {scan.units}
          {scan.report?.decimated ? ` (simplified from ${scan.report.decimated.originalFaces.toLocaleString()} faces)` : ""}; seams:{" "}
          {scan.seamMapVersion ? `version ${scan.seamMapVersion}` : "none saved yet"}
        </p>
      ) : null}
      {scan.status === "failed" ? <p role="alert" className="text-sm text-ember-700">{scan.error}</p> : null}
      {scan.status === "processing" ? <p className="text-xs text-kraft-700">Reading the mesh…</p> : null}
      {scan.status === "ready" && canFlatten ? <FlattenForm projectId={projectId} scanId={scan.id} seamMapVersion={scan.seamMapVersion} /> : null}
    </li>
  );
}

/** The project's scans with their status, the upload dropzone and a flatten form per ready scan (per role). */
export function ScansPanel({ projectId, canUpload, canFlatten }: { projectId: string; canUpload: boolean; canFlatten: boolean }) {
  const scans = useScans(projectId);
  return (
    <Panel title="Scans">
      {scans.isError ? <p role="alert" className="text-sm text-ember-700">Could not load the scans: {errorMessage(scans.error)}</p> : null}
      {scans.data && scans.data.length === 0 ? <p className="text-sm text-kraft-700">No scans yet.</p> : null}
      {scans.data && scans.data.length > 0 ? (
        <ul className="mb-4">
          {scans.data.map((s) => (
            <ScanRow key={s.id} scan={s} projectId={projectId} canFlatten={canFlatten} />
          ))}
        </ul>
      ) : null}
      {canUpload ? <ScanDropzone projectId={projectId} /> : null}
    </Panel>
  );
}
