import { z } from "zod";
import { COMPONENTS } from "../constants/components";
import { VERDICTS } from "../constants/verdicts";
import { loadCaseParamsSchema } from "./load-cases";
import { POINT_TABLE_LIMITS } from "./limits";
import { stressUnitSchema } from "./materials";
import { criterionSchema, personRefSchema } from "./projects";

// Long because it holds every wire schema of a finite-element point table (the upload's
// declaration, the stored table, its evaluation, the comparison's section, "keep as location")
// that the API and the browser share.

/**
 * Finite-element point tables: a load case's file of stress points, declared with POST (name,
 * size, SHA-256, layout, column mapping, unit), its text sent with PUT …/content, stored as
 * binary columns and evaluated by the server with core's point-table kernels against the load
 * case's allowables. Imports only zod, core's dependency-free constants and other contract files.
 */

/** How fields are separated: a comma, semicolon or tab per boundary, or any run of spaces and tabs. */
export const POINT_TABLE_SEPARATORS = [",", ";", "\t", "whitespace"] as const;
/** The decimal mark; a decimal comma needs a separator other than the comma. */
export const POINT_TABLE_DECIMALS = [".", ","] as const;
/** "number": node or element numbers; "text": ids kept as written ("N101"). */
export const POINT_ID_KINDS = ["number", "text"] as const;
/** Whether a table's text has arrived: declared tables wait for their content. */
export const POINT_TABLE_STATUSES = ["awaiting-content", "ready"] as const;
/** Content types PUT …/content accepts (the text of the file, any of them). */
export const POINT_TABLE_CONTENT_TYPES = ["text/plain", "text/csv", "application/octet-stream"] as const;

/** The largest column index a mapping may name (the parser's own bound). */
const MAX_COLUMN = 10_000;
/** Lines skipped before the data (a title block) at most. */
const MAX_SKIP_ROWS = 1000;

/** A verdict (as the comparison's schema has it; declared here too so the two files do not import each other). */
const verdictSchema = z.enum(VERDICTS);

const columnIndex = () =>
  z
    .number({ error: "must be a column number (0 for the first column)" })
    .int("must be a whole number (0 for the first column)")
    .min(0, "must be 0 or more (0 for the first column)")
    .max(MAX_COLUMN, `must be at most ${MAX_COLUMN}`);

export const pointTableLayoutSchema = z
  .object({
    separator: z.enum(POINT_TABLE_SEPARATORS, {
      error: 'must be ",", ";", a tab ("\\t") or "whitespace"',
    }),
    decimal: z.enum(POINT_TABLE_DECIMALS, { error: 'must be "." or ","' }).default("."),
    skipRows: z
      .number({ error: "must be a whole number" })
      .int("must be a whole number")
      .min(0, "must be 0 or more")
      .max(MAX_SKIP_ROWS, `must be at most ${MAX_SKIP_ROWS}`)
      .default(0),
    header: z.boolean({ error: "must be true or false" }).default(false),
  })
  .superRefine((layout, ctx) => {
    if (layout.decimal === "," && layout.separator === ",") {
      ctx.addIssue({
        code: "custom",
        path: ["decimal"],
        message: 'a decimal comma needs a separator other than the comma (";", tab or whitespace)',
      });
    }
  });
export type PointTableLayoutInput = z.infer<typeof pointTableLayoutSchema>;

/** Which column (0-based) holds each component, and optionally the point id and coordinates. */
export const pointTableColumnsSchema = z
  .object({
    ...(Object.fromEntries(COMPONENTS.map((c) => [c, columnIndex()])) as Record<
      (typeof COMPONENTS)[number],
      ReturnType<typeof columnIndex>
    >),
    id: columnIndex().optional(),
    x: columnIndex().optional(),
    y: columnIndex().optional(),
    z: columnIndex().optional(),
  })
  .superRefine((columns, ctx) => {
    const seen = new Map<number, string>();
    for (const [key, col] of Object.entries(columns)) {
      if (col === undefined) continue;
      const other = seen.get(col);
      if (other !== undefined) {
        ctx.addIssue({ code: "custom", path: [key], message: `is column ${col}, which ${other} already is` });
      } else seen.set(col, key);
    }
  });
