import type { Sequelize } from "sequelize";
import type { ProjectReview, RecordContent } from "../../../core/contract/records";
import type { ProjectRow } from "../../../db/repositories/projects";
import { findRecord, listRecordHeads } from "../../../db/repositories/records";
import { freezeProjectContent } from "./freeze";
import { nextRevisionLetter } from "./revision";
import { sameCalculation } from "./same-calculation";
import { projectReviewStatus } from "./status";
import { recordSummaries } from "./summary";

/**
 * Where a project stands in its review: its status, the approvals its records need, the
 * revision being worked on, its latest and last approved records, and whether the project as it
 * is now differs from the last approved record. That last answer computes the project's record
 * content afresh (the full comparison, yielding the event loop between runs) and compares it with
 * the approved one, leaving out when each was taken.
 */
export async function projectReview(sequelize: Sequelize, project: ProjectRow): Promise<ProjectReview> {
  const heads = await listRecordHeads(project.id);
  const latestHead = heads[0] ?? null;
  const approvedHead = heads.find((r) => r.status === "approved") ?? null;
  const [latest, lastApproved] = await recordSummaries([latestHead, approvedHead].filter((r) => r !== null));
  let differs: boolean | null = null;
  if (approvedHead) {
    const approved = await findRecord(project.id, approvedHead.id);
    const now = await freezeProjectContent(sequelize, project.workspaceId, project.id);
    differs = !sameCalculation(approved!.content as RecordContent, now.content);
  }
  let revision = "A";
  if (latestHead) {
    revision =
      latestHead.status === "approved" && differs
        ? nextRevisionLetter(latestHead.revision)
        : latestHead.revision;
  }
  return {
    status: projectReviewStatus(latestHead, differs),
    requiredApprovals: project.requiredApprovals === 2 ? 2 : 1,
    revision,
    latestRecord: latestHead ? latest : null,
    lastApproved: approvedHead ? lastApproved : null,
    currentDiffersFromApproved: differs,
  };
}
