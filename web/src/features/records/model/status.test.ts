import { describe, expect, it } from "vitest";
import { STATUS_MARK, projectStatusWords, recordStatusWords } from "./status";

// Product rule (issue 14, no outside source): statuses in Sigmacube's own words, each with a mark.

describe("review status words", () => {
  it("when each project status is named, then the names differ and each says who acts next", () => {
    const statuses = ["in-work", "submitted", "returned", "approved"] as const;
    const names = statuses.map((s) => projectStatusWords(s).name);
    expect(names).toEqual(["Work in progress", "Submitted for check", "Returned with comments", "Approved"]);
    expect(projectStatusWords("returned").next).toMatch(/originator answers the comments/);
    for (const s of statuses) expect(STATUS_MARK[s]).not.toBe("");
  });

  it("when a newer record was submitted, then the older one reads superseded", () => {
    expect(recordStatusWords("superseded")).toEqual({
      name: "Superseded",
      next: "A later record of this project was submitted.",
    });
  });
});
