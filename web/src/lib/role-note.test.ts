import { describe, expect, it } from "vitest";
import { readOnlyNote } from "./role-note";

// Product rule (no outside source): read-only members are told why nothing here is editable.

describe("read-only note", () => {
  it("when a reviewer reads a project, then the note says reviewing is coming; editors get no note", () => {
    expect(readOnlyNote("reviewer")).toMatch(/Reviewing and approving calculations is coming/);
    expect(readOnlyNote("viewer")).toMatch(/^You are a viewer here/);
    expect(readOnlyNote("editor")).toBeNull();
    expect(readOnlyNote("owner")).toBeNull();
  });
});
