"use client";

import { useEffect, useRef, useState, type DragEvent } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { scanKeys } from "@/components/scans/use-scan-queries";
import { useToast } from "@/components/toast/toast-provider";
import { Button } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import { SelectField } from "@/components/ui/field";
import { ApiError, errorMessage } from "@/lib/client/api-fetch";
import { LENGTH_UNITS } from "@/lib/geometry/mesh";
import type { ScanDto } from "@/lib/scans/scans";
import { IntakeStatus } from "./intake-status";
import { UploadProgressBar } from "./upload-progress-bar";
import { uploadScanRequest, type UploadProgress } from "./upload-scan-request";

const UNIT_OPTIONS = LENGTH_UNITS.map((u) => ({ value: u, label: { mm: "millimetres (mm)", cm: "centimetres (cm)", m: "metres (m)", in: "inches (in)" }[u] }));
const ACCEPT = ".obj,.stl,model/obj,model/stl";

/** A quick check of the file name before sending; the server checks the content itself. */
function refuse(file: File): string | null {
  if (!/\.(obj|stl)$/i.test(file.name)) return `${file.name} is not an OBJ or STL file. Export the mesh as .obj or .stl and try again.`;
  if (file.size === 0) return `${file.name} is empty.`;
  return null;
}

/**
 * Scan upload for a project: pick the units, then drop an OBJ or STL on the area (or choose one with the button).
 * Shows the bytes sent as they go, the server's reason when it refuses the file, then polls the new scan and
 * reports what the intake found. Refreshes the project's scan list (the scans panel's query) when a scan is in.
 */
export function ScanDropzone({ projectId }: { projectId: string }) {
  const inputRef = useRef<HTMLInputElement>(null);
  const abortRef = useRef<AbortController | null>(null);
  const client = useQueryClient();
  const toast = useToast();
  const [units, setUnits] = useState<string>("mm");
  const [over, setOver] = useState(false);
  const [current, setCurrent] = useState<{ name: string; progress: UploadProgress } | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [uploaded, setUploaded] = useState<ScanDto[]>([]);
  const id = `dropzone-${projectId}`;

  useEffect(() => () => abortRef.current?.abort(), []);

  const start = async (file: File) => {
    const why = refuse(file);
    if (why) {
      setProblem(why);
      return;
    }
    setProblem(null);
    const abort = new AbortController();
    abortRef.current = abort;
    setCurrent({ name: file.name, progress: { sent: 0, total: file.size } });
    try {
      const scan = await uploadScanRequest(projectId, file, units, (progress) => setCurrent({ name: file.name, progress }), abort.signal);
      setUploaded((list) => [scan, ...list.filter((s) => s.id !== scan.id)].slice(0, 3));
      void client.invalidateQueries({ queryKey: scanKeys.scans(projectId) });
      toast.success(`${file.name} uploaded; reading the mesh now.`);
    } catch (err) {
      if (err instanceof ApiError && err.code === "ABORTED") setProblem("Upload cancelled.");
      else setProblem(errorMessage(err));
    } finally {
      abortRef.current = null;
      setCurrent(null);
      if (inputRef.current) inputRef.current.value = "";
    }
  };

  const onDrop = (e: DragEvent<HTMLDivElement>) => {
    e.preventDefault();
    setOver(false);
    if (current) return;
    const files = e.dataTransfer.files;
    if (files.length > 1) {
      setProblem("Drop one file at a time.");
      return;
    }
    if (files[0]) void start(files[0]);
  };

  return (
    <div className="flex flex-col gap-3" data-testid="scan-dropzone">
      <SelectField id={`${id}-units`} label="Units of the file" hint="Mesh files carry no units: say what one unit in the file is." options={UNIT_OPTIONS} value={units} disabled={current !== null} onChange={(e) => setUnits(e.target.value)} />
      <div
        onDragOver={(e) => {
          e.preventDefault();
          e.dataTransfer.dropEffect = current ? "none" : "copy";
          setOver(true);
        }}
        onDragLeave={() => setOver(false)}
        onDrop={onDrop}
        onClick={(e) => {
          if (!current && e.target === e.currentTarget) inputRef.current?.click();
        }}
        className={`flex flex-col items-center gap-2 border-2 border-dashed px-4 py-6 text-center text-sm transition-colors ${
          over ? "border-foam-600 bg-foam-400/15" : "border-kraft-500 bg-kraft-50"
        } ${current ? "cursor-default" : "cursor-pointer"}`}
      >
        <input
          ref={inputRef}
          type="file"
          accept={ACCEPT}
          tabIndex={-1}
          aria-label="Mesh file (OBJ or STL)"
          data-testid="scan-file-input"
          className="sr-only"
          onChange={(e) => {
            const f = e.target.files?.[0];
            if (f) void start(f);
          }}
        />
        <p className="pointer-events-none font-bold text-kraft-900">Drop an OBJ or STL here</p>
        <p className="pointer-events-none text-xs text-kraft-700">or</p>
        <Button type="button" variant="secondary" disabled={current !== null} onClick={() => inputRef.current?.click()}>
          Choose a mesh file…
        </Button>
      </div>
      {current ? (
        <div className="flex items-end gap-3">
          <div className="flex-1">
            <UploadProgressBar fileName={current.name} progress={current.progress} />
          </div>
          <Button type="button" variant="ghost" className="px-2 py-1 text-xs" onClick={() => abortRef.current?.abort()}>
            Cancel
          </Button>
        </div>
      ) : null}
      <FormAlert message={problem} />
      {uploaded.map((s) => (
        <IntakeStatus key={s.id} initial={s} />
      ))}
    </div>
  );
}
