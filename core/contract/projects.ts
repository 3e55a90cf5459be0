import { z } from "zod";
import { categoryKey } from "../constants/categories";
import { CRITERIA } from "../constants/criteria";
import { materialRefSchema, versionSchema } from "./materials";

// Long because it holds every wire schema of a project (requirements, category factors,
// materials, create/update/list bodies) that the API and the browser's forms share.

/**
 * Projects and their locations (the named points of a structure that every load case is
 * checked at). Shared by the API and the web: imports only zod and core's dependency-free constants.
 */

/** The yield and fracture criteria (core's CRITERIA). */
export const CRITERION_NAMES = CRITERIA;
export const criterionSchema = z.enum(CRITERION_NAMES, {
  error: `must be one of ${CRITERION_NAMES.join(", ")}`,
});
export type CriterionName = z.infer<typeof criterionSchema>;

/** How each criterion is written in a sentence. */
export const CRITERION_LABELS: Readonly<Record<CriterionName, string>> = {
  "von-mises": "von Mises",
  tresca: "Tresca",
  "max-principal": "maximum principal",
  "mohr-coulomb": "Mohr–Coulomb",
  "modified-mohr": "modified Mohr",
};

const requiredFactorSchema = z
  .number({ error: "must be a number" })
  .refine((v) => Number.isFinite(v) && v > 0, { message: "must be a positive finite number" });

/** A criterion to check and the safety factor the project requires with it. */
export const requirementSchema = z.object({
  criterion: criterionSchema,
  requiredFactor: requiredFactorSchema,
});
export type Requirement = z.infer<typeof requirementSchema>;

export const requirementsSchema = z
  .array(requirementSchema)
  .min(1, "Check at least one criterion.")
  .max(CRITERION_NAMES.length)
  .superRefine((list, ctx) => {
    const seen = new Set<string>();
    list.forEach((r, i) => {
      if (seen.has(r.criterion)) {
        ctx.addIssue({ code: "custom", path: [i, "criterion"], message: `${r.criterion} is listed twice` });
      }
      seen.add(r.criterion);
    });
  });

/** What a new project checks when nobody says otherwise (common practice for a ductile steel check). */
export const DEFAULT_REQUIREMENTS: Requirement[] = [
  { criterion: "von-mises", requiredFactor: 1.5 },
  { criterion: "tresca", requiredFactor: 1.5 },
];

/**
 * Load-case categories offered for their own allowables (a hydrostatic test, an upset and a
 * design case are not checked against the same margin); users add others. Matched to a load
 * case's category trimmed and case-insensitively (core's categoryKey).
 */
export const ALLOWABLE_CATEGORY_SUGGESTIONS = ["operating", "design", "test", "upset"] as const;

/** A category's name as a project's allowables list it (the same bounds as a load case's category). */
export const categoryNameSchema = z
  .string({ error: "Name the category." })
  .trim()
  .min(1, "Name the category.")
  .max(40, "A category has at most 40 characters.");

/**
 * The required factors of one load-case category, per criterion; a criterion it leaves out
 * uses the project-wide default (`requirements`).
 */
export const categoryRequirementSchema = z.object({
  category: categoryNameSchema,
  factors: z.partialRecord(criterionSchema, requiredFactorSchema),
});
export type CategoryRequirement = z.infer<typeof categoryRequirementSchema>;

const sameCategory = (a: string, b: string) => categoryKey(a) === categoryKey(b);

export const categoryRequirementsSchema = z
  .array(categoryRequirementSchema)
  .max(50, "At most 50 categories.")
  .superRefine((list, ctx) => {
    list.forEach((c, i) => {
      if (list.slice(0, i).some((o) => sameCategory(o.category, c.category))) {
        ctx.addIssue({ code: "custom", path: [i, "category"], message: `"${c.category}" is listed twice` });
      }
    });
  });

/**
 * Factors a category gives for criteria the project does not check (they could never apply):
 * issues with their paths under `categoryRequirements`, to refuse with the field named.
 */
