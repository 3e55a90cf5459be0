import { z } from "zod";
import { calculatorRecordSchema } from "./calculator-inputs";
import { LINEARIZATION_LIMITS } from "./limits";
import { linearizationInputSchema } from "./linearizations";
import { CALCULATOR_STATE_SOURCES, stateSourceSchema } from "./load-cases";
import { finiteNumber, stressPaValue, stressUnitSchema } from "./materials";
import { MAX_COMBINATION_FACTOR } from "./combinations";
import {
  categoryRequirementIssues,
  categoryRequirementsSchema,
  requirementSchema,
  unitSystemSchema,
} from "./projects";

/**
 * The project export file (documented in docs/project-export.md). Its own versioned schema:
 * `format` names it, `schemaVersion` says which layout; a reader refuses versions it does
 * not know rather than guess. Records point at each other by `key` (any string unique in
 * its list), never by database id, so a file can be imported into any workspace.
 * Stresses and strengths are in Pa exactly as stored, with the unit they were entered in.
 * Imports only zod.
 */

export const PROJECT_EXPORT_FORMAT = "sigmacube.project";
/** The version this Sigmacube writes. */
export const PROJECT_EXPORT_SCHEMA_VERSION = 4;
/**
 * Every version this Sigmacube reads (1: before allowables per load-case category; 2: before
 * states kept their calculator's inputs; 3: before load cases carried their linearization lines).
 */
export const READABLE_SCHEMA_VERSIONS = [1, 2, 3, 4] as const;

const key = z.string({ error: "must be a key (text)" }).min(1, "must not be empty").max(100);
// PostgreSQL text cannot hold U+0000; refuse it here with the field named rather than fail on insert.
const text = (max: number) =>
  z
    .string({ error: "must be text" })
    .max(max, `At most ${max} characters.`)
    .refine((v) => !v.includes("\u0000"), { message: "must not contain the NUL character" });
const positiveOrNull = stressPaValue()
  .refine((v) => v > 0, { message: "must be positive" })
  .nullable();

/** Six components in Pa, bounded as everywhere else so that nothing overflows after import. */
const componentsPaSchema = z.object({
  xx: stressPaValue(),
  yy: stressPaValue(),
  zz: stressPaValue(),
  xy: stressPaValue(),
  yz: stressPaValue(),
  zx: stressPaValue(),
});

const exportMaterialRefSchema = z.discriminatedUnion(
  "kind",
  [
    z.object({ kind: z.literal("published"), id: z.string().min(1).max(40) }),
    z.object({ kind: z.literal("library"), key }),
  ],
  { error: 'must be { kind: "published", id } or { kind: "library", key }' },
);

const exportMaterialSchema = z.object({
  key,
  name: text(120).min(1, "Name the material."),
  unit: stressUnitSchema,
  yieldPa: positiveOrNull,
  ultimateTensionPa: positiveOrNull,
  ultimateCompressionPa: positiveOrNull,
  elasticModulusPa: positiveOrNull,
  poissonRatio: finiteNumber()
    .refine((v) => v >= 0 && v < 0.5, { message: "must be at least 0 and below 0.5" })
    .nullable(),
  reference: text(500),
  note: text(2000),
});

const exportStateSchema = z.object({
  location: key,
  unit: stressUnitSchema,
  componentsPa: componentsPaSchema,
  source: stateSourceSchema,
  note: text(2000),
  /** schemaVersion 3: the calculator that produced the state and every input, or null. */
  calculator: calculatorRecordSchema.nullable().optional(),
});

/**
 * schemaVersion 4: a stress classification line of a load case — its inputs exactly as the
 * linearization routes take them (path in the unit it was entered in, frame, classification,
 * allowables, options), its location by key or null. No result: the importing server linearizes
 * every line again with core's `linearize`, as it does on every save.
 */
const exportLinearizationSchema = linearizationInputSchema
  .omit({ locationId: true })
  .extend({ location: key.nullable() });