export type PointTableColumnsInput = z.infer<typeof pointTableColumnsSchema>;

/** POST …/point-tables: what the file is and how to read it; its text follows with PUT …/content. */
export const createPointTableBodySchema = z.object({
  fileName: z
    .string({ error: "must be the file's name" })
    .trim()
    .min(1, "must not be empty")
    .max(255, "must be at most 255 characters"),
  sizeBytes: z
    .number({ error: "must be the file's size in bytes" })
    .int("must be a whole number of bytes")
    .min(1, "must be at least 1 (an empty file holds no points)"),
  sha256: z
    .string({ error: "must be the SHA-256 of the file, 64 hexadecimal digits" })
    .regex(/^[0-9a-fA-F]{64}$/, "must be the SHA-256 of the file, 64 hexadecimal digits")
    .transform((h) => h.toLowerCase()),
  layout: pointTableLayoutSchema,
  columns: pointTableColumnsSchema,
  unit: stressUnitSchema,
  idKind: z.enum(POINT_ID_KINDS, { error: 'must be "number" or "text"' }).default("number"),
});
export type CreatePointTableBody = z.infer<typeof createPointTableBodySchema>;

export const pointTableParamsSchema = loadCaseParamsSchema.extend({
  tableId: z.uuid({ error: "must be a point-table id (UUID)" }),
});

/** A point's id: a number (node or element number) or text, as the table's idKind says. */
export const pointIdSchema = z.union([z.number(), z.string()]);

/**
 * The point where a criterion's utilisation is highest: its 0-based place in the table, its id
 * (the file's, or the 1-based row number when no id column is mapped), its coordinates (null
 * without coordinates), the safety factor (null: infinite) and the utilisation.
 */
export const pointTableGoverningSchema = z.object({
  index: z.int(),
  id: pointIdSchema,
  x: z.number().nullable(),
  y: z.number().nullable(),
  z: z.number().nullable(),
  factor: z.number().nullable(),
  utilisation: z.number(),
  verdict: verdictSchema,
});
export type PointTableGoverningView = z.infer<typeof pointTableGoverningSchema>;

/** One criterion the project checks, over the whole table. */
export const pointTableCriterionSchema = z.object({
  criterion: criterionSchema,
  status: z.enum(["evaluated", "not-applicable", "not-evaluated"]),
  /** Why it was not rated (or, rated anyway, why it does not suit the material); else null. */
  reason: z.string().nullable(),
  requiredFactor: z.number(),
  /** The load-case category whose factor applies, or null for the project default. */
  category: z.string().nullable(),
  governing: pointTableGoverningSchema.nullable(),
  countFail: z.int(),
  countClose: z.int(),
});
export type PointTableCriterionView = z.infer<typeof pointTableCriterionSchema>;

/** The evaluation as lists show it: per criterion, and the points failing or close on any criterion. */
export const pointTableEvaluationSummarySchema = z.object({
  evaluatedAt: z.string(),
  /** The material the points were rated against (the project's default material). */
  material: z.object({ label: z.string(), note: z.string() }),
  countFail: z.int(),
  countClose: z.int(),
  /** Points with a component that is not a finite number (left out of every count). */
  badPoints: z.int(),
  perCriterion: z.array(pointTableCriterionSchema),
});
export type PointTableEvaluationSummary = z.infer<typeof pointTableEvaluationSummarySchema>;

/** A utilisation histogram: counts[k] for k·binWidth ≤ u < (k+1)·binWidth, the last bin every u ≥ max. */
export const pointTableHistogramSchema = z.object({
  binWidth: z.number(),
  max: z.number(),
  counts: z.array(z.int()),
});

/** One of the worst points by its highest utilisation over the rated criteria. */
export const pointTableWorstPointSchema = z.object({
  index: z.int(),
  id: pointIdSchema,
  x: z.number().nullable(),
  y: z.number().nullable(),
  z: z.number().nullable(),
  utilisation: z.number(),
  verdict: verdictSchema,
  /** xx yy zz xy yz zx in Pa, for opening the point in the bench. */
  componentsPa: z.object(
    Object.fromEntries(COMPONENTS.map((c) => [c, z.number()])) as Record<
      (typeof COMPONENTS)[number],
      z.ZodNumber
    >,
  ),
});

