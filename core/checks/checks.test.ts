import { eigs } from "mathjs";
import { describe, expect, it } from "vitest";
import { seededRandom } from "../testing/fixtures";
import type { StressTensor } from "../tensor/types";
import { combineLoadCases } from "./combine";
import { evaluateState, type CheckRequirement } from "./evaluate";
import { findGoverning, type ComparisonRow } from "./governing";
import { missingStrengths } from "./requirements";
import {
  CLOSE_BAND,
  CLOSE_UTILISATION,
  utilisation,
  verdictForFactor,
  verdictForUtilisation,
} from "./verdict";

const tensor = (xx: number, yy: number, zz: number, xy: number, yz: number, zx: number): StressTensor => ({
  xx,
  yy,
  zz,
  xy,
  yz,
  zx,
});

function randomTensor(next: () => number, scale = 300): StressTensor {
  const r = () => (2 * next() - 1) * scale;
  return tensor(r(), r(), r(), r(), r(), r());
}

/** Principal stresses by mathjs (an independent eigen solver), sorted σ1 ≥ σ2 ≥ σ3. */
function mathjsPrincipal(s: StressTensor): number[] {
  const { values } = eigs([
    [s.xx, s.xy, s.zx],
    [s.xy, s.yy, s.yz],
    [s.zx, s.yz, s.zz],
  ]);
  return (values as number[]).slice().sort((a, b) => b - a);
}

describe("combineLoadCases (superposition; common practice, no source: linear elasticity)", () => {
  it("when cases are combined with factors, then each component is the factored sum", () => {
    const dead = tensor(10, -4, 0, 2, 0, 0);
    const pressure = tensor(60, 30, 0, 0, 0, 0);
    const wind = tensor(-5, 12, 1, 8, -3, 0.5);
    const combined = combineLoadCases([
      { factor: 1.0, tensor: dead },
      { factor: 1.0, tensor: pressure },
      { factor: 0.6, tensor: wind },
    ]);
    // Hand sum of the three lines above, component by component.
    expect(combined.xx).toBeCloseTo(10 + 60 - 3, 12);
    expect(combined.yy).toBeCloseTo(-4 + 30 + 7.2, 12);
    expect(combined.zz).toBeCloseTo(0.6, 12);
    expect(combined.xy).toBeCloseTo(2 + 4.8, 12);
    expect(combined.yz).toBeCloseTo(-1.8, 12);
    expect(combined.zx).toBeCloseTo(0.3, 12);
  });

  it("when factors and stresses are too large to add, then the overflow is refused, not returned as Infinity", () => {
    expect(() => combineLoadCases([{ factor: 1e10, tensor: tensor(1e300, 0, 0, 0, 0, 0) }])).toThrow(
      "the combined xx component overflows (Infinity); check the factors and stresses",
    );
  });

  it("when no case is given, then the combination is the zero state", () => {
    expect(combineLoadCases([])).toEqual(tensor(0, 0, 0, 0, 0, 0));
  });

  it("when a factor is not finite, then it says which term", () => {
    expect(() =>
      combineLoadCases([
        { factor: 1, tensor: tensor(1, 0, 0, 0, 0, 0) },
        { factor: NaN, tensor: tensor(1, 0, 0, 0, 0, 0) },
      ]),
    ).toThrow("terms[1].factor must be finite, got NaN");
  });

  it("when the combined state is evaluated, then its principal stresses match mathjs on the summed tensor (200 seeded pairs)", () => {
    const next = seededRandom(606);
    for (let i = 0; i < 200; i++) {
      const a = randomTensor(next);
      const b = randomTensor(next);
      const fa = 0.5 + next();
      const fb = -1 + 2 * next();
      const combined = combineLoadCases([
        { factor: fa, tensor: a },
        { factor: fb, tensor: b },
      ]);
      const summed = tensor(
        fa * a.xx + fb * b.xx,
        fa * a.yy + fb * b.yy,
        fa * a.zz + fb * b.zz,
        fa * a.xy + fb * b.xy,
        fa * a.yz + fb * b.yz,
        fa * a.zx + fb * b.zx,
      );
      const reference = mathjsPrincipal(summed);
      const found = evaluateState(combined, { yield: 355 }, []).principal;
      for (let k = 0; k < 3; k++) expect(Math.abs(found[k] - reference[k])).toBeLessThan(1e-9);
    }
  });
});

