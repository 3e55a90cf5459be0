import { describe, expect, it } from "vitest";
import type { Comparison } from "../../../../../core/contract/comparison";
import { toCsv } from "../../../lib/csv";
import { comparisonTable, governingMarks, roundToScale } from "./rows";

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
  allowable: { category: null, label: "the project default" },
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
          category: null,
          factor: null,
          utilisation: 0,
          verdict: "pass",
          unsuited: null,
        }
      : {
          status: "evaluated",
          criterion: "von-mises",
          requiredFactor: 1.5,
          category: null,
          factor,
          utilisation: 1.5 / factor,
          verdict: 1.5 / factor > 1 ? "fail" : "pass",
          unsuited: null,
        },
  ],
});

const governs: Comparison["governing"][number] = {
  criterion: "von-mises",
  rowId: "case:Hydrostatic test",
  caseName: "Hydrostatic test",
  locationName: "head junction",
  factor: 1.34,
  requiredFactor: 1.5,
  category: null,
  utilisation: 1.5 / 1.34,
  verdict: "fail",
};

const comparison: Comparison = {
  projectId: id(3),
  requirements: [{ criterion: "von-mises", requiredFactor: 1.5 }],
  categoryRequirements: [],
  includeUnsuitedCriteria: false,
  rows: [row("=cmd|' /C calc'!A0", 3), row("Hydrostatic test", 1.34)],
  governing: [governs],
  governingOverall: governs,
  governingByLocation: [],
  summary: "governs: Hydrostatic test at head junction, von Mises, SF 1.34 against 1.5 required",
  skipped: [],
  cautions: ["First caution for the test.", "Second caution for the test."],
};

describe("the comparison as a table", () => {
  it("when exported, then stresses are in the display unit and a case named like a formula is escaped in the CSV", () => {
    const table = comparisonTable(comparison, "MPa");
    expect(table[0]).toContain("σ1 (MPa)");
    expect(table[2].slice(6, 9)).toEqual([100, 0, -5]);
    const csv = toCsv(table);
    expect(csv.split("\r\n")[1].startsWith("'=cmd|' /C calc'!A0,load-case,")).toBe(true);
    expect(csv).toContain(",-5,");
  });

  it("when exported, then the summary line and every caution follow the table, so a copy carries them", () => {
    const table = comparisonTable(comparison, "MPa");
    const tail = table.slice(-4).map((line) => line[0]);
    expect(tail[0]).toBe(comparison.summary);
    expect(tail[1]).toMatch(/rounded to 6 significant figures/);
    expect(tail.slice(2)).toEqual(comparison.cautions);
    expect(table[table.length - 5]).toEqual([]);
  });

  it("when the governing row is marked, then only it carries the criterion", () => {
    const marks = governingMarks(comparison);
    expect(marks.get("case:Hydrostatic test")?.overall).toEqual(["von-mises"]);
    expect(marks.has("case:=cmd|' /C calc'!A0")).toBe(false);
  });
});

describe("CSV rounding (common practice, no source: report values to the precision they carry)", () => {
  it("when a stress is float noise beside the row's stresses, a factor is 79.99999999999999 or a value rounds to −0, then the CSV writes 0, 80 and 0", () => {
    const noisy: Comparison = {
      ...comparison,
      rows: [
        {
          ...row("Noise", 79.99999999999999),
          principalPa: [100e6, 4.59e-9, -1e-10],
          vonMisesPa: 100e6,
          trescaPa: 100.0000000001e6,
          maxShearPa: 50e6,
        },
      ],
    };
    const [header, line] = comparisonTable(noisy, "MPa");
    const at = (name: string) => line[header.indexOf(name)];
    expect(at("σ2 (MPa)")).toBe(0);
    expect(Object.is(at("σ3 (MPa)"), 0)).toBe(true);
    expect(at("Tresca σ1−σ3 (MPa)")).toBe(100);
    expect(at("von Mises SF (dimensionless)")).toBe(80);
    expect(at("von Mises utilisation (dimensionless)")).toBe(0.01875);
    const csv = toCsv([line]);
    expect(csv).not.toMatch(/e-|99999|-0(,|$)/);
    expect(header).toContain("τmax = (σ1−σ3)/2 (MPa)");
  });

  it("when values are rounded to a scale, then six figures of the scale are kept and signs are kept", () => {
    expect(roundToScale(123.456789, 123.456789, 6)).toBe(123.457);
    expect(roundToScale(-0.0004, 250, 6)).toBe(0);
    expect(roundToScale(-1.23456, 250, 6)).toBe(-1.235);
    expect(roundToScale(1234567, 1234567, 4)).toBe(1235000);
    expect(roundToScale(0, 0, 6)).toBe(0);
  });
});
