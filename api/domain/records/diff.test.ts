import { describe, expect, it } from "vitest";
import type { RecordContent } from "../../../core/contract/records";
import { diffInputs, diffVerdicts } from "./diff";

const LOC_A = "00000000-0000-4000-8000-00000000000a";
const LOC_B = "00000000-0000-4000-8000-00000000000b";
const CASE_1 = "00000000-0000-4000-8000-000000000001";
const MAT_1 = "00000000-0000-4000-8000-0000000000f1";

/** The parts of a record's content the diff reads; the rest of the schema does not matter here. */
function content(options: {
  locations: { key: string; id: string; name: string }[];
  yieldPa: number;
  factor: number;
  rows: { rowId: string; verdict: "pass" | "close" | "fail"; factor: number }[];
}): RecordContent {
  return {
    inputs: {
      project: { name: "P", description: "", unitSystem: "SI", requirements: [], defaultMaterial: null },
      materials: [{ key: "m1", name: "Plate", yieldPa: options.yieldPa, reference: "cert" }],
      locations: options.locations.map((l) => ({ key: l.key, name: l.name, note: "", material: null })),
      loadCases: [{ key: "c1", name: "Design", category: "design", description: "", states: [] }],
      combinations: [{ name: "Comb", description: "", terms: [{ loadCase: "c1", factor: options.factor }] }],
    },
    ids: {
      materials: { m1: MAT_1 },
      locations: Object.fromEntries(options.locations.map((l) => [l.key, l.id])),
      loadCases: { c1: CASE_1 },
    },
    results: {
      rows: options.rows.map((r) => ({
        rowId: r.rowId,
        caseName: "Design",
        locationName: "shell",
        checks: [{ status: "evaluated", criterion: "tresca", verdict: r.verdict, factor: r.factor }],
      })),
    },
  } as unknown as RecordContent;
}

describe("the diff between two records", () => {
  it("when a location is added under another key, one removed, a material's yield and a combination factor change, then each is listed with display values in MPa", () => {
    const from = content({
      locations: [
        { key: "l1", id: LOC_A, name: "shell" },
        { key: "l2", id: LOC_B, name: "nozzle" },
      ],
      yieldPa: 250e6,
      factor: 1,
      rows: [],
    });
    const to = content({
      // Same database id under a new key: not a change; the other location is gone, a new one came.
      locations: [
        { key: "l9", id: LOC_A, name: "shell" },
        { key: "l2", id: "00000000-0000-4000-8000-0000000000cc", name: "skirt" },
      ],
      yieldPa: 200e6,
      factor: 1.5,
      rows: [],
    });
    const diff = diffInputs(from, to);
    expect(diff.added).toEqual([{ kind: "location", label: "skirt" }]);
    expect(diff.removed).toEqual([{ kind: "location", label: "nozzle" }]);
    expect(diff.changed).toEqual([
      { kind: "material", label: "Plate", field: "yieldPa", from: "250 MPa", to: "200 MPa" },
      { kind: "combination", label: "Comb", field: "terms", from: "1 × Design", to: "1.5 × Design" },
    ]);
  });

  it("when only a factor moves within the same verdict, then no verdict change is listed; when the verdict flips, it is", () => {
    const rowId = `case:${CASE_1}:${LOC_A}`;
    const locations = [{ key: "l1", id: LOC_A, name: "shell" }];
    const a = content({ locations, yieldPa: 1, factor: 1, rows: [{ rowId, verdict: "pass", factor: 2.4 }] });
    const b = content({ locations, yieldPa: 1, factor: 1, rows: [{ rowId, verdict: "pass", factor: 2.1 }] });
    const c = content({ locations, yieldPa: 1, factor: 1, rows: [{ rowId, verdict: "fail", factor: 0.9 }] });
    expect(diffVerdicts(a, b)).toEqual([]);
    expect(diffVerdicts(a, c)).toEqual([
      {
        rowId,
        caseName: "Design",
        locationName: "shell",
        criterion: "tresca",
        from: { verdict: "pass", factor: 2.4 },
        to: { verdict: "fail", factor: 0.9 },
      },
    ]);
  });
});
