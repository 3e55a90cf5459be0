import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  thickCylinder,
  thickCylinderProfile,
  thickSphere,
  thickSphereProfile,
  type CylinderEnds,
  type ThickCylinderInput,
  type ThickSphereInput,
} from "./thick-wall";
import { thinCylinder, thinSphere } from "./thin-wall";
import { vonMises } from "../tensor/invariants";

// Lamé formulas: Timoshenko & Goodier, Theory of Elasticity, and Roark's Formulas for Stress and
// Strain, thick-walled cylinders and spheres (recalled from memory; see thick-wall.ts).

const innerRadius = fc.double({ min: 0.5, max: 500, noNaN: true });
const wallOverRadius = fc.double({ min: 0.01, max: 3, noNaN: true });
// Subnormal pressures (1e-300) lose their digits in any arithmetic; they are flushed to zero here.
const pressure = fc.double({ min: -50, max: 50, noNaN: true }).map((p) => (Math.abs(p) < 1e-9 ? 0 : p));
const fraction = fc.double({ min: 0, max: 1, noNaN: true });
const ends = fc.constantFrom<CylinderEnds>("closed", "open", "plane-strain");
const nu = fc.double({ min: 0, max: 0.5, noNaN: true });

const cylinderInput = fc
  .record({ ri: innerRadius, k: wallOverRadius, pi: pressure, po: pressure, ends, nu })
  .map(({ ri, k, pi, po, ends: e, nu: v }): ThickCylinderInput => ({
    innerRadius: ri,
    outerRadius: ri * (1 + k),
    innerPressure: pi,
    outerPressure: po,
    ends: e,
    poissonRatio: v,
  }));
const sphereInput = fc
  .record({ ri: innerRadius, k: wallOverRadius, pi: pressure, po: pressure })
  .map(({ ri, k, pi, po }): ThickSphereInput => ({
    innerRadius: ri,
    outerRadius: ri * (1 + k),
    innerPressure: pi,
    outerPressure: po,
  }));

/** A radius inside the wall, 2h from each face, so that r ± h stays inside after rounding. */
const insideWall = (ri: number, ro: number, h: number, u: number) => ri + 2 * h + u * (ro - ri - 4 * h);

const near = (got: number, want: number, tol: number) =>
  expect(Math.abs(got - want)).toBeLessThanOrEqual(tol);

/** Composite Simpson's rule over evenly spaced samples (an odd number of them). */
function simpson(values: readonly number[], step: number): number {
  let sum = values[0] + values[values.length - 1];
  for (let i = 1; i < values.length - 1; i++) sum += (i % 2 === 1 ? 4 : 2) * values[i];
  return (sum * step) / 3;
}

