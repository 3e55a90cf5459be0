import type { CreateCommentBody, RecordContent } from "../../../core/contract/records";
import { findRecord, findRecordComment, insertRecordComment } from "../../../db/repositories/records";
import { currentMembership, currentUser } from "../../auth/guards";
import type { AppContext } from "../../context";
import { errors } from "../../errors";
import { findProject } from "../../domain/projects/scope";
import type { RouteHandler } from "../../openapi/registry";
import { presentComment } from "./presenter";
import type { NoInput, RecordParams } from "./schema";

/**
 * `POST …/records/{recordId}/comments`: a comment on the record or on one of its comparison
 * rows, or an answer to a comment. New comments go on a record submitted for check; answers
 * (`replyTo`) also on a returned record, so the originator can answer the checker's comments
 * before resubmitting. 400 naming `rowId` when it is not a row of this record's content, and
 * `replyTo` when it is not a comment of this record.
 */
export function createCommentHandler(
  context: AppContext,
): RouteHandler<RecordParams, NoInput, CreateCommentBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const { params, body } = res.locals.input;
    const comment = await context.sequelize.transaction(async (transaction) => {
      const project = await findProject(workspace.id, params.projectId, { transaction });
      const record = await findRecord(project.id, params.recordId, { transaction, lock: true });
      if (!record) throw errors.notFound("This record");
      const open = record.status === "submitted" || (record.status === "returned" && body.replyTo !== null);
      if (!open) {
        throw errors.conflictWithId(
          "record_not_open",
          record.status === "returned"
            ? `Record ${record.number} was returned; answer a comment on it (replyTo), or comment on the next submission.`
            : `Record ${record.number} is ${record.status}; comments go on a record submitted for check.`,
        );
      }
      const problems: { path: string; message: string }[] = [];
      const rows = (record.content as RecordContent).results.rows;
      if (body.rowId !== null && !rows.some((r) => r.rowId === body.rowId)) {
        problems.push({ path: "rowId", message: "is not a comparison row of this record" });
      }
      if (body.replyTo !== null && !(await findRecordComment(record.id, body.replyTo, transaction))) {
        problems.push({ path: "replyTo", message: "is not a comment on this record" });
      }
      if (problems.length) throw errors.invalidInput(problems);
      return insertRecordComment(
        {
          recordId: record.id,
          rowId: body.rowId,
          replyTo: body.replyTo,
          text: body.text,
          authorId: user.id,
          authorName: user.name,
        },
        transaction,
      );
    });
    res.status(201).json(presentComment(comment));
  };
}
