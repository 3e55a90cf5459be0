import { z } from "zod";

/** The outline of an OpenAPI 3.1 document (its full schema is the specification's own). */
export const openApiDocumentSchema = z.looseObject({
  openapi: z.literal("3.1.0"),
  info: z.looseObject({ title: z.string(), version: z.string() }),
  paths: z.record(z.string(), z.record(z.string(), z.unknown())),
});
