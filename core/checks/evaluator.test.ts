import { describe, expect, it } from "vitest";
import { safetyFactor } from "../criteria/safety-factor";
import { seededRandom } from "../testing/fixtures";
import type { StressTensor } from "../tensor/types";
import { materialBehaviour, unsuitedReason } from "./applicability";
import { evaluateBatch, evaluateState, evaluateStates, type CriterionCheck } from "./evaluate";
import { findGoverning, findOverallGoverning, type ComparisonRow } from "./governing";
import { requirementsFor, type Allowables, type CheckRequirement } from "./requirements";

const t = (xx: number, yy: number, zz = 0, xy = 0, yz = 0, zx = 0): StressTensor => ({
  xx,
  yy,
  zz,
  xy,
  yz,
  zx,
});

function rated(check: CriterionCheck | undefined) {
  if (!check || check.status !== "evaluated") throw new Error(`expected a rated check, got ${check?.status}`);
  return check;
}

describe("one evaluator: every check, its verdict and the governing one", () => {
  it("when a project requires von Mises n ≥ 1.5 and Tresca n ≥ 2 and both factors are 1.5, then Tresca fails and governs (highest utilisation, not smallest factor)", () => {
    // Uniaxial 200 MPa against Sy 300: n = Sy/σ = 1.5 for both criteria (common practice, no source).
    const result = evaluateState(t(200, 0), { yield: 300 }, [
      { criterion: "von-mises", requiredFactor: 1.5 },
      { criterion: "tresca", requiredFactor: 2 },
    ]);
    const [vm, tr] = result.checks.map(rated);
    expect(vm.factor).toBeCloseTo(1.5, 14);
    expect(tr.factor).toBeCloseTo(1.5, 14);
    expect(vm.verdict).toBe("close");
    expect(tr.verdict).toBe("fail");
    expect(result.governing?.criterion).toBe("tresca");
    expect(result.governing?.utilisation).toBeCloseTo(2 / 1.5, 14);
  });

  it("when many states are evaluated in one batch, then each equals the single-state evaluation and safetyFactor (300 seeded states)", () => {
    const next = seededRandom(4242);
    const r = () => (2 * next() - 1) * 300;
    const material = {
      yield: 250,
      ultimateTension: 300,
      ultimateCompression: 900,
      behaviour: "brittle" as const,
    };
    const reqs: CheckRequirement[] = [
      { criterion: "max-principal", requiredFactor: 2 },
      { criterion: "mohr-coulomb", requiredFactor: 2.5 },
      { criterion: "modified-mohr", requiredFactor: 3 },
    ];
    const states = Array.from({ length: 300 }, () => ({
      tensor: t(r(), r(), r(), r(), r(), r()),
      material,
      requirements: reqs,
    }));
    const batch = evaluateStates(states);
    states.forEach((s, k) => {
      expect(batch[k]).toEqual(evaluateState(s.tensor, material, reqs));
      for (const check of batch[k].checks) {
        const c = rated(check);
        const n = safetyFactor(s.tensor, c.criterion, material);
        expect(Math.abs(c.factor - n)).toBeLessThanOrEqual(1e-12 * n);
      }
    });
  });

  it("when a point table is given as 6N numbers, then evaluateBatch rates each row with its own requirements", () => {
    const input = Float64Array.of(100, 0, 0, 0, 0, 0, 0, 0, 0, 50, 0, 0);
    const rows = evaluateBatch(input, (k) => ({
      material: { yield: 300 },
      requirements: [{ criterion: "tresca", requiredFactor: k === 0 ? 1.5 : 2 }],
    }));
    // Tresca n = Sy/(σ1 − σ3): 300/100 = 3 (uniaxial); pure shear τ = 50 gives σ1 − σ3 = 100, n = 3.
    expect(rated(rows[0].checks[0])).toMatchObject({ factor: 3, utilisation: 0.5, verdict: "pass" });
    expect(rated(rows[1].checks[0])).toMatchObject({ factor: 3, requiredFactor: 2 });
    expect(rows[1].maxShear).toBeCloseTo(50, 12);
  });
});

