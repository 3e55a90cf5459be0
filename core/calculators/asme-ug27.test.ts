import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ug27RequiredThickness } from "./asme-ug27";

// UG-27 of ASME BPVC Section VIII Division 1 (formulas recalled from memory: verify against the
// code edition you work to). The published-style sphere example is in core/testing/reference-cases.ts
// (asme-ug27d-sphere) and runs in core/reference-cases.test.ts.

describe("UG-27 required thickness under internal pressure", () => {
  it("when a cylinder has P = 1.5 MPa, R = 600 mm, S = 138 MPa, E = 1 and CA = 3 mm, then (c)(1) asks 900/137.1 = 6.5646 mm, (c)(2) 900/276.6 = 3.2538 mm, and 9.5646 mm with the allowance (UG-27(c), recalled from memory; hand arithmetic)", () => {
    const r = ug27RequiredThickness("cylinder", {
      pressure: 1.5,
      insideRadius: 600,
      allowableStress: 138,
      jointEfficiency: 1,
      corrosionAllowance: 3,
    });
    expect(r.formulas.map((f) => f.paragraph)).toEqual(["UG-27(c)(1)", "UG-27(c)(2)"]);
    expect(r.formulas[0].thickness).toBeCloseTo(6.5646, 4);
    expect(r.formulas[1].thickness).toBeCloseTo(3.2538, 4);
    expect(r.governing.paragraph).toBe("UG-27(c)(1)");
    expect(r.required).toBe(r.formulas[0].thickness);
    expect(r.requiredWithCorrosion).toBeCloseTo(9.5646, 4);
    expect(r.applicable).toBe(true);
    expect(r.formulas[0].pressureLimit).toBeCloseTo(0.385 * 138, 12);
    expect(r.formulas[0].thicknessLimit).toBe(300);
  });

  it("when the thickness found is put back, then each formula's stress P(R + 0.6t)/t, P(R − 0.4t)/(2t) and P(R + 0.2t)/(2t) equals S·E (the formulas rearranged; property on random inputs)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 50, noNaN: true }),
        fc.double({ min: 10, max: 5000, noNaN: true }),
        fc.double({ min: 50, max: 500, noNaN: true }),
        fc.double({ min: 0.5, max: 1, noNaN: true }),
        (P, R, S, E) => {
          fc.pre(P < 0.38 * S * E);
          const cyl = ug27RequiredThickness("cylinder", {
            pressure: P,
            insideRadius: R,
            allowableStress: S,
            jointEfficiency: E,
          });
          const [circ, long] = cyl.formulas.map((f) => f.thickness);
          expect((P * (R + 0.6 * circ)) / circ / (S * E)).toBeCloseTo(1, 10);
          expect((P * (R - 0.4 * long)) / (2 * long) / (S * E)).toBeCloseTo(1, 10);
          // the hoop formula always governs a cylinder under internal pressure
          expect(cyl.governing.paragraph).toBe("UG-27(c)(1)");
          const t = ug27RequiredThickness("sphere", {
            pressure: P,
            insideRadius: R,
            allowableStress: S,
            jointEfficiency: E,
          }).required;
          expect((P * (R + 0.2 * t)) / (2 * t) / (S * E)).toBeCloseTo(1, 10);
        },
      ),
      { seed: 27, numRuns: 300 },
    );
  });

  it("when P passes 0.385·S·E on a cylinder or 0.665·S·E on a sphere, then the result says the formulas do not apply (the code's limits, recalled from memory)", () => {
    const base = { insideRadius: 100, allowableStress: 100, jointEfficiency: 1 };
    expect(ug27RequiredThickness("cylinder", { ...base, pressure: 38 }).applicable).toBe(true);
    const thick = ug27RequiredThickness("cylinder", { ...base, pressure: 39 });
    expect(thick.applicable).toBe(false);
    expect(thick.formulas[0].applicable).toBe(false);
    // 39/(100 − 23.4) = 0.509 R: past R/2 too
    expect(thick.formulas[0].thickness).toBeGreaterThan(50);
    expect(thick.formulas[1].applicable).toBe(true);
    expect(ug27RequiredThickness("sphere", { ...base, pressure: 66 }).applicable).toBe(true);
    expect(ug27RequiredThickness("sphere", { ...base, pressure: 67 }).applicable).toBe(false);
  });

  it("when an input is impossible, then the error names it", () => {
    const ok = { pressure: 1, insideRadius: 100, allowableStress: 100, jointEfficiency: 1 };
    expect(() => ug27RequiredThickness("cone" as never, ok)).toThrow(/shape must be one of/);
    expect(() => ug27RequiredThickness("cylinder", { ...ok, pressure: 0 })).toThrow(/input.pressure/);
    expect(() => ug27RequiredThickness("cylinder", { ...ok, insideRadius: -1 })).toThrow(
      /input.insideRadius/,
    );
    expect(() => ug27RequiredThickness("cylinder", { ...ok, allowableStress: Number.NaN })).toThrow(
      /input.allowableStress/,
    );
    expect(() => ug27RequiredThickness("sphere", { ...ok, jointEfficiency: 1.2 })).toThrow(
      /input.jointEfficiency/,
    );
    expect(() => ug27RequiredThickness("sphere", { ...ok, corrosionAllowance: -1 })).toThrow(
      /input.corrosionAllowance/,
    );
    expect(() => ug27RequiredThickness("cylinder", { ...ok, pressure: 200 })).toThrow(
      /input.pressure 200 is too high for UG-27\(c\)\(1\)/,
    );
  });
});
