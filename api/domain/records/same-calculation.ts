import { createHash } from "node:crypto";
import type { RecordContent } from "../../../core/contract/records";
import { canonicalJson } from "./content";

/**
 * The hash of a record's content without the fields that change when nothing of the
 * calculation did: when it was taken (`takenAt`, the export's `exportedAt`) and the project's
 * version counter. Two contents with the same calculation hash have the same inputs and results.
 */
export function calculationHash(content: RecordContent): string {
  const comparable = {
    ...content,
    takenAt: null,
    project: { ...content.project, version: null },
    inputs: { ...content.inputs, exportedAt: null },
  };
  return createHash("sha256").update(canonicalJson(comparable)).digest("hex");
}

/** Whether two contents hold the same inputs and results (volatile fields left out). */
export function sameCalculation(a: RecordContent, b: RecordContent): boolean {
  return calculationHash(a) === calculationHash(b);
}