const baseSchema = z.object({
  format: z.literal(PROJECT_EXPORT_FORMAT, { error: `must be "${PROJECT_EXPORT_FORMAT}"` }),
  schemaVersion: z.literal(READABLE_SCHEMA_VERSIONS, {
    error: `must be ${READABLE_SCHEMA_VERSIONS.join(" or ")} (the versions this Sigmacube reads)`,
  }),
  exportedAt: z.iso.datetime({ error: "must be an ISO date-time" }),
  project: z.object({
    name: text(150).trim().min(1, "Name the project."),
    description: text(4000),
    unitSystem: unitSystemSchema,
    /** The project-wide default factors. */
    requirements: z.array(requirementSchema).min(1, "Check at least one criterion."),
    /** schemaVersion 2: per load-case category, the factors that replace the default's. */
    categoryRequirements: categoryRequirementsSchema.optional(),
    /** schemaVersion 2: rate criteria that do not suit a material and let them govern. */
    includeUnsuitedCriteria: z.boolean({ error: "must be true or false" }).optional(),
    defaultMaterial: exportMaterialRefSchema.nullable(),
  }),
  materials: z.array(exportMaterialSchema).max(500),
  locations: z
    .array(
      z.object({
        key,
        name: text(120).trim().min(1, "Name the location."),
        note: text(2000),
        material: exportMaterialRefSchema.nullable(),
      }),
    )
    .max(1000),
  loadCases: z
    .array(
      z.object({
        key,
        name: text(150).trim().min(1, "Name the load case."),
        category: text(40),
        description: text(4000),
        states: z.array(exportStateSchema).max(1000),
        /**
         * schemaVersion 4: the case's stress classification lines, in their order. Optional even in
         * version 4 (Sigmacube always writes it): a case without the field has no lines, which is
         * unambiguous, so a hand-made file need not list an empty one.
         */
        linearizations: z
          .array(exportLinearizationSchema)
          .max(
            LINEARIZATION_LIMITS.linesPerLoadCase,
            `A load case holds at most ${LINEARIZATION_LIMITS.linesPerLoadCase} linearizations (limit "linesPerLoadCase").`,
          )
          .optional(),
      }),
    )
    .max(1000),
  combinations: z
    .array(
      z.object({
        name: text(150).trim().min(1, "Name the combination."),
        description: text(4000),
        terms: z
          .array(
            z.object({
              loadCase: key,
              factor: finiteNumber()
                .refine((v) => v !== 0, "must not be zero")
                .refine(
                  (v) => Math.abs(v) <= MAX_COMBINATION_FACTOR,
                  `must be at most ${MAX_COMBINATION_FACTOR} in magnitude`,
                ),
            }),
          )
          .min(1, "Add at least one load case with its factor."),
      }),
    )
    .max(500),
});

type Issue = { path: (string | number)[]; message: string };

