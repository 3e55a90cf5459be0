import { z } from "zod";
import { VERDICTS } from "../constants/verdicts";
import { COMPARISON_PAGE } from "./limits";
import { comparisonLinearizationSchema } from "./linearizations";
import { comparisonPointTableSchema } from "./point-tables";
import {
  CRITERION_LABELS,
  categoryRequirementSchema,
  criterionSchema,
  requirementSchema,
  type CriterionName,
} from "./projects";

/**
 * The comparison: every load case and combination at every location, evaluated against the
 * location's material and the project's required factors, with the governing row named.
 * The server computes it with core (evaluateState, combineLoadCases, findGoverning); these
 * schemas carry it. Stresses in Pa. A factor of null means the state never reaches the
 * criterion's surface (an infinite factor, which JSON cannot carry). Imports only zod and core's
 * dependency-free constants.
 */

export const verdictSchema = z.enum(VERDICTS);
export type VerdictName = z.infer<typeof verdictSchema>;

/** The load-case category whose factor a check used, or null for the project-wide default. */
const allowableCategory = z.string().nullable();

export const comparisonCheckSchema = z.discriminatedUnion("status", [
  z.object({
    status: z.literal("evaluated"),
    criterion: criterionSchema,
    requiredFactor: z.number(),
    category: allowableCategory,
    /** null: infinite (the state never reaches the surface). */
    factor: z.number().nullable(),
    utilisation: z.number(),
    verdict: verdictSchema,
    /** Why the criterion does not suit the material, when the project asked to rate it anyway; else null. */
    unsuited: z.string().nullable(),
  }),
  z.object({
    status: z.literal("not-evaluated"),
    criterion: criterionSchema,
    requiredFactor: z.number(),
    category: allowableCategory,
    /** Strengths the material lacks for this criterion (empty when the reason is another). */
    missing: z.array(z.string()),
    reason: z.string(),
  }),
  z.object({
    /** The criterion does not suit the material (ductile vs brittle); left out of the governing search. */
    status: z.literal("not-applicable"),
    criterion: criterionSchema,
    requiredFactor: z.number(),
    category: allowableCategory,
    reason: z.string(),
  }),
]);
export type ComparisonCheck = z.infer<typeof comparisonCheckSchema>;

export const comparisonRowSchema = z.object({
  /** "case:<id>:<locationId>" or "combination:<id>:<locationId>". */
  rowId: z.string(),
  kind: z.enum(["load-case", "combination"]),
  caseId: z.uuid(),
  caseName: z.string(),
  category: z.string(),
  locationId: z.uuid(),
  locationName: z.string(),
  /** The case's version and the state's revision (load cases only), for opening in the bench. */
  caseVersion: z.int(),
  stateRevision: z.int().nullable(),
  /**
   * The allowables the row was checked against: its category's factors (`category`) or the
   * project default (null; also for combinations, which have no category). `label` says it in words.
   */
  allowable: z.object({ category: z.string().nullable(), label: z.string() }),
  material: z.object({
    label: z.string(),
    kind: z.enum(["published", "workspace", "none"]),
    note: z.string(),
  }),
  componentsPa: z.object({
    xx: z.number(),
    yy: z.number(),
    zz: z.number(),
    xy: z.number(),
    yz: z.number(),
    zx: z.number(),
  }),
  principalPa: z.tuple([z.number(), z.number(), z.number()]),
  vonMisesPa: z.number(),
  trescaPa: z.number(),
  maxShearPa: z.number(),
  checks: z.array(comparisonCheckSchema),
});
export type ComparisonRowView = z.infer<typeof comparisonRowSchema>;

export const governingSchema = z.object({
  criterion: criterionSchema,
  rowId: z.string(),
  caseName: z.string(),
  locationName: z.string(),
  factor: z.number().nullable(),
  requiredFactor: z.number(),
  /** The category whose factor was required, or null for the project default. */
  category: z.string().nullable(),
  utilisation: z.number(),
  verdict: verdictSchema,
});
export type GoverningView = z.infer<typeof governingSchema>;

