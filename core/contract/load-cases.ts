import { z } from "zod";
import { COMPONENTS } from "../constants/components";
import { SYMMETRY_REL_TOL } from "../constants/input-bounds";
import { calculatorRecordOutSchema, calculatorRecordSchema } from "./calculator-inputs";
import { uuidInput } from "./ids";
import { stressUnitSchema, stressValue, versionSchema } from "./materials";
import { personRefSchema, projectParamsSchema } from "./projects";

/**
 * Load cases and the stress state each one gives at each location. States travel in the
 * unit they were entered in and are stored in Pa; every saved state is a numbered,
 * immutable revision (a later sign-off can freeze exactly what it checked). Imports only zod and
 * core's dependency-free constants.
 */

/** Categories the form suggests; any short tag is accepted. */
export const LOAD_CASE_CATEGORY_SUGGESTIONS = [
  "operating",
  "design",
  "test",
  "upset",
  "transport",
  "lifting",
] as const;

/** Where a stress state came from. */
export const STATE_SOURCES = ["typed", "pasted", "calculator", "measured", "finite-element point"] as const;
export const stateSourceSchema = z.enum(STATE_SOURCES, {
  error: `must be one of ${STATE_SOURCES.join(", ")}`,
});
export type StateSource = z.infer<typeof stateSourceSchema>;

/** The six component names (core's COMPONENTS). */
const COMPONENT_KEYS = COMPONENTS;

/** One schema per component name, in COMPONENTS order. */
function eachComponent<T extends z.ZodType>(schema: () => T): Record<(typeof COMPONENT_KEYS)[number], T> {
  return Object.fromEntries(COMPONENT_KEYS.map((key) => [key, schema()])) as Record<
    (typeof COMPONENT_KEYS)[number],
    T
  >;
}

/** Six tensor components (σxy is the tensor shear, not an engineering strain). */
export const componentsSchema = z.object(eachComponent(() => stressValue()));
export type Components = z.infer<typeof componentsSchema>;

/** Six components as the server sends them (already checked when they came in; not bounded again). */
export const componentsOutSchema = z.object(eachComponent(() => z.number()));

/** Relative symmetry tolerance of a 3×3 matrix, as a fraction of its largest entry (core's parser's). */
export const MATRIX_SYMMETRY_TOLERANCE = SYMMETRY_REL_TOL;

const matrixSchema = z
  .array(z.array(stressValue()).length(3, "each row has 3 numbers"), {
    error: "must be 3 rows of 3 numbers",
  })
  .length(3, { error: "must have 3 rows", abort: true })
  .superRefine((m, ctx) => {
    // Symmetry is only asked of a 3×3 matrix; a wrong shape has already been reported.
    if (m.length !== 3 || m.some((row) => row.length !== 3)) return;
    const scale = Math.max(...m.flat().map(Math.abs), 0);
    for (const [i, j] of [
      [0, 1],
      [1, 2],
      [0, 2],
    ] as const) {
      if (Math.abs(m[i][j] - m[j][i]) > MATRIX_SYMMETRY_TOLERANCE * scale) {
        ctx.addIssue({
          code: "custom",
          path: [i, j],
          message: `the matrix is not symmetric: row ${i + 1} column ${j + 1} is ${m[i][j]} but row ${j + 1} column ${i + 1} is ${m[j][i]}`,
        });
      }
    }
  });

/**
 * A stress as entered: six components or a symmetric 3×3 matrix, in one unit.
 * Normalised to `{ unit, components }`.
 */
export const stressInputSchema = z
  .object({
    unit: stressUnitSchema,
    components: componentsSchema.optional(),
    matrix: matrixSchema.optional(),
  })
  .superRefine((s, ctx) => {
    if (!s.components === !s.matrix) {
      ctx.addIssue({
        code: "custom",
        path: ["components"],
        message: "give either components or matrix, not both or neither",
      });
    }
  })
  .transform((s) => {
    if (s.components) return { unit: s.unit, components: s.components };
    const m = s.matrix!;
    // The matrix passed the symmetry check; the mean of the two off-diagonal entries is kept.
    const components: Components = {
      xx: m[0][0],
      yy: m[1][1],
      zz: m[2][2],
      xy: (m[0][1] + m[1][0]) / 2,
      yz: (m[1][2] + m[2][1]) / 2,
      zx: (m[0][2] + m[2][0]) / 2,
    };
    return { unit: s.unit, components };
  });
export type StressInput = z.output<typeof stressInputSchema>;

/** Sources a state may have when it carries a calculator's inputs (a rosette's readings are measured). */
export const CALCULATOR_STATE_SOURCES: readonly StateSource[] = ["calculator", "measured"];