describe("evaluateState", () => {
  const requirements: CheckRequirement[] = [
    { criterion: "von-mises", requiredFactor: 1.5 },
    { criterion: "tresca", requiredFactor: 1.5 },
    { criterion: "mohr-coulomb", requiredFactor: 2 },
  ];

  it("when a state is evaluated, then von Mises, Tresca and maximum shear agree with the handbook formulas on mathjs's principal stresses (500 seeded states)", () => {
    // σvm = √(((σ1−σ2)² + (σ2−σ3)² + (σ3−σ1)²)/2); Tresca σ1 − σ3; τmax = (σ1 − σ3)/2
    // (distortion-energy and maximum-shear theories as in machine-design handbooks; formulas recalled from memory).
    const next = seededRandom(707);
    for (let i = 0; i < 500; i++) {
      const s = randomTensor(next);
      const [p1, p2, p3] = mathjsPrincipal(s);
      const result = evaluateState(s, { yield: 355 }, requirements);
      const vm = Math.sqrt(((p1 - p2) ** 2 + (p2 - p3) ** 2 + (p3 - p1) ** 2) / 2);
      expect(result.vonMises).toBeCloseTo(vm, 9);
      expect(result.tresca).toBeCloseTo(p1 - p3, 9);
      expect(result.maxShear).toBeCloseTo((p1 - p3) / 2, 9);
    }
  });

  it("when the material has a yield strength only, then von Mises and Tresca are checked and Mohr–Coulomb says which strengths it lacks", () => {
    const s = tensor(120, 40, 0, 30, 0, 0);
    const result = evaluateState(s, { yield: 355 }, requirements);
    const [vm, tr, mc] = result.checks;
    expect(vm).toMatchObject({ criterion: "von-mises", requiredFactor: 1.5 });
    if (vm.status !== "evaluated" || tr.status !== "evaluated") {
      throw new Error("von Mises and Tresca must be evaluated");
    }
    // Plane stress σx = 120, σy = 40, τxy = 30: σA,B = 80 ± √(40² + 30²) = 130, 30 (Mohr's circle,
    // common practice, no source); with σ3 = 0, σvm = √(130² − 130·30 + 30²) = √13 900 and Tresca = 130.
    expect(vm.factor).toBeCloseTo(355 / Math.sqrt(13_900), 12);
    expect(vm.utilisation).toBeCloseTo((1.5 * Math.sqrt(13_900)) / 355, 12);
    expect(tr.factor).toBeCloseTo(355 / 130, 12);
    expect(mc).toEqual({
      criterion: "mohr-coulomb",
      requiredFactor: 2,
      category: null,
      status: "not-evaluated",
      missing: ["ultimateTension", "ultimateCompression"],
      reason: "needs the tensile strength Sut and compressive strength Suc",
    });
  });

  it("when the state is zero, then every factor is infinite and every verdict passes", () => {
    const result = evaluateState(
      tensor(0, 0, 0, 0, 0, 0),
      { yield: 250, ultimateTension: 400, ultimateCompression: 900 },
      requirements,
      { includeUnsuited: true },
    );
    expect(result.checks).toHaveLength(3);
    for (const check of result.checks) {
      expect(check).toMatchObject({ factor: Infinity, utilisation: 0, verdict: "pass" });
    }
  });
});

describe("verdicts (common practice, no source: a check passes when n ≥ n_required)", () => {
  it("when the band edge is drawn on a utilisation chart, then it sits where n = 1.1 × n_required", () => {
    expect(CLOSE_BAND).toBe(0.1);
    expect(CLOSE_UTILISATION * 1.1).toBeCloseTo(1, 15);
    expect(utilisation(1.5 * 1.1, 1.5)).toBeCloseTo(CLOSE_UTILISATION, 15);
  });

  it("when the factor is below, at, just under 10 % above and 10 % above the required one, then fail, close, close, pass", () => {
    expect(verdictForFactor(1.49, 1.5)).toBe("fail");
    expect(verdictForFactor(1.5, 1.5)).toBe("close");
    expect(verdictForFactor(1.64, 1.5)).toBe("close");
    expect(verdictForFactor(1.66, 1.5)).toBe("pass");
    expect(verdictForFactor(Infinity, 1.5)).toBe("pass");
  });

  it("when the factor is exactly 10 % above the required one (1.65 against 1.5, though 1.5 × 1.1 = 1.6500000000000001 in doubles), then it passes", () => {
    expect(1.5 * 1.1).not.toBe(1.65); // the rounding this rule must survive
    expect(verdictForFactor(1.65, 1.5)).toBe("pass");
    expect(verdictForFactor(2.2, 2)).toBe("pass");
    expect(verdictForFactor(1.32, 1.2)).toBe("pass");
    expect(verdictForFactor(1.375, 1.25)).toBe("pass");
  });

  it("when factors are drawn around the edges (2000 seeded cases), then 10 % above passes, a millionth below it is close, a millionth below the required fails, and the verdict is the one of the utilisation the chart draws", () => {
    const next = seededRandom(909);
    for (let i = 0; i < 2000; i++) {
      const hundredths = Math.round((1 + 3 * next()) * 100);
      const required = hundredths / 100; // typed with two decimals
      const edge = (hundredths * 11) / 1000; // exactly 10 % above, as it would be typed
      expect(verdictForFactor(edge, required)).toBe("pass");
      expect(verdictForFactor(edge * (1 - 1e-6), required)).toBe("close");
      expect(verdictForFactor(required, required)).toBe("close");
      expect(verdictForFactor(required * (1 - 1e-6), required)).toBe("fail");
      const n = required * (0.5 + 2 * next());
      expect(verdictForFactor(n, required)).toBe(verdictForUtilisation(required / n));
    }
  });

  it("when the factor found equals the factor required, then the utilisation is exactly 1", () => {
    expect(utilisation(1.5, 1.5)).toBe(1);
    expect(utilisation(3, 1.5)).toBe(0.5);
    expect(utilisation(Infinity, 1.5)).toBe(0);
  });

  it("when a factor is not positive, then it is refused with the value named", () => {
    expect(() => utilisation(0, 1.5)).toThrow("factor must be a positive number, got 0");
    expect(() => utilisation(2, -1)).toThrow("requiredFactor must be a positive finite number, got -1");
    expect(() => verdictForFactor(NaN, 1.5)).toThrow("factor must be a positive number, got NaN");
  });
});

