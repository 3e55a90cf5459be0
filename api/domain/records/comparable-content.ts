import type { RecordContent } from "../../../core/contract/records";

/**
 * An approved record and the project's content taken now, made comparable: what the record could
 * not hold is left out of both, so "differs from the approved record" means the calculation changed,
 * not that the record is older than a field.
 *
 * - `pointTableFiles` and `linearizationEnds`: records frozen before they were kept lack them, and
 *   the project's content now has them whenever it has point tables or lines; the results the
 *   record does hold (the point-table and line sections) still show any change to those.
 * - each row's `caseVersion`: a counter that moves with any save of the load case, also a save of
 *   its state at a location outside the scope; the states and results it stands for are compared
 *   themselves (like the project's version, which the calculation hash leaves out).
 * - `scope`: the content now is taken with the approved record's scope, so the chosen cases and
 *   locations are the same; only how many the project has may have moved (a case added outside the
 *   scope), which changes nothing the record covers.
 */
export function comparableContents(
  approved: RecordContent,
  now: RecordContent,
): [RecordContent, RecordContent] {
  const { scope: _approvedScope, ...a } = approved;
  const { scope: _nowScope, ...b } = now;
  if (approved.pointTableFiles === undefined) delete b.pointTableFiles;
  if (approved.linearizationEnds === undefined) delete b.linearizationEnds;
  return [withoutCaseVersions(a), withoutCaseVersions(b)];
}

function withoutCaseVersions(content: RecordContent): RecordContent {
  return {
    ...content,
    results: { ...content.results, rows: content.results.rows.map((row) => ({ ...row, caseVersion: 0 })) },
  };
}
