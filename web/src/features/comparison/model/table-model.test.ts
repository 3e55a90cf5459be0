import { describe, expect, it } from "vitest";
import type { ComparisonCheck, ComparisonRowView } from "../../../../../core/contract/comparison";
import {
  benchComponents,
  comparisonColumns,
  locationOptions,
  matchesEquals,
  matchesText,
  rowHighlight,
  utilisationOf,
  worstVerdict,
} from "./table-model";

const uuid = (n: number) => `00000000-0000-4000-8000-00000000000${n}`;

const rated = (criterion: ComparisonCheck["criterion"], u: number): ComparisonCheck => ({
  status: "evaluated",
  criterion,
  requiredFactor: 1.5,
  category: null,
  factor: 1.5 / u,
  utilisation: u,
  verdict: u > 1 ? "fail" : u > 1 / 1.1 ? "close" : "pass",
  unsuited: null,
});

function row(over: Partial<ComparisonRowView> = {}): ComparisonRowView {
  return {
    rowId: "case:Design",
    kind: "load-case",
    caseId: uuid(1),
    caseName: "Design",
    category: "operating",
    locationId: uuid(2),
    locationName: "Head-to-shell junction",
    caseVersion: 1,
    stateRevision: 1,
    allowable: { category: null, label: "the project default" },
    material: { label: "SA-516 70", kind: "published", note: "" },
    componentsPa: { xx: 150e6, yy: 0, zz: 0, xy: 25e6, yz: 0, zx: 0 },
    principalPa: [154.06e6, 0, -4.06e6],
    vonMisesPa: 156.1e6,
    trescaPa: 158.12e6,
    maxShearPa: 79.06e6,
    checks: [rated("von-mises", 0.5), rated("tresca", 0.95)],
    ...over,
  };
}

describe("the comparison table's columns", () => {
  it("when the project requires von Mises and Tresca, then the columns run case, kind, location, σ₁ σ₂ σ₃, σvm, σ₁−σ₃, τmax, one safety-factor column per criterion, worst verdict and the bench link, every header naming its content and unit, with the stresses and factors numeric", () => {
    const cols = comparisonColumns(["von-mises", "tresca"], "MPa");
    expect(cols.map((c) => c.id)).toEqual([
      "caseName",
      "kind",
      "locationId",
      "s1",
      "s2",
      "s3",
      "vonMisesPa",
      "trescaPa",
      "maxShearPa",
      "u:von-mises",
      "u:tresca",
      "verdict",
      "bench",
    ]);
    expect(cols.map((c) => c.header)).toEqual([
      "Case",
      "Kind",
      "Location",
      "σ₁, MPa",
      "σ₂, MPa",
      "σ₃, MPa",
      "von Mises σvm, MPa",
      "Tresca σ₁−σ₃, MPa",
      "Max shear τmax, MPa",
      "von Mises safety factor n / required",
      "Tresca safety factor n / required",
      "Worst",
      "Bench",
    ]);
    expect(cols.filter((c) => c.numeric).map((c) => c.id)).toEqual([
      "s1",
      "s2",
      "s3",
      "vonMisesPa",
      "trescaPa",
      "maxShearPa",
      "u:von-mises",
      "u:tresca",
    ]);
    expect(cols.filter((c) => c.hidden).map((c) => c.id)).toEqual(["kind", "verdict"]);
    expect(cols.filter((c) => c.filter === "equals").map((c) => c.id)).toEqual([
      "kind",
      "locationId",
      "verdict",
    ]);
  });

  it("when a row is read by each column, then the stresses are its Pa values and a criterion's column its utilisation", () => {
    const cols = comparisonColumns(["tresca"], "MPa");
    const value = (id: string) => cols.find((c) => c.id === id)!.value!(row());
    expect([value("s1"), value("s2"), value("s3")]).toEqual([154.06e6, 0, -4.06e6]);
    expect(value("u:tresca")).toBe(0.95);
    expect(value("locationId")).toBe(uuid(2));
    expect(cols.find((c) => c.id === "bench")!.value).toBeNull();
  });

  it("when locations are sorted, then they compare by name, not by id", () => {
    const loc = comparisonColumns([], "MPa").find((c) => c.id === "locationId")!;
    const a = row({ locationId: uuid(9), locationName: "Anchor" });
    const b = row({ locationId: uuid(1), locationName: "Shell" });
    expect(loc.compare!(a, b)).toBeLessThan(0);
    expect(loc.compare!(b, a)).toBeGreaterThan(0);
  });

  it("when a criterion was not rated on a row, then its sort value is −1, below every rated utilisation (0 included)", () => {
    const notRated = row({
      checks: [
        {
          status: "not-evaluated",
          criterion: "tresca",
          requiredFactor: 1.5,
          category: null,
          missing: ["yield"],
          reason: "needs yield",
        } as ComparisonCheck,
      ],
    });
    expect(utilisationOf(notRated, "tresca")).toBe(-1);
    expect(utilisationOf(row(), "mohr-coulomb")).toBe(-1);
    expect(utilisationOf(row({ checks: [rated("tresca", 0)] }), "tresca")).toBe(0);
  });
});

