import { MutationObserver, QueryClient, type QueryKey } from "@tanstack/react-query";
import { afterEach, describe, expect, it, vi } from "vitest";
import { auditKeys } from "./audit/keys";
import { combinationKeys } from "./combination/keys";
import {
  createCombinationMutation,
  deleteCombinationMutation,
  updateCombinationMutation,
} from "./combination/mutations";
import { comparisonKeys } from "./comparison/keys";
import { loadCaseKeys } from "./load-case/keys";
import {
  createLoadCaseMutation,
  deleteLoadCaseMutation,
  saveStateMutation,
  updateLoadCaseMutation,
} from "./load-case/mutations";
import { locationKeys } from "./location/keys";
import { createLocationMutation, deleteLocationMutation, updateLocationMutation } from "./location/mutations";
import { materialKeys } from "./material/keys";
import { createMaterialMutation, deleteMaterialMutation, updateMaterialMutation } from "./material/mutations";
import { pointTableKeys } from "./point-table/keys";
import {
  createPointTableMutation,
  deletePointTableMutation,
  keepPointsMutation,
} from "./point-table/mutations";
import { projectKeys } from "./project/keys";
import {
  createProjectMutation,
  deleteProjectMutation,
  importProjectMutation,
  updateProjectMutation,
} from "./project/mutations";
import { trashKeys } from "./trash/keys";
import { recordKeys } from "./record/keys";
import {
  addCommentMutation,
  approveRecordMutation,
  returnRecordMutation,
  submitRecordMutation,
  updateReviewMutation,
} from "./record/mutations";
import { purgeMutation, restoreMutation } from "./trash/mutations";
import { workspaceKeys } from "./workspace/keys";
import {
  createWorkspaceMutation,
  deleteWorkspaceMutation,
  leaveWorkspaceMutation,
  removeMemberMutation,
  renameWorkspaceMutation,
  updateMemberMutation,
} from "./workspace/mutations";

// Each mutation runs for real on a real QueryClient (TanStack's MutationObserver, no DOM) against a
// stubbed fetch; the spy on invalidateQueries records which keys it refreshes.

const WS = "0d5f3c1e-0000-4000-8000-000000000001";
const P = "0d5f3c1e-0000-4000-8000-000000000002";
const CASE = "0d5f3c1e-0000-4000-8000-000000000003";
const LOC = "0d5f3c1e-0000-4000-8000-000000000004";
const NOW = "2026-12-01T10:00:00.000Z";

type Answer = { status: number; body?: unknown };
/** A server error: mutations that refresh on settle must refresh after a refusal too (a 409 shows the newer data). */
const REFUSED: Answer = { status: 409, body: { error: { id: "version_conflict", message: "moved on" } } };
const NO_CONTENT: Answer = { status: 204 };

const workspace = { id: WS, name: "Pressure vessels", role: "owner", memberCount: 1, createdAt: NOW };
const project = {
  id: P,
  workspaceId: WS,
  name: "Vessel V-101",
  description: "",
  unitSystem: "SI",
  requirements: [],
  categoryRequirements: [],
  includeUnsuitedCriteria: false,
  defaultMaterial: null,
  version: 1,
  counts: { locations: 0, loadCases: 0, combinations: 0 },
  createdAt: NOW,
  updatedAt: NOW,
  createdBy: null,
  updatedBy: null,
};

afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

/**
 * Runs `options` with `variables` while fetch answers `answer`; returns the request made and the
 * keys handed to invalidateQueries, in call order.
 */
async function run<TVariables>(
  build: (client: QueryClient) => { mutationFn?: unknown },
  variables: TVariables,
  answer: Answer,
): Promise<{ request: string; invalidated: QueryKey[] }> {
  const fetchStub = vi.fn(
    async (_url: string, _init?: RequestInit) =>
      new Response(answer.body === undefined ? null : JSON.stringify(answer.body), {
        status: answer.status,
        headers: { "Content-Type": "application/json" },
      }),
  );
  vi.stubGlobal("fetch", fetchStub);
  const client = new QueryClient();
  const spy = vi.spyOn(client, "invalidateQueries");
  // The factories are typed for useMutation; MutationObserver takes the same options.
  const observer = new MutationObserver(client, build(client) as never);
  await observer.mutate(variables as never).catch(() => undefined);
  const [url, init] = fetchStub.mock.calls[0];
  return {
    request: `${init?.method ?? "GET"} ${url}`,
    invalidated: spy.mock.calls.map(([filters]) => filters?.queryKey as QueryKey),
  };
}

const base = `/api/workspaces/${WS}/projects/${P}`;

