import { z } from "zod";
import { MAX_INPUT_STRESS } from "../constants/input-bounds";
import { STRESS_UNITS } from "../constants/stress-units";
import { uuidInput } from "./ids";

/**
 * Materials: a workspace's own library and references to the read-only built-in list of
 * published minimum values. Shared by the API and the web forms: imports only zod and core's
 * dependency-free constants, so the unit list is core's own.
 */

/** Stress units accepted at the API (core's STRESS_UNITS). */
export const STRESS_UNIT_NAMES = STRESS_UNITS;
export const stressUnitSchema = z.enum(STRESS_UNIT_NAMES, {
  error: `must be one of ${STRESS_UNIT_NAMES.join(", ")}`,
});
export type StressUnitName = z.infer<typeof stressUnitSchema>;

/** A finite number (JSON's 1e999 parses to Infinity; it is refused here, never stored). */
export const finiteNumber = (what = "a number") =>
  z.number({ error: `must be ${what}` }).refine(Number.isFinite, { message: `must be a finite number` });

/**
 * The largest stress magnitude accepted, in the unit it is entered in (core's MAX_INPUT_STRESS,
 * where the reason for it is given).
 */
export const MAX_STRESS_MAGNITUDE = MAX_INPUT_STRESS;

/**
 * The same bound for values already in Pa (exports): the largest accepted value in any unit,
 * converted (1 ksi ≈ 6.9e6 Pa), is below it, so whatever was stored can be exported and imported.
 */
export const MAX_STRESS_PA = MAX_STRESS_MAGNITUDE * 1e7;

/** A finite value in Pa no larger in magnitude than {@link MAX_STRESS_PA}. */
export const stressPaValue = (what = "a number") =>
  finiteNumber(what).refine((v) => Math.abs(v) <= MAX_STRESS_PA, {
    message: `must be at most ${MAX_STRESS_PA.toExponential()} Pa in magnitude`,
  });

/** A finite stress (or strength, or modulus) no larger in magnitude than {@link MAX_STRESS_MAGNITUDE}. */
export const stressValue = (what = "a number") =>
  finiteNumber(what).refine((v) => Math.abs(v) <= MAX_STRESS_MAGNITUDE, {
    message: `must be at most ${MAX_STRESS_MAGNITUDE.toExponential()} in magnitude (in the unit given)`,
  });

const positiveStrength = stressValue("a positive number")
  .refine((v) => v > 0, { message: "must be positive (a compressive strength is given as a magnitude)" })
  .nullable();

const materialName = z
  .string({ error: "Name the material." })
  .trim()
  .min(1, "Name the material.")
  .max(120, "A material name has at most 120 characters.");

/** What an editor types for a library material; strengths and E in `unit`. */
export const materialInputSchema = z.object({
  name: materialName,
  /** The unit the strengths and E were entered in (stored in Pa, shown back in this unit). */
  unit: stressUnitSchema.default("MPa"),
  yield: positiveStrength.default(null),
  ultimateTension: positiveStrength.default(null),
  ultimateCompression: positiveStrength.default(null),
  elasticModulus: positiveStrength.default(null),
  poissonRatio: finiteNumber()
    .refine((v) => v >= 0 && v < 0.5, { message: "must be at least 0 and below 0.5" })
    .nullable()
    .default(null),
  /** Where the values come from: standard, certificate number, test report. */
  reference: z.string().trim().max(500, "At most 500 characters.").default(""),
  note: z.string().trim().max(2000, "At most 2000 characters.").default(""),
});
export type MaterialInput = z.infer<typeof materialInputSchema>;

export const createMaterialBodySchema = materialInputSchema;
export type CreateMaterialBody = z.infer<typeof createMaterialBodySchema>;

/** An update names the version it was based on; a stale one is refused with 409. */
export const versionSchema = z.int({ error: "must be the whole-number version you started from" }).min(1);

export const updateMaterialBodySchema = z
  .object({
    version: versionSchema,
    name: materialName,
    unit: stressUnitSchema,
    yield: positiveStrength,
    ultimateTension: positiveStrength,
    ultimateCompression: positiveStrength,
    elasticModulus: positiveStrength,
    poissonRatio: finiteNumber()
      .refine((v) => v >= 0 && v < 0.5, { message: "must be at least 0 and below 0.5" })
      .nullable(),
    reference: z.string().trim().max(500, "At most 500 characters."),
    note: z.string().trim().max(2000, "At most 2000 characters."),
  })
  .partial()
  .required({ version: true });
export type UpdateMaterialBody = z.infer<typeof updateMaterialBodySchema>;

/** Which material applies: a built-in published grade or one of the workspace library. */
export const materialRefSchema = z.discriminatedUnion(
  "kind",
  [
    z.object({ kind: z.literal("published"), id: z.string().min(1).max(40) }),
    z.object({ kind: z.literal("workspace"), id: uuidInput("must be a material id (UUID)") }),
  ],
  { error: 'must be { kind: "published", id } or { kind: "workspace", id }' },
);
export type MaterialRef = z.infer<typeof materialRefSchema>;

/** Strengths in pascals (null when the material does not give one). */
export const strengthsPaSchema = z.object({
  yieldPa: z.number().nullable(),
  ultimateTensionPa: z.number().nullable(),
  ultimateCompressionPa: z.number().nullable(),
});

/** A library material as the API sends it: every value in Pa, with the unit it was entered in. */
export const materialSchema = strengthsPaSchema.extend({
  id: z.uuid(),
  workspaceId: z.uuid(),
  kind: z.literal("workspace"),
  name: z.string(),
  unit: stressUnitSchema,
  elasticModulusPa: z.number().nullable(),
  poissonRatio: z.number().nullable(),
  reference: z.string(),
  note: z.string(),
  version: z.int(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
  updatedBy: z.object({ id: z.uuid(), name: z.string() }).nullable(),
});
export type Material = z.infer<typeof materialSchema>;

/** A built-in published grade (read-only), values in Pa, with its standard and the note to verify. */
export const publishedMaterialSchema = strengthsPaSchema.extend({
  id: z.string(),
  kind: z.literal("published"),
  name: z.string(),
  standard: z.string(),
  scope: z.string(),
  compressionBasis: z.string(),
  brittle: z.boolean(),
  note: z.string(),
});
export type PublishedMaterialView = z.infer<typeof publishedMaterialSchema>;

export const materialListSchema = z.object({
  materials: z.array(materialSchema),
  published: z.array(publishedMaterialSchema),
});
export type MaterialList = z.infer<typeof materialListSchema>;
export const materialResponseSchema = z.object({ material: materialSchema });

export const materialParamsSchema = z.object({
  workspaceId: z.uuid({ error: "must be a workspace id (UUID)" }),
  materialId: z.uuid({ error: "must be a material id (UUID)" }),
});

/** The label a person reads for a material reference, e.g. "S355 (EN 10025-2)". */
export function materialLabel(
  m: Pick<Material, "name"> | Pick<PublishedMaterialView, "name" | "standard">,
): string {
  return "standard" in m ? `${m.name} (${m.standard})` : m.name;
}
