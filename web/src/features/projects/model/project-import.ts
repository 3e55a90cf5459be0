import { ApiError } from "../../../lib/api-client";

/** Said when the chosen file cannot be read as JSON (nothing is sent). */
export const NOT_JSON_MESSAGE = "That file is not JSON; choose a Sigmacube project export.";

/**
 * A chosen export file's text read as JSON for the server to judge; the server checks its shape,
 * the browser only refuses text that is not JSON at all.
 */
export function readExportText(text: string): { ok: true; body: unknown } | { ok: false; message: string } {
  try {
    return { ok: true, body: JSON.parse(text) as unknown };
  } catch {
    return { ok: false, message: NOT_JSON_MESSAGE };
  }
}

/**
 * Why the server refused an import, every reason it listed as "path: message", joined with "; ";
 * the error's own message when it listed none.
 */
export function importRefusalText(error: Error): string {
  const reasons =
    error instanceof ApiError && Array.isArray(error.details)
      ? (error.details as { path: string; message: string }[])
      : [];
  return reasons.length > 0 ? reasons.map((r) => `${r.path}: ${r.message}`).join("; ") : error.message;
}
