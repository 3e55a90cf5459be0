import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { vonMises } from "../tensor/invariants";
import { thinCylinder, thinSphere } from "./thin-wall";

const pressure = fc.double({ min: -10, max: 10, noNaN: true });
const radius = fc.double({ min: 1, max: 5000, noNaN: true });
const wall = fc.double({ min: 0.1, max: 100, noNaN: true });
const close = (a: number, b: number) =>
  expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-12 * (Math.abs(b) + 1e-300));

describe("thin-walled cylinder and sphere (membrane formulas, any strength-of-materials text)", () => {
  it("when a closed cylinder is pressurised, then hoop = 2 × axial, the tensor is x axial, y hoop, z radial and σr = 0 (common practice, no source)", () => {
    fc.assert(
      fc.property(pressure, radius, wall, (p, r, t) => {
        const c = thinCylinder(p, r, t);
        close(c.hoop, (p * r) / t);
        close(c.hoop, 2 * c.axial);
        expect(c.tensor).toEqual({ xx: c.axial, yy: c.hoop, zz: 0, xy: 0, yz: 0, zx: 0 });
        expect(c.radiusOverWall).toBeCloseTo(r / t, 12);
      }),
      { seed: 71, numRuns: 500 },
    );
  });

  it("when a sphere and a cylinder have the same p, r, t, then the sphere's stress equals the cylinder's axial stress (common practice, no source)", () => {
    fc.assert(
      fc.property(pressure, radius, wall, (p, r, t) => {
        const s = thinSphere(p, r, t);
        close(s.hoop, thinCylinder(p, r, t).axial);
        expect(s.axial).toBe(s.hoop);
      }),
      { seed: 72, numRuns: 500 },
    );
  });

  it("when the mean-diameter form is asked for, then hoop = p(dᵢ + t)/(2t), axial = p·dᵢ/(4t) (Shigley's thin-wall forms), larger in hoop by (1 + t/dᵢ)", () => {
    const inside = thinCylinder(3.5, 48.45, 1.55);
    const mean = thinCylinder(3.5, 48.45, 1.55, { form: "mean-diameter" });
    close(mean.hoop, (3.5 * (96.9 + 1.55)) / (2 * 1.55));
    close(mean.axial, (3.5 * 96.9) / (4 * 1.55));
    close(mean.hoop / inside.hoop, 1 + 1.55 / 96.9);
    close(thinSphere(2, 100, 4, { form: "mean-diameter" }).hoop, (2 * (200 + 4)) / (4 * 4));
  });

  it("when the inner surface is asked for, then σr = −p; the membrane choice gives 0, also at p = 0 (not −0)", () => {
    expect(thinCylinder(2, 500, 10, { radial: "inner-surface" }).tensor.zz).toBe(-2);
    expect(thinSphere(-0.1, 500, 10, { radial: "inner-surface" }).radial).toBe(0.1);
    expect(Object.is(thinCylinder(0, 500, 10, { radial: "inner-surface" }).radial, 0)).toBe(true);
    expect(thinCylinder(2, 500, 10).radial).toBe(0);
    // σ = 40p, 40p, −p → σvm = 41p (thin sphere with its inner-surface radial stress, hand arithmetic)
    expect(vonMises(thinSphere(1, 100, 1.25, { radial: "inner-surface" }).tensor)).toBeCloseTo(41, 12);
  });

  it("when the pressure is a vacuum, then both membrane stresses are compressive", () => {
    const v = thinCylinder(-0.1, 600, 8);
    expect(v.hoop).toBeCloseTo(-7.5, 12);
    expect(v.axial).toBeCloseTo(-3.75, 12);
  });

  it("when an input is not a finite number, a size is not positive or an option is unknown, then the error names it", () => {
    expect(() => thinCylinder(Number.NaN, 1, 1)).toThrow(/pressure/);
    expect(() => thinCylinder("1" as unknown as number, 1, 1)).toThrow(TypeError);
    expect(() => thinCylinder(1, 0, 1)).toThrow(/insideRadius must be positive/);
    expect(() => thinSphere(1, 1, -1)).toThrow(/wall must be positive/);
    expect(() => thinSphere(1, 1, Number.POSITIVE_INFINITY)).toThrow(RangeError);
    expect(() => thinCylinder(1, 1, 1, { form: "outside" as never })).toThrow(/options.form/);
    expect(() => thinCylinder(1, 1, 1, { radial: "mid" as never })).toThrow(/options.radial/);
    expect(() => thinCylinder(1, 1, 1, null as never)).toThrow(/options must be an object/);
  });
});