/**
 * The calculator that produced a state, with every input (null: typed, pasted, from elsewhere).
 * Only a state whose source is "calculator" or "measured" may carry one.
 */
const calculatorField = calculatorRecordSchema.nullable().default(null);

function checkCalculatorSource(s: { source: StateSource; calculator: unknown }, ctx: z.RefinementCtx): void {
  if (s.calculator !== null && !CALCULATOR_STATE_SOURCES.includes(s.source)) {
    ctx.addIssue({
      code: "custom",
      path: ["source"],
      message: `must be ${CALCULATOR_STATE_SOURCES.join(" or ")} when calculator inputs are given`,
    });
  }
}

/** One state to save at a location. */
export const stateInputSchema = z
  .object({
    locationId: uuidInput("must be a location id (UUID)"),
    stress: stressInputSchema,
    source: stateSourceSchema.default("typed"),
    note: z.string().trim().max(2000, "At most 2000 characters.").default(""),
    calculator: calculatorField,
  })
  .superRefine(checkCalculatorSource);
export type StateInput = z.infer<typeof stateInputSchema>;

const statesInputSchema = z.array(stateInputSchema).superRefine((list, ctx) => {
  const seen = new Set<string>();
  list.forEach((s, i) => {
    if (seen.has(s.locationId)) {
      ctx.addIssue({ code: "custom", path: [i, "locationId"], message: "this location is given twice" });
    }
    seen.add(s.locationId);
  });
});

const caseName = z
  .string({ error: "Name the load case." })
  .trim()
  .min(1, "Name the load case.")
  .max(150, "A load-case name has at most 150 characters.");
const category = z.string().trim().max(40, "A category has at most 40 characters.");

export const createLoadCaseBodySchema = z.object({
  name: caseName,
  category: category.default(""),
  description: z.string().trim().max(4000, "At most 4000 characters.").default(""),
  states: statesInputSchema.default([]),
});
export type CreateLoadCaseBody = z.infer<typeof createLoadCaseBodySchema>;

export const updateLoadCaseBodySchema = z
  .object({
    version: versionSchema,
    name: caseName,
    category,
    description: z.string().trim().max(4000, "At most 4000 characters."),
    /** States to save (a new revision at each location listed); other locations keep theirs. */
    states: statesInputSchema,
    /** Locations whose state is removed from the case. */
    removeStates: z.array(uuidInput("must be a location id (UUID)")),
  })
  .partial()
  .required({ version: true });
export type UpdateLoadCaseBody = z.infer<typeof updateLoadCaseBodySchema>;

/** Saving one location's state (what the bench sends): the case's version, the stress, its source. */
export const putStateBodySchema = z
  .object({
    version: versionSchema,
    stress: stressInputSchema,
    source: stateSourceSchema.default("typed"),
    note: z.string().trim().max(2000, "At most 2000 characters.").default(""),
    calculator: calculatorField,
  })
  .superRefine(checkCalculatorSource);
export type PutStateBody = z.infer<typeof putStateBodySchema>;

/** A saved state: the stored Pa values, the same values in the entered unit, and its revision. */
export const stressStateSchema = z.object({
  /** Id of this immutable revision. */
  id: z.uuid(),
  locationId: z.uuid(),
  revision: z.int(),
  unit: stressUnitSchema,
  /** In `unit`. */
  components: componentsOutSchema,
  /** As stored, in Pa. */
  componentsPa: componentsOutSchema,
  source: stateSourceSchema,
  note: z.string(),
  /** The calculator that produced it, with every input as typed (null when it came from elsewhere). */
  calculator: calculatorRecordOutSchema.nullable(),
  savedAt: z.iso.datetime(),
  savedBy: personRefSchema,
});
export type StressState = z.infer<typeof stressStateSchema>;

export const loadCaseSchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  name: z.string(),
  category: z.string(),
  description: z.string(),
  position: z.int(),
  version: z.int(),
  states: z.array(stressStateSchema),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
  updatedBy: personRefSchema,
});
export type LoadCase = z.infer<typeof loadCaseSchema>;
export const loadCaseResponseSchema = z.object({ loadCase: loadCaseSchema });
export const loadCaseListSchema = z.object({ loadCases: z.array(loadCaseSchema) });

export const loadCaseParamsSchema = projectParamsSchema.extend({
  loadCaseId: z.uuid({ error: "must be a load-case id (UUID)" }),
});
export const stateParamsSchema = loadCaseParamsSchema.extend({
  locationId: z.uuid({ error: "must be a location id (UUID)" }),
});

/** Every revision a state has had at one location, newest first (the record a checker reads). */
export const stateHistorySchema = z.object({ revisions: z.array(stressStateSchema) });

export { COMPONENT_KEYS };