describe("load-case mutations", () => {
  it("when a state is saved, then that case (with its histories), the project's case list, the comparison and the audit trail are refreshed", async () => {
    const variables = {
      caseId: CASE,
      locationId: LOC,
      version: 3,
      stress: { unit: "MPa" as const, components: { xx: 150, yy: 87.75, zz: 0, xy: 0, yz: 0, zx: 0 } },
      source: "typed" as const,
    };
    const { request, invalidated } = await run((c) => saveStateMutation(c, WS, P), variables, REFUSED);
    expect(request).toBe(`PUT ${base}/load-cases/${CASE}/states/${LOC}`);
    expect(invalidated).toEqual([
      loadCaseKeys.detail(WS, P, CASE),
      loadCaseKeys.list(WS, P),
      comparisonKeys.all(WS, P),
      auditKeys.all(WS),
    ]);
  });

  it("when a state is saved, then the project's record, locations, combinations and other projects stay cached", async () => {
    const client = new QueryClient();
    const untouched = [
      projectKeys.detail(WS, P),
      locationKeys.list(WS, P),
      combinationKeys.list(WS, P),
      loadCaseKeys.detail(WS, P, "another-case"),
      comparisonKeys.page(WS, "another-project", 1),
      materialKeys.list(WS),
      workspaceKeys.detail(WS),
    ];
    const refreshed = [
      loadCaseKeys.detail(WS, P, CASE),
      loadCaseKeys.history(WS, P, CASE, LOC),
      loadCaseKeys.list(WS, P),
      comparisonKeys.page(WS, P, 1),
      comparisonKeys.page(WS, P, 2),
      auditKeys.list(WS, P),
    ];
    for (const key of [...untouched, ...refreshed]) client.setQueryData(key, "cached");
    vi.stubGlobal("fetch", async () => new Response(JSON.stringify(REFUSED.body), { status: 409 }));
    const observer = new MutationObserver(client, saveStateMutation(client, WS, P) as never);
    await observer
      .mutate({
        caseId: CASE,
        locationId: LOC,
        version: 1,
        stress: { unit: "MPa", components: { xx: 1, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 } },
        source: "typed",
      } as never)
      .catch(() => undefined);
    const stale = (key: QueryKey) => client.getQueryState(key)?.isInvalidated;
    expect(refreshed.filter(stale)).toEqual(refreshed);
    expect(untouched.filter(stale)).toEqual([]);
  });

  it("when a case is created, then the case list, the comparison and the audit trail are refreshed", async () => {
    const { request, invalidated } = await run(
      (c) => createLoadCaseMutation(c, WS, P),
      { name: "Hydrostatic test", category: "test" },
      REFUSED,
    );
    expect(request).toBe(`POST ${base}/load-cases`);
    expect(invalidated).toEqual([loadCaseKeys.list(WS, P), comparisonKeys.all(WS, P), auditKeys.all(WS)]);
  });

  it("when a case is renamed, then it, the case list, the combinations (they name it), the comparison and the audit trail are refreshed", async () => {
    const { request, invalidated } = await run(
      (c) => updateLoadCaseMutation(c, WS, P),
      { id: CASE, body: { version: 2, name: "Design" } },
      REFUSED,
    );
    expect(request).toBe(`PATCH ${base}/load-cases/${CASE}`);
    expect(invalidated).toEqual([
      loadCaseKeys.detail(WS, P, CASE),
      loadCaseKeys.list(WS, P),
      combinationKeys.list(WS, P),
      comparisonKeys.all(WS, P),
      auditKeys.all(WS),
    ]);
  });

  it("when a case is deleted, then the trash is refreshed as well as what renaming refreshes", async () => {
    const { request, invalidated } = await run((c) => deleteLoadCaseMutation(c, WS, P), CASE, NO_CONTENT);
    expect(request).toBe(`DELETE ${base}/load-cases/${CASE}`);
    expect(invalidated).toEqual([
      loadCaseKeys.detail(WS, P, CASE),
      loadCaseKeys.list(WS, P),
      combinationKeys.list(WS, P),
      comparisonKeys.all(WS, P),
      trashKeys.list(WS),
      auditKeys.all(WS),
    ]);
  });
});

