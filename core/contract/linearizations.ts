import { z } from "zod";
import { VERDICTS } from "../constants/verdicts";
import { uuidInput } from "./ids";
import { LINEARIZATION_LIMITS } from "./limits";
import { finiteNumber, stressUnitSchema, stressValue, versionSchema } from "./materials";
import { personRefSchema, projectParamsSchema } from "./projects";

/**
 * Stress classification lines saved per load case: the path through the wall (distances or
 * x y z, six components at each point, in one stress unit), the frame, the engineer's
 * classification, the allowables and the options. The server linearizes them with core's
 * `linearize` on every save and read; a client never sends a result. Imports only zod and core's
 * dependency-free constants.
 */

/** Length units a path may be written in (a label: core converts nothing, the thickness is in it). */
export const LENGTH_UNITS = ["mm", "m", "in"] as const;
export const lengthUnitSchema = z.enum(LENGTH_UNITS, { error: `must be one of ${LENGTH_UNITS.join(", ")}` });

/** How the points are placed: a distance along the line, or x y z coordinates. */
export const POSITION_KINDS = ["distance", "xyz"] as const;

const coordinate = () =>
  finiteNumber().refine((v) => Math.abs(v) <= 1e12, "must be at most 1e12 in magnitude");

const vec3Schema = z.tuple([coordinate(), coordinate(), coordinate()], {
  error: "must be three numbers [x, y, z]",
});

/** One point: its place (`distance`, or `x` `y` `z`) and the six tensor components in the path's unit. */
export const pathPointSchema = z.object({
  distance: coordinate().optional(),
  x: coordinate().optional(),
  y: coordinate().optional(),
  z: coordinate().optional(),
  xx: stressValue(),
  yy: stressValue(),
  zz: stressValue(),
  xy: stressValue(),
  yz: stressValue(),
  zx: stressValue(),
});
export type PathPoint = z.infer<typeof pathPointSchema>;

/**
 * The path. With `positions: "distance"` every point gives `distance` and `lineDirection` says
 * where the line points in the stresses' frame; with "xyz" every point gives x, y and z.
 */
export const pathSchema = z
  .object({
    positions: z.enum(POSITION_KINDS, { error: 'must be "distance" or "xyz"' }),
    lengthUnit: lengthUnitSchema,
    stressUnit: stressUnitSchema,
    lineDirection: vec3Schema.nullable().default(null),
    points: z
      .array(pathPointSchema, { error: "must be a list of points" })
      .min(3, "A line needs at least 3 points (11 or more recommended).")
      .max(
        LINEARIZATION_LIMITS.pointsPerLine,
        `A line holds at most ${LINEARIZATION_LIMITS.pointsPerLine} points (limit "pointsPerLine").`,
      ),
  })
  .superRefine((path, ctx) => {
    const keys = path.positions === "distance" ? (["distance"] as const) : (["x", "y", "z"] as const);
    path.points.forEach((p, i) => {
      for (const k of keys) {
        if (p[k] === undefined) {
          ctx.addIssue({ code: "custom", path: ["points", i, k], message: `give ${k} for every point` });
        }
      }
    });
    if (path.positions === "distance" && path.lineDirection === null) {
      ctx.addIssue({
        code: "custom",
        path: ["lineDirection"],
        message:
          "give the line's direction [x, y, z] in the stresses' frame when points are placed by distance",
      });
    }
  });
export type LinePath = z.infer<typeof pathSchema>;

/** The engineer's classification of the line (core's LineClassification). */
export const classificationSchema = z.object({
  membrane: z.enum(["general", "local"], { error: 'must be "general" or "local"' }),
  stresses: z.enum(["primary", "primary-plus-secondary"], {
    error: 'must be "primary" or "primary-plus-secondary"',
  }),
});

const positiveStress = () => stressValue().refine((v) => v > 0, "must be greater than 0");

/**
 * The allowables, in the path's stress unit. S is always typed (the code's allowable for the
 * material at the design temperature, which no stored material holds). Sy and Su are typed
 * (`source: "typed"`), or read from the material of the line's location, else the project's
 * default material, when the line is saved (`source: "material"`).
 */
export const allowablesSchema = z.discriminatedUnion(
  "source",
  [
    z.object({
      source: z.literal("typed"),
      S: positiveStress(),
      Sy: positiveStress().nullable().default(null),
      Su: positiveStress().nullable().default(null),
      timeDependent: z.boolean({ error: "must be true or false" }).default(false),
    }),
    z.object({
      source: z.literal("material"),
      S: positiveStress(),
      timeDependent: z.boolean({ error: "must be true or false" }).default(false),
    }),
  ],
  { error: 'source must be "typed" or "material"' },
);
export type AllowablesInput = z.infer<typeof allowablesSchema>;

