import { describe, expect, it } from "vitest";
import { workspaceIdInPath } from "./membership-prefetch";

const ID = "0b6f4a5e-3c1d-4e2f-9a8b-7c6d5e4f3a2b";

describe("workspaceIdInPath", () => {
  it("when a path under /api names a workspace, then its id is read, with or without a tail", () => {
    expect(workspaceIdInPath(`/workspaces/${ID}`)).toBe(ID);
    expect(workspaceIdInPath(`/workspaces/${ID}/projects/x/comparison`)).toBe(ID);
  });

  it("when the path names no workspace or the id is not UUID-shaped, then there is none (no statement is given a bad id)", () => {
    expect(workspaceIdInPath("/workspaces")).toBeNull();
    expect(workspaceIdInPath("/workspaces/not-a-uuid/projects")).toBeNull();
    expect(workspaceIdInPath(`/workspaces/${ID}x`)).toBeNull();
    expect(workspaceIdInPath(`/health/${ID}`)).toBeNull();
    expect(workspaceIdInPath(`/x/workspaces/${ID}`)).toBeNull();
  });
});
