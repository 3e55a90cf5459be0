import { z } from "zod";

/**
 * `GET /api/health`. Shared by the server (which builds it) and the browser (which
 * shows it): this module imports only zod so both sides can use it.
 */
export const healthResponseSchema = z.object({
  ok: z.boolean(),
  version: z.string(),
  database: z.object({
    ok: z.boolean(),
    /** e.g. "15.18"; null when the database did not answer. */
    serverVersion: z.string().nullable(),
    /** Why the database check failed, in words; absent when it passed. */
    message: z.string().optional(),
  }),
});

export type HealthResponse = z.infer<typeof healthResponseSchema>;
