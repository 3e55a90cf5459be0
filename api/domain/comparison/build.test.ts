import { describe, expect, it } from "vitest";
import { combineLoadCases, evaluateState, findGoverning, requirementsFor } from "../../../core";
import { seededRandom } from "../../../core/testing/fixtures";
import {
  buildComparison,
  buildComparisonWindow,
  coreAllowables,
  type ComparisonInput,
  type ComparisonState,
} from "./build";
import { comparisonPage } from "./paging";

const uuid = (prefix: number, i: number) =>
  `${String(prefix).padStart(8, "0")}-0000-4000-8000-${String(i).padStart(12, "0")}`;

/**
 * A small project as the loader hands it over: 4 locations (one without a material), 5 cases
 * of mixed categories with a state missing at one location, and 3 combinations, one naming a
 * deleted case. Stresses are seeded random values in Pa.
 */
function project(): ComparisonInput {
  const rnd = seededRandom(20_261_203);
  const stress = () => (rnd() - 0.5) * 4e8;
  const steel = {
    strengths: { yield: 355e6, ultimateTension: 470e6 },
    label: "S355",
    kind: "published" as const,
    note: "",
  };
  const none = { strengths: {}, label: "no material", kind: "none" as const, note: "choose one" };
  const locations = [0, 1, 2, 3].map((i) => ({
    id: uuid(1, i),
    name: `point ${i}`,
    material: i === 3 ? none : steel,
  }));
  const categories = ["operating", "design", "test", "upset", ""];
  const cases = categories.map((category, i) => ({
    id: uuid(2, i),
    name: `case ${i}`,
    category,
    version: 1,
  }));
  const states = new Map<string, ComparisonState>();
  for (const c of cases) {
    for (const l of locations) {
      if (c.id === cases[1].id && l.id === locations[2].id) continue; // no state entered here
      const row = {
        loadCaseId: c.id,
        locationId: l.id,
        revision: 1,
        xxPa: stress(),
        yyPa: stress(),
        zzPa: stress(),
        xyPa: stress(),
        yzPa: stress(),
        zxPa: stress(),
      };
      states.set(`${c.id}:${l.id}`, row);
    }
  }
  const term = (i: number, factor: number) => ({
    loadCaseId: cases[i].id,
    loadCaseName: cases[i].name,
    factor,
    live: true,
  });
  const combinations = [
    { id: uuid(3, 0), name: "operating + upset", version: 1, terms: [term(0, 1), term(3, 1.2)] },
    { id: uuid(3, 1), name: "design with case 1", version: 1, terms: [term(1, 1.35), term(2, -0.5)] },
    {
      id: uuid(3, 2),
      name: "with a deleted case",
      version: 1,
      terms: [term(0, 1), { ...term(4, 1), live: false }],
    },
  ];
  return {
    projectId: uuid(4, 0),
    allowables: {
      requirements: [
        { criterion: "von-mises", requiredFactor: 1.5 },
        { criterion: "tresca", requiredFactor: 1.5 },
      ],
      categoryRequirements: [{ category: "test", factors: { tresca: 1.25 } }],
    },
    includeUnsuitedCriteria: false,
    locations,
    cases,
    states,
    combinations,
  };
}

describe("buildComparison (pure: the loaded project in, the comparison out)", () => {
  it("when combinations are superposed over packed states, then each row's components equal core's combineLoadCases and its checks equal evaluateState with the row's factors", () => {
    // Superposition Σ fᵢ·σᵢ: common practice, no source (linear elasticity).
    const input = project();
    const { rows, skipped } = buildComparison(input);
    const combos = rows.filter((r) => r.kind === "combination");
    expect(combos).toHaveLength(2 * 4 - 1); // the deleted-case combination is skipped everywhere; one state is missing
    for (const row of combos) {
      const combo = input.combinations.find((c) => c.id === row.caseId)!;
      const expected = combineLoadCases(
        combo.terms.map((t) => {
          const s = input.states.get(`${t.loadCaseId}:${row.locationId}`)!;
          return {
            factor: t.factor,
            tensor: { xx: s.xxPa, yy: s.yyPa, zz: s.zzPa, xy: s.xyPa, yz: s.yzPa, zx: s.zxPa },
          };
        }),
      );
      expect(row.componentsPa).toEqual(expected);
    }
    for (const row of rows) {
      const location = input.locations.find((l) => l.id === row.locationId)!;
      const category = row.kind === "combination" ? null : row.category;
      const requirements = requirementsFor(coreAllowables(input.allowables), category);
      const single = evaluateState(row.componentsPa, location.material.strengths, requirements);
      expect(row.checks.map((c) => c.status)).toEqual(single.checks.map((c) => c.status));
      for (const [k, c] of row.checks.entries()) {
        const s = single.checks[k];
        if (c.status === "evaluated" && s.status === "evaluated") {
          expect(c.factor).toBeCloseTo(s.factor, 12);
          expect(c.verdict).toBe(s.verdict);
          expect(c.requiredFactor).toBe(s.requiredFactor);
        }
      }
    }
    expect(skipped.map((s) => s.caseName)).toContain("with a deleted case");
    expect(skipped.find((s) => s.caseName === "case 1")?.locationName).toBe("point 2");
  });

  it("when a window of rows is asked for, then exactly those rows are written out and the governing results still cover every row", () => {
    const input = project();
    const whole = buildComparison(input);
    const { comparison, rowCount } = buildComparisonWindow(input, { from: 5, to: 12 });
    expect(rowCount).toBe(whole.rows.length);
    expect(comparison.rows).toEqual(whole.rows.slice(5, 12));
    expect(comparison.governing).toEqual(whole.governing);
    expect(comparison.governingOverall).toEqual(whole.governingOverall);
    expect(comparison.summary).toBe(whole.summary);
  });

  it("when the comparison is read a page at a time, then the pages join into the whole and every page carries the whole's governing results", async () => {
    const input = project();
    const whole = buildComparison(input);
    const joined = [];
    for (let page = 1; ; page++) {
      const part = await comparisonPage(input, { page, limit: 4 });
      joined.push(...part.rows);
      expect(part.governing).toEqual(whole.governing);
      expect(part.governingOverall).toEqual(whole.governingOverall);
      if (page >= part.paging.totalPages) break;
    }
    expect(joined).toEqual(whole.rows);
    // The governing rows are core's findGoverning over the rows as core sees them.
    const coreGoverning = findGoverning(
      whole.rows.map((r) => ({
        caseId: r.rowId,
        locationId: r.locationId,
        evaluation: evaluateState(
          r.componentsPa,
          input.locations.find((l) => l.id === r.locationId)!.material.strengths,
          requirementsFor(coreAllowables(input.allowables), r.kind === "combination" ? null : r.category),
        ),
      })),
    );
    expect(whole.governing.map((g) => [g.criterion, g.rowId])).toEqual(
      coreGoverning.map((g) => [g.criterion, g.caseId]),
    );
  });
});
