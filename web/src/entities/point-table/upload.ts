import { ApiError } from "../../lib/api-client";
import { uploadSummarySchema, type UploadSummary } from "./contract";
import { pointTablesPath } from "./queries";

/** An upload under way: its answer, and how to stop it. */
export type PointTableUpload = { done: Promise<UploadSummary>; abort: () => void };

/** Thrown (as the upload's rejection) when the engineer stopped it. */
export class UploadCancelled extends Error {
  override name = "UploadCancelled";
  constructor() {
    super("The upload was cancelled; nothing of it was kept.");
  }
}

/**
 * Sends a table's original bytes with PUT …/:tableId/content. XMLHttpRequest rather than fetch
 * because fetch reports no upload progress; `onProgress` gets the bytes sent and the total.
 */
export function uploadPointTableContent(
  ids: { workspaceId: string; projectId: string; caseId: string; tableId: string },
  body: Blob,
  onProgress: (sent: number, total: number) => void,
): PointTableUpload {
  const xhr = new XMLHttpRequest();
  const done = new Promise<UploadSummary>((resolve, reject) => {
    xhr.open(
      "PUT",
      `/api${pointTablesPath(ids.workspaceId, ids.projectId, ids.caseId)}/${ids.tableId}/content`,
    );
    xhr.setRequestHeader("Content-Type", "application/octet-stream");
    xhr.setRequestHeader("Accept", "application/json");
    xhr.upload.onprogress = (e) => onProgress(e.loaded, e.lengthComputable ? e.total : body.size);
    xhr.onabort = () => reject(new UploadCancelled());
    xhr.onerror = () =>
      reject(new ApiError(0, "network", "The server cannot be reached. Check that Sigmacube is running."));
    xhr.onload = () => {
      let answer: unknown = null;
      try {
        answer = JSON.parse(xhr.responseText) as unknown;
      } catch {
        answer = null;
      }
      if (xhr.status < 200 || xhr.status >= 300) {
        const error = (answer as { error?: { id?: string; message?: string; details?: unknown } } | null)
          ?.error;
        reject(
          new ApiError(
            xhr.status,
            error?.id ?? "unknown",
            error?.message ?? `The server answered ${xhr.status}.`,
            error?.details,
          ),
        );
        return;
      }
      const parsed = uploadSummarySchema.safeParse(answer);
      if (parsed.success) resolve(parsed.data);
      else reject(new ApiError(xhr.status, "unexpected_answer", "The server's answer could not be read."));
    };
    xhr.send(body);
  });
  return { done, abort: () => xhr.abort() };
}

/** The hex SHA-256 of a file's bytes (the server checks the upload against it). */
export async function sha256Hex(body: Blob): Promise<string> {
  const digest = await crypto.subtle.digest("SHA-256", await body.arrayBuffer());
  return Array.from(new Uint8Array(digest), (b) => b.toString(16).padStart(2, "0")).join("");
}