describe("thick-walled cylinder (Lamé)", () => {
  it("when ri = 1, ro = 2, p = 100 with closed ends, then σr = −100 and σθ = 166.67 at the bore, σθ = 66.67 and σr = 0 outside, σz = 33.33 (Lamé formulas of Timoshenko & Goodier, recalled from memory: 5p/3, 2p/3, p/3 by hand)", () => {
    const input: ThickCylinderInput = { innerRadius: 1, outerRadius: 2, innerPressure: 100, ends: "closed" };
    const bore = thickCylinder(input);
    expect(bore.radius).toBe(1);
    expect(bore.radial).toBeCloseTo(-100, 12);
    expect(bore.hoop).toBeCloseTo(500 / 3, 12);
    expect(bore.axial).toBeCloseTo(100 / 3, 12);
    const outside = thickCylinder(input, 2);
    expect(outside.hoop).toBeCloseTo(200 / 3, 12);
    expect(outside.radial).toBeCloseTo(0, 12);
    expect(outside.axial).toBeCloseTo(100 / 3, 12);
    expect(bore.tensor).toEqual({ xx: bore.axial, yy: bore.hoop, zz: bore.radial, xy: 0, yz: 0, zx: 0 });
    // A = p·ri²/(ro² − ri²) = 100/3, B = p·ri²·ro²/(ro² − ri²) = 400/3
    expect(bore.lameA).toBeCloseTo(100 / 3, 12);
    expect(bore.lameB).toBeCloseTo(400 / 3, 12);
  });

  it("when the same cylinder has open ends or plane strain with ν = 0.3, then σz = 0 or ν(σr + σθ) = 0.3 × 200/3 = 20 (Lamé end conditions, hand arithmetic)", () => {
    const base = { innerRadius: 1, outerRadius: 2, innerPressure: 100 };
    expect(thickCylinder({ ...base, ends: "open" }).axial).toBe(0);
    expect(thickCylinder({ ...base, ends: "open" }, 1.5).hoop).toBeCloseTo(100 / 3 + 400 / 3 / 2.25, 12);
    const ps = thickCylinder({ ...base, ends: "plane-strain", poissonRatio: 0.3 }, 1.7);
    expect(ps.axial).toBeCloseTo(20, 12);
  });

  it("when r is random inside the wall, then radial equilibrium dσr/dr = (σθ − σr)/r holds by a central difference (Lamé equilibrium equation)", () => {
    fc.assert(
      fc.property(cylinderInput, fraction, (input, u) => {
        const { innerRadius: ri, outerRadius: ro } = input;
        const h = 1e-4 * (ro - ri);
        const r = insideWall(ri, ro, h, u);
        const at = thickCylinder(input, r);
        const dsr = (thickCylinder(input, r + h).radial - thickCylinder(input, r - h).radial) / (2 * h);
        const rhs = (at.hoop - at.radial) / r;
        // truncation ≈ 2(h/r)² of the slope (h/r ≤ 3e-4), rounding ≈ 1e-16·|σ|/h
        const rounding = (1e-12 * (Math.abs(at.lameA) + Math.abs(at.lameB) / (r * r))) / h;
        expect(Math.abs(dsr - rhs)).toBeLessThanOrEqual(1e-6 * Math.abs(rhs) + rounding + 1e-300);
      }),
      { seed: 131, numRuns: 400 },
    );
  });

  it("when the faces are approached, then σr tends to −pi at the bore and −po outside, and the faces give exactly those (boundary conditions)", () => {
    fc.assert(
      fc.property(cylinderInput, (input) => {
        const { innerRadius: ri, outerRadius: ro, innerPressure: pi } = input;
        const po = input.outerPressure ?? 0;
        expect(thickCylinder(input, ri).radial).toBe(-pi);
        expect(thickCylinder(input, ro).radial).toBe(-po);
        const near = thickCylinder(input, ri + 1e-12 * (ro - ri));
        const far = thickCylinder(input, ro - 1e-12 * (ro - ri));
        const scale = Math.abs(near.lameA) + Math.abs(near.lameB) / (ri * ri);
        expect(Math.abs(near.radial + pi)).toBeLessThanOrEqual(1e-10 * scale + 1e-300);
        expect(Math.abs(far.radial + po)).toBeLessThanOrEqual(1e-10 * scale + 1e-300);
      }),
      { seed: 132, numRuns: 400 },
    );
  });

  it("when half the cylinder is cut free, then ∫σθ dr over the wall = pi·ri − po·ro, and with closed ends σz·(ro² − ri²) = pi·ri² − po·ro² (force balance, Simpson's rule)", () => {
    fc.assert(
      fc.property(cylinderInput, (input) => {
        const { innerRadius: ri, outerRadius: ro, innerPressure: pi } = input;
        const po = input.outerPressure ?? 0;
        const profile = thickCylinderProfile(input, 401);
        const integral = simpson(
          profile.map((s) => s.hoop),
          (ro - ri) / 400,
        );
        const scale = (Math.abs(pi) + Math.abs(po)) * ro + 1e-300;
        expect(Math.abs(integral - (pi * ri - po * ro))).toBeLessThanOrEqual(1e-6 * scale);
        const closed = thickCylinder({ ...input, ends: "closed" });
        expect(
          Math.abs(closed.axial * (ro * ro - ri * ri) - (pi * ri * ri - po * ro * ro)),
        ).toBeLessThanOrEqual(1e-12 * scale * ro);
      }),
      { seed: 133, numRuns: 200 },
    );
  });

  it("when the ends are in plane strain, then σz = ν(σr + σθ) at every radius and σr + σθ is the same through the wall (Lamé: 2A)", () => {
    fc.assert(
      fc.property(cylinderInput, nu, (input, v) => {
        const profile = thickCylinderProfile({ ...input, ends: "plane-strain", poissonRatio: v }, 9);
        const sum0 = profile[0].radial + profile[0].hoop;
        for (const s of profile) {
          const scale = Math.abs(s.radial) + Math.abs(s.hoop) + 1e-300;
          expect(Math.abs(s.axial - v * (s.radial + s.hoop))).toBeLessThanOrEqual(1e-12 * scale);
          expect(Math.abs(s.radial + s.hoop - sum0)).toBeLessThanOrEqual(1e-12 * scale);
        }
      }),
      { seed: 134, numRuns: 200 },
    );
  });

  it("when the ends are closed, then the von Mises stress is √3·|B|/r² at every radius, largest at the bore (Lamé: σz = A drops out of every stress difference)", () => {
    fc.assert(
      fc.property(cylinderInput, fraction, (input, u) => {
        const closed = { ...input, ends: "closed" as const };
        const r = input.innerRadius + u * (input.outerRadius - input.innerRadius);
        const at = thickCylinder(closed, r);
        const bore = thickCylinder(closed);
        const scale = Math.abs(at.lameA) + Math.abs(at.lameB) / (r * r) + 1e-300;
        near(vonMises(at.tensor), (Math.sqrt(3) * Math.abs(at.lameB)) / (r * r), 1e-12 * scale);
        expect(vonMises(bore.tensor)).toBeGreaterThanOrEqual(vonMises(at.tensor) - 1e-12 * scale);
      }),
      { seed: 138, numRuns: 300 },
    );
  });

  it("when the same pressure acts inside and out, then σr = σθ = −p through the wall (a uniform in-plane pressure, common practice, no source)", () => {
    const s = thickCylinder(
      { innerRadius: 30, outerRadius: 45, innerPressure: 12, outerPressure: 12, ends: "closed" },
      37,
    );
    expect(s.radial).toBeCloseTo(-12, 12);
    expect(s.hoop).toBeCloseTo(-12, 12);
    expect(s.axial).toBeCloseTo(-12, 12);
  });

  it("when only an external pressure acts, then the hoop stress is compressive everywhere and largest in magnitude at the bore, −2·po·ro²/(ro² − ri²) (Lamé)", () => {
    const input: ThickCylinderInput = {
      innerRadius: 50,
      outerRadius: 80,
      innerPressure: 0,
      outerPressure: 20,
      ends: "open",
    };
    const profile = thickCylinderProfile(input, 21);
    for (const s of profile) expect(s.hoop).toBeLessThan(0);
    expect(profile[0].hoop).toBeCloseTo((-2 * 20 * 6400) / (6400 - 2500), 10);
    expect(Math.min(...profile.map((s) => s.hoop))).toBe(profile[0].hoop);
  });

  it("when t/r → 0, then the bore hoop stress tends to thin-wall p·r/t and the closed-end axial stress to p·r/(2t), each within t/r (thin-wall limit)", () => {
    let previous = Infinity;
    for (const k of [1e-1, 1e-2, 1e-3, 1e-4, 1e-5, 1e-6]) {
      const ri = 750;
      const t = k * ri;
      const lame = thickCylinder({ innerRadius: ri, outerRadius: ri + t, innerPressure: 2, ends: "closed" });
      const thin = thinCylinder(2, ri, t);
      const hoopError = Math.abs(lame.hoop / thin.hoop - 1);
      const axialError = Math.abs(lame.axial / thin.axial - 1);
      // exact: σθ(ri)/(p·r/t) = (2 + 2k + k²)/(2 + k) = 1 + k/2 + O(k²); σz/(p·r/2t) = 2/(2 + k)
      expect(hoopError).toBeLessThanOrEqual(k);
      expect(hoopError).toBeGreaterThan(0.4 * k);
      expect(axialError).toBeLessThanOrEqual(k);
      expect(hoopError).toBeLessThan(previous);
      previous = hoopError;
    }
  });

  it("when a profile is asked for, then it runs from ri to ro in equal steps with both faces exact", () => {
    const input: ThickCylinderInput = { innerRadius: 0.1, outerRadius: 0.3, innerPressure: 5, ends: "open" };
    const profile = thickCylinderProfile(input);
    expect(profile).toHaveLength(41);
    expect(profile[0].radius).toBe(0.1);
    expect(profile[40].radius).toBe(0.3);
    expect(profile[20].radius).toBeCloseTo(0.2, 15);
    expect(profile[7]).toEqual(thickCylinder(input, profile[7].radius));
    expect(thickCylinderProfile(input, 2).map((s) => s.radius)).toEqual([0.1, 0.3]);
  });

  it("when an input is missing, not finite or impossible, then the error names it", () => {
    const ok: ThickCylinderInput = { innerRadius: 1, outerRadius: 2, innerPressure: 1, ends: "closed" };
    expect(() => thickCylinder({ ...ok, innerRadius: 0 })).toThrow(/innerRadius must be positive/);
    expect(() => thickCylinder({ ...ok, outerRadius: 1 })).toThrow(/outerRadius must be larger/);
    expect(() => thickCylinder({ ...ok, outerRadius: 0.5 })).toThrow(RangeError);
    expect(() => thickCylinder({ ...ok, innerPressure: Number.NaN })).toThrow(/innerPressure/);
    expect(() => thickCylinder({ ...ok, outerPressure: Number.POSITIVE_INFINITY })).toThrow(/outerPressure/);
    expect(() => thickCylinder({ ...ok, innerRadius: "1" as never })).toThrow(TypeError);
    expect(() => thickCylinder({ ...ok, ends: "capped" as never })).toThrow(/ends must be one of/);
    expect(() => thickCylinder({ ...ok, ends: "plane-strain" })).toThrow(/poissonRatio is required/);
    expect(() => thickCylinder({ ...ok, ends: "plane-strain", poissonRatio: 0.6 })).toThrow(/poissonRatio/);
    expect(() => thickCylinder(ok, 2.5)).toThrow(/radius must lie in the wall/);
    expect(() => thickCylinder(ok, Number.NaN)).toThrow(/radius/);
    expect(() => thickCylinderProfile(ok, 1)).toThrow(/points/);
    expect(() => thickCylinderProfile(ok, 2.5)).toThrow(/points/);
    expect(() => thickCylinder(null as never)).toThrow(TypeError);
  });
});

