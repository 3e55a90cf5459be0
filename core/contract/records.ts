import { z } from "zod";
import { ENGINE_NAME } from "../constants/engine";
import { comparisonSchema } from "./comparison";
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
  results: comparisonSchema,
});
export type RecordContent = z.infer<typeof recordContentSchema>;
