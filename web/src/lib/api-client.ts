import type { z } from "zod";

/** An error the API answered with (`{ error: { id, message, details? } }`), or a network failure. */
export class ApiError extends Error {
  override name = "ApiError";
  constructor(
    readonly status: number,
    readonly id: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

/**
 * Fetches `/api…` and parses the body with `schema`. Non-2xx answers become ApiError with
 * the server's message, except the statuses in `acceptStatuses`, whose body is parsed too
 * (health answers 503 with a full body).
 */
export async function apiGet<T>(
  path: string,
  schema: z.ZodType<T>,
  acceptStatuses: number[] = [],
): Promise<T> {
  let response: Response;
  try {
    response = await fetch(`/api${path}`, {
      headers: { Accept: "application/json" },
      credentials: "same-origin",
    });
  } catch {
    throw new ApiError(0, "network", "The server cannot be reached. Check that Sigmacube is running.");
  }
  const body: unknown = await response.json().catch(() => null);
  if (!response.ok && !acceptStatuses.includes(response.status)) {
    const error = (body as { error?: { id?: string; message?: string; details?: unknown } } | null)?.error;
    throw new ApiError(
      response.status,
      error?.id ?? "unknown",
      error?.message ?? `The server answered ${response.status}.`,
      error?.details,
    );
  }
  return schema.parse(body);
}

/** Reads an error answer into ApiError (the shape every API error has). */
export async function toApiError(response: Response): Promise<ApiError> {
  const body = (await response.json().catch(() => null)) as {
    error?: { id?: string; message?: string; details?: unknown };
  } | null;
  return new ApiError(
    response.status,
    body?.error?.id ?? "unknown",
    body?.error?.message ?? `The server answered ${response.status}.`,
    body?.error?.details,
  );
}

/**
 * POST/PATCH/PUT/DELETE `/api…` with a JSON body; the browser adds the Origin header the
 * server's CSRF check needs. Parses the answer with `schema`, or returns undefined for
 * 204 when `schema` is null.
 */
export async function apiSend<T>(
  method: "POST" | "PATCH" | "PUT" | "DELETE",
  path: string,
  body: unknown,
  schema: z.ZodType<T>,
): Promise<T>;
export async function apiSend(
  method: "POST" | "PATCH" | "PUT" | "DELETE",
  path: string,
  body: unknown,
  schema: null,
): Promise<void>;
export async function apiSend<T>(
  method: "POST" | "PATCH" | "PUT" | "DELETE",
  path: string,
  body: unknown,
  schema: z.ZodType<T> | null,
): Promise<T | void> {
  let response: Response;
  try {
    response = await fetch(`/api${path}`, {
      method,
      headers: {
        Accept: "application/json",
        ...(body === undefined ? {} : { "Content-Type": "application/json" }),
      },
      body: body === undefined ? undefined : JSON.stringify(body),
      credentials: "same-origin",
    });
  } catch {
    throw new ApiError(0, "network", "The server cannot be reached. Check that Sigmacube is running.");
  }
  if (!response.ok) throw await toApiError(response);
  if (schema === null || response.status === 204) return;
  return schema.parse(await response.json());
}

/** The field errors of a 400 `invalid_input` answer, by field path; empty for any other error. */
export function fieldErrorsOf(error: unknown): Record<string, string> {
  if (!(error instanceof ApiError) || error.id !== "invalid_input" || !Array.isArray(error.details))
    return {};
  const out: Record<string, string> = {};
  for (const detail of error.details as { path?: string; message?: string }[]) {
    if (detail.path && detail.message && !out[detail.path]) out[detail.path] = detail.message;
  }
  return out;
}
