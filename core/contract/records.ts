import { z } from "zod";
import { ENGINE_NAME } from "../constants/engine";
import { comparisonWithSectionsSchema } from "./comparison";
import { projectExportSchema } from "./project-export";

/**
 * The content of a frozen calculation record: everything a checker needs to see the calculation
 * again exactly as it was submitted — the inputs (the project export file: states in Pa with the
 * unit they were entered in and their source, materials with values and references, the
 * allowables per category, combinations), which database row each input key stood for and which
 * revision of each state was frozen, the full comparison computed from those inputs (every row,
 * the governing checks, the cautions) and the engine that computed it.
 *
 * A record's hash is the SHA-256 of this object written as canonical JSON (keys sorted); the
 * API stores the object and its hash once and never changes either. Imports only zod and contracts.
 */

export const RECORD_CONTENT_FORMAT = "sigmacube.record";
export const RECORD_CONTENT_VERSION = 1;

const keyToId = z.record(z.string(), z.uuid());

/**
 * What a record covers when it is not the whole project: the chosen load cases and locations (in
 * the project's order) and how many the project had when frozen, so the record can say "covers N of M".
 */
export const recordScopeSchema = z.object({
  loadCases: z.array(z.object({ id: z.uuid(), name: z.string() })),
  locations: z.array(z.object({ id: z.uuid(), name: z.string() })),
  projectLoadCases: z.int(),
  projectLocations: z.int(),
});
export type RecordScope = z.infer<typeof recordScopeSchema>;

export const recordContentSchema = z.object({
  format: z.literal(RECORD_CONTENT_FORMAT),
  contentVersion: z.literal(RECORD_CONTENT_VERSION),
  engine: z.object({ name: z.literal(ENGINE_NAME), version: z.string() }),
  /** When the content was taken from the project (ISO date-time). */
  takenAt: z.iso.datetime(),
  project: z.object({ id: z.uuid(), workspaceId: z.uuid(), version: z.int() }),
  /** The project's inputs, exactly as the project export writes them. */
  inputs: projectExportSchema,
  /** Per export key, the database id it stood for (to match rows between two records). */
  ids: z.object({ materials: keyToId, locations: keyToId, loadCases: keyToId }),
  /** Which revision of each state was frozen, who saved it and when. */
  stateRevisions: z.array(
    z.object({
      loadCase: z.string(),
      location: z.string(),
      revision: z.int(),
      savedAt: z.iso.datetime(),
      savedBy: z.uuid().nullable(),
    }),
  ),
  /** The comparison of those inputs: every row (not a page), the governing checks, the cautions. */
  results: comparisonWithSectionsSchema,
  /**
   * Each point table's file as it was read (its SHA-256), so a checker can match the file they hold
   * to the one rated. Absent from records frozen before it was kept.
   */
  pointTableFiles: z.array(z.object({ tableId: z.uuid(), sha256: z.string() })).optional(),
  /**
   * Each stress classification line of the comparison: where it runs (a distance, or x y z, in its
   * length unit) and its equivalent stresses (the line's stress unit) — membrane, membrane plus
   * bending and peak at both ends. Absent from records frozen before it was kept.
   */
  linearizationEnds: z
    .array(
      z.object({
        id: z.uuid(),
        lengthUnit: z.string(),
        pointCount: z.int(),
        thickness: z.number(),
        start: z.array(z.number()),
        end: z.array(z.number()),
        equivalent: z.object({
          label: z.string(),
          membrane: z.number(),
          membranePlusBending: z.object({ start: z.number(), end: z.number() }),
          peak: z.object({ start: z.number(), end: z.number() }),
        }),
      }),
    )
    .optional(),
  /** The chosen subset; ABSENT for a whole-project record (so whole-project records keep their hash). */
  scope: recordScopeSchema.optional(),
});
export type RecordContent = z.infer<typeof recordContentSchema>;

/*
 * The review of a project and its calculation records, as the API sends and receives them
 * (GET/PATCH …/review, …/records, …/records/{recordId}, comments, return, approve, diff).
 */

