import { ApiError } from "@/lib/client/api-fetch";
import type { ScanDto } from "@/lib/scans/scans";

export interface UploadProgress {
  sent: number;
  total: number;
}

/**
 * POST /api/projects/[id]/scans as multipart/form-data through XMLHttpRequest, whose `upload.onprogress` reports
 * the bytes sent (fetch has no upload progress). Resolves with the new scan; rejects with an ApiError carrying the
 * server's message (413 over the upload limit, 422 for a file that is not a mesh, …), or code ABORTED when
 * `signal` aborts.
 */
export function uploadScanRequest(projectId: string, file: File, units: string, onProgress: (p: UploadProgress) => void, signal: AbortSignal): Promise<ScanDto> {
  return new Promise((resolve, reject) => {
    const form = new FormData();
    form.append("units", units);
    form.append("file", file, file.name);
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api/projects/${encodeURIComponent(projectId)}/scans`);
    xhr.responseType = "text";
    xhr.withCredentials = true;
    xhr.setRequestHeader("accept", "application/json");
    xhr.upload.onprogress = (e) => onProgress({ sent: e.loaded, total: e.lengthComputable ? e.total : file.size });
    xhr.onload = () => {
      let body: (ScanDto & { error?: { code?: string; message?: string } }) | null = null;
      try {
        body = xhr.responseText ? JSON.parse(xhr.responseText) : null;
      } catch {
        body = null;
      }
      if (xhr.status >= 200 && xhr.status < 300 && body) return resolve(body);
      const fallback =
        xhr.status === 413 ? "The file is larger than the upload limit; simplify or split the mesh and try again." : `The server answered ${xhr.status}. Please try again.`;
      reject(new ApiError(xhr.status, body?.error?.code ?? `HTTP_${xhr.status}`, body?.error?.message ?? fallback));
    };
    xhr.onerror = () =>
      reject(
        new ApiError(0, "NETWORK", "The upload stopped before the server answered. A very large file may be over the upload limit; otherwise check your connection and try again."),
      );
    xhr.onabort = () => reject(new ApiError(0, "ABORTED", "Upload cancelled."));
    signal.addEventListener("abort", () => xhr.abort(), { once: true });
    xhr.send(form);
  });
}
