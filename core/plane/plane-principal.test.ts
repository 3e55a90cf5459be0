import fc from "fast-check";
import { eigs } from "mathjs";
import { describe, expect, it } from "vitest";
import type { StressTensor, Vec3 } from "../tensor/types";
import { planePrincipal, zIsPrincipal } from "./plane-principal";

// Handbook formulas for plane stress (e.g. Hibbeler, Mechanics of Materials, chapter on stress
// transformation; recalled from memory): tan 2θp = 2τxy/(σx − σy) and
// σ = (σx + σy)/2 ± √(((σx − σy)/2)² + τxy²).
const HANDBOOK_THETA_P = (sx: number, sy: number, txy: number) =>
  (Math.atan2(2 * txy, sx - sy) * 90) / Math.PI;

/** σ1 ≥ σ2 ≥ σ3 from mathjs, an independent eigenvalue solver. */
function mathjsPrincipal(s: StressTensor): number[] {
  const values = eigs([
    [s.xx, s.xy, s.zx],
    [s.xy, s.yy, s.yz],
    [s.zx, s.yz, s.zz],
  ]).values as number[];
  return values.slice().sort((a, b) => b - a);
}

function apply(s: StressTensor, d: Vec3): Vec3 {
  return [
    s.xx * d[0] + s.xy * d[1] + s.zx * d[2],
    s.xy * d[0] + s.yy * d[1] + s.yz * d[2],
    s.zx * d[0] + s.yz * d[1] + s.zz * d[2],
  ];
}

const cross = (a: Vec3, b: Vec3): Vec3 => [
  a[1] * b[2] - a[2] * b[1],
  a[2] * b[0] - a[0] * b[2],
  a[0] * b[1] - a[1] * b[0],
];

const plane = (xx: number, yy: number, xy: number): StressTensor => ({ xx, yy, zz: 0, xy, yz: 0, zx: 0 });

describe("planePrincipal: one naming rule, σ1 ≥ σ2 ≥ σ3 of the full 3D state", () => {
  it("when σx = 150, σy = 0, τxy = 25 MPa, then the in-plane pair is σ1 = 154.06 and σ3 = −4.06 with σ2 = 0 out of plane, and θp = 9.22° (handbook formulas, recalled from memory)", () => {
    const p = planePrincipal(plane(150, 0, 25))!;
    const root = Math.sqrt(75 ** 2 + 25 ** 2);
    expect(p.values[0]).toBeCloseTo(75 + root, 12);
    expect(p.values[1]).toBe(0);
    expect(p.values[2]).toBeCloseTo(75 - root, 12);
    expect(p.values[0]).toBeCloseTo(154.06, 2);
    expect(p.values[2]).toBeCloseTo(-4.06, 2);
    expect(p).toMatchObject({ inPlaneMajor: 0, outOfPlane: 1, inPlaneMinor: 2 });
    expect(p.thetaP).toBeCloseTo(HANDBOOK_THETA_P(150, 0, 25), 12);
    expect(p.thetaP).toBeCloseTo(9.22, 2);
    expect(p.thetaS).toBeCloseTo(9.2175 - 45, 3);
    expect(p.directions[0][0]).toBeCloseTo(Math.cos((p.thetaP * Math.PI) / 180), 15);
    expect(p.directions[0][1]).toBeCloseTo(Math.sin((p.thetaP * Math.PI) / 180), 15);
    expect(p.directions[1]).toEqual([0, 0, -1]);
  });

  it("when both in-plane stresses are tensile, then they are σ1 and σ2 and the zero out of plane is σ3; both compressive, then the zero is σ1", () => {
    expect(planePrincipal(plane(100, 50, 0))).toMatchObject({
      values: [100, 50, 0],
      inPlaneMajor: 0,
      inPlaneMinor: 1,
      outOfPlane: 2,
    });
    expect(planePrincipal(plane(-100, -50, 0))).toMatchObject({
      values: [0, -50, -100],
      outOfPlane: 0,
      inPlaneMajor: 1,
      inPlaneMinor: 2,
      thetaP: 90,
    });
  });

  it("when a value ties with σz (uniaxial stress), then the in-plane stress takes the lower number (the stated tie rule)", () => {
    expect(planePrincipal(plane(100, 0, 0))).toMatchObject({ values: [100, 0, 0], outOfPlane: 2 });
    expect(planePrincipal(plane(-100, 0, 0))).toMatchObject({
      values: [0, 0, -100],
      inPlaneMajor: 0,
      outOfPlane: 1,
      inPlaneMinor: 2,
    });
  });

  it("when τyz or τzx is not zero, then z is not principal and there is no plane reading", () => {
    expect(zIsPrincipal({ xx: 1, yy: 2, zz: 0, xy: 3, yz: 1e-9, zx: 0 })).toBe(false);
    expect(planePrincipal({ xx: 1, yy: 2, zz: 0, xy: 3, yz: 0, zx: -1 })).toBeNull();
  });

  it("when z is principal (random σx, σy, τxy, σz), then the values are mathjs's eigenvalues in order, each direction satisfies σ·d = σi·d, and d1 × d2 = d3 (definition of principal axes)", () => {
    const v = fc.double({ min: -500, max: 500, noNaN: true });
    fc.assert(
      fc.property(v, v, v, fc.oneof(fc.constant(0), v), (xx, yy, xy, zz) => {
        const s: StressTensor = { xx, yy, zz, xy, yz: 0, zx: 0 };
        const p = planePrincipal(s)!;
        const scale = Math.max(1, Math.abs(xx), Math.abs(yy), Math.abs(zz), Math.abs(xy));
        const expected = mathjsPrincipal(s);
        for (let i = 0; i < 3; i++) {
          expect(Math.abs(p.values[i] - expected[i]) / scale).toBeLessThan(1e-10);
          const sd = apply(s, p.directions[i]);
          for (let k = 0; k < 3; k++) {
            expect(Math.abs(sd[k] - p.values[i] * p.directions[i][k]) / scale).toBeLessThan(1e-12);
          }
        }
        expect(p.values[0]).toBeGreaterThanOrEqual(p.values[1]);
        expect(p.values[1]).toBeGreaterThanOrEqual(p.values[2]);
        const c = cross(p.directions[0], p.directions[1]);
        for (let k = 0; k < 3; k++) expect(c[k]).toBeCloseTo(p.directions[2][k], 12);
        expect(p.values[p.outOfPlane]).toBe(zz);
        expect(new Set([p.inPlaneMajor, p.inPlaneMinor, p.outOfPlane]).size).toBe(3);
      }),
      { seed: 91, numRuns: 1000 },
    );
  });
});