const lineName = z
  .string({ error: "Name the line." })
  .trim()
  .min(1, "Name the line.")
  .max(150, "A line name has at most 150 characters.");

const inputFields = {
  name: lineName,
  /** The location the line belongs to (for its material and the comparison), or null. */
  locationId: uuidInput("must be a location id (UUID)").nullable().default(null),
  path: pathSchema,
  /** The second local axis (e.g. hoop) in the stresses' frame, or null for core's stated default. */
  secondAxis: vec3Schema.nullable().default(null),
  classification: classificationSchema,
  allowables: allowablesSchema,
  equivalent: z
    .enum(["von-mises", "tresca"], { error: 'must be "von-mises" or "tresca"' })
    .default("von-mises"),
  bending: z
    .enum(["annex-5a", "all-components"], { error: 'must be "annex-5a" or "all-components"' })
    .default("annex-5a"),
};

/** What a client sends to create a line, or to compute one without saving it. */
export const linearizationInputSchema = z.object(inputFields);
export type LinearizationInputBody = z.infer<typeof linearizationInputSchema>;

/** A change: the version started from and every input field again (a line is small; no partial merge). */
export const updateLinearizationBodySchema = z.object({ version: versionSchema, ...inputFields });
export type UpdateLinearizationBody = z.infer<typeof updateLinearizationBodySchema>;

const sixSchema = z.array(z.number()).length(6);
const endsSchema = z.object({ start: sixSchema, end: sixSchema });
const scalarEndsSchema = z.object({ start: z.number(), end: z.number() });

export const linearizationCheckSchema = z.object({
  id: z.enum(["Pm", "PL", "PL+Pb", "PL+Pb+Q"]),
  rule: z.string(),
  value: z.number(),
  at: z.enum(["membrane", "start", "end"]),
  limit: z.number(),
  limitNote: z.string(),
  ratio: z.number(),
  verdict: z.enum(VERDICTS),
  source: z.string(),
});
export type LinearizationCheckView = z.infer<typeof linearizationCheckSchema>;

/** The allowables the checks used, after Sy and Su were read from a material (path's stress unit). */
export const allowablesUsedSchema = z.object({
  S: z.number(),
  Sy: z.number().nullable(),
  Su: z.number().nullable(),
  timeDependent: z.boolean(),
  /** Where Sy and Su came from, in words. */
  note: z.string(),
});

/**
 * Core's result, as JSON: stresses in the path's stress unit, lengths in its length unit, every
 * six-component block in the line's local frame (x along the line, y the second axis, z = x × y;
 * order xx yy zz xy yz zx).
 */
export const linearizationResultSchema = z.object({
  stressUnit: stressUnitSchema,
  lengthUnit: lengthUnitSchema,
  pointCount: z.int(),
  thickness: z.number(),
  x: z.array(z.number()),
  frame: z.array(z.array(z.number()).length(3)).length(3),
  frameNote: z.string(),
  /** N rows of six components in the local frame. */
  local: z.array(sixSchema),
  bendingRule: z.enum(["annex-5a", "all-components"]),
  bentComponents: z.array(z.int()),
  membrane: sixSchema,
  bending: endsSchema,
  membranePlusBending: endsSchema,
  peak: endsSchema,
  total: endsSchema,
  equivalent: z.object({
    criterion: z.enum(["von-mises", "tresca"]),
    label: z.string(),
    membrane: z.number(),
    bending: scalarEndsSchema,
    membranePlusBending: scalarEndsSchema,
    peak: scalarEndsSchema,
    total: scalarEndsSchema,
  }),
  allowables: allowablesUsedSchema,
  checks: z.array(linearizationCheckSchema),
  checksNote: z.string(),
  notes: z.array(z.string()),
  warnings: z.array(z.string()),
  source: z.string(),
});
export type LinearizationResultView = z.infer<typeof linearizationResultSchema>;

/** A saved line with its inputs and the result the server computed from them. */
export const linearizationSchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  loadCaseId: z.uuid(),
  locationId: z.uuid().nullable(),
  name: z.string(),
  version: z.int(),
  input: z.object({
    path: z.object({
      positions: z.enum(POSITION_KINDS),
      lengthUnit: lengthUnitSchema,
      stressUnit: stressUnitSchema,
      lineDirection: z.array(z.number()).nullable(),
      points: z.array(pathPointSchema),
    }),
    secondAxis: z.array(z.number()).nullable(),
    classification: classificationSchema,
    allowables: z.object({
      source: z.enum(["typed", "material"]),
      S: z.number(),
      Sy: z.number().nullable().optional(),
      Su: z.number().nullable().optional(),
      timeDependent: z.boolean(),
    }),
    equivalent: z.enum(["von-mises", "tresca"]),
    bending: z.enum(["annex-5a", "all-components"]),
  }),
  result: linearizationResultSchema,
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
  updatedBy: personRefSchema,
});
export type LinearizationView = z.infer<typeof linearizationSchema>;

