import { ApiError } from "@/lib/client/api-fetch";

/** GET a binary endpoint of our API; errors carry the server's `{ error: { code, message } }` like apiFetch. */
export async function fetchBinary(path: string, signal?: AbortSignal): Promise<Uint8Array> {
  let res: Response;
  try {
    res = await fetch(path, { credentials: "same-origin", signal });
  } catch (err) {
    if (err instanceof DOMException && err.name === "AbortError") throw err;
    throw new ApiError(0, "NETWORK", "Could not reach the server. Check your connection and try again.");
  }
  if (!res.ok) {
    const body = (await res.json().catch(() => null)) as { error?: { code?: string; message?: string } } | null;
    throw new ApiError(res.status, body?.error?.code ?? `HTTP_${res.status}`, body?.error?.message ?? `The server answered ${res.status}.`);
  }
  return new Uint8Array(await res.arrayBuffer());
}
