import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { principalValues } from "../eigen/principal";
import { rotationFromQuaternion, tensorWithPrincipal } from "../testing/fixtures";
import { rotateTensor } from "./rotate";
import { maxShearFrame, principalFrame } from "./special-frames";

const state = fc
  .tuple(
    fc.tuple(
      fc.double({ min: -1, max: 1, noNaN: true }),
      fc.double({ min: -1, max: 1, noNaN: true }),
      fc.double({ min: -1, max: 1, noNaN: true }),
      fc.double({ min: -1, max: 1, noNaN: true }),
    ),
    fc.tuple(
      fc.double({ min: -400, max: 400, noNaN: true }),
      fc.double({ min: -400, max: 400, noNaN: true }),
      fc.double({ min: -400, max: 400, noNaN: true }),
    ),
  )
  .map(([[w, x, y, z], l]) => tensorWithPrincipal(rotationFromQuaternion(w, x, y, z), l));

describe("special frames", () => {
  it("when the element is turned onto the principal frame, then σ′ is diagonal with σ1 ≥ σ2 ≥ σ3 (definition of principal axes)", () => {
    fc.assert(
      fc.property(state, (s) => {
        const [s1, s2, s3] = principalValues(s);
        const p = rotateTensor(s, principalFrame(s));
        const scale = Math.max(1, Math.abs(s1), Math.abs(s3));
        expect(Math.abs(p.xx - s1) / scale).toBeLessThan(1e-11);
        expect(Math.abs(p.yy - s2) / scale).toBeLessThan(1e-11);
        expect(Math.abs(p.zz - s3) / scale).toBeLessThan(1e-11);
        expect(Math.max(Math.abs(p.xy), Math.abs(p.yz), Math.abs(p.zx)) / scale).toBeLessThan(1e-11);
      }),
      { seed: 3, numRuns: 300 },
    );
  });

  it("when turned onto the maximum-shear frame, then σ′xy = (σ1 − σ3)/2 and σ′xx = σ′yy = (σ1 + σ3)/2 (τmax on planes at 45° to σ1 and σ3; e.g. Shigley's Mechanical Engineering Design, §3-7)", () => {
    fc.assert(
      fc.property(state, (s) => {
        const [s1, s2, s3] = principalValues(s);
        const m = rotateTensor(s, maxShearFrame(s));
        const scale = Math.max(1, Math.abs(s1), Math.abs(s3));
        expect(Math.abs(m.xy - (s1 - s3) / 2) / scale).toBeLessThan(1e-11);
        expect(Math.abs(m.xx - (s1 + s3) / 2) / scale).toBeLessThan(1e-11);
        expect(Math.abs(m.yy - (s1 + s3) / 2) / scale).toBeLessThan(1e-11);
        expect(Math.abs(m.zz - s2) / scale).toBeLessThan(1e-11);
        expect(Math.max(Math.abs(m.yz), Math.abs(m.zx)) / scale).toBeLessThan(1e-11);
      }),
      { seed: 5, numRuns: 300 },
    );
  });

  it("when σx = 80, σy = −40, τxy = 30 (plane stress), then the max-shear frame gives τ = √(60² + 30²) ≈ 67.08 (Mohr's circle radius)", () => {
    const m = rotateTensor(
      { xx: 80, yy: -40, zz: 0, xy: 30, yz: 0, zx: 0 },
      maxShearFrame({ xx: 80, yy: -40, zz: 0, xy: 30, yz: 0, zx: 0 }),
    );
    expect(m.xy).toBeCloseTo(Math.hypot(60, 30), 10);
    expect(m.xx).toBeCloseTo(20, 10);
  });
});
