import { beforeEach, describe, expect, it, vi } from "vitest";
import { CRITERIA } from "../constants/criteria";
import * as sym3 from "../eigen/sym3";
import { safetyFactor, type Material } from "../criteria/safety-factor";
import { seededRandom } from "../testing/fixtures";
import { tresca, vonMises } from "../tensor/invariants";
import { principalValues } from "../tensor/principal";
import type { StressTensor } from "../tensor/types";
import { evaluateState, evaluateStates } from "./evaluate";
import type { CheckRequirement } from "./requirements";

// Every eigen-solve in core goes through eigSym3; the spy counts them and still solves.
vi.mock("../eigen/sym3", async (importOriginal) => {
  const actual = await importOriginal<typeof import("../eigen/sym3")>();
  return { ...actual, eigSym3: vi.fn(actual.eigSym3) };
});
const solves = vi.mocked(sym3.eigSym3);
// Braces: a function returned from beforeEach would be called as its teardown.
beforeEach(() => {
  solves.mockClear();
});

/** Strengths for all five criteria, so each of them is rated (with unsuited ones included). */
const material: Material = { yield: 250, ultimateTension: 300, ultimateCompression: 900 };
const everyCriterion: CheckRequirement[] = CRITERIA.map((criterion, i) => ({
  criterion,
  requiredFactor: 1.5 + i / 4,
}));

/** Seeded states from 1e-3 to 1e3 in magnitude, a quarter of them plane stress (σz = τyz = τzx = 0). */
function randomStates(seed: number, count: number): StressTensor[] {
  const next = seededRandom(seed);
  const c = () => (2 * next() - 1) * 10 ** (6 * next() - 3);
  return Array.from({ length: count }, (_, k) =>
    k % 4 === 0
      ? { xx: c(), yy: c(), zz: 0, xy: c(), yz: 0, zx: 0 }
      : { xx: c(), yy: c(), zz: c(), xy: c(), yz: c(), zx: c() },
  );
}

describe("each state is solved once, then rated by every criterion", () => {
  it("when the five criteria are rated one by one with safetyFactor, then the spy counts four solves (von Mises needs none): the counter sees every solve", () => {
    const [s] = randomStates(11, 1);
    for (const criterion of CRITERIA) safetyFactor(s, criterion, material);
    expect(solves.mock.calls.length).toBe(4);
  });

  it("when one state is evaluated against all five criteria, then its eigenvalues are solved once and all five are rated", () => {
    const [s] = randomStates(12, 1);
    const result = evaluateState(s, material, everyCriterion, { includeUnsuited: true });
    expect(result.checks.map((c) => c.status)).toEqual(CRITERIA.map(() => "evaluated"));
    expect(solves.mock.calls.length).toBe(1);
  });

  it("when 200 states are evaluated together against all five criteria, then there are 200 solves", () => {
    const states = randomStates(13, 200).map((tensor) => ({
      tensor,
      material,
      requirements: everyCriterion,
    }));
    const results = evaluateStates(states, { includeUnsuited: true });
    expect(results.flatMap((r) => r.checks).filter((c) => c.status === "evaluated")).toHaveLength(1000);
    expect(solves.mock.calls.length).toBe(200);
  });

  it("when 2000 seeded states are evaluated once, then every factor, principal stress, von Mises and Tresca stress is exactly what the per-criterion path (safetyFactor, principalValues, vonMises, tresca) gives", () => {
    for (const s of randomStates(14, 2000)) {
      const result = evaluateState(s, material, everyCriterion, { includeUnsuited: true });
      expect(result.principal).toEqual(principalValues(s));
      expect(result.vonMises).toBe(vonMises(s));
      expect(result.tresca).toBe(tresca(s));
      for (const check of result.checks) {
        if (check.status !== "evaluated")
          throw new Error(`${check.criterion} was not rated: ${check.status}`);
        expect(check.factor).toBe(safetyFactor(s, check.criterion, material));
      }
    }
  });
});
