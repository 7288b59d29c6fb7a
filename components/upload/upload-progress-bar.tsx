import type { UploadProgress } from "./upload-scan-request";

const mb = (b: number) => (b >= 1024 * 1024 ? `${(b / 1024 / 1024).toFixed(1)} MB` : `${Math.max(1, Math.round(b / 1024))} KB`);

/** Bytes sent of the upload as a bar with numbers (the server then reads the mesh: see the intake status). */
export function UploadProgressBar({ fileName, progress }: { fileName: string; progress: UploadProgress }) {
  const pct = progress.total > 0 ? Math.min(100, Math.round((progress.sent / progress.total) * 100)) : 0;
  return (
    <div className="flex flex-col gap-1" data-testid="upload-progress">
      <div className="flex justify-between gap-2 text-xs text-kraft-700">
        <span className="truncate">Uploading {fileName}</span>
        <span className="tabular-nums">{mb(progress.sent)} / {mb(progress.total)} · {pct} %</span>
      </div>
      <div role="progressbar" aria-label={`Upload of ${fileName}`} aria-valuemin={0} aria-valuemax={100} aria-valuenow={pct} className="h-3 w-full border border-kraft-500 bg-kraft-100">
        <div className="h-full bg-foam-600 transition-[width] duration-150" style={{ width: `${pct}%` }} />
      </div>
    </div>
  );
}
