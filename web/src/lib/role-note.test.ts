import { describe, expect, it } from "vitest";
import { ROLES } from "../../../core/contract/workspaces";
import { readOnlyNote, reviewActionNote, type ReviewAction } from "./role-note";

// Product rule (no outside source): read-only members are told why nothing here is editable, and
// every review action a role may not take is explained beside it (issue 14's role rules).

describe("read-only note", () => {
  it("when a reviewer reads a project, then the note says they check submitted records; editors get no note", () => {
    expect(readOnlyNote("reviewer")).toMatch(/check the records submitted for check/);
    expect(readOnlyNote("viewer")).toMatch(/^You are a viewer here/);
    expect(readOnlyNote("editor")).toBeNull();
    expect(readOnlyNote("owner")).toBeNull();
  });
});

describe("review action notes", () => {
  it("when each role meets each review action, then only the allowed ones have no note", () => {
    const allowed = (action: ReviewAction) => ROLES.filter((role) => reviewActionNote(role, action) === null);
    expect(allowed("submit")).toEqual(["owner", "editor"]);
    expect(allowed("comment")).toEqual(["owner", "editor", "reviewer"]);
    expect(allowed("decide")).toEqual(["owner", "reviewer"]);
    expect(allowed("set-approvals")).toEqual(["owner"]);
  });

  it("when a viewer meets a review action, then the note names who may take it", () => {
    expect(reviewActionNote("viewer", "submit")).toBe(
      "Only editors and owners submit a calculation for check.",
    );
    expect(reviewActionNote("editor", "decide")).toMatch(/^Only reviewers and owners/);
  });
});
