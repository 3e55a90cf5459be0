import { describe, expect, it } from "vitest";
import { readApprovalComment, readComment, readReason, readReturnComment } from "./forms";

describe("review form fields", () => {
  it("when the reason is blank, then the error names the field and says what to write", () => {
    expect(readReason("   ")).toEqual({
      ok: false,
      error: "What changed and why: say what changed since the last record and why.",
    });
  });

  it("when a reason or comment is given, then it is read trimmed", () => {
    expect(readReason("  Corrected the test pressure  ")).toEqual({
      ok: true,
      value: "Corrected the test pressure",
    });
    expect(readComment("Which gauge?\n")).toEqual({ ok: true, value: "Which gauge?" });
  });

  it("when a text is longer than the API takes, then the error gives the limit and the length", () => {
    const reason = readReason("x".repeat(2001));
    expect(reason).toEqual({
      ok: false,
      error: "What changed and why: at most 2000 characters (now 2001); shorten it.",
    });
    expect(readComment("x".repeat(4001)).ok).toBe(false);
    expect(readComment("x".repeat(4000)).ok).toBe(true);
  });

  it("when a return has no comment, then it is refused; an approval may have none", () => {
    const refused = readReturnComment("");
    expect(refused.ok).toBe(false);
    expect(!refused.ok && refused.error).toMatch(/^Comment for the originator: /);
    expect(readApprovalComment("  ")).toEqual({ ok: true, value: "" });
    expect(readApprovalComment("y".repeat(4001)).ok).toBe(false);
  });
});