/** A project's review status: nothing submitted since the last change, waiting for a check, returned, approved. */
export const PROJECT_REVIEW_STATUSES = ["in-work", "submitted", "returned", "approved"] as const;
export type ProjectReviewStatus = (typeof PROJECT_REVIEW_STATUSES)[number];

/** A record's status; "superseded": a newer record of the project was submitted after it was returned. */
export const RECORD_STATUSES = ["submitted", "returned", "approved", "superseded"] as const;
export type RecordStatusName = (typeof RECORD_STATUSES)[number];

/** How many independent approvals a record may need. */
export const REQUIRED_APPROVALS = [1, 2] as const;

/** Someone named on a record (id null when their account no longer exists; the name stays). */
export const recordPersonSchema = z.object({ id: z.uuid().nullable(), name: z.string() });
export type RecordPerson = z.infer<typeof recordPersonSchema>;

export const recordSummarySchema = z.object({
  id: z.uuid(),
  /** 1, 2, 3 … across the project. */
  number: z.int().positive(),
  /** "A", "B", … : resubmissions after a return keep the letter, the first submission after an approval takes the next. */
  revision: z.string().regex(/^[A-Z]+$/),
  status: z.enum(RECORD_STATUSES),
  /** SHA-256 (hex) of the content as canonical JSON. */
  hash: z.string().regex(/^[0-9a-f]{64}$/),
  engineVersion: z.string(),
  /** What changed and why, as the submitter wrote it. */
  reason: z.string(),
  /** How many approvals this record needs (the project's setting when it was submitted). */
  requiredApprovals: z.union([z.literal(1), z.literal(2)]),
  submittedBy: recordPersonSchema,
  submittedAt: z.iso.datetime(),
  approvals: z.array(z.object({ by: recordPersonSchema, at: z.iso.datetime(), comment: z.string() })),
  returned: z.object({ by: recordPersonSchema, at: z.iso.datetime(), comment: z.string() }).nullable(),
  /** When the last required approval was given, else null. */
  approvedAt: z.iso.datetime().nullable(),
  /** What the record covers; null = the whole project. */
  scope: recordScopeSchema.nullable(),
});
export type RecordSummary = z.infer<typeof recordSummarySchema>;

export const recordCommentSchema = z.object({
  id: z.uuid(),
  recordId: z.uuid(),
  /** A comparison row of the record's content ("case:<caseId>:<locationId>", "combination:<id>:<locationId>"), or null for the whole record. */
  rowId: z.string().nullable(),
  /** The comment this one answers, or null. */
  replyTo: z.uuid().nullable(),
  text: z.string(),
  by: recordPersonSchema,
  at: z.iso.datetime(),
});
export type RecordComment = z.infer<typeof recordCommentSchema>;

export const recordEventSchema = z.object({
  /** The record's status after the event. */
  status: z.enum(RECORD_STATUSES),
  /** What happened: submitted, one approval, returned, or superseded by a newer submission. */
  action: z.enum(["submit", "approve", "return", "supersede"]),
  by: recordPersonSchema,
  at: z.iso.datetime(),
  note: z.string(),
});
export type RecordEvent = z.infer<typeof recordEventSchema>;

export const recordDetailSchema = recordSummarySchema.extend({
  content: recordContentSchema,
  comments: z.array(recordCommentSchema),
  events: z.array(recordEventSchema),
});
export type RecordDetail = z.infer<typeof recordDetailSchema>;

export const recordListSchema = z.object({ records: z.array(recordSummarySchema) });

export const projectReviewSchema = z.object({
  status: z.enum(PROJECT_REVIEW_STATUSES),
  requiredApprovals: z.union([z.literal(1), z.literal(2)]),
  /** The revision being worked on (see recordSummarySchema.revision). */
  revision: z.string().regex(/^[A-Z]+$/),
  latestRecord: recordSummarySchema.nullable(),
  lastApproved: recordSummarySchema.nullable(),
  /** null with nothing approved; true when the project's inputs or results now differ from the last approved record. */
  currentDiffersFromApproved: z.boolean().nullable(),
});
export type ProjectReview = z.infer<typeof projectReviewSchema>;