describe("criteria applied where they apply (common practice, no source: yield criteria for ductile, fracture criteria for brittle materials)", () => {
  const all: CheckRequirement[] = [
    { criterion: "von-mises", requiredFactor: 1.5 },
    { criterion: "tresca", requiredFactor: 1.5 },
    { criterion: "max-principal", requiredFactor: 1.5 },
    { criterion: "mohr-coulomb", requiredFactor: 1.5 },
    { criterion: "modified-mohr", requiredFactor: 1.5 },
  ];
  const s355 = { yield: 355, ultimateTension: 470, ultimateCompression: 470 };

  it("when a ductile steel fails von Mises, then the brittle criteria say not applicable with the reason instead of passing, and von Mises governs", () => {
    // Pure shear τ = 250: von Mises n = 355/(√3·250) = 0.82 (fails); maximum principal would give 470/250 = 1.88.
    const result = evaluateState(t(0, 0, 0, 250), s355, all);
    expect(rated(result.checks[0]).verdict).toBe("fail");
    for (const check of result.checks.slice(2)) {
      expect(check.status).toBe("not-applicable");
      if (check.status === "not-applicable") {
        expect(check.reason).toMatch(
          /material has a yield strength, so it is taken as ductile; this criterion predicts brittle fracture/,
        );
      }
    }
    expect(result.governing?.criterion).toBe("tresca");
  });

  it("when the user asks for unsuited criteria, then they are rated, flagged and take part in the governing search", () => {
    // Uniaxial 100 MPa on a steel with Sy 355 and (for this test) Sut 150: the yield criteria give
    // n = 3.55; maximum principal gives Sut/σ1 = 1.5, the smaller margin.
    const material = { ...s355, ultimateTension: 150 };
    const asked = evaluateState(t(100, 0), material, all, { includeUnsuited: true });
    const mp = rated(asked.checks[2]);
    expect(mp.factor).toBeCloseTo(1.5, 12);
    expect(mp.unsuited).toMatch(/ductile/);
    expect(asked.governing?.criterion).toBe("max-principal");
    const rows: ComparisonRow[] = [{ caseId: "a", locationId: "l", evaluation: asked }];
    expect(findOverallGoverning(rows)?.criterion).toBe("max-principal");
    const notAsked = evaluateState(t(100, 0), material, all);
    expect(notAsked.checks[2].status).toBe("not-applicable");
    expect(notAsked.governing?.criterion).toBe("von-mises");
  });

  it("when the material is stated brittle although it has a yield strength, then von Mises and Tresca are not applicable", () => {
    const result = evaluateState(t(100, 0), { ...s355, behaviour: "brittle" }, all);
    expect(result.checks.slice(0, 2).map((c) => c.status)).toEqual(["not-applicable", "not-applicable"]);
    expect(unsuitedReason("von-mises", { ...s355, behaviour: "brittle" })).toMatch(/set as brittle/);
    expect(materialBehaviour({ ultimateTension: 200, ultimateCompression: 700 })).toEqual({
      behaviour: "brittle",
      basis: "yield strength",
    });
  });

  it("when modified Mohr meets a material with Suc < Sut (σ = (200, −200) MPa, Sut 700, Suc 200), then it is refused with the assumption named instead of n = 3.5 (Shigley's Mechanical Engineering Design, brittle-material criteria: modified Mohr is drawn for Suc ≥ Sut; recalled from memory)", () => {
    const material = { ultimateTension: 700, ultimateCompression: 200 };
    expect(() => safetyFactor(t(200, -200), "modified-mohr", material)).toThrow(
      /modified Mohr assumes a compressive strength at least equal to the tensile one \(Suc ≥ Sut\); this material has Suc 200 < Sut 700/,
    );
    const check = evaluateState(t(200, -200), material, [{ criterion: "modified-mohr", requiredFactor: 1 }])
      .checks[0];
    expect(check).toMatchObject({ status: "not-evaluated", missing: [] });
    if (check.status === "not-evaluated") expect(check.reason).toMatch(/Suc ≥ Sut/);
    // Mohr–Coulomb has no such assumption: 1/n = σ1/St − σ3/Sc = 200/700 + 200/200, so n < 1 here.
    const mc = rated(
      evaluateState(t(200, -200), material, [{ criterion: "mohr-coulomb", requiredFactor: 1 }]).checks[0],
    );
    expect(mc.factor).toBeCloseTo(1 / (200 / 700 + 1), 12);
  });
});

