import { MutationObserver, QueryClient, type QueryKey } from "@tanstack/react-query";
import { afterEach, describe, expect, it, vi } from "vitest";
import { auditKeys } from "../../../entities/audit/keys";
import { comparisonKeys } from "../../../entities/comparison/keys";
import { deleteLinearizationMutation } from "./delete-linearization";
import { linearizationKeys } from "./keys";
import { saveLinearizationMutation, type SaveLine } from "./save-linearization";

// The mutation runs for real on a QueryClient (TanStack's MutationObserver, no DOM) against a
// stubbed fetch; a spy on invalidateQueries records which keys it refreshes.

const WS = "0d5f3c1e-0000-4000-8000-000000000001";
const P = "0d5f3c1e-0000-4000-8000-000000000002";
const CASE = "0d5f3c1e-0000-4000-8000-000000000003";
const LINE = "0d5f3c1e-0000-4000-8000-000000000005";

afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

const body = { name: "Shell" } as unknown as SaveLine["body"];

async function run(variables: SaveLine) {
  const fetchStub = vi.fn(
    async (_url: string, _init?: RequestInit) =>
      new Response(JSON.stringify({ error: { id: "conflict", message: "moved on" } }), { status: 409 }),
  );
  vi.stubGlobal("fetch", fetchStub);
  const client = new QueryClient();
  const spy = vi.spyOn(client, "invalidateQueries");
  const observer = new MutationObserver(client, saveLinearizationMutation(client, WS, P) as never);
  await observer.mutate(variables as never).catch(() => undefined);
  const [url, init] = fetchStub.mock.calls[0];
  return {
    request: `${init?.method} ${url}`,
    sent: JSON.parse(String(init?.body)) as Record<string, unknown>,
    invalidated: spy.mock.calls.map(([filters]) => (filters as { queryKey: QueryKey }).queryKey),
  };
}

describe("saveLinearizationMutation", () => {
  it("when a new line is saved, then it POSTs under the case and refreshes the lines, the comparison and the audit trail, even after a refusal", async () => {
    const { request, invalidated } = await run({ loadCaseId: CASE, body });
    expect(request).toBe(`POST /api/workspaces/${WS}/projects/${P}/load-cases/${CASE}/linearizations`);
    expect(invalidated).toEqual([linearizationKeys.all(WS, P), comparisonKeys.all(WS, P), auditKeys.all(WS)]);
  });

  it("when a saved line is changed, then it PUTs to the line with the version it started from", async () => {
    const { request, sent } = await run({ loadCaseId: CASE, body, id: LINE, version: 3 });
    expect(request).toBe(`PUT /api/workspaces/${WS}/projects/${P}/load-cases/${CASE}/linearizations/${LINE}`);
    expect(sent).toEqual({ name: "Shell", version: 3 });
  });
});

describe("deleteLinearizationMutation", () => {
  it("when a line is deleted, then it DELETEs the line and refreshes the lines, the comparison and the audit trail", async () => {
    const fetchStub = vi.fn(async (_url: string, _init?: RequestInit) => new Response(null, { status: 204 }));
    vi.stubGlobal("fetch", fetchStub);
    const client = new QueryClient();
    const spy = vi.spyOn(client, "invalidateQueries");
    const observer = new MutationObserver(client, deleteLinearizationMutation(client, WS, P) as never);
    await observer.mutate({ loadCaseId: CASE, id: LINE } as never);
    const [url, init] = fetchStub.mock.calls[0];
    expect(`${init?.method} ${url}`).toBe(
      `DELETE /api/workspaces/${WS}/projects/${P}/load-cases/${CASE}/linearizations/${LINE}`,
    );
    expect(spy.mock.calls.map(([filters]) => (filters as { queryKey: QueryKey }).queryKey)).toEqual([
      linearizationKeys.all(WS, P),
      comparisonKeys.all(WS, P),
      auditKeys.all(WS),
    ]);
  });
});
