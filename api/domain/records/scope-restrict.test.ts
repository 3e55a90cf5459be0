import { describe, expect, it } from "vitest";
import type { ProjectExport } from "../../../core/contract/project-export";
import type { RecordScope } from "../../../core/contract/records";
import type { ComparisonInput } from "../comparison/build";
import type { StoredLineForComparison } from "../comparison/linearizations";
import type { ExportKeys } from "../projects/export";
import { restrictComparisonInput, restrictExport } from "./scope-restrict";

// Two load cases (A in scope, B not) and three locations (L1 in scope, L2 not, L3 in the trash).
const A = "00000000-0000-4000-8000-00000000000a";
const B = "00000000-0000-4000-8000-00000000000b";
const L1 = "00000000-0000-4000-8000-000000000001";
const L2 = "00000000-0000-4000-8000-000000000002";
const L3 = "00000000-0000-4000-8000-000000000003";

const scope: RecordScope = {
  loadCases: [{ id: A, name: "A" }],
  locations: [{ id: L1, name: "L1" }],
  projectLoadCases: 2,
  projectLocations: 2,
};

const line = (id: string, caseId: string, locationId: string | null) =>
  ({ id, name: id, caseId, locationId }) as StoredLineForComparison;
const state = (loadCaseId: string, locationId: string) => ({ loadCaseId, locationId }) as never;

describe("restrictComparisonInput", () => {
  it("when a scope is applied, then only its cases, locations, states, all-chosen combinations, and its cases' point tables and lines stay", () => {
    const input = {
      projectId: "p",
      cases: [{ id: A }, { id: B }],
      locations: [{ id: L1 }, { id: L2 }],
      states: new Map([
        [`${A}:${L1}`, state(A, L1)],
        [`${A}:${L2}`, state(A, L2)],
        [`${B}:${L1}`, state(B, L1)],
      ]),
      combinations: [
        { id: "only-a", terms: [{ loadCaseId: A }] },
        { id: "a-and-b", terms: [{ loadCaseId: A }, { loadCaseId: B }] },
      ],
      pointTables: [
        { id: "t-a", caseId: A },
        { id: "t-b", caseId: B },
      ],
      linearizations: [
        line("a-none", A, null),
        line("a-l1", A, L1),
        line("a-l2", A, L2),
        line("a-trashed", A, L3),
        line("b-l1", B, L1),
      ],
    } as unknown as ComparisonInput & { linearizations: StoredLineForComparison[] };
    const restricted = restrictComparisonInput(input, scope);
    expect(restricted.cases.map((c) => c.id)).toEqual([A]);
    expect(restricted.locations.map((l) => l.id)).toEqual([L1]);
    expect([...restricted.states.keys()]).toEqual([`${A}:${L1}`]);
    expect(restricted.combinations.map((c) => c.id)).toEqual(["only-a"]);
    expect(restricted.pointTables!.map((t) => t.id)).toEqual(["t-a"]);
    // A line without a location, or whose location is in the trash, goes with its case.
    expect(restricted.linearizations.map((l) => l.id)).toEqual(["a-none", "a-l1", "a-trashed"]);
    expect(input.cases).toHaveLength(2);
  });
});

describe("restrictExport", () => {
  it("when a scope is applied, then the file keeps the chosen rows, the materials of the default and chosen locations, and keys that still name the same rows", () => {
    const file = {
      project: { defaultMaterial: { kind: "library", key: "m1" } },
      materials: [{ key: "m1" }, { key: "m2" }, { key: "m3" }],
      locations: [
        { key: "l1", material: { kind: "library", key: "m3" } },
        { key: "l2", material: { kind: "library", key: "m2" } },
      ],
      loadCases: [
        {
          key: "c1",
          states: [{ location: "l1" }, { location: "l2" }],
          linearizations: [
            { name: "x", location: null },
            { name: "y", location: "l2" },
          ],
        },
        { key: "c2", states: [{ location: "l1" }] },
      ],
      combinations: [
        { name: "c1 only", terms: [{ loadCase: "c1" }] },
        { name: "both", terms: [{ loadCase: "c1" }, { loadCase: "c2" }] },
      ],
    } as unknown as ProjectExport;
    const keys: ExportKeys = {
      materials: new Map([
        ["M1", "m1"],
        ["M2", "m2"],
        ["M3", "m3"],
      ]),
      locations: new Map([
        [L1, "l1"],
        [L2, "l2"],
      ]),
      loadCases: new Map([
        [A, "c1"],
        [B, "c2"],
      ]),
      states: [state(A, L1), state(A, L2), state(B, L1)],
    };
    const { file: cut, keys: cutKeys } = restrictExport(file, keys, scope);
    expect(cut.materials.map((m) => m.key)).toEqual(["m1", "m3"]);
    expect(cut.locations.map((l) => l.key)).toEqual(["l1"]);
    expect(cut.loadCases.map((c) => c.key)).toEqual(["c1"]);
    expect(cut.loadCases[0].states.map((s) => s.location)).toEqual(["l1"]);
    expect(cut.loadCases[0].linearizations!.map((l) => l.name)).toEqual(["x"]);
    expect(cut.combinations.map((c) => c.name)).toEqual(["c1 only"]);
    expect([...cutKeys.materials.keys()]).toEqual(["M1", "M3"]);
    expect([...cutKeys.locations]).toEqual([[L1, "l1"]]);
    expect([...cutKeys.loadCases]).toEqual([[A, "c1"]]);
    expect(cutKeys.states).toEqual([state(A, L1)]);
  });
});
