import { QueryTypes, type Sequelize } from "sequelize";
import type { RecordContent } from "../../../core/contract/records";
import type { ProjectRow } from "../../../db/repositories/projects";
import { findRecord } from "../../../db/repositories/records";
import { inputsStampSql } from "../comparison/stamp";
import { freezeProjectContent } from "./freeze";
import { comparableContents } from "./comparable-content";
import { sameCalculation } from "./same-calculation";

/**
 * Whether the project as it is now differs from its last approved record — asked by every read of
 * the review status. Answering takes the project's full record content (every row of the
 * comparison), so the answer is kept per project for the approved record it was compared with and
 * the project's inputs stamp (api/domain/comparison/stamp.ts): PostgreSQL raises that stamp in the
 * same commit as any change of an input (project, locations, cases, combinations, states, lines,
 * point tables, the workspace's materials), so while it stands, the answer stands, and a read costs
 * one small statement. The stamp is read before the content is taken: a change that lands meanwhile
 * raises it past the kept one, so the next read computes again rather than trusting a stale answer.
 *
 * The project is taken as the approved record took it: cut to the approved record's scope (an edit
 * outside that scope changes nothing the record holds), and without the optional fields the
 * approved content lacks (comparable-content.ts).
 */

type Kept = { recordId: string; stamp: string; differs: boolean };

/** Projects whose answer is kept; the oldest is forgotten first beyond this. */
const MAX_KEPT = 2000;
const kept = new Map<string, Kept>();
let computations = 0;

/** The stamp of the project's comparison inputs, "project:workspace" (one index lookup each). */
async function inputsStamp(sequelize: Sequelize, project: ProjectRow): Promise<string> {
  const [row] = await sequelize.query<{ stamp: string }>(
    `SELECT ${inputsStampSql("$1::uuid", "$2::uuid")} AS stamp`,
    { bind: [project.id, project.workspaceId], type: QueryTypes.SELECT },
  );
  return row.stamp;
}

/** Whether the project's inputs or results now differ from the approved record `recordId`. */
export async function differsFromApproved(
  sequelize: Sequelize,
  project: ProjectRow,
  recordId: string,
): Promise<boolean> {
  const stamp = await inputsStamp(sequelize, project);
  const known = kept.get(project.id);
  if (known && known.recordId === recordId && known.stamp === stamp) return known.differs;
  computations++;
  const approved = (await findRecord(project.id, recordId))!.content as RecordContent;
  const now = await freezeProjectContent(sequelize, project.workspaceId, project.id, {
    scope: approved.scope
      ? {
          loadCaseIds: approved.scope.loadCases.map((c) => c.id),
          locationIds: approved.scope.locations.map((l) => l.id),
        }
      : null,
    // A case or location of the approved scope deleted since is simply missing now (and so differs).
    unknownIds: "leave-out",
  });
  const differs = !sameCalculation(...comparableContents(approved, now.content));
  kept.delete(project.id);
  kept.set(project.id, { recordId, stamp, differs });
  if (kept.size > MAX_KEPT) kept.delete(kept.keys().next().value!);
  return differs;
}

/** How many times this process took a project's full content to answer (a repeated read takes none). */
export function approvedDifferenceComputations(): number {
  return computations;
}
