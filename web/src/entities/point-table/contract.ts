/**
 * The point-table wire shapes as this browser reads them, written from the API contract agreed
 * with the server half of issue 15. They stand in for the server's zod schemas
 * (core/contract/point-tables.ts) until both halves are merged: this is the one file to switch
 * then. Objects are loose (extra fields pass) so a richer server answer still parses.
 */
import { z } from "zod";
import { stressUnitSchema } from "../../../../core/contract/materials";

export const pointTableSeparatorSchema = z.enum([",", ";", "\t", "whitespace"]);
export const pointTableLayoutSchema = z.object({
  separator: pointTableSeparatorSchema,
  decimal: z.enum([".", ","]),
  skipRows: z.int().min(0),
  header: z.boolean(),
});
export type PointTableLayoutBody = z.infer<typeof pointTableLayoutSchema>;

const column = z.int().min(0);
export const pointTableColumnsSchema = z.object({
  xx: column,
  yy: column,
  zz: column,
  xy: column,
  yz: column,
  zx: column,
  id: column.optional(),
  x: column.optional(),
  y: column.optional(),
  z: column.optional(),
});
export type PointTableColumnsBody = z.infer<typeof pointTableColumnsSchema>;

export const idKindSchema = z.enum(["number", "text"]);
export type IdKind = z.infer<typeof idKindSchema>;

/** What POST …/point-tables sends before the file's bytes follow. */
export type CreatePointTableBody = {
  fileName: string;
  sizeBytes: number;
  /** hex SHA-256 of the original file */
  sha256: string;
  layout: PointTableLayoutBody;
  columns: PointTableColumnsBody;
  unit: z.infer<typeof stressUnitSchema>;
  idKind: IdKind;
};

export const badRowsSchema = z.object({
  count: z.int(),
  first: z.array(z.object({ line: z.int(), reason: z.string() })),
});

const pointIdSchema = z.union([z.number(), z.string()]);

/** A criterion over a stored table, as the server's evaluation gives it. */
export const storedCriterionSchema = z.looseObject({
  governing: z
    .looseObject({
      id: pointIdSchema.nullable(),
      x: z.number().nullable(),
      y: z.number().nullable(),
      z: z.number().nullable(),
      factor: z.number().nullable(),
      utilisation: z.number().nullable(),
      verdict: z.string(),
    })
    .nullable(),
  countFail: z.int(),
  countClose: z.int(),
  histogram: z.unknown().optional(),
});

export const storedEvaluationSchema = z.looseObject({
  criteria: z.record(z.string(), storedCriterionSchema).optional(),
});

export const pointTableSchema = z.looseObject({
  id: z.string(),
  fileName: z.string(),
  sizeBytes: z.number(),
  sha256: z.string(),
  layout: pointTableLayoutSchema,
  columns: pointTableColumnsSchema,
  unit: stressUnitSchema,
  idKind: idKindSchema,
  pointCount: z.int(),
  badRows: badRowsSchema,
  createdAt: z.string(),
  createdBy: z.unknown().optional(),
  evaluation: storedEvaluationSchema.nullable().optional(),
});
export type StoredPointTable = z.infer<typeof pointTableSchema>;

/**
 * The list answers a bare array, `{ items }` or `{ pointTables }` (the agreed contract names the
 * items but not the envelope); each reads as the array.
 */
export const pointTableListSchema = z
  .union([
    z.array(pointTableSchema),
    z.looseObject({ items: z.array(pointTableSchema) }),
    z.looseObject({ pointTables: z.array(pointTableSchema) }),
  ])
  .transform((v): StoredPointTable[] => {
    if (Array.isArray(v)) return v;
    const envelope = v as { items?: StoredPointTable[]; pointTables?: StoredPointTable[] };
    return envelope.items ?? envelope.pointTables ?? [];
  });

export const createdPointTableSchema = z.looseObject({ id: z.string() });

/** What PUT …/content answers once the server has read and evaluated the bytes. */
export const uploadSummarySchema = z.looseObject({
  id: z.string(),
  pointCount: z.int(),
  badRows: badRowsSchema,
});
export type UploadSummary = z.infer<typeof uploadSummarySchema>;

export const keptLocationsSchema = z.looseObject({
  locations: z.array(z.looseObject({ id: z.string(), name: z.string() })),
});
export type KeptLocations = z.infer<typeof keptLocationsSchema>;
