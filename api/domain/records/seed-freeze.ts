import type { Sequelize, Transaction } from "sequelize";
import { findLiveProject } from "../../../db/repositories/projects";
import type { FreezeForSeed } from "../../../db/seed-records";
import { buildRecordContent, recordHash } from "./content";
import { inputEditorsOf } from "./independence";

/**
 * The freezing the demo seed needs (db/ may not import the comparison): a project's record
 * content, hash and input editors, read inside the seed's own transaction.
 */
export function freezeForSeed(sequelize: Sequelize): FreezeForSeed {
  return async (transaction: Transaction, workspaceId: string, projectId: string) => {
    const project = await findLiveProject(workspaceId, projectId, { transaction });
    if (!project) throw new Error(`demo project ${projectId} is missing`);
    const content = await buildRecordContent(sequelize, project, transaction);
    return {
      content,
      hash: recordHash(content),
      engineVersion: content.engine.version,
      inputEditors: await inputEditorsOf(project, content, transaction),
    };
  };
}
