/**
 * Downloading a file the server builds (a PDF report) with progress the page can show and a way to
 * cancel it: fetch, read the body chunk by chunk, count the bytes against Content-Length when the
 * server sends it, and hand the finished file to the browser to save.
 */
import { ApiError } from "./api-client";

/** How far a download has come: bytes received and, when the server said, the total. */
export type DownloadProgress = { received: number; total: number | null };

/** "1.2 MB of 3.4 MB (35 %)", "640 kB" when the total is unknown, "waiting for the server…" before the first byte. */
export function progressText(p: DownloadProgress): string {
  if (p.received === 0) return "waiting for the server…";
  const size = (bytes: number) =>
    bytes >= 1e6 ? `${(bytes / 1e6).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1e3))} kB`;
  if (p.total === null || p.total <= 0) return size(p.received);
  const percent = Math.min(100, Math.floor((100 * p.received) / p.total));
  return `${size(p.received)} of ${size(p.total)} (${percent} %)`;
}

/** The file name a Content-Disposition header gives (`attachment; filename="a.pdf"`), or `fallback`. */
export function fileNameFrom(header: string | null, fallback: string): string {
  const match = header?.match(/filename="([^"]+)"/i) ?? header?.match(/filename=([^;]+)/i);
  const name = match?.[1]?.trim();
  return name && !/[\\/]/.test(name) ? name : fallback;
}

/**
 * Fetches `/api…` as a file, calling `onProgress` as bytes arrive; `signal` cancels it (the promise
 * then rejects with the AbortError). Error answers become ApiError with the server's message.
 * @returns the file and the name the server gave it
 */
export async function fetchFileWithProgress(
  path: string,
  fallbackName: string,
  onProgress: (p: DownloadProgress) => void,
  signal: AbortSignal,
): Promise<{ blob: Blob; name: string }> {
  const response = await fetch(`/api${path}`, { credentials: "same-origin", signal });
  if (!response.ok) {
    const body = (await response.json().catch(() => null)) as {
      error?: { id?: string; message?: string };
    } | null;
    throw new ApiError(
      response.status,
      body?.error?.id ?? "unknown",
      body?.error?.message ?? `The server answered ${response.status}.`,
    );
  }
  const length = Number(response.headers.get("Content-Length"));
  const total = Number.isFinite(length) && length > 0 ? length : null;
  const chunks: Uint8Array[] = [];
  let received = 0;
  onProgress({ received, total });
  const reader = response.body?.getReader();
  if (reader) {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      chunks.push(value);
      received += value.byteLength;
      onProgress({ received, total });
    }
  }
  const type = response.headers.get("Content-Type") ?? "application/octet-stream";
  return {
    blob: new Blob(chunks as BlobPart[], { type }),
    name: fileNameFrom(response.headers.get("Content-Disposition"), fallbackName),
  };
}

/** Hands a file to the browser to save under `name`. */
export function saveFile(blob: Blob, name: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement("a");
  a.href = url;
  a.download = name;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
