import type { OutgoingMail } from "../../mail/mailer";
import { findUser } from "../../../db/repositories/users";
import { membersOf } from "../../../db/repositories/workspaces";
import type { RecordHeadRow } from "../../../db/repositories/records";
import type { AppContext } from "../../context";
import { recordApprovedMail, recordReturnedMail, recordSubmittedMail } from "../../mail/templates";

/**
 * The review's mail: a submission goes to every reviewer and owner of the workspace except the
 * submitter; a return or an approval goes to the submitter. Sent after the change is committed;
 * a mail server that fails is logged and does not undo or refuse the change (the status, its
 * date and its signer are what the record keeps; the mail only tells people).
 */

type Project = { id: string; workspaceId: string; name: string };

const projectUrl = (context: AppContext, project: Project) =>
  `${context.publicOrigin}/workspaces/${project.workspaceId}/projects/${project.id}`;

async function sendAll(context: AppContext, mails: OutgoingMail[]): Promise<void> {
  for (const mail of mails) {
    try {
      await context.mailer.send(mail);
    } catch (error) {
      context.logger.warn({ err: error, to: mail.to, subject: mail.subject }, "review mail not sent");
    }
  }
}

/** Tells every reviewer and owner but the submitter that `record` waits for a check. */
export async function notifySubmitted(context: AppContext, project: Project, record: RecordHeadRow) {
  const members = await membersOf(project.workspaceId);
  const mails = members
    .filter((m) => (m.role === "reviewer" || m.role === "owner") && m.userId !== record.submittedBy)
    .map((m) =>
      recordSubmittedMail({
        to: m.user.email,
        name: m.user.name,
        projectName: project.name,
        recordNumber: record.number,
        revision: record.revision,
        url: projectUrl(context, project),
        submitterName: record.submittedByName,
        reason: record.reason,
      }),
    );
  await sendAll(context, mails);
}

async function submitter(record: RecordHeadRow) {
  return record.submittedBy ? findUser(record.submittedBy) : null;
}

/** Tells the submitter that `record` was returned. */
export async function notifyReturned(context: AppContext, project: Project, record: RecordHeadRow) {
  const user = await submitter(record);
  if (!user) return;
  await sendAll(context, [
    recordReturnedMail({
      to: user.email,
      name: user.name,
      projectName: project.name,
      recordNumber: record.number,
      revision: record.revision,
      url: projectUrl(context, project),
      checkerName: record.returnedByName ?? "A reviewer",
      comment: record.returnComment ?? "",
    }),
  ]);
}

/** Tells the submitter that `record` is approved by `approverNames`. */
export async function notifyApproved(
  context: AppContext,
  project: Project,
  record: RecordHeadRow,
  approverNames: string[],
) {
  const user = await submitter(record);
  if (!user) return;
  await sendAll(context, [
    recordApprovedMail({
      to: user.email,
      name: user.name,
      projectName: project.name,
      recordNumber: record.number,
      revision: record.revision,
      url: projectUrl(context, project),
      approverNames,
    }),
  ]);
}