describe("allowables per load-case category", () => {
  const allowables: Allowables = {
    defaults: [
      { criterion: "von-mises", requiredFactor: 1.5 },
      { criterion: "tresca", requiredFactor: 1.5 },
    ],
    categories: [
      { category: "test", factors: { "von-mises": 1.1, tresca: 1.1 } },
      { category: "Upset", factors: { tresca: 1.25 } },
    ],
  };

  it("when a category has factors, then its factors are used and named; criteria it does not list keep the default", () => {
    expect(requirementsFor(allowables, "test")).toEqual([
      { criterion: "von-mises", requiredFactor: 1.1, category: "test" },
      { criterion: "tresca", requiredFactor: 1.1, category: "test" },
    ]);
    expect(requirementsFor(allowables, " upset ")).toEqual([
      { criterion: "von-mises", requiredFactor: 1.5, category: null },
      { criterion: "tresca", requiredFactor: 1.25, category: "Upset" },
    ]);
  });

  it("when a case has no category or one with no factors, then the project default applies", () => {
    for (const c of ["", "operating", null]) {
      expect(requirementsFor(allowables, c)).toEqual([
        { criterion: "von-mises", requiredFactor: 1.5, category: null },
        { criterion: "tresca", requiredFactor: 1.5, category: null },
      ]);
    }
  });

  it("when a test case has the larger stress but a smaller required factor, then the governing search weighs each row against its own category's factor", () => {
    const material = { yield: 300 };
    // Design: σ 150 → n 2, u = 1.5/2 = 0.75. Test: σ 230 → n 1.304, u = 1.1/1.304 = 0.843: the test case governs.
    // Upset σ 200 → n 1.5, Tresca u = 1.25/1.5 = 0.833 and von Mises u = 1.5/1.5 = 1.
    const row = (caseId: string, category: string, s: number): ComparisonRow => ({
      caseId,
      locationId: "shell",
      evaluation: evaluateState(t(s, 0), material, requirementsFor(allowables, category)),
    });
    const rows = [row("design", "design", 150), row("test", "test", 230), row("upset", "upset", 200)];
    const governing = findGoverning(rows);
    expect(governing.find((g) => g.criterion === "tresca")).toMatchObject({ caseId: "test" });
    expect(governing.find((g) => g.criterion === "von-mises")).toMatchObject({ caseId: "upset" });
    expect(governing.find((g) => g.criterion === "tresca")?.check.category).toBe("test");
    expect(findOverallGoverning(rows)).toMatchObject({ caseId: "upset", criterion: "von-mises" });
  });
});

describe("evaluateBatch past a bad row", () => {
  it("when one row of a table has a NaN component, then that row's checks are not evaluated with the reason and every other row equals evaluateState", () => {
    // The finite-element point tables go through here: one bad row must not stop the rest
    // (product rule, issue 9); the good rows are checked against the single-state path.
    const material = { yield: 250, ultimateTension: 400 };
    const requirements: CheckRequirement[] = [
      { criterion: "von-mises", requiredFactor: 1.5 },
      { criterion: "tresca", requiredFactor: 1.5 },
    ];
    const states = [t(100, 20, 0, 30), t(Number.NaN, 0), t(-80, 40, 10, 0, 5, -5)];
    const packed = new Float64Array(states.flatMap((s) => [s.xx, s.yy, s.zz, s.xy, s.yz, s.zx]));
    const out = evaluateBatch(packed, () => ({ material, requirements }));
    expect(out).toHaveLength(3);
    for (const check of out[1].checks) {
      expect(check.status).toBe("not-evaluated");
      if (check.status === "not-evaluated") expect(check.reason).toMatch(/not a finite number/);
    }
    expect(out[1].governing).toBeNull();
    for (const k of [0, 2]) expect(out[k]).toEqual(evaluateState(states[k], material, requirements));
  });
});
