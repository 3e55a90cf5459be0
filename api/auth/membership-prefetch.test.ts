import { describe, expect, it } from "vitest";
import {
  comparisonProjectIdInPath,
  prefetchedComparisonStamp,
  workspaceIdInPath,
} from "./membership-prefetch";

const ID = "0b6f4a5e-3c1d-4e2f-9a8b-7c6d5e4f3a2b";
const PROJECT = "1c7e5b6f-4d2e-4f3a-8b9c-0d1e2f3a4b5c";

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

describe("comparisonProjectIdInPath", () => {
  it("when a path asks for a project's comparison, then the project's id is read", () => {
    expect(comparisonProjectIdInPath(`/workspaces/${ID}/projects/${PROJECT}/comparison`)).toBe(PROJECT);
    expect(comparisonProjectIdInPath(`/workspaces/${ID}/projects/${PROJECT}/comparison/`)).toBe(PROJECT);
  });

  it("when the path asks for anything else of a project, then there is none (no stamp is read for it)", () => {
    expect(comparisonProjectIdInPath(`/workspaces/${ID}/projects/${PROJECT}`)).toBeNull();
    expect(comparisonProjectIdInPath(`/workspaces/${ID}/projects/${PROJECT}/comparison/x`)).toBeNull();
    expect(comparisonProjectIdInPath(`/workspaces/${ID}/projects/not-a-uuid/comparison`)).toBeNull();
    expect(comparisonProjectIdInPath(`/workspaces/${ID}/projects/${PROJECT}/load-cases`)).toBeNull();
  });
});

describe("prefetchedComparisonStamp", () => {
  const prefetch = { workspaceId: ID, comparisonProjectId: PROJECT, comparisonStamp: "4:2" };

  it("when the session statement read the stamp of exactly this workspace and project, then it is used", () => {
    expect(prefetchedComparisonStamp(prefetch, ID, PROJECT)).toBe("4:2");
  });

  it("when it read none, or for another workspace or project, then there is none", () => {
    expect(prefetchedComparisonStamp(undefined, ID, PROJECT)).toBeUndefined();
    expect(prefetchedComparisonStamp({ workspaceId: ID }, ID, PROJECT)).toBeUndefined();
    expect(prefetchedComparisonStamp(prefetch, PROJECT, PROJECT)).toBeUndefined();
    expect(prefetchedComparisonStamp(prefetch, ID, ID)).toBeUndefined();
  });
});
