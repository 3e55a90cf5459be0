import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { principalValues } from "../tensor/principal";
import { planeStress } from "../plane/plane-stress";
import { vonMises } from "../tensor/invariants";
import { solidShaftStress } from "./shaft";

const load = fc.double({ min: -1e4, max: 1e4, noNaN: true });
const diameter = fc.double({ min: 0.005, max: 0.5, noNaN: true });

describe("solid shaft at the surface (σ = 32M/πd³ + 4P/πd², τ = 16T/πd³, any machine-design text)", () => {
  it("when only a torque acts, then the state is pure shear: σ1 = τ = −σ3 and σvm = √3·τ (common practice, no source)", () => {
    fc.assert(
      fc.property(diameter, load, (d, T) => {
        const s = solidShaftStress(d, { bendingMoment: 0, torque: T, axialForce: 0 });
        expect(s.sigma).toBe(0);
        const [s1, s2, s3] = principalValues(s.tensor);
        const tol = 1e-12 * Math.abs(s.tau) + 1e-300;
        expect(Math.abs(s1 - Math.abs(s.tau))).toBeLessThanOrEqual(tol);
        expect(Math.abs(s2)).toBeLessThanOrEqual(tol);
        expect(Math.abs(s3 + Math.abs(s.tau))).toBeLessThanOrEqual(tol);
        expect(Math.abs(vonMises(s.tensor) - Math.sqrt(3) * Math.abs(s.tau))).toBeLessThanOrEqual(4 * tol);
      }),
      { seed: 91, numRuns: 500 },
    );
  });

  it("when M and T act, then σ1,2 = 16/(πd³)(M ± √(M² + T²)) (equivalent-moment form, common practice, no source)", () => {
    fc.assert(
      fc.property(diameter, load, load, (d, M, T) => {
        const s = solidShaftStress(d, { bendingMoment: M, torque: T, axialForce: 0 });
        const k = 16 / (Math.PI * d ** 3);
        const p = planeStress(s.tensor.xx, s.tensor.yy, s.tensor.xy);
        const scale = k * (Math.abs(M) + Math.abs(T)) + 1e-300;
        expect(Math.abs(p.s1 - k * (M + Math.hypot(M, T)))).toBeLessThanOrEqual(1e-12 * scale);
        expect(Math.abs(p.s2 - k * (M - Math.hypot(M, T)))).toBeLessThanOrEqual(1e-12 * scale);
      }),
      { seed: 92, numRuns: 500 },
    );
  });

  it("when the thrust is tensile, then it adds to the bending stress on the tensile fibre; −M gives the other fibre", () => {
    const d = 0.045;
    const t = solidShaftStress(d, { bendingMoment: 420, torque: 0, axialForce: 3000 });
    expect(t.bending).toBeCloseTo((32 * 420) / (Math.PI * d ** 3), 6);
    expect(t.axial).toBeCloseTo((4 * 3000) / (Math.PI * d ** 2), 6);
    expect(t.sigma).toBe(t.bending + t.axial);
    const other = solidShaftStress(d, { bendingMoment: -420, torque: 0, axialForce: 3000 });
    expect(other.sigma).toBeCloseTo(-t.bending + t.axial, 6);
    // N and mm give MPa: the same shaft in both unit sets differs by exactly 10⁶.
    const mm = solidShaftStress(45, { bendingMoment: 420e3, torque: 850e3, axialForce: 3000 });
    const m = solidShaftStress(0.045, { bendingMoment: 420, torque: 850, axialForce: 3000 });
    expect(mm.tau * 1e6).toBeCloseTo(m.tau, 3);
    expect(mm.sigma * 1e6).toBeCloseTo(m.sigma, 3);
  });

  it("when an input is missing, not finite or the diameter is not positive, then the error names it", () => {
    const ok = { bendingMoment: 1, torque: 1, axialForce: 1 };
    expect(() => solidShaftStress(0, ok)).toThrow(/diameter must be positive/);
    expect(() => solidShaftStress(Number.NaN, ok)).toThrow(/diameter/);
    expect(() => solidShaftStress(1, { ...ok, torque: Number.POSITIVE_INFINITY })).toThrow(/loads.torque/);
    expect(() => solidShaftStress(1, { bendingMoment: 1, torque: 1 } as never)).toThrow(/loads.axialForce/);
    expect(() => solidShaftStress(1, null as never)).toThrow(TypeError);
  });
});
