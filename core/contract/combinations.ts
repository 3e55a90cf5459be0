import { z } from "zod";
import { uuidInput } from "./ids";
import { limitMessage, PROJECT_LIMITS } from "./limits";
import { componentsOutSchema } from "./load-cases";
import { finiteNumber, versionSchema } from "./materials";
import { personRefSchema, projectParamsSchema } from "./projects";

/**
 * Load combinations: named linear combinations of load cases (Σ factor × case), evaluated by
 * superposition at each location. Superposition holds only for linear-elastic behaviour and
 * small displacements; every place that shows a combination says so. Imports only zod.
 */

/** The largest load-case factor accepted in a combination (real ones are a few units at most). */
export const MAX_COMBINATION_FACTOR = 1e6;

/** The sentence shown wherever a combination is shown. */
export const SUPERPOSITION_CAUTION =
  "Combinations add load-case stresses by superposition, which assumes linear-elastic material and small displacements.";

export const combinationTermInputSchema = z.object({
  loadCaseId: uuidInput("must be a load-case id (UUID)"),
  factor: finiteNumber()
    .refine((v) => v !== 0, { message: "must not be zero (leave the case out instead)" })
    // With stresses bounded too, a combination of 50 terms can never overflow.
    .refine((v) => Math.abs(v) <= MAX_COMBINATION_FACTOR, {
      message: `must be at most ${MAX_COMBINATION_FACTOR} in magnitude`,
    }),
});

const termsSchema = z
  .array(combinationTermInputSchema)
  .min(1, "Add at least one load case with its factor.")
  .max(PROJECT_LIMITS.termsPerCombination, limitMessage("termsPerCombination"))
  .superRefine((terms, ctx) => {
    const seen = new Set<string>();
    terms.forEach((t, i) => {
      if (seen.has(t.loadCaseId)) {
        ctx.addIssue({ code: "custom", path: [i, "loadCaseId"], message: "this load case is listed twice" });
      }
      seen.add(t.loadCaseId);
    });
  });

const combinationName = z
  .string({ error: "Name the combination." })
  .trim()
  .min(1, "Name the combination.")
  .max(150, "A combination name has at most 150 characters.");

export const createCombinationBodySchema = z.object({
  name: combinationName,
  description: z.string().trim().max(4000, "At most 4000 characters.").default(""),
  terms: termsSchema,
});
export type CreateCombinationBody = z.infer<typeof createCombinationBodySchema>;

export const updateCombinationBodySchema = z
  .object({
    version: versionSchema,
    name: combinationName,
    description: z.string().trim().max(4000, "At most 4000 characters."),
    terms: termsSchema,
  })
  .partial()
  .required({ version: true });
export type UpdateCombinationBody = z.infer<typeof updateCombinationBodySchema>;

export const combinationSchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  name: z.string(),
  description: z.string(),
  terms: z.array(z.object({ loadCaseId: z.uuid(), loadCaseName: z.string(), factor: z.number() })),
  version: z.int(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
  updatedBy: personRefSchema,
});
export type Combination = z.infer<typeof combinationSchema>;
export const combinationResponseSchema = z.object({ combination: combinationSchema });
export const combinationListSchema = z.object({ combinations: z.array(combinationSchema) });

export const combinationParamsSchema = projectParamsSchema.extend({
  combinationId: z.uuid({ error: "must be a combination id (UUID)" }),
});

/** The superposed state of a combination at one location, or why there is none. */
export const combinationResultSchema = z.discriminatedUnion("status", [
  z.object({
    status: z.literal("combined"),
    locationId: z.uuid(),
    locationName: z.string(),
    componentsPa: componentsOutSchema,
  }),
  z.object({
    status: z.literal("incomplete"),
    locationId: z.uuid(),
    locationName: z.string(),
    /** Cases of the combination that have no state at this location. */
    missingCases: z.array(z.object({ id: z.uuid(), name: z.string() })),
  }),
]);
export type CombinationResult = z.infer<typeof combinationResultSchema>;
export const combinationResultsSchema = z.object({
  combination: combinationSchema,
  results: z.array(combinationResultSchema),
  caution: z.string(),
});