describe("combination mutations", () => {
  const changed = [combinationKeys.list(WS, P), comparisonKeys.all(WS, P), auditKeys.all(WS)];

  it("when a combination is created, then the comparison and the combination list are refreshed (and the audit trail)", async () => {
    const body = { name: "Design + test", terms: [{ loadCaseId: CASE, factor: 1.2 }] };
    const { request, invalidated } = await run((c) => createCombinationMutation(c, WS, P), body, REFUSED);
    expect(request).toBe(`POST ${base}/combinations`);
    expect(invalidated).toEqual(changed);
  });

  it("when a combination is changed, then the same three are refreshed", async () => {
    const { request, invalidated } = await run(
      (c) => updateCombinationMutation(c, WS, P),
      { id: "k1", version: 1, name: "Renamed" },
      REFUSED,
    );
    expect(request).toBe(`PATCH ${base}/combinations/k1`);
    expect(invalidated).toEqual(changed);
  });

  it("when a combination is deleted, then the trash is refreshed too", async () => {
    const { request, invalidated } = await run((c) => deleteCombinationMutation(c, WS, P), "k1", NO_CONTENT);
    expect(request).toBe(`DELETE ${base}/combinations/k1`);
    expect(invalidated).toEqual([...changed, trashKeys.list(WS)]);
  });
});

describe("location mutations", () => {
  it("when a location is created, then the location list, the comparison and the audit trail are refreshed", async () => {
    const { request, invalidated } = await run(
      (c) => createLocationMutation(c, WS, P),
      { name: "nozzle N1" },
      REFUSED,
    );
    expect(request).toBe(`POST ${base}/locations`);
    expect(invalidated).toEqual([locationKeys.list(WS, P), comparisonKeys.all(WS, P), auditKeys.all(WS)]);
  });

  it("when a location is changed, then that location is refreshed as well", async () => {
    const { invalidated } = await run(
      (c) => updateLocationMutation(c, WS, P),
      { id: LOC, body: { version: 1, name: "nozzle N2" } },
      REFUSED,
    );
    expect(invalidated).toEqual([
      locationKeys.detail(WS, P, LOC),
      locationKeys.list(WS, P),
      comparisonKeys.all(WS, P),
      auditKeys.all(WS),
    ]);
  });

  it("when a location is deleted, then the case list (its states there) and the trash are refreshed too", async () => {
    const { request, invalidated } = await run((c) => deleteLocationMutation(c, WS, P), LOC, NO_CONTENT);
    expect(request).toBe(`DELETE ${base}/locations/${LOC}`);
    expect(invalidated).toEqual([
      locationKeys.detail(WS, P, LOC),
      locationKeys.list(WS, P),
      loadCaseKeys.list(WS, P),
      comparisonKeys.all(WS, P),
      trashKeys.list(WS),
      auditKeys.all(WS),
    ]);
  });
});

describe("project mutations", () => {
  it("when a project is created, then the project list and the audit trail are refreshed", async () => {
    const { request, invalidated } = await run(
      (c) => createProjectMutation(c, WS),
      { name: "Vessel V-101" },
      { status: 201, body: { project } },
    );
    expect(request).toBe(`POST /api/workspaces/${WS}/projects`);
    expect(invalidated).toEqual([projectKeys.list(WS), auditKeys.all(WS)]);
  });

  it("when a project is changed, then the list, its record, its comparison and the audit trail are refreshed", async () => {
    const { request, invalidated } = await run(
      (c) => updateProjectMutation(c, WS, P),
      { version: 1, name: "Vessel V-102" },
      REFUSED,
    );
    expect(request).toBe(`PATCH ${base}`);
    expect(invalidated).toEqual([
      projectKeys.list(WS),
      projectKeys.detail(WS, P),
      comparisonKeys.all(WS, P),
      auditKeys.all(WS),
    ]);
  });

  it("when a project is deleted, then the list, everything of that project, the trash and the audit trail are refreshed", async () => {
    const { request, invalidated } = await run((c) => deleteProjectMutation(c, WS), P, NO_CONTENT);
    expect(request).toBe(`DELETE ${base}`);
    expect(invalidated).toEqual([
      projectKeys.list(WS),
      projectKeys.scope(WS, P),
      trashKeys.list(WS),
      auditKeys.all(WS),
    ]);
  });

  it("when a project file is imported, then the project list and the audit trail are refreshed", async () => {
    const { request, invalidated } = await run((c) => importProjectMutation(c, WS), { format: "x" }, REFUSED);
    expect(request).toBe(`POST /api/workspaces/${WS}/project-imports`);
    expect(invalidated).toEqual([projectKeys.list(WS), auditKeys.all(WS)]);
  });
});

