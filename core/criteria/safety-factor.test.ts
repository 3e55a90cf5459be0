import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { StressTensor } from "../tensor/types";
import { safetyFactor, type Criterion } from "./safety-factor";

const ZERO: StressTensor = { xx: 0, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 };
const diag = (a: number, b: number, c: number): StressTensor => ({
  xx: a,
  yy: b,
  zz: c,
  xy: 0,
  yz: 0,
  zx: 0,
});
const ALL = { yield: 250, ultimateTension: 200, ultimateCompression: 600 };

describe("safetyFactor (handbook formulas, common practice, no source)", () => {
  it("when the state is zero, then every criterion gives Infinity", () => {
    for (const c of [
      "von-mises",
      "tresca",
      "max-principal",
      "mohr-coulomb",
      "modified-mohr",
    ] as Criterion[]) {
      expect(safetyFactor(ZERO, c, ALL)).toBe(Infinity);
    }
  });

  it("when the state is hydrostatic, then von Mises and Tresca never fail (Infinity) but the Mohr criteria do", () => {
    expect(safetyFactor(diag(-80, -80, -80), "von-mises", ALL)).toBe(Infinity);
    expect(safetyFactor(diag(-80, -80, -80), "tresca", ALL)).toBe(Infinity);
    expect(safetyFactor(diag(100, 100, 100), "mohr-coulomb", ALL)).toBeCloseTo(2, 14);
  });

  it("when the state is uniaxial σ, then every criterion gives strength/σ on the loaded side", () => {
    expect(safetyFactor(diag(100, 0, 0), "von-mises", ALL)).toBeCloseTo(2.5, 14);
    expect(safetyFactor(diag(100, 0, 0), "tresca", ALL)).toBeCloseTo(2.5, 14);
    expect(safetyFactor(diag(100, 0, 0), "max-principal", ALL)).toBeCloseTo(2, 14);
    expect(safetyFactor(diag(0, 0, -100), "max-principal", ALL)).toBeCloseTo(6, 14);
    expect(safetyFactor(diag(0, 0, -100), "mohr-coulomb", ALL)).toBeCloseTo(6, 14);
    expect(safetyFactor(diag(0, 0, -100), "modified-mohr", ALL)).toBeCloseTo(6, 14);
    expect(safetyFactor(diag(0, -50, -100), "modified-mohr", ALL)).toBeCloseTo(6, 14);
  });

  it("when σ1 > 0 > σ3 with −σ3 > σ1, then modified Mohr uses the line to the compressive strength", () => {
    // 1/n = (Sc − St)σ1/(Sc·St) − σ3/Sc = (400·50)/(120000) + 150/600
    expect(safetyFactor(diag(50, 0, -150), "modified-mohr", ALL)).toBeCloseTo(
      1 / (20000 / 120000 + 0.25),
      13,
    );
    // and Mohr–Coulomb: 1/n = σ1/St − σ3/Sc = 0.25 + 0.25
    expect(safetyFactor(diag(50, 0, -150), "mohr-coulomb", ALL)).toBeCloseTo(2, 13);
  });

  it("when the state is scaled by n, then it lies on the criterion's surface (factor becomes 1)", () => {
    const tensor = fc.record({
      xx: fc.double({ min: -500, max: 500, noNaN: true }),
      yy: fc.double({ min: -500, max: 500, noNaN: true }),
      zz: fc.double({ min: -500, max: 500, noNaN: true }),
      xy: fc.double({ min: -500, max: 500, noNaN: true }),
      yz: fc.double({ min: -500, max: 500, noNaN: true }),
      zx: fc.double({ min: -500, max: 500, noNaN: true }),
    });
    const criterion = fc.constantFrom<Criterion>(
      "von-mises",
      "tresca",
      "max-principal",
      "mohr-coulomb",
      "modified-mohr",
    );
    fc.assert(
      fc.property(tensor, criterion, (s, c) => {
        const n = safetyFactor(s, c, ALL);
        fc.pre(Number.isFinite(n) && n < 1e12);
        const on = { xx: n * s.xx, yy: n * s.yy, zz: n * s.zz, xy: n * s.xy, yz: n * s.yz, zx: n * s.zx };
        expect(safetyFactor(on, c, ALL)).toBeCloseTo(1, 10);
      }),
      { seed: 424242, numRuns: 1000 },
    );
  });

  it("when a needed strength is missing or invalid, or the criterion is unknown, then a RangeError says which", () => {
    const s = diag(100, 0, 0);
    expect(() => safetyFactor(s, "von-mises", {})).toThrow(/criterion "von-mises" needs material.yield/);
    expect(() => safetyFactor(s, "tresca", { ultimateTension: 1 })).toThrow(/needs material.yield/);
    expect(() => safetyFactor(s, "max-principal", { yield: 1 })).toThrow(
      /"max-principal" needs material.ultimateTension/,
    );
    expect(() => safetyFactor(s, "mohr-coulomb", { ultimateTension: 1 })).toThrow(
      /needs material.ultimateCompression/,
    );
    expect(() => safetyFactor(s, "modified-mohr", { ultimateCompression: 1 })).toThrow(
      /needs material.ultimateTension/,
    );
    expect(() => safetyFactor(s, "von-mises", { yield: -5 })).toThrow(
      /material.yield must be a positive finite number/,
    );
    expect(() => safetyFactor(s, "von-mises", { yield: NaN })).toThrow(RangeError);
    expect(() => safetyFactor(s, "rankine" as Criterion, ALL)).toThrow(
      /unknown criterion "rankine"; expected one of von-mises, tresca/,
    );
  });
});