/** Keys unique within their list and every reference pointing at something in the file. */
function crossReferenceIssues(
  file: z.infer<typeof baseSchema>,
  publishedIds: ReadonlySet<string> | null,
): Issue[] {
  const issues: Issue[] = [];
  const keysOf = (list: { key: string }[], name: string) => {
    const keys = new Set<string>();
    list.forEach((item, i) => {
      if (keys.has(item.key))
        issues.push({ path: [name, i, "key"], message: `the key "${item.key}" is used twice` });
      keys.add(item.key);
    });
    return keys;
  };
  const materials = keysOf(file.materials, "materials");
  const locations = keysOf(file.locations, "locations");
  const cases = keysOf(file.loadCases, "loadCases");
  const checkRef = (ref: z.infer<typeof exportMaterialRefSchema> | null, path: (string | number)[]) => {
    if (!ref) return;
    if (ref.kind === "library" && !materials.has(ref.key)) {
      issues.push({ path, message: `names the material "${ref.key}", which is not in materials` });
    }
    if (ref.kind === "published" && publishedIds && !publishedIds.has(ref.id)) {
      issues.push({
        path,
        message: `names the built-in material "${ref.id}", which this Sigmacube does not have`,
      });
    }
  };
  checkRef(file.project.defaultMaterial, ["project", "defaultMaterial"]);
  file.locations.forEach((l, i) => checkRef(l.material, ["locations", i, "material"]));
  file.loadCases.forEach((c, i) => {
    const seen = new Set<string>();
    c.states.forEach((s, j) => {
      if (!locations.has(s.location)) {
        issues.push({
          path: ["loadCases", i, "states", j, "location"],
          message: `names the location "${s.location}", which is not in locations`,
        });
      }
      if (seen.has(s.location)) {
        issues.push({
          path: ["loadCases", i, "states", j, "location"],
          message: `a second state at "${s.location}"`,
        });
      }
      seen.add(s.location);
    });
  });
  file.loadCases.forEach((c, i) =>
    (c.linearizations ?? []).forEach((line, j) => {
      if (line.location !== null && !locations.has(line.location)) {
        issues.push({
          path: ["loadCases", i, "linearizations", j, "location"],
          message: `names the location "${line.location}", which is not in locations`,
        });
      }
    }),
  );
  file.combinations.forEach((c, i) =>
    c.terms.forEach((t, j) => {
      if (!cases.has(t.loadCase)) {
        issues.push({
          path: ["combinations", i, "terms", j, "loadCase"],
          message: `names the load case "${t.loadCase}", which is not in loadCases`,
        });
      }
    }),
  );
  const seenCriteria = new Set<string>();
  file.project.requirements.forEach((r, i) => {
    if (seenCriteria.has(r.criterion))
      issues.push({
        path: ["project", "requirements", i, "criterion"],
        message: `${r.criterion} is listed twice`,
      });
    seenCriteria.add(r.criterion);
  });
  if (file.schemaVersion >= 3) {
    file.loadCases.forEach((c, i) =>
      c.states.forEach((s, j) => {
        if (s.calculator === undefined) {
          issues.push({
            path: ["loadCases", i, "states", j, "calculator"],
            message: "is required from schemaVersion 3 on (null when the state came from no calculator)",
          });
        }
      }),
    );
  }
  file.loadCases.forEach((c, i) =>
    c.states.forEach((s, j) => {
      if (s.calculator && !CALCULATOR_STATE_SOURCES.includes(s.source)) {
        issues.push({
          path: ["loadCases", i, "states", j, "source"],
          message: `must be ${CALCULATOR_STATE_SOURCES.join(" or ")} when calculator inputs are given`,
        });
      }
    }),
  );
  if (file.schemaVersion >= 2) {
    for (const field of ["categoryRequirements", "includeUnsuitedCriteria"] as const) {
      if (file.project[field] === undefined) {
        issues.push({ path: ["project", field], message: "is required from schemaVersion 2 on" });
      }
    }
  }
  for (const issue of categoryRequirementIssues(
    file.project.requirements,
    file.project.categoryRequirements ?? [],
  )) {
    issues.push({ path: ["project", ...issue.path], message: issue.message });
  }
  return issues;
}

/**
 * A file of any readable version in today's layout (a version-1 file has no category factors;
 * states of a version-1 or 2 file kept no calculator inputs). Load cases of a file before version 4
 * carry no `linearizations`; the field stays optional in the type, read as no lines.
 */
function upgrade(file: z.infer<typeof baseSchema>) {
  return {
    ...file,
    project: {
      ...file.project,
      categoryRequirements: file.project.categoryRequirements ?? [],
      includeUnsuitedCriteria: file.project.includeUnsuitedCriteria ?? false,
    },
    loadCases: file.loadCases.map((c) => ({
      ...c,
      states: c.states.map((s) => ({ ...s, calculator: s.calculator ?? null })),
    })),
  };
}

/**
 * The schema of an export file. `publishedIds` (the built-in material ids) lets the
 * server also refuse references to built-in grades it does not have.
 */
export function projectExportSchemaWith(publishedIds: ReadonlySet<string> | null) {
  return baseSchema
    .superRefine((file, ctx) => {
      for (const issue of crossReferenceIssues(file, publishedIds))
        ctx.addIssue({ code: "custom", ...issue });
    })
    .transform(upgrade);
}

/** The export file schema without the check against the built-in list. */
export const projectExportSchema = projectExportSchemaWith(null);
/** A file as read: any readable version, in today's layout. */
export type ProjectExport = z.output<typeof projectExportSchema>;

export const importResponseSchema = z.object({
  project: z.object({ id: z.uuid(), name: z.string() }),
  counts: z.object({ materials: z.int(), locations: z.int(), loadCases: z.int(), combinations: z.int() }),
});