describe("material mutations", () => {
  it("when a material is created, then only the material list and the audit trail are refreshed (no project uses it yet)", async () => {
    const { invalidated } = await run((c) => createMaterialMutation(c, WS), { name: "S355" }, REFUSED);
    expect(invalidated).toEqual([materialKeys.list(WS), auditKeys.all(WS)]);
  });

  it("when a material is changed, then every project of the workspace is refreshed (they refer to it)", async () => {
    const { request, invalidated } = await run(
      (c) => updateMaterialMutation(c, WS),
      { id: "m1", version: 1, name: "S355J2" },
      REFUSED,
    );
    expect(request).toBe(`PATCH /api/workspaces/${WS}/materials/m1`);
    expect(invalidated).toEqual([materialKeys.list(WS), projectKeys.all(WS), auditKeys.all(WS)]);
  });

  it("when a material is deleted, then the trash is refreshed too", async () => {
    const { invalidated } = await run((c) => deleteMaterialMutation(c, WS), "m1", NO_CONTENT);
    expect(invalidated).toEqual([
      materialKeys.list(WS),
      projectKeys.all(WS),
      auditKeys.all(WS),
      trashKeys.list(WS),
    ]);
  });
});

describe("trash mutations", () => {
  it("when a location is restored, then the trash, its project and the audit trail are refreshed", async () => {
    const { request, invalidated } = await run(
      (c) => restoreMutation(c, WS),
      { kind: "location", id: LOC, projectId: P },
      NO_CONTENT,
    );
    expect(request).toBe(`POST /api/workspaces/${WS}/trash/location/${LOC}/restore`);
    expect(invalidated).toEqual([trashKeys.list(WS), projectKeys.scope(WS, P), auditKeys.all(WS)]);
  });

  it("when a project is restored, then the project list is refreshed; a material, the materials and every project", async () => {
    const project = await run((c) => restoreMutation(c, WS), { kind: "project", id: P }, NO_CONTENT);
    expect(project.invalidated).toEqual([trashKeys.list(WS), projectKeys.list(WS), auditKeys.all(WS)]);
    const material = await run((c) => restoreMutation(c, WS), { kind: "material", id: "m1" }, NO_CONTENT);
    expect(material.invalidated).toEqual([
      trashKeys.list(WS),
      materialKeys.list(WS),
      projectKeys.all(WS),
      auditKeys.all(WS),
    ]);
  });

  it("when an item is purged, then only the trash and the audit trail are refreshed", async () => {
    const { request, invalidated } = await run(
      (c) => purgeMutation(c, WS),
      { kind: "load-case", id: CASE },
      NO_CONTENT,
    );
    expect(request).toBe(`DELETE /api/workspaces/${WS}/trash/load-case/${CASE}`);
    expect(invalidated).toEqual([trashKeys.list(WS), auditKeys.all(WS)]);
  });
});

describe("workspace mutations", () => {
  it("when a workspace is created, then the list is refreshed", async () => {
    const { request, invalidated } = await run(
      createWorkspaceMutation,
      { name: "Pressure vessels" },
      { status: 201, body: { workspace } },
    );
    expect(request).toBe("POST /api/workspaces");
    expect(invalidated).toEqual([workspaceKeys.list()]);
  });

  it("when a workspace is renamed, then the list and that workspace's record are refreshed, not its members", async () => {
    const { request, invalidated } = await run(
      renameWorkspaceMutation,
      { workspaceId: WS, name: "Vessels" },
      { status: 200, body: { workspace } },
    );
    expect(request).toBe(`PATCH /api/workspaces/${WS}`);
    expect(invalidated).toEqual([workspaceKeys.list(), workspaceKeys.detail(WS)]);
  });

  it("when a workspace is deleted or left, then the list and its record (or everything of it) are refreshed", async () => {
    const deleted = await run(deleteWorkspaceMutation, WS, NO_CONTENT);
    expect(deleted.invalidated).toEqual([workspaceKeys.list(), workspaceKeys.detail(WS)]);
    const left = await run(leaveWorkspaceMutation, WS, NO_CONTENT);
    expect(left.request).toBe(`POST /api/workspaces/${WS}/leave`);
    expect(left.invalidated).toEqual([workspaceKeys.list(), workspaceKeys.scope(WS)]);
  });

  it("when a member's role changes or a member is removed, then the members, the record (the caller's role) and the list are refreshed", async () => {
    const expected = [workspaceKeys.members(WS), workspaceKeys.detail(WS), workspaceKeys.list()];
    const updated = await run(
      (c) => updateMemberMutation(c, WS),
      { workspaceId: WS, memberId: "m1", role: "viewer" },
      REFUSED,
    );
    expect(updated.request).toBe(`PATCH /api/workspaces/${WS}/members/m1`);
    expect(updated.invalidated).toEqual(expected);
    const removed = await run(
      (c) => removeMemberMutation(c, WS),
      { workspaceId: WS, memberId: "m1" },
      NO_CONTENT,
    );
    expect(removed.invalidated).toEqual(expected);
  });
});

