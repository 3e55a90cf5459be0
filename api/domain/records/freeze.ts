import { Transaction, type Sequelize } from "sequelize";
import type { RecordContent, RecordScopeInput } from "../../../core/contract/records";
import type { StoredInputEditor } from "../../../db/models/calculation-record";
import type { ProjectRow } from "../../../db/repositories/projects";
import { findProject } from "../projects/scope";
import { buildRecordContent, recordHash } from "./content";
import { inputEditorsOf } from "./independence";
import type { UnknownScopeIds } from "./scope";

/** A project's content as of one moment, its hash, and who last edited each input then. */
export type FrozenContent = {
  project: ProjectRow;
  content: RecordContent;
  hash: string;
  inputEditors: StoredInputEditor[];
};

/**
 * Takes the record content of a project in one REPEATABLE READ, read-only transaction: every
 * statement (the project, the export, the comparison's inputs, the input editors) reads the same
 * snapshot, so a write that lands meanwhile is either wholly in the content or wholly out of it.
 * The comparison itself runs through paging.ts and yields the event loop between runs. 404 when
 * the project is not a live project of the workspace. With a `scope`, only the chosen load cases and
 * locations are frozen (content.ts), and the input editors are those of the inputs in scope.
 */
export async function freezeProjectContent(
  sequelize: Sequelize,
  workspaceId: string,
  projectId: string,
  scopeChoice: { scope: RecordScopeInput | null; unknownIds: UnknownScopeIds } = {
    scope: null,
    unknownIds: "refuse",
  },
): Promise<FrozenContent> {
  return sequelize.transaction(
    { isolationLevel: Transaction.ISOLATION_LEVELS.REPEATABLE_READ, readOnly: true },
    async (transaction) => {
      const project = await findProject(workspaceId, projectId, { transaction });
      const content = await buildRecordContent(sequelize, project, transaction, scopeChoice);
      const inputEditors = await inputEditorsOf(project, content, transaction);
      return { project, content, hash: recordHash(content), inputEditors };
    },
  );
}
