import type { Transaction } from "sequelize";
import type { RecordContent } from "../../../core/contract/records";
import type { StoredInputEditor } from "../../../db/models/calculation-record";
import { listLiveCombinations } from "../../../db/repositories/combinations";
import { listLiveLoadCases } from "../../../db/repositories/load-cases";
import { listLiveLocations } from "../../../db/repositories/locations";
import type { ProjectRow } from "../../../db/repositories/projects";
import { errors } from "../../errors";

/**
 * The independence of a check (ISO 9001 §8.3.4 asks that verification be done by someone other
 * than the designer; common practice, the clause recalled from memory): nobody may approve a
 * record they submitted or whose inputs they were the last to edit, and nobody may return their
 * own record.
 */

/**
 * Who last edited each input of a record as it is frozen: the person who saved each frozen state
 * revision, and the last editor of the project's settings and of each location, load case and
 * combination in it. Read in the same transaction as the content, so both describe one moment.
 */
export async function inputEditorsOf(
  project: ProjectRow,
  content: RecordContent,
  transaction?: Transaction,
): Promise<StoredInputEditor[]> {
  const editors: StoredInputEditor[] = [];
  const add = (userId: string | null, what: string) => {
    if (userId) editors.push({ userId, what });
  };
  add(project.updatedBy ?? project.createdBy, "the project settings");
  const locationIds = new Set(Object.values(content.ids.locations));
  const caseIds = new Set(Object.values(content.ids.loadCases));
  const combinationNames = new Set(content.inputs.combinations.map((c) => c.name));
  // One after another: statements on one transaction's connection queue anyway, and pg deprecates
  // issuing them concurrently.
  const locations = await listLiveLocations(project.id, transaction);
  const cases = await listLiveLoadCases(project.id, transaction);
  const combinations = await listLiveCombinations(project.id, transaction);
  for (const l of locations) {
    if (locationIds.has(l.id)) add(l.updatedBy ?? l.createdBy, `the location "${l.name}"`);
  }
  for (const c of cases) if (caseIds.has(c.id)) add(c.updatedBy ?? c.createdBy, `the load case "${c.name}"`);
  for (const c of combinations) {
    if (combinationNames.has(c.name)) add(c.updatedBy ?? c.createdBy, `the combination "${c.name}"`);
  }
  const caseName = new Map(content.inputs.loadCases.map((c) => [c.key, c.name]));
  const locationName = new Map(content.inputs.locations.map((l) => [l.key, l.name]));
  for (const s of content.stateRevisions) {
    add(
      s.savedBy,
      `the state of "${caseName.get(s.loadCase)}" at "${locationName.get(s.location)}" (revision ${s.revision})`,
    );
  }
  return editors;
}

/** 403 "independence" when `userId` submitted the record or last edited one of its inputs. */
export function assertMayApprove(
  record: { submittedBy: string | null; inputEditors: StoredInputEditor[] },
  userId: string,
): void {
  if (record.submittedBy === userId) {
    throw errors.independence(
      "You submitted this record, so you cannot approve it: the check must be independent. Ask another reviewer or owner to approve it.",
    );
  }
  const edited = record.inputEditors.filter((e) => e.userId === userId).map((e) => e.what);
  if (edited.length > 0) {
    const shown = edited.slice(0, 3).join(", ") + (edited.length > 3 ? ` and ${edited.length - 3} more` : "");
    throw errors.independence(
      `You were the last to edit inputs of this record (${shown}), so you cannot approve it: the check must be independent. Ask another reviewer or owner to approve it.`,
    );
  }
}

/** 403 "independence" when `userId` submitted the record: nobody returns their own work. */
export function assertMayReturn(record: { submittedBy: string | null }, userId: string): void {
  if (record.submittedBy === userId) {
    throw errors.independence(
      "You submitted this record, so you cannot return it: the check must come from someone else. To change it, ask a reviewer to return it.",
    );
  }
}
