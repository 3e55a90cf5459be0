import { QueryClient, type QueryKey } from "@tanstack/react-query";
import { describe, expect, it } from "vitest";
import { auditKeys } from "./audit/keys";
import { combinationKeys } from "./combination/keys";
import { comparisonKeys } from "./comparison/keys";
import { comparisonQueryOptions } from "./comparison/queries";
import { loadCaseKeys } from "./load-case/keys";
import { loadCaseQueryOptions, loadCasesQueryOptions } from "./load-case/queries";
import { locationKeys } from "./location/keys";
import { materialKeys } from "./material/keys";
import { projectKeys } from "./project/keys";
import { projectQueryOptions } from "./project/queries";
import { recordKeys } from "./record/keys";
import { recordQueryOptions, reviewQueryOptions } from "./record/queries";
import { trashKeys } from "./trash/keys";
import { workspaceKeys } from "./workspace/keys";
import { workspaceQueryOptions } from "./workspace/queries";

// Invalidation matches keys by prefix (TanStack Query's partial matching), so what a mutation
// refreshes follows from which keys start with which. These tests pin that layout down.

const WS = "w1";
const OTHER_WS = "w2";
const P = "p1";
const OTHER_P = "p2";

const startsWith = (key: QueryKey, prefix: QueryKey) =>
  prefix.length <= key.length && prefix.every((part, i) => part === key[i]);

/** Which of `keys` a query client marks stale when `prefix` is invalidated (a real client, nothing fetched). */
async function staleAfter(prefix: QueryKey, keys: QueryKey[]): Promise<QueryKey[]> {
  const client = new QueryClient();
  for (const key of keys) client.setQueryData(key, "cached");
  await client.invalidateQueries({ queryKey: prefix });
  return keys.filter((key) => client.getQueryState(key)?.isInvalidated);
}

describe("query-key factories", () => {
  it("when any page asks for one workspace, then it uses the one key workspaceKeys.detail", () => {
    expect(workspaceQueryOptions(WS).queryKey).toEqual(workspaceKeys.detail(WS));
    expect(workspaceKeys.detail(WS)).toEqual(["workspace", WS, "record"]);
  });

  it("when the query options of project data are built, then their keys come from the factories", () => {
    expect(projectQueryOptions(WS, P).queryKey).toEqual(projectKeys.detail(WS, P));
    expect(loadCasesQueryOptions(WS, P).queryKey).toEqual(loadCaseKeys.list(WS, P));
    expect(loadCaseQueryOptions(WS, P, "c1").queryKey).toEqual(loadCaseKeys.detail(WS, P, "c1"));
    expect(comparisonQueryOptions(WS, P, 2).queryKey).toEqual(comparisonKeys.page(WS, P, 2));
  });

  it("when a project's keys are built, then each sits under the project's scope, which sits under the workspace's", () => {
    const scope = projectKeys.scope(WS, P);
    expect(startsWith(scope, workspaceKeys.scope(WS))).toBe(true);
    for (const key of [
      projectKeys.detail(WS, P),
      loadCaseKeys.list(WS, P),
      loadCaseKeys.detail(WS, P, "c1"),
      loadCaseKeys.history(WS, P, "c1", "l1"),
      locationKeys.list(WS, P),
      locationKeys.detail(WS, P, "l1"),
      combinationKeys.list(WS, P),
      comparisonKeys.page(WS, P, 1),
    ])
      expect(startsWith(key, scope), JSON.stringify(key)).toBe(true);
  });

  it("when two siblings are built (list and record, two pages, two cases), then neither is a prefix of the other", () => {
    const pairs: [QueryKey, QueryKey][] = [
      [workspaceKeys.list(), workspaceKeys.detail(WS)],
      [workspaceKeys.detail(WS), workspaceKeys.members(WS)],
      [projectKeys.list(WS), projectKeys.detail(WS, P)],
      [loadCaseKeys.list(WS, P), loadCaseKeys.detail(WS, P, "c1")],
      [loadCaseKeys.detail(WS, P, "c1"), loadCaseKeys.detail(WS, P, "c2")],
      [comparisonKeys.page(WS, P, 1), comparisonKeys.page(WS, P, 2)],
      [materialKeys.list(WS), trashKeys.list(WS)],
      [auditKeys.list(WS), auditKeys.list(WS, P)],
    ];
    for (const [a, b] of pairs) {
      expect(startsWith(a, b) || startsWith(b, a), `${JSON.stringify(a)} / ${JSON.stringify(b)}`).toBe(false);
    }
  });

  it("when a project's scope is invalidated on a real client, then that project's data goes stale and nothing of another project or workspace does", async () => {
    const mine = [
      projectKeys.detail(WS, P),
      loadCaseKeys.list(WS, P),
      loadCaseKeys.history(WS, P, "c1", "l1"),
      comparisonKeys.page(WS, P, 1),
    ];
    const others = [
      projectKeys.detail(WS, OTHER_P),
      comparisonKeys.page(WS, OTHER_P, 1),
      projectKeys.list(WS),
      workspaceKeys.detail(WS),
      materialKeys.list(WS),
      projectKeys.detail(OTHER_WS, P),
    ];
    expect(await staleAfter(projectKeys.scope(WS, P), [...mine, ...others])).toEqual(mine);
  });

  it("when the comparison's key is invalidated, then every page of it goes stale and the project's other data does not", async () => {
    const pages = [comparisonKeys.page(WS, P, 1), comparisonKeys.page(WS, P, 2)];
    const rest = [projectKeys.detail(WS, P), loadCaseKeys.list(WS, P), comparisonKeys.page(WS, OTHER_P, 1)];
    expect(await staleAfter(comparisonKeys.all(WS, P), [...pages, ...rest])).toEqual(pages);
  });

  it("when one load case is invalidated, then its state histories go stale with it and another case's do not", async () => {
    const mine = [loadCaseKeys.detail(WS, P, "c1"), loadCaseKeys.history(WS, P, "c1", "l1")];
    const others = [
      loadCaseKeys.detail(WS, P, "c2"),
      loadCaseKeys.history(WS, P, "c2", "l1"),
      loadCaseKeys.list(WS, P),
    ];
    expect(await staleAfter(loadCaseKeys.detail(WS, P, "c1"), [...mine, ...others])).toEqual(mine);
  });

  it("when an input write invalidates the comparison, then the review (does today differ from the approved record?) goes stale with it, and frozen records do not", async () => {
    expect(reviewQueryOptions(WS, P).queryKey).toEqual(recordKeys.review(WS, P));
    expect(recordQueryOptions(WS, P, "r1").queryKey).toEqual(recordKeys.detail(WS, P, "r1"));
    const frozen = [
      recordKeys.list(WS, P),
      recordKeys.detail(WS, P, "r1"),
      recordKeys.diff(WS, P, "r1", null),
    ];
    expect(await staleAfter(comparisonKeys.all(WS, P), [recordKeys.review(WS, P), ...frozen])).toEqual([
      recordKeys.review(WS, P),
    ]);
  });

  it("when a project's records are invalidated, then the list, every record and every diff go stale, another project's do not", async () => {
    const mine = [recordKeys.list(WS, P), recordKeys.detail(WS, P, "r1"), recordKeys.diff(WS, P, "r2", "r1")];
    const others = [
      recordKeys.list(WS, OTHER_P),
      recordKeys.detail(WS, OTHER_P, "r1"),
      comparisonKeys.page(WS, P, 1),
    ];
    expect(await staleAfter(recordKeys.all(WS, P), [...mine, ...others])).toEqual(mine);
  });
});
