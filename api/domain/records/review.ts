import type { Sequelize } from "sequelize";
import type { ProjectReview } from "../../../core/contract/records";
import type { ProjectRow } from "../../../db/repositories/projects";
import { listRecordHeads } from "../../../db/repositories/records";
import { differsFromApproved } from "./approved-difference";
import { nextRevisionLetter } from "./revision";
import { projectReviewStatus } from "./status";
import { recordSummaries } from "./summary";

/**
 * Where a project stands in its review: its status, the approvals its records need, the
 * revision being worked on, its latest and last approved records, and whether the project as it
 * is now differs from the last approved record. That last answer compares the project's record
 * content taken afresh with the approved one (leaving out when each was taken), and is kept while
 * the project's inputs stamp stands (approved-difference.ts), so repeated reads stay cheap.
 */
export async function projectReview(sequelize: Sequelize, project: ProjectRow): Promise<ProjectReview> {
  const heads = await listRecordHeads(project.id);
  const latestHead = heads[0] ?? null;
  const approvedHead = heads.find((r) => r.status === "approved") ?? null;
  const [latest, lastApproved] = await recordSummaries([latestHead, approvedHead].filter((r) => r !== null));
  let differs: boolean | null = null;
  if (approvedHead) differs = await differsFromApproved(sequelize, project, approvedHead.id);
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