describe("the comparison table's filters", () => {
  it("when rows are filtered by text, then case, location, category and material match in any letter case, and nothing else does", () => {
    const r = row();
    for (const text of ["design", "HEAD-TO", "operating", "sa-516", ""])
      expect(matchesText(r, text)).toBe(true);
    expect(matchesText(r, "hydrostatic")).toBe(false);
    expect(matchesText(r, "von")).toBe(false);
  });

  it("when a row's worst verdict is asked, then fail beats close beats pass, and a row with nothing rated has none", () => {
    expect(worstVerdict(row())).toBe("close");
    expect(worstVerdict(row({ checks: [rated("von-mises", 0.2), rated("tresca", 1.2)] }))).toBe("fail");
    expect(worstVerdict(row({ checks: [rated("von-mises", 0.2)] }))).toBe("pass");
    expect(worstVerdict(row({ checks: [] }))).toBe("");
  });

  it("when a kind, location or verdict filter is set, then only rows with exactly that value stay; an empty filter keeps all", () => {
    const cols = comparisonColumns(["tresca"], "MPa");
    const col = (id: string) => cols.find((c) => c.id === id)!;
    const combination = row({ kind: "combination" });
    expect(matchesEquals(col("kind"), combination, "combination")).toBe(true);
    expect(matchesEquals(col("kind"), row(), "combination")).toBe(false);
    expect(matchesEquals(col("locationId"), row(), uuid(2))).toBe(true);
    expect(matchesEquals(col("locationId"), row(), uuid(3))).toBe(false);
    expect(matchesEquals(col("verdict"), row(), "close")).toBe(true);
    expect(matchesEquals(col("verdict"), row(), "fail")).toBe(false);
    expect(matchesEquals(col("verdict"), row(), undefined)).toBe(true);
    expect(matchesEquals(col("verdict"), row(), "")).toBe(true);
  });

  it("when locations are offered, then each appears once, in the order the rows first name it", () => {
    const rows = [
      row({ locationId: uuid(5), locationName: "Shell" }),
      row({ locationId: uuid(2), locationName: "Junction" }),
      row({ locationId: uuid(5), locationName: "Shell" }),
    ];
    expect(locationOptions(rows)).toEqual([
      [uuid(5), "Shell"],
      [uuid(2), "Junction"],
    ]);
  });
});

describe("the comparison table's cells", () => {
  it("when a row governs overall or at its location, then it is washed in ink or paper, and only the overall one says so in data-governs", () => {
    expect(rowHighlight({ overall: ["tresca"], atLocation: ["tresca"] })).toEqual({
      className: "bg-ink-wash",
      governs: "overall",
    });
    expect(rowHighlight({ overall: [], atLocation: ["tresca"] })).toEqual({
      className: "bg-paper",
      governs: undefined,
    });
    expect(rowHighlight(undefined)).toEqual({ className: "", governs: undefined });
  });

  it("when a row opens in the bench, then its components travel in the display unit to twelve significant figures (150e6 Pa = 150 MPa; 1/3 MPa loses its float tail)", () => {
    expect(benchComponents(row(), "MPa")).toEqual({ xx: 150, yy: 0, zz: 0, xy: 25, yz: 0, zx: 0 });
    const third = benchComponents(
      row({ componentsPa: { xx: 1e6 / 3, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 } }),
      "MPa",
    );
    expect(third.xx).toBe(0.333333333333);
  });
});