describe("missingStrengths", () => {
  it("when a strength is absent, zero, negative or not finite, then it is reported missing", () => {
    expect(missingStrengths("von-mises", {})).toEqual(["yield"]);
    expect(missingStrengths("von-mises", { yield: 0 })).toEqual(["yield"]);
    expect(missingStrengths("tresca", { yield: -5 })).toEqual(["yield"]);
    expect(missingStrengths("max-principal", { ultimateTension: Infinity })).toEqual(["ultimateTension"]);
    expect(missingStrengths("modified-mohr", { ultimateTension: 200 })).toEqual(["ultimateCompression"]);
    expect(missingStrengths("mohr-coulomb", { ultimateTension: 200, ultimateCompression: 700 })).toEqual([]);
  });
});

describe("findGoverning", () => {
  const material = { yield: 300 };
  const reqs: CheckRequirement[] = [
    { criterion: "von-mises", requiredFactor: 1.5 },
    { criterion: "tresca", requiredFactor: 1.5 },
  ];
  const row = (caseId: string, locationId: string, s: StressTensor): ComparisonRow => ({
    caseId,
    locationId,
    evaluation: evaluateState(s, material, reqs),
  });
  // Uniaxial σ: n = Sy/σ for both criteria (common practice, no source).
  const rows = [
    row("operating", "shell", tensor(100, 0, 0, 0, 0, 0)),
    row("test", "shell", tensor(180, 0, 0, 0, 0, 0)),
    row("design", "junction", tensor(150, 0, 0, 0, 0, 0)),
    // Pure shear τ: von Mises n = Sy/(√3 τ), Tresca n = Sy/(2τ) — Tresca is the harsher one here.
    row("upset", "junction", tensor(0, 0, 0, 95, 0, 0)),
  ];

  it("when several cases compete, then the highest utilisation governs, per criterion", () => {
    const governing = findGoverning(rows);
    const vm = governing.find((g) => g.criterion === "von-mises")!;
    const tr = governing.find((g) => g.criterion === "tresca")!;
    expect(vm).toMatchObject({ caseId: "test", locationId: "shell" });
    expect(vm.check.factor).toBeCloseTo(300 / 180, 12);
    expect(tr).toMatchObject({ caseId: "upset", locationId: "junction" });
    expect(tr.check.factor).toBeCloseTo(300 / 190, 12);
    expect(tr.check.verdict).toBe("close");
  });

  it("when a location is named, then only its rows compete", () => {
    // At the junction: von Mises √3·95 = 164.5 (upset) beats 150 (design); overall, 180 (test) governs.
    const atJunction = findGoverning(rows, "junction");
    expect(atJunction.find((g) => g.criterion === "von-mises")).toMatchObject({ caseId: "upset" });
    const atShell = findGoverning(rows, "shell");
    expect(atShell.map((g) => g.caseId)).toEqual(["test", "test"]);
  });

  it("when two rows tie, then the first one given governs", () => {
    const tied = [
      row("b-first", "x", tensor(100, 0, 0, 0, 0, 0)),
      row("a-second", "x", tensor(100, 0, 0, 0, 0, 0)),
    ];
    expect(findGoverning(tied)[0].caseId).toBe("b-first");
  });

  it("when no row can evaluate a criterion, then that criterion is left out", () => {
    const noStrength: ComparisonRow = {
      caseId: "c",
      locationId: "l",
      evaluation: evaluateState(tensor(1, 0, 0, 0, 0, 0), {}, reqs),
    };
    expect(findGoverning([noStrength])).toEqual([]);
  });
});