export const comparisonSchema = z.object({
  projectId: z.uuid(),
  /** The project-wide default factors (every criterion checked). */
  requirements: z.array(requirementSchema),
  /** Per load-case category, the factors that replace the default's. */
  categoryRequirements: z.array(categoryRequirementSchema),
  /** Whether criteria that do not suit a material were rated and could govern (the project's choice). */
  includeUnsuitedCriteria: z.boolean(),
  rows: z.array(comparisonRowSchema),
  /** Per criterion, over every row. */
  governing: z.array(governingSchema),
  /** The one check that governs over every row and criterion (core's rule), or null with nothing rated. */
  governingOverall: governingSchema.nullable(),
  /** Per location, per criterion. */
  governingByLocation: z.array(
    z.object({ locationId: z.uuid(), locationName: z.string(), governing: z.array(governingSchema) }),
  ),
  /** "governs: Hydrostatic test at head junction, von Mises, SF 1.34 against 1.5 required", or null with no rows. */
  summary: z.string().nullable(),
  /** Case × location pairs with no row, and why. */
  skipped: z.array(z.object({ caseName: z.string(), locationName: z.string(), reason: z.string() })),
  cautions: z.array(z.string()),
});
export type Comparison = z.infer<typeof comparisonSchema>;

/**
 * What `GET …/comparison` answers: one page of the rows (and of the skipped pairs), in the
 * comparison's order, while `governing`, `governingByLocation` and `summary` always cover
 * every row of the project.
 */
/**
 * The comparison with the sections that stand beside its rows: saved stress classification lines
 * and finite-element point tables. What a frozen record keeps (every row); both sections are
 * optional here so a record frozen before a section existed still reads as it was frozen.
 */
export const comparisonWithSectionsSchema = comparisonSchema.extend({
  /** Each saved stress classification line of a live case, with its category checks (every page). */
  linearizations: z.array(comparisonLinearizationSchema).optional(),
  /** Each finite-element point table of a live load case, summarised; its governing points compete in `governing`. */
  pointTables: z.array(comparisonPointTableSchema).optional(),
});
export type ComparisonWithSections = z.infer<typeof comparisonWithSectionsSchema>;

export const comparisonPageSchema = comparisonWithSectionsSchema.extend({
  paging: z.object({
    page: z.int(),
    limit: z.int(),
    totalRows: z.int(),
    totalSkipped: z.int(),
    /** At least 1, so page 1 always exists. */
    totalPages: z.int(),
  }),
  /** Each saved stress classification line of a live case, with its category checks (every page). */
  linearizations: z.array(comparisonLinearizationSchema),
});
export type PagedComparison = z.infer<typeof comparisonPageSchema>;

/** `?page=1&limit=200`: which rows the client shows (1-based page of `limit` rows). */
export const comparisonQuerySchema = z.object({
  page: z.coerce.number({ error: "must be a whole number" }).int("must be a whole number").min(1).default(1),
  limit: z.coerce
    .number({ error: "must be a whole number" })
    .int("must be a whole number")
    .min(1)
    .max(COMPARISON_PAGE.maxLimit, `must be at most ${COMPARISON_PAGE.maxLimit}`)
    .default(COMPARISON_PAGE.defaultLimit),
});
export type ComparisonQuery = z.infer<typeof comparisonQuerySchema>;

/** A safety factor as the summary writes it: two decimals, "∞" for none. */
export function formatFactor(factor: number | null): string {
  return factor === null ? "∞" : factor.toFixed(2);
}

/** Where a required factor comes from, in words: "the test factors" or "the project default". */
export function allowableLabel(category: string | null): string {
  return category === null ? "the project default" : `the “${category}” factors`;
}

/** The governing check in one line, as a calculation sheet states it. */
export function governingSentence(
  g: Pick<
    GoverningView,
    "criterion" | "caseName" | "locationName" | "factor" | "requiredFactor" | "category"
  >,
): string {
  const label = CRITERION_LABELS[g.criterion as CriterionName];
  return `${g.caseName} at ${g.locationName}, ${label}, SF ${formatFactor(g.factor)} against ${g.requiredFactor} required (${allowableLabel(g.category)})`;
}

export const comparisonParamsSchema = z.object({
  workspaceId: z.uuid({ error: "must be a workspace id (UUID)" }),
  projectId: z.uuid({ error: "must be a project id (UUID)" }),
});
