import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { planeStress } from "../plane/plane-stress";
import {
  deltaRosette,
  microstrain,
  principalStrains,
  rectangularRosette,
  strain,
  stressFromStrain,
  threeGaugeRosette,
  toMicrostrain,
  transformStrain,
  type PlaneStrain,
} from "./rosette";

const ue = fc.double({ min: -3000, max: 3000, noNaN: true });
const angle = fc.double({ min: -180, max: 180, noNaN: true });
const gap = fc.double({ min: 20, max: 70, noNaN: true });
/** A random strain field, in plain strain. */
const field = fc.tuple(ue, ue, ue).map(([ex, ey, gxy]): PlaneStrain => ({
  ex: microstrain(ex),
  ey: microstrain(ey),
  gxy: microstrain(gxy),
}));
const read = (f: PlaneStrain, theta: number) => transformStrain(f.ex, f.ey, f.gxy, theta);
/** Absolute tolerance for strains of a few thousand µε. */
const TOL = 1e-15;

describe("strain-gauge rosettes and strain transformation (handbook formulas, common practice, no source)", () => {
  it("when a rectangular and a delta rosette read the same strain field, then both give the field back and the same principal strains", () => {
    fc.assert(
      fc.property(field, (f) => {
        const rect = rectangularRosette(read(f, 0), read(f, 45), read(f, 90));
        const delta = deltaRosette(read(f, 0), read(f, 60), read(f, 120));
        for (const r of [rect, delta]) {
          expect(Math.abs(r.ex - f.ex)).toBeLessThanOrEqual(TOL);
          expect(Math.abs(r.ey - f.ey)).toBeLessThanOrEqual(TOL);
          expect(Math.abs(r.gxy - f.gxy)).toBeLessThanOrEqual(TOL);
        }
        const a = principalStrains(rect);
        const b = principalStrains(delta);
        expect(Math.abs(a.e1 - b.e1)).toBeLessThanOrEqual(TOL);
        expect(Math.abs(a.e2 - b.e2)).toBeLessThanOrEqual(TOL);
      }),
      { seed: 31, numRuns: 1000 },
    );
  });

  it("when three gauges at any distinct angles read a field, then the general solve gives the field back", () => {
    fc.assert(
      fc.property(field, angle, gap, gap, (f, a, g1, g2) => {
        // gaps of 20°–70° keep all three directions at least 20° apart modulo 180°
        const [b, c] = [a + g1, a + g1 + g2];
        const r = threeGaugeRosette([
          { angle: a, strain: read(f, a) },
          { angle: b, strain: read(f, b) },
          { angle: c, strain: read(f, c) },
        ]);
        expect(Math.abs(r.ex - f.ex)).toBeLessThanOrEqual(1e-12);
        expect(Math.abs(r.ey - f.ey)).toBeLessThanOrEqual(1e-12);
        expect(Math.abs(r.gxy - f.gxy)).toBeLessThanOrEqual(1e-12);
      }),
      { seed: 32, numRuns: 1000 },
    );
  });

  it("when the strain is transformed to the ε1 direction, then it reads ε1, and at θ + 90° it reads ε2", () => {
    fc.assert(
      fc.property(field, (f) => {
        const p = principalStrains(f);
        expect(p.thetaE1).toBeGreaterThan(-90);
        expect(p.thetaE1).toBeLessThanOrEqual(90);
        expect(Math.abs(read(f, p.thetaE1) - p.e1)).toBeLessThanOrEqual(TOL);
        expect(Math.abs(read(f, p.thetaE1 + 90) - p.e2)).toBeLessThanOrEqual(TOL);
        expect(p.gammaMaxInPlane).toBeCloseTo(p.e1 - p.e2, 15);
      }),
      { seed: 33, numRuns: 1000 },
    );
  });

  it("when strains become stresses, then the principal stresses from ε1, ε2 equal those of σx, σy, τxy and act at the angle of ε1 (isotropic Hooke's law)", () => {
    fc.assert(
      fc.property(field, fc.double({ min: 0, max: 0.49, noNaN: true }), (f, nu) => {
        const s = stressFromStrain(f, { E: 200_000, nu });
        const p = planeStress(s.sx, s.sy, s.txy);
        const tol = 1e-9 * (Math.abs(s.sx) + Math.abs(s.sy) + Math.abs(s.txy) + 1e-300);
        expect(Math.abs(p.s1 - s.s1)).toBeLessThanOrEqual(tol);
        expect(Math.abs(p.s2 - s.s2)).toBeLessThanOrEqual(tol);
        if (p.radius > 1e-6) expect(Math.abs(p.thetaP - s.thetaP)).toBeLessThan(1e-6);
        expect(s.tensor).toEqual({ xx: s.sx, yy: s.sy, zz: 0, xy: s.txy, yz: 0, zx: 0 });
      }),
      { seed: 34, numRuns: 1000 },
    );
  });

  it("when a uniaxial stress σ is applied, then its strains εx = σ/E, εy = −νσ/E come back as σx = σ, σy = 0 (Hooke's law)", () => {
    const E = 210e9;
    const nu = 0.3;
    const s = stressFromStrain(
      { ex: strain(100e6 / E), ey: strain((-nu * 100e6) / E), gxy: strain(0) },
      { E, nu },
    );
    expect(s.sx).toBeCloseTo(100e6, 3);
    expect(Math.abs(s.sy)).toBeLessThan(1e-6);
    expect(s.G).toBeCloseTo(E / 2.6, 3);
  });

  it("when micro-strain is converted, then 1 µε = 10⁻⁶ and back", () => {
    expect(microstrain(420)).toBeCloseTo(4.2e-4, 18);
    expect(toMicrostrain(microstrain(-90))).toBeCloseTo(-90, 12);
  });

  it("when an input is missing, not finite or out of range, or two gauges are parallel, then the error names it", () => {
    const z = strain(0);
    expect(() => rectangularRosette(z, strain(Number.NaN), z)).toThrow(/e45/);
    expect(() => deltaRosette(z, z, "1" as never)).toThrow(/e120 must be a number/);
    expect(() => transformStrain(z, z, z, Number.POSITIVE_INFINITY)).toThrow(/thetaDeg/);
    expect(() => principalStrains({ ex: z, ey: z } as never)).toThrow(/strain.gxy/);
    expect(() => stressFromStrain({ ex: z, ey: z, gxy: z }, { E: -1, nu: 0.3 })).toThrow(/material.E/);
    expect(() => stressFromStrain({ ex: z, ey: z, gxy: z }, { E: 1, nu: 0.5 })).toThrow(/material.nu/);
    expect(() => stressFromStrain({ ex: z, ey: z, gxy: z }, undefined as never)).toThrow(TypeError);
    expect(() =>
      threeGaugeRosette([
        { angle: 0, strain: z },
        { angle: 180, strain: z },
        { angle: 90, strain: z },
      ]),
    ).toThrow(/differ modulo 180/);
    expect(() => threeGaugeRosette([{ angle: 0, strain: z }] as never)).toThrow(/exactly three/);
    expect(() =>
      threeGaugeRosette([
        { angle: 0, strain: z },
        { angle: Number.NaN, strain: z },
        { angle: 90, strain: z },
      ]),
    ).toThrow(/gauges\[1\].angle/);
  });
});
