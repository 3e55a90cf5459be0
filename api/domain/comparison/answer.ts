import type { ComparisonQuery } from "../../../core/contract/comparison";
import { AnswerCache } from "./answer-cache";
import { comparisonLinearizations } from "./linearizations";
import { comparisonInputFrom } from "./load";
import { comparisonPage } from "./paging";

/** One per process: answers depend only on their input text and this process's engine. */
const answers = new AnswerCache();

/**
 * The JSON text of one page of the comparison of `projectId`, computed from `source` (the
 * loader's text) or, when a page of the same project was answered from the very same text,
 * that answer again.
 */
export async function comparisonAnswer(
  projectId: string,
  source: string,
  query: ComparisonQuery,
): Promise<string> {
  const key = `${projectId}|${query.page}|${query.limit}`;
  const kept = answers.get(key, source);
  if (kept !== undefined) return kept;
  const input = comparisonInputFrom(projectId, source);
  const page = await comparisonPage(input, query);
  const linearizations = comparisonLinearizations(input.linearizations, input.cases, input.locations);
  const body = JSON.stringify({ ...page, linearizations });
  answers.set(key, source, body);
  return body;
}