/** One input that differs between two records; values are display strings with units (MPa for stresses). */
export const recordChangeSchema = z.object({
  kind: z.enum(["state", "location", "load-case", "combination", "material", "project", "scope"]),
  /** What it is, e.g. "Design at shell". */
  label: z.string(),
  field: z.string().optional(),
  from: z.string().optional(),
  to: z.string().optional(),
});
export type RecordChange = z.infer<typeof recordChangeSchema>;

const verdictAndFactor = z.object({ verdict: z.string(), factor: z.number().nullable() }).nullable();

export const recordDiffSchema = z.object({
  from: recordSummarySchema,
  to: recordSummarySchema,
  inputs: z.object({
    added: z.array(recordChangeSchema),
    changed: z.array(recordChangeSchema),
    removed: z.array(recordChangeSchema),
  }),
  verdictChanges: z.array(
    z.object({
      rowId: z.string(),
      caseName: z.string(),
      locationName: z.string(),
      criterion: z.string(),
      from: verdictAndFactor,
      to: verdictAndFactor,
    }),
  ),
});
export type RecordDiff = z.infer<typeof recordDiffSchema>;

const requiredApprovalsInput = z.union([z.literal(1), z.literal(2)], { error: "must be 1 or 2" });

export const updateReviewBodySchema = z.object({ requiredApprovals: requiredApprovalsInput });
export type UpdateReviewBody = z.infer<typeof updateReviewBodySchema>;

/** The load cases and locations a record is to cover (the submit form's choice). */
export const recordScopeInputSchema = z.object({
  loadCaseIds: z
    .array(z.uuid({ error: "must be a load case id (UUID)" }))
    .min(1, "Choose at least one load case."),
  locationIds: z
    .array(z.uuid({ error: "must be a location id (UUID)" }))
    .min(1, "Choose at least one location."),
});
export type RecordScopeInput = z.infer<typeof recordScopeInputSchema>;

export const submitRecordBodySchema = z.object({
  reason: z
    .string({ error: "Say what changed and why (1 to 2000 characters)." })
    .trim()
    .min(1, "Say what changed and why (1 to 2000 characters).")
    .max(2000, "At most 2000 characters."),
  /** null or omitted = the whole project. */
  scope: recordScopeInputSchema.nullable().default(null),
});
export type SubmitRecordBody = z.infer<typeof submitRecordBodySchema>;

const commentText = (max: number) =>
  z
    .string({ error: `Write the comment (1 to ${max} characters).` })
    .trim()
    .min(1, `Write the comment (1 to ${max} characters).`)
    .max(max, `At most ${max} characters.`);

export const createCommentBodySchema = z.object({
  text: commentText(4000),
  rowId: z.string({ error: "must be a comparison row id or null" }).max(200).nullable().default(null),
  replyTo: z.uuid({ error: "must be a comment id (UUID) or null" }).nullable().default(null),
});
export type CreateCommentBody = z.infer<typeof createCommentBodySchema>;

export const returnRecordBodySchema = z.object({ comment: commentText(4000) });
export type ReturnRecordBody = z.infer<typeof returnRecordBodySchema>;

export const approveRecordBodySchema = z.object({
  comment: z.string({ error: "must be text" }).trim().max(4000, "At most 4000 characters.").default(""),
});
export type ApproveRecordBody = z.infer<typeof approveRecordBodySchema>;

export const reviewParamsSchema = z.object({
  workspaceId: z.uuid({ error: "must be a workspace id (UUID)" }),
  projectId: z.uuid({ error: "must be a project id (UUID)" }),
});
export const recordParamsSchema = reviewParamsSchema.extend({
  recordId: z.uuid({ error: "must be a record id (UUID)" }),
});
export const recordDiffQuerySchema = z.object({
  against: z.uuid({ error: "must be a record id (UUID)" }).optional(),
});
