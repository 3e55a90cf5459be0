import { afterEach, describe, expect, it, vi } from "vitest";
import { ApiError } from "../../lib/api-client";
import { getRecordDiff } from "./queries";

// The first record of a project has nothing before it; the API answers the diff with 404 then.

afterEach(() => vi.unstubAllGlobals());

const answer = (status: number, body: unknown) =>
  vi.stubGlobal(
    "fetch",
    vi.fn(
      async () =>
        new Response(JSON.stringify(body), { status, headers: { "Content-Type": "application/json" } }),
    ),
  );

describe("record diff fetcher", () => {
  it("when the API answers 404 (no earlier record), then the diff is null rather than an error", async () => {
    answer(404, { error: { id: "not_found", message: "This is the first record." } });
    expect(await getRecordDiff("w", "p", "r", null)).toBeNull();
  });

  it("when the API refuses for another reason, then the error reaches the page with the server's words", async () => {
    answer(403, { error: { id: "forbidden", message: "You are not a member of this workspace." } });
    const error = await getRecordDiff("w", "p", "r", "q").catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect((error as ApiError).message).toBe("You are not a member of this workspace.");
  });
});
