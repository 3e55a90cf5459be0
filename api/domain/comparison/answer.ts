import type { Sequelize } from "sequelize";
import type { ComparisonQuery } from "../../../core/contract/comparison";
import { AnswerCache, keptAnswer, type KeptAnswer } from "./answer-cache";
import { comparisonInputFrom, loadComparisonSource } from "./load";
import { refreshPointTables } from "./point-tables";
import { comparisonPageWithSections } from "./sections";

/** One per process: answers depend only on their inputs (named by their stamp) and this process's engine. */
const answers = new AnswerCache();

/** Which comparison page: the project, the workspace the caller reached it through, the page. */
export type ComparisonRequest = { workspaceId: string; projectId: string; query: ComparisonQuery };

/**
 * One page of the comparison of a project, as the bytes to send; null when the workspace has no
 * such live project (the caller answers 404).
 *
 * `stamp` is the project's inputs stamp as the session statement read it at the start of this
 * request (see membership-prefetch.ts), when it did: if an answer was kept for that stamp it is
 * the answer, and nothing more is read. Otherwise the inputs are read with their own stamp (one
 * statement, one snapshot) and the answer kept for that stamp, or computed and kept. An answer is
 * only ever kept under the stamp of the inputs it was computed from, and only after the project
 * was found live in this workspace at that stamp (a deletion or a move raises the stamp).
 */
export async function comparisonAnswer(
  sequelize: Sequelize,
  request: ComparisonRequest,
  stamp: string | undefined,
): Promise<KeptAnswer | null> {
  const { workspaceId, projectId, query } = request;
  const key = `${workspaceId}|${projectId}|${query.page}|${query.limit}`;
  const early = stamp === undefined ? undefined : answers.get(key, stamp);
  if (early) return early;
  let loaded = await loadComparisonSource(sequelize, workspaceId, projectId);
  if (!loaded) return null;
  const kept = answers.get(key, loaded.stamp);
  if (kept) return kept;
  // Point tables evaluated against allowables that have changed since are evaluated again first;
  // storing their evaluations raises the stamp, so the inputs are read again with the new one.
  if (await refreshPointTables(loaded.source)) {
    loaded = await loadComparisonSource(sequelize, workspaceId, projectId);
    if (!loaded) return null;
  }
  const page = await comparisonPageWithSections(comparisonInputFrom(projectId, loaded.source), query);
  const answer = keptAnswer(JSON.stringify(page));
  answers.set(key, loaded.stamp, answer);
  return answer;
}
