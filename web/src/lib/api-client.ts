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