describe("thick-walled sphere (Lamé)", () => {
  it("when ri = 1, ro = 2, pi = 100, then σr = −100, σθ = 500/7 = 71.43 inside and σθ = 150/7 = 21.43, σr = 0 outside (Lamé sphere formulas of Timoshenko & Goodier, recalled from memory: A = 100/7, B = 800/7 by hand)", () => {
    const input: ThickSphereInput = { innerRadius: 1, outerRadius: 2, innerPressure: 100 };
    const inside = thickSphere(input);
    expect(inside.radial).toBeCloseTo(-100, 12);
    expect(inside.hoop).toBeCloseTo(500 / 7, 12);
    expect(inside.tensor).toEqual({ xx: inside.hoop, yy: inside.hoop, zz: -100, xy: 0, yz: 0, zx: 0 });
    const outside = thickSphere(input, 2);
    expect(outside.hoop).toBeCloseTo(150 / 7, 12);
    expect(outside.radial).toBeCloseTo(0, 12);
    expect(inside.lameA).toBeCloseTo(100 / 7, 12);
    expect(inside.lameB).toBeCloseTo(800 / 7, 12);
  });

  it("when r is random inside the wall, then radial equilibrium dσr/dr = 2(σθ − σr)/r holds by a central difference (sphere equilibrium equation)", () => {
    fc.assert(
      fc.property(sphereInput, fraction, (input, u) => {
        const { innerRadius: ri, outerRadius: ro } = input;
        const h = 1e-4 * (ro - ri);
        const r = insideWall(ri, ro, h, u);
        const at = thickSphere(input, r);
        const dsr = (thickSphere(input, r + h).radial - thickSphere(input, r - h).radial) / (2 * h);
        const rhs = (2 * (at.hoop - at.radial)) / r;
        const rounding = (1e-12 * (Math.abs(at.lameA) + Math.abs(at.lameB) / r ** 3)) / h;
        expect(Math.abs(dsr - rhs)).toBeLessThanOrEqual(1e-6 * Math.abs(rhs) + rounding + 1e-300);
      }),
      { seed: 135, numRuns: 400 },
    );
  });

  it("when the faces are approached, then σr tends to −pi inside and −po outside, and the faces give exactly those (boundary conditions)", () => {
    fc.assert(
      fc.property(sphereInput, (input) => {
        const { innerRadius: ri, outerRadius: ro, innerPressure: pi } = input;
        const po = input.outerPressure ?? 0;
        expect(thickSphere(input, ri).radial).toBe(-pi);
        expect(thickSphere(input, ro).radial).toBe(-po);
        const near = thickSphere(input, ri + 1e-12 * (ro - ri));
        const far = thickSphere(input, ro - 1e-12 * (ro - ri));
        const scale = Math.abs(near.lameA) + Math.abs(near.lameB) / ri ** 3;
        expect(Math.abs(near.radial + pi)).toBeLessThanOrEqual(1e-10 * scale + 1e-300);
        expect(Math.abs(far.radial + po)).toBeLessThanOrEqual(1e-10 * scale + 1e-300);
      }),
      { seed: 136, numRuns: 400 },
    );
  });

  it("when half the sphere is cut free, then ∫σθ·2πr dr over the wall = pi·π·ri² − po·π·ro² (force balance, Simpson's rule)", () => {
    fc.assert(
      fc.property(sphereInput, (input) => {
        const { innerRadius: ri, outerRadius: ro, innerPressure: pi } = input;
        const po = input.outerPressure ?? 0;
        const profile = thickSphereProfile(input, 401);
        const integral = simpson(
          profile.map((s) => s.hoop * 2 * Math.PI * s.radius),
          (ro - ri) / 400,
        );
        const want = Math.PI * (pi * ri * ri - po * ro * ro);
        const scale = Math.PI * (Math.abs(pi) + Math.abs(po)) * ro * ro + 1e-300;
        expect(Math.abs(integral - want)).toBeLessThanOrEqual(1e-6 * scale);
      }),
      { seed: 137, numRuns: 200 },
    );
  });

  it("when the same pressure acts inside and out, then the state is hydrostatic −p through the wall (common practice, no source)", () => {
    const s = thickSphere({ innerRadius: 2, outerRadius: 3, innerPressure: 7, outerPressure: 7 }, 2.4);
    expect(s.radial).toBeCloseTo(-7, 12);
    expect(s.hoop).toBeCloseTo(-7, 12);
  });

  it("when t/r → 0, then the inside tangential stress tends to thin-wall p·r/(2t), within t/r (thin-wall limit)", () => {
    let previous = Infinity;
    for (const k of [1e-1, 1e-2, 1e-3, 1e-4, 1e-5, 1e-6]) {
      const ri = 1200;
      const t = k * ri;
      const lame = thickSphere({ innerRadius: ri, outerRadius: ri + t, innerPressure: 0.8 });
      const error = Math.abs(lame.hoop / thinSphere(0.8, ri, t).hoop - 1);
      expect(error).toBeLessThanOrEqual(k);
      expect(error).toBeLessThan(previous);
      previous = error;
    }
  });

  it("when a profile is asked for, then it samples ri to ro with both faces exact; bad input is named", () => {
    const input: ThickSphereInput = { innerRadius: 10, outerRadius: 13, innerPressure: 4 };
    const profile = thickSphereProfile(input, 4);
    expect(profile.map((s) => s.radius)).toEqual([10, 11, 12, 13]);
    expect(profile[2]).toEqual(thickSphere(input, 12));
    expect(() => thickSphere({ ...input, outerRadius: 10 })).toThrow(/outerRadius must be larger/);
    expect(() => thickSphere({ ...input, innerRadius: -1 })).toThrow(/innerRadius must be positive/);
    expect(() => thickSphere(input, 9.99)).toThrow(/radius must lie in the wall/);
    expect(() => thickSphere({ ...input, outerPressure: Number.NaN })).toThrow(/outerPressure/);
    expect(() => thickSphereProfile(input, 0)).toThrow(/points/);
  });
});