/** A line in a list: what it is and how its governing check came out, without its points. */
export const linearizationSummarySchema = z.object({
  id: z.uuid(),
  loadCaseId: z.uuid(),
  locationId: z.uuid().nullable(),
  name: z.string(),
  version: z.int(),
  classification: classificationSchema,
  equivalent: z.enum(["von-mises", "tresca"]),
  stressUnit: stressUnitSchema,
  pointCount: z.int(),
  checks: z.array(linearizationCheckSchema),
  updatedAt: z.iso.datetime(),
});
export type LinearizationSummary = z.infer<typeof linearizationSummarySchema>;

export const linearizationResponseSchema = z.object({ linearization: linearizationSchema });
export const linearizationListSchema = z.object({ linearizations: z.array(linearizationSummarySchema) });
export const linearizationPreviewSchema = z.object({ result: linearizationResultSchema });

export const linearizationCaseParamsSchema = projectParamsSchema.extend({
  loadCaseId: z.uuid({ error: "must be a load-case id (UUID)" }),
});
export const linearizationParamsSchema = linearizationCaseParamsSchema.extend({
  linearizationId: z.uuid({ error: "must be a linearization id (UUID)" }),
});

/** Each saved line as a section of the comparison: its checks with their sources. */
export const comparisonLinearizationSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  caseId: z.uuid(),
  caseName: z.string(),
  locationName: z.string().nullable(),
  /** The classification in words, e.g. "local membrane, primary". */
  category: z.string(),
  equivalent: z.enum(["von-mises", "tresca"]),
  stressUnit: stressUnitSchema,
  checks: z.array(
    z.object({
      rule: z.string(),
      value: z.number(),
      limit: z.number(),
      ratio: z.number(),
      verdict: z.enum(VERDICTS),
      source: z.string(),
    }),
  ),
  /** The rule of the check with the highest ratio, or null when none was made. */
  governingRule: z.string().nullable(),
});
export type ComparisonLinearization = z.infer<typeof comparisonLinearizationSchema>;

/** The classification in words. */
export function classificationLabel(c: z.infer<typeof classificationSchema>): string {
  return `${c.membrane === "general" ? "general" : "local"} membrane, ${
    c.stresses === "primary" ? "primary" : "primary + secondary"
  }`;
}

/**
 * `POST …/linearizations/path-from-point-table`: pick a path out of a stored finite-element point
 * table of the load case — the points within `tolerance` of the segment from `start` to `end`
 * (the table's coordinates and length unit), projected onto it and sorted. `lengthUnit` only
 * labels the path (a point table declares no length unit).
 */
export const pathFromPointTableBodySchema = z
  .object({
    tableId: uuidInput("must be a point-table id (UUID) of this load case"),
    start: vec3Schema,
    end: vec3Schema,
    tolerance: coordinate().refine((v) => v > 0, "must be greater than 0 (a distance from the line)"),
    lengthUnit: lengthUnitSchema.default("mm"),
  })
  .superRefine((body, ctx) => {
    if (body.start.every((v, i) => v === body.end[i])) {
      ctx.addIssue({
        code: "custom",
        path: ["end"],
        message: "must differ from start: the two ends coincide, so the line has zero length",
      });
    }
  });
export type PathFromPointTableBody = z.infer<typeof pathFromPointTableBodySchema>;

/** A picked path, in the shape the linearization's `path` field takes (points placed by distance). */
export const pickedPathSchema = z.object({
  positions: z.literal("distance"),
  lengthUnit: lengthUnitSchema,
  stressUnit: stressUnitSchema,
  lineDirection: z.array(z.number()).length(3),
  points: z.array(pathPointSchema),
});

/**
 * What the pick found: how many points of the table lay within the tolerance (`found`), how many
 * places they make along the line (`pointCount`, after coincident nodes were merged), and the
 * path — null when there are too few places to linearize or more than a line may hold (the
 * warnings say which).
 */
export const pathFromPointTableResponseSchema = z.object({
  table: z.object({ id: z.uuid(), fileName: z.string(), unit: stressUnitSchema }),
  found: z.int(),
  pointCount: z.int(),
  lineLength: z.number(),
  path: pickedPathSchema.nullable(),
  notes: z.array(z.string()),
  warnings: z.array(z.string()),
});
export type PathFromPointTable = z.infer<typeof pathFromPointTableResponseSchema>;