describe("record mutations", () => {
  const REC = "0d5f3c1e-0000-4000-8000-000000000005";
  const statusChange = [recordKeys.review(WS, P), recordKeys.all(WS, P), auditKeys.all(WS)];

  it("when a record is submitted for check, then the review, every record and the audit trail are refreshed", async () => {
    const { request, invalidated } = await run(
      (c) => submitRecordMutation(c, WS, P),
      { reason: "Hydrostatic test state corrected" },
      REFUSED,
    );
    expect(request).toBe(`POST ${base}/records`);
    expect(invalidated).toEqual(statusChange);
  });

  it("when a record is returned or approved, then the same three are refreshed (the status moved)", async () => {
    const returned = await run(
      (c) => returnRecordMutation(c, WS, P, REC),
      { comment: "check the lug" },
      REFUSED,
    );
    expect(returned.request).toBe(`POST ${base}/records/${REC}/return`);
    expect(returned.invalidated).toEqual(statusChange);
    const approved = await run((c) => approveRecordMutation(c, WS, P, REC), {}, REFUSED);
    expect(approved.request).toBe(`POST ${base}/records/${REC}/approve`);
    expect(approved.invalidated).toEqual(statusChange);
  });

  it("when a comment is written, then only that record and the audit trail are refreshed", async () => {
    const { request, invalidated } = await run(
      (c) => addCommentMutation(c, WS, P, REC),
      { text: "Which gauge?", rowId: null, replyTo: null },
      REFUSED,
    );
    expect(request).toBe(`POST ${base}/records/${REC}/comments`);
    expect(invalidated).toEqual([recordKeys.detail(WS, P, REC), auditKeys.all(WS)]);
  });

  it("when the owner changes the required approvals, then the review and the audit trail are refreshed", async () => {
    const { request, invalidated } = await run(
      (c) => updateReviewMutation(c, WS, P),
      { requiredApprovals: 2 },
      REFUSED,
    );
    expect(request).toBe(`PATCH ${base}/review`);
    expect(invalidated).toEqual([recordKeys.review(WS, P), auditKeys.all(WS)]);
  });
});

describe("point-table mutations", () => {
  const TABLE = "0d5f3c1e-0000-4000-8000-000000000005";

  it("when a table is registered, then the case's tables, the comparison and the audit trail are refreshed", async () => {
    const body = {
      fileName: "nozzle.csv",
      sizeBytes: 10,
      sha256: "0".repeat(64),
      layout: { separator: ",", decimal: ".", skipRows: 0, header: true },
      columns: { xx: 0, yy: 1, zz: 2, xy: 3, yz: 4, zx: 5 },
      unit: "MPa",
      idKind: "number",
    } as const;
    const { request, invalidated } = await run(
      (c) => createPointTableMutation(c, WS, P, CASE),
      body,
      REFUSED,
    );
    expect(request).toBe(`POST ${base}/load-cases/${CASE}/point-tables`);
    expect(invalidated).toEqual([
      pointTableKeys.list(WS, P, CASE),
      comparisonKeys.all(WS, P),
      auditKeys.all(WS),
    ]);
  });

  it("when a table is deleted, then it, the case's tables, the comparison and the audit trail are refreshed", async () => {
    const { request, invalidated } = await run(
      (c) => deletePointTableMutation(c, WS, P, CASE),
      TABLE,
      NO_CONTENT,
    );
    expect(request).toBe(`DELETE ${base}/load-cases/${CASE}/point-tables/${TABLE}`);
    expect(invalidated).toEqual([
      pointTableKeys.detail(WS, P, CASE, TABLE),
      pointTableKeys.list(WS, P, CASE),
      comparisonKeys.all(WS, P),
      auditKeys.all(WS),
    ]);
  });

  it("when points are kept as locations, then the locations, the load cases (a state each), the comparison and the audit trail are refreshed", async () => {
    const { request, invalidated } = await run(
      (c) => keepPointsMutation(c, WS, P, CASE),
      { tableId: TABLE, points: [77777] },
      REFUSED,
    );
    expect(request).toBe(`POST ${base}/load-cases/${CASE}/point-tables/${TABLE}/keep`);
    expect(invalidated).toEqual([
      locationKeys.list(WS, P),
      loadCaseKeys.list(WS, P),
      comparisonKeys.all(WS, P),
      auditKeys.all(WS),
    ]);
  });
});
