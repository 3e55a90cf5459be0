import { describe, expect, it } from "vitest";
import type { Comparison } from "../../../../../core/contract/comparison";
import { toCsv } from "../../../lib/csv";
import { comparisonTable, governingMarks } from "./rows";

const id = (n: number) => `00000000-0000-4000-8000-00000000000${n}`;
const row = (caseName: string, factor: number | null): Comparison["rows"][number] => ({
  rowId: `case:${caseName}`,
  kind: "load-case",
  caseId: id(1),
  caseName,
  category: "test",
  locationId: id(2),
  locationName: "head junction",
  caseVersion: 1,
  stateRevision: 1,
  material: { label: "S355 (EN 10025-2)", kind: "published", note: "" },
  componentsPa: { xx: 100e6, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 },
  principalPa: [100e6, 0, -5e6],
  vonMisesPa: 102.5e6,
  trescaPa: 105e6,
  maxShearPa: 52.5e6,
  checks: [
    factor === null
      ? {
          status: "evaluated",
          criterion: "von-mises",
          requiredFactor: 1.5,
          factor: null,
          utilisation: 0,
          verdict: "pass",
        }
      : {
          status: "evaluated",
          criterion: "von-mises",
          requiredFactor: 1.5,
          factor,
          utilisation: 1.5 / factor,
          verdict: 1.5 / factor > 1 ? "fail" : "pass",
        },
  ],
});

const comparison: Comparison = {
  projectId: id(3),
  requirements: [{ criterion: "von-mises", requiredFactor: 1.5 }],
  rows: [row("=cmd|' /C calc'!A0", 3), row("Hydrostatic test", 1.34)],
  governing: [
    {
      criterion: "von-mises",
      rowId: "case:Hydrostatic test",
      caseName: "Hydrostatic test",
      locationName: "head junction",
      factor: 1.34,
      requiredFactor: 1.5,
      utilisation: 1.5 / 1.34,
      verdict: "fail",
    },
  ],
  governingByLocation: [],
  summary: "governs: Hydrostatic test at head junction, von Mises, SF 1.34 against 1.5 required",
  skipped: [],
  cautions: ["First caution for the test.", "Second caution for the test."],
};

describe("the comparison as a table", () => {
  it("when exported, then stresses are in the display unit and a case named like a formula is escaped in the CSV", () => {
    const table = comparisonTable(comparison, "MPa");
    expect(table[0]).toContain("σ1 (MPa)");
    expect(table[2].slice(5, 8)).toEqual([100, 0, -5]);
    const csv = toCsv(table);
    expect(csv.split("\r\n")[1].startsWith("'=cmd|' /C calc'!A0,load-case,")).toBe(true);
    expect(csv).toContain(",-5,");
  });

  it("when exported, then the summary line and every caution follow the table, so a copy carries them", () => {
    const table = comparisonTable(comparison, "MPa");
    const tail = table.slice(-3).map((line) => line[0]);
    expect(tail).toEqual([comparison.summary, ...comparison.cautions]);
    expect(table[table.length - 4]).toEqual([]);
  });

  it("when the governing row is marked, then only it carries the criterion", () => {
    const marks = governingMarks(comparison);
    expect(marks.get("case:Hydrostatic test")?.overall).toEqual(["von-mises"]);
    expect(marks.has("case:=cmd|' /C calc'!A0")).toBe(false);
  });
});
