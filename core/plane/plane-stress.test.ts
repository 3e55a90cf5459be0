import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { eigs } from "mathjs";
import { mohrCircles } from "./mohr";
import { planeStress, transformPlaneStress } from "./plane-stress";

const stress = fc.double({ min: -1e3, max: 1e3, noNaN: true });

describe("planeStress and transformPlaneStress (handbook formulas, common practice, no source)", () => {
  it("when axes are rotated to θp, then σx' = σ1 and τx'y' = 0; at θs, τx'y' = +τmax", () => {
    fc.assert(
      fc.property(stress, stress, stress, (sx, sy, txy) => {
        const p = planeStress(sx, sy, txy);
        expect(p.thetaP).toBeGreaterThan(-90);
        expect(p.thetaP).toBeLessThanOrEqual(90);
        const at = transformPlaneStress(sx, sy, txy, p.thetaP);
        const tol = 1e-12 * (Math.abs(sx) + Math.abs(sy) + Math.abs(txy) + 1e-300);
        expect(Math.abs(at.sx - p.s1)).toBeLessThanOrEqual(tol);
        expect(Math.abs(at.txy)).toBeLessThanOrEqual(tol);
        expect(
          Math.abs(transformPlaneStress(sx, sy, txy, p.thetaS).txy - p.tauMaxInPlane),
        ).toBeLessThanOrEqual(tol);
        expect(p.s1).toBeGreaterThanOrEqual(p.s2);
        expect(p.center).toBeCloseTo((sx + sy) / 2, 9);
      }),
      { seed: 777, numRuns: 2000 },
    );
  });

  it("when σx < σy with no shear, then θp = 90° (not −90°); when in-plane hydrostatic, θp = 0", () => {
    expect(planeStress(10, 50, 0).thetaP).toBe(90);
    expect(planeStress(10, 50, -0).thetaP).toBe(90);
    expect(planeStress(30, 30, 0).thetaP).toBe(0);
  });

  it("when rotating by θ, then the sum σx' + σy' is unchanged and 180° gives the same components", () => {
    const r = transformPlaneStress(80, -40, 25, 180);
    expect(r).toEqual({ sx: 80, sy: -40, txy: 25 });
    const q = transformPlaneStress(80, -40, 25, 33);
    expect(q.sx + q.sy).toBeCloseTo(40, 12);
  });
});

describe("mohrCircles", () => {
  it("when principal stresses are σ1 ≥ σ2 ≥ σ3, then circles are (σ1,σ3), (σ1,σ2), (σ2,σ3) with the outer radius τmax (principal stresses from mathjs, an independent solver)", () => {
    const s = { xx: 50, yy: 40, zz: 20, xy: 20, yz: 20, zx: -30 };
    const eig = eigs([
      [s.xx, s.xy, s.zx],
      [s.xy, s.yy, s.yz],
      [s.zx, s.yz, s.zz],
    ]).values as number[];
    const [s1, s2, s3] = eig.slice().sort((a, b) => b - a);
    const { circles } = mohrCircles(s);
    expect(circles[0].center).toBeCloseTo((s1 + s3) / 2, 12);
    expect(circles[0].radius).toBeCloseTo((s1 - s3) / 2, 12);
    expect(circles[1].radius).toBeCloseTo((s1 - s2) / 2, 12);
    expect(circles[1].center).toBeCloseTo((s1 + s2) / 2, 12);
    expect(circles[2].center).toBeCloseTo((s2 + s3) / 2, 12);
    expect(circles[2].radius).toBeCloseTo((s2 - s3) / 2, 12);
    expect(circles[0].radius).toBeCloseTo(circles[1].radius + circles[2].radius, 12);
  });
});