export function categoryRequirementIssues(
  requirements: readonly Requirement[],
  categories: readonly CategoryRequirement[],
): { path: (string | number)[]; message: string }[] {
  const checked = new Set(requirements.map((r) => r.criterion));
  return categories.flatMap((c, i) =>
    Object.keys(c.factors)
      .filter((k) => !checked.has(k as CriterionName))
      .map((k) => ({
        path: ["categoryRequirements", i, "factors", k],
        message: `the project does not check ${CRITERION_LABELS[k as CriterionName]}; add it to the default requirements first or remove this factor`,
      })),
  );
}

export const unitSystemSchema = z.enum(["SI", "US"], { error: "must be SI or US" });
export type UnitSystem = z.infer<typeof unitSystemSchema>;

const projectName = z
  .string({ error: "Name the project." })
  .trim()
  .min(1, "Name the project.")
  .max(150, "A project name has at most 150 characters.");
const description = z.string().trim().max(4000, "At most 4000 characters.");

const includeUnsuitedCriteria = z.boolean({ error: "must be true or false" });

export const createProjectBodySchema = z
  .object({
    name: projectName,
    description: description.default(""),
    unitSystem: unitSystemSchema.default("SI"),
    requirements: requirementsSchema.default(DEFAULT_REQUIREMENTS),
    categoryRequirements: categoryRequirementsSchema.default([]),
    /** Rate criteria that do not suit a location's material (ductile vs brittle) and let them govern. */
    includeUnsuitedCriteria: includeUnsuitedCriteria.default(false),
    defaultMaterial: materialRefSchema.nullable().default(null),
  })
  .superRefine((body, ctx) => {
    for (const issue of categoryRequirementIssues(body.requirements, body.categoryRequirements)) {
      ctx.addIssue({ code: "custom", ...issue });
    }
  });
export type CreateProjectBody = z.infer<typeof createProjectBodySchema>;

/** A change to a project; `requirements` and `categoryRequirements` are checked against each other (the stored one when only one is sent). */
export const updateProjectBodySchema = z
  .object({
    version: versionSchema,
    name: projectName,
    description,
    unitSystem: unitSystemSchema,
    requirements: requirementsSchema,
    categoryRequirements: categoryRequirementsSchema,
    includeUnsuitedCriteria,
    defaultMaterial: materialRefSchema.nullable(),
  })
  .partial()
  .required({ version: true });
export type UpdateProjectBody = z.infer<typeof updateProjectBodySchema>;

/** Someone named on a record (null when their account was deleted). */
export const personRefSchema = z.object({ id: z.uuid(), name: z.string() }).nullable();

export const projectSchema = z.object({
  id: z.uuid(),
  workspaceId: z.uuid(),
  name: z.string(),
  description: z.string(),
  unitSystem: unitSystemSchema,
  /** The project-wide default: every criterion checked, with its required factor. */
  requirements: z.array(requirementSchema),
  /** Per load-case category, the factors that replace the default's. */
  categoryRequirements: z.array(categoryRequirementSchema),
  includeUnsuitedCriteria: z.boolean(),
  defaultMaterial: materialRefSchema.nullable(),
  version: z.int(),
  /** Counts for the project list. */
  counts: z.object({ locations: z.int(), loadCases: z.int(), combinations: z.int() }),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
  createdBy: personRefSchema,
  updatedBy: personRefSchema,
});
export type Project = z.infer<typeof projectSchema>;
export const projectResponseSchema = z.object({ project: projectSchema });
export const projectListSchema = z.object({ projects: z.array(projectSchema) });
export type ProjectList = z.infer<typeof projectListSchema>;

export const projectParamsSchema = z.object({
  workspaceId: z.uuid({ error: "must be a workspace id (UUID)" }),
  projectId: z.uuid({ error: "must be a project id (UUID)" }),
});

const locationName = z
  .string({ error: "Name the location." })
  .trim()
  .min(1, "Name the location.")
  .max(120, "A location name has at most 120 characters.");

export const createLocationBodySchema = z.object({
  name: locationName,
  note: z.string().trim().max(2000, "At most 2000 characters.").default(""),
  /** Overrides the project's default material here; null uses the default. */
  material: materialRefSchema.nullable().default(null),
});
export type CreateLocationBody = z.infer<typeof createLocationBodySchema>;