/** The whole evaluation (GET …/point-tables/{tableId}): the summary, the histogram, the worst points. */
export const pointTableEvaluationSchema = pointTableEvaluationSummarySchema.extend({
  histogram: pointTableHistogramSchema,
  worst: z.array(pointTableWorstPointSchema),
});
export type PointTableEvaluationView = z.infer<typeof pointTableEvaluationSchema>;

/** A stored point table as lists show it. */
export const pointTableSchema = z.object({
  id: z.uuid(),
  loadCaseId: z.uuid(),
  status: z.enum(POINT_TABLE_STATUSES),
  fileName: z.string(),
  sizeBytes: z.int(),
  sha256: z.string(),
  layout: z.object({
    separator: z.enum(POINT_TABLE_SEPARATORS),
    decimal: z.enum(POINT_TABLE_DECIMALS),
    skipRows: z.int(),
    header: z.boolean(),
  }),
  columns: z.record(z.string(), z.int()),
  unit: stressUnitSchema,
  idKind: z.enum(POINT_ID_KINDS),
  /** Points stored (0 while awaiting content). */
  pointCount: z.int(),
  hasCoordinates: z.boolean(),
  badRows: z.object({
    count: z.int(),
    first: z.array(z.object({ line: z.int(), reason: z.string() })),
  }),
  createdAt: z.string(),
  createdBy: personRefSchema,
  /** null while awaiting content, or while the project's allowables changed since the last evaluation. */
  evaluation: pointTableEvaluationSummarySchema.nullable(),
});
export type PointTableView = z.infer<typeof pointTableSchema>;

export const pointTableListSchema = z.array(pointTableSchema);

/** One table with its whole evaluation (evaluated again first when the allowables changed). */
export const pointTableDetailSchema = pointTableSchema.extend({
  evaluation: pointTableEvaluationSchema.nullable(),
});
export type PointTableDetailView = z.infer<typeof pointTableDetailSchema>;

/** The ids of a table's points in table order (numbers or text; 1…n when no id column is mapped). */
export const pointTableIdsSchema = z.array(pointIdSchema);

/** POST …/{tableId}/keep: points that become project locations, their states saved in this load case. */
export const keepPointsBodySchema = z.object({
  points: z
    .array(pointIdSchema, { error: "must be a list of point ids" })
    .min(1, "must name at least one point")
    .max(
      POINT_TABLE_LIMITS.keepPerRequest,
      `must name at most ${POINT_TABLE_LIMITS.keepPerRequest} points (limit "keepPerRequest")`,
    ),
  namePrefix: z
    .string({ error: "must be text" })
    .trim()
    .min(1, "must not be empty")
    .max(80, "must be at most 80 characters")
    .optional(),
});
export type KeepPointsBody = z.infer<typeof keepPointsBodySchema>;

export const keepPointsResponseSchema = z.object({
  locations: z.array(z.object({ id: z.uuid(), name: z.string() })),
});

/** A point table in the comparison: per criterion, its governing point and how many points fail or are close. */
export const comparisonPointTableSchema = z.object({
  tableId: z.uuid(),
  fileName: z.string(),
  caseId: z.uuid(),
  caseName: z.string(),
  category: z.string(),
  pointCount: z.int(),
  material: z.object({ label: z.string(), note: z.string() }),
  perCriterion: z.array(
    z.object({
      criterion: criterionSchema,
      status: z.enum(["evaluated", "not-applicable", "not-evaluated"]),
      reason: z.string().nullable(),
      governing: pointTableGoverningSchema
        .omit({ factor: true, utilisation: true, verdict: true })
        .nullable(),
      factor: z.number().nullable(),
      utilisation: z.number().nullable(),
      verdict: verdictSchema.nullable(),
      requiredFactor: z.number(),
      category: z.string().nullable(),
      countFail: z.int(),
      countClose: z.int(),
    }),
  ),
});
export type ComparisonPointTableView = z.infer<typeof comparisonPointTableSchema>;
