import { describe, expect, it } from "vitest";
import type { RecordContent, RecordScope } from "../../../core/contract/records";
import { scopeChanges } from "./scope-diff";

const CASE = ["00000000-0000-4000-8000-000000000001", "00000000-0000-4000-8000-000000000002"];
const LOC = ["00000000-0000-4000-8000-00000000000a", "00000000-0000-4000-8000-00000000000b"];

/** Only the scope matters to scopeChanges; the rest of the content is not read. */
const withScope = (scope: RecordScope | undefined) => ({ scope }) as unknown as RecordContent;

const scope = (cases: number[], locations: number[]): RecordScope => ({
  loadCases: cases.map((i) => ({ id: CASE[i], name: ["Operating", "Design"][i] })),
  locations: locations.map((i) => ({ id: LOC[i], name: ["shell", "nozzle"][i] })),
  projectLoadCases: 2,
  projectLocations: 2,
});

describe("scopeChanges", () => {
  it("when both records cover the whole project or the same choice, then nothing is listed", () => {
    expect(scopeChanges(withScope(undefined), withScope(undefined))).toEqual([]);
    expect(scopeChanges(withScope(scope([0], [1])), withScope(scope([0], [1])))).toEqual([]);
  });

  it("when a whole-project record is followed by a subset, then load cases and locations each show from whole project to the names", () => {
    expect(scopeChanges(withScope(undefined), withScope(scope([1], [0])))).toEqual([
      { kind: "scope", label: "Scope", field: "load cases", from: "whole project", to: "Design" },
      { kind: "scope", label: "Scope", field: "locations", from: "whole project", to: "shell" },
    ]);
  });

  it("when a subset chooses every location, then only the load cases are listed as changed from the whole project", () => {
    expect(scopeChanges(withScope(undefined), withScope(scope([0], [0, 1])))).toEqual([
      { kind: "scope", label: "Scope", field: "load cases", from: "whole project", to: "Operating" },
    ]);
  });
});