export const updateLocationBodySchema = z
  .object({
    version: versionSchema,
    name: locationName,
    note: z.string().trim().max(2000, "At most 2000 characters."),
    material: materialRefSchema.nullable(),
  })
  .partial()
  .required({ version: true });
export type UpdateLocationBody = z.infer<typeof updateLocationBodySchema>;

export const locationSchema = z.object({
  id: z.uuid(),
  projectId: z.uuid(),
  name: z.string(),
  note: z.string(),
  material: materialRefSchema.nullable(),
  position: z.int(),
  version: z.int(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type Location = z.infer<typeof locationSchema>;
export const locationResponseSchema = z.object({ location: locationSchema });
export const locationListSchema = z.object({ locations: z.array(locationSchema) });

export const locationParamsSchema = projectParamsSchema.extend({
  locationId: z.uuid({ error: "must be a location id (UUID)" }),
});

/** The body of a 409: the version the server holds now, so the client can reload or keep its copy. */
export const conflictDetailsSchema = z.object({ currentVersion: z.int(), current: z.unknown() });
export type ConflictDetails = z.infer<typeof conflictDetailsSchema>;

/** What the audit trail records. */
export const AUDIT_ENTITY_TYPES = [
  "project",
  "location",
  "load-case",
  "stress-state",
  "combination",
  "material",
  "linearization",
  "record",
  "point-table",
] as const;

export const auditQuerySchema = z.object({
  projectId: z.uuid({ error: "must be a project id (UUID)" }).optional(),
  entityId: z.uuid({ error: "must be an id (UUID)" }).optional(),
  /** Events older than this id (paging backwards). */
  before: z.coerce.number({ error: "must be an event id" }).int().positive().optional(),
  limit: z.coerce.number({ error: "must be a whole number" }).int().min(1).max(500).default(100),
});
export type AuditQuery = z.infer<typeof auditQuerySchema>;

export const auditEventSchema = z.object({
  id: z.string(),
  at: z.iso.datetime(),
  actor: z.object({ id: z.uuid().nullable(), name: z.string() }),
  projectId: z.uuid().nullable(),
  entityType: z.enum(AUDIT_ENTITY_TYPES),
  entityId: z.uuid(),
  action: z.enum(["create", "update", "delete", "restore", "import", "purge", "submit", "return", "approve"]),
  summary: z.string(),
  changes: z.record(z.string(), z.unknown()).nullable(),
  /** The changes in words: each field with its value before and after (null: none), names instead of ids. */
  details: z.array(z.object({ field: z.string(), from: z.string().nullable(), to: z.string().nullable() })),
});
export type AuditEventView = z.infer<typeof auditEventSchema>;
export const auditListSchema = z.object({
  events: z.array(auditEventSchema),
  nextBefore: z.string().nullable(),
});

/** How long a deleted record can be restored. */
export const TRASH_RETENTION_DAYS = 30;
export const TRASH_KINDS = ["project", "location", "load-case", "combination", "material"] as const;
export const trashKindSchema = z.enum(TRASH_KINDS, { error: `must be one of ${TRASH_KINDS.join(", ")}` });
export type TrashKind = z.infer<typeof trashKindSchema>;

export const trashItemSchema = z.object({
  kind: trashKindSchema,
  id: z.uuid(),
  name: z.string(),
  /** The project it belongs to (null for projects and materials). */
  project: z.object({ id: z.uuid(), name: z.string(), inTrash: z.boolean() }).nullable(),
  deletedAt: z.iso.datetime(),
  deletedBy: personRefSchema,
  /** When it is deleted for good. */
  purgeAt: z.iso.datetime(),
});
export type TrashItem = z.infer<typeof trashItemSchema>;
export const trashListSchema = z.object({ items: z.array(trashItemSchema), retentionDays: z.int() });

export const trashItemParamsSchema = z.object({
  workspaceId: z.uuid({ error: "must be a workspace id (UUID)" }),
  kind: trashKindSchema,
  itemId: z.uuid({ error: "must be an id (UUID)" }),
});
