import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { vonMises } from "../tensor/invariants";
import {
  bendingTowards,
  hollowShaftStress,
  type CombinedShaftLoads,
  type ShaftSection,
  type ShaftSurfacePoint,
} from "./combined-shaft";
import { solidShaftStress } from "./shaft";

const load = fc.double({ min: -1e4, max: 1e4, noNaN: true }).map((x) => (Math.abs(x) < 1e-6 ? 0 : x));
const loads = fc.record({
  momentY: load,
  momentZ: load,
  torque: load,
  axialForce: load,
  shearY: load,
  shearZ: load,
});
/** Outer diameter 5..500 and a bore from none to 95 % of it. */
const section = fc
  .record({
    D: fc.double({ min: 5, max: 500, noNaN: true }),
    bore: fc.oneof(fc.constant(0), fc.double({ min: 0.05, max: 0.95, noNaN: true })),
  })
  .map(({ D, bore }): ShaftSection => ({ outerDiameter: D, innerDiameter: bore * D }));
const angle = fc.double({ min: -720, max: 720, noNaN: true });

const near = (got: number, want: number, rel: number, scale = Math.abs(want)) =>
  expect(Math.abs(got - want)).toBeLessThanOrEqual(rel * scale + 1e-300);

describe("solid or hollow shaft under combined load", () => {
  it("when a hollow shaft D = 50, d = 30 carries M = 1e6 and T = 2e6 (N·mm), then σ = 32MD/(π(D⁴ − d⁴)) and τ = 16TD/(π(D⁴ − d⁴)) on the outer face (Shigley's and Roark's hollow-shaft formulas, recalled from memory)", () => {
    const r = hollowShaftStress(
      { outerDiameter: 50, innerDiameter: 30 },
      { momentY: 1e6, torque: 2e6 },
      { point: { surface: "outer", angle: 90 } },
    );
    const d4 = Math.PI * (50 ** 4 - 30 ** 4);
    const p = r.point!;
    near(p.bending, (32 * 1e6 * 50) / d4, 1e-13);
    near(p.torsion, (16 * 2e6 * 50) / d4, 1e-13);
    // hand arithmetic: I = π(50⁴ − 30⁴)/64 = 267 035.4 mm⁴, σ = 1e6·25/I = 93.62 MPa, τ = 93.62 MPa
    expect(r.section.secondMoment).toBeCloseTo(267035.375, 2);
    expect(p.bending).toBeCloseTo(93.62, 2);
    expect(p.tensor).toEqual({ xx: p.sigma, yy: 0, zz: 0, xy: p.tau, yz: 0, zx: 0 });
    // the inner face at the same angle: both stresses scale with ρ, 15/25 of the outer ones
    const inner = hollowShaftStress(
      { outerDiameter: 50, innerDiameter: 30 },
      { momentY: 1e6, torque: 2e6 },
      { point: { surface: "inner", angle: 90 } },
    ).point!;
    near(inner.sigma, p.sigma * 0.6, 1e-13);
    near(inner.tau, p.tau * 0.6, 1e-13);
    expect(r.nominal.bending).toBeCloseTo(p.bending, 12);
    expect(r.nominal.torsion).toBeCloseTo(p.torsion, 12);
  });

  it("when the section is solid and the point is the stretched fibre at 90°, then the state equals solidShaftStress (σ = 32M/πd³ + 4P/πd², τ = 16T/πd³)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.005, max: 0.5, noNaN: true }), load, load, load, (d, M, T, P) => {
        const mine = hollowShaftStress(
          { outerDiameter: d },
          { momentY: M, torque: T, axialForce: P },
          { point: { surface: "outer", angle: 90 } },
        ).point!;
        const solid = solidShaftStress(d, { bendingMoment: M, torque: T, axialForce: P });
        const scale =
          Math.abs(solid.sigma) + Math.abs(solid.bending) + Math.abs(solid.axial) + Math.abs(solid.tau);
        near(mine.sigma, solid.sigma, 1e-12, scale);
        near(mine.tau, solid.tau, 1e-12, scale);
      }),
      { seed: 151, numRuns: 300 },
    );
  });

  it("when only M and T act on a solid shaft, then the critical von Mises stress is 32/(πd³)·√(M² + 3T²/4), on a fibre of largest bending stress (equivalent-moment form, common practice, no source)", () => {
    fc.assert(
      fc.property(fc.double({ min: 5, max: 200, noNaN: true }), load, load, load, (d, My, Mz, T) => {
        const r = hollowShaftStress({ outerDiameter: d }, { momentY: My, momentZ: Mz, torque: T });
        const M = Math.hypot(My, Mz);
        const want = (32 / (Math.PI * d ** 3)) * Math.sqrt(M * M + 0.75 * T * T);
        near(r.critical.vonMises, want, 1e-12);
        // with no axial force both fibres tie; either one carries the full bending stress
        if (M > 1) near(Math.abs(r.critical.bending), r.nominal.bending, 1e-12);
      }),
      { seed: 152, numRuns: 300 },
    );
  });

  it("when only transverse shear acts, then the largest shear is 4V/(3A) on a solid shaft, 4V/(3A)·(ro² + ro·ri + ri²)/(ro² + ri²) on a hollow one, and → 2V/A as the wall thins (Gere & Goodno, circular sections, recalled from memory)", () => {
    const solid = hollowShaftStress({ outerDiameter: 40 }, { shearY: 5000 });
    const A = Math.PI * 20 ** 2;
    near(solid.nominal.transverseShear, (4 * 5000) / (3 * A), 1e-13);
    near(Math.abs(solid.critical.tau), (4 * 5000) / (3 * A), 1e-12);
    near(solid.critical.vonMises, Math.sqrt(3) * solid.nominal.transverseShear, 1e-12);
    // V along y: the largest transverse shear sits on the neutral axis, at ±90°
    expect(Math.min(Math.abs(solid.critical.angle - 90), Math.abs(solid.critical.angle - 270))).toBeLessThan(
      1e-9,
    );

    const hollow = hollowShaftStress({ outerDiameter: 40, innerDiameter: 30 }, { shearZ: 5000 });
    const Ah = Math.PI * (20 ** 2 - 15 ** 2);
    near(hollow.nominal.transverseShear, ((4 * 5000) / (3 * Ah)) * ((400 + 300 + 225) / (400 + 225)), 1e-13);

    const thin = hollowShaftStress({ outerDiameter: 100, innerDiameter: 99.9 }, { shearY: 100 });
    near(thin.nominal.transverseShear * thin.section.area, 2 * 100, 1e-3);
  });

  it("when the transverse shear Q/(Ib) is integrated numerically over the annular sector, then it equals the closed form at random angles (shear formula τ = VQ/(Ib), midpoint rule)", () => {
    fc.assert(
      fc.property(section, fc.double({ min: 1, max: 179, noNaN: true }), (sec, theta) => {
        const V = 1000;
        const r = hollowShaftStress(sec, { shearY: V }, { point: { surface: "outer", angle: theta } });
        const ro = sec.outerDiameter / 2;
        const ri = (sec.innerDiameter ?? 0) / 2;
        // Q of the sector |φ| < θ about the z axis, ∫∫ ρ cos φ · ρ dφ dρ, by the midpoint rule
        const n = 200;
        const th = (theta * Math.PI) / 180;
        let Q = 0;
        for (let i = 0; i < n; i++) {
          const rho = ri + ((i + 0.5) * (ro - ri)) / n;
          for (let j = 0; j < n; j++) {
            const phi = -th + ((j + 0.5) * 2 * th) / n;
            Q += rho * Math.cos(phi) * rho * ((ro - ri) / n) * ((2 * th) / n);
          }
        }
        // two radial cuts of length ro − ri share the sector's shear flow V·Q/I
        const tau = (V * Q) / (r.section.secondMoment * 2 * (ro - ri));
        // the sector at +y pushed by +V: on the point's face the stress runs along −t̂ on the +z side
        near(Math.abs(r.point!.transverseShear), tau, 1e-4);
      }),
      { seed: 153, numRuns: 60 },
    );
  });

  it("when a thin tube's transverse shear is summed around the section, then its resultant is the shear force V, in direction too (shear flow, equilibrium)", () => {
    const sec = { outerDiameter: 200, innerDiameter: 199.8 };
    const V: [number, number] = [300, -700];
    const n = 720;
    let fy = 0;
    let fz = 0;
    const area = hollowShaftStress(sec, {}).section.area;
    for (let i = 0; i < n; i++) {
      const a = (360 * i) / n;
      const t = hollowShaftStress(
        sec,
        { shearY: V[0], shearZ: V[1] },
        { point: { surface: "outer", angle: a } },
      ).point!.transverseShear;
      const th = (a * Math.PI) / 180;
      fy += (t * -Math.sin(th) * area) / n;
      fz += (t * Math.cos(th) * area) / n;
    }
    near(fy, V[0], 1e-3, 700);
    near(fz, V[1], 1e-3, 700);
  });

  it("when two load sets act together, then the state at any point is the sum of the states (superposition, linear elasticity)", () => {
    fc.assert(
      fc.property(section, loads, loads, angle, (sec, a, b, theta) => {
        const both: CombinedShaftLoads = {};
        for (const k of Object.keys(a) as (keyof CombinedShaftLoads)[]) both[k] = a[k]! + b[k]!;
        const surfaces: ShaftSurfacePoint["surface"][] = sec.innerDiameter ? ["outer", "inner"] : ["outer"];
        for (const surface of surfaces) {
          const point = { surface, angle: theta };
          const sa = hollowShaftStress(sec, a, { point }).point!;
          const sb = hollowShaftStress(sec, b, { point }).point!;
          const sab = hollowShaftStress(sec, both, { point }).point!;
          const scale = Math.abs(sa.sigma) + Math.abs(sb.sigma) + Math.abs(sa.tau) + Math.abs(sb.tau);
          near(sab.sigma, sa.sigma + sb.sigma, 1e-12, scale);
          near(sab.tau, sa.tau + sb.tau, 1e-12, scale);
        }
      }),
      { seed: 154, numRuns: 300 },
    );
  });

  it("when the bending moment and shear force rotate together by φ, then the critical von Mises stress is unchanged and the state at θ + φ equals the old one at θ (rotation invariance of a circular section)", () => {
    fc.assert(
      fc.property(
        section,
        loads,
        fc.double({ min: -180, max: 180, noNaN: true }),
        angle,
        (sec, l, phi, theta) => {
          const c = Math.cos((phi * Math.PI) / 180);
          const s = Math.sin((phi * Math.PI) / 180);
          const rotated: CombinedShaftLoads = {
            ...l,
            momentY: c * l.momentY - s * l.momentZ,
            momentZ: s * l.momentY + c * l.momentZ,
            shearY: c * l.shearY - s * l.shearZ,
            shearZ: s * l.shearY + c * l.shearZ,
          };
          const before = hollowShaftStress(sec, l, { point: { surface: "outer", angle: theta } });
          const after = hollowShaftStress(sec, rotated, { point: { surface: "outer", angle: theta + phi } });
          near(after.critical.vonMises, before.critical.vonMises, 1e-10);
          const scale = before.critical.vonMises;
          near(after.point!.sigma, before.point!.sigma, 1e-10, scale);
          near(after.point!.tau, before.point!.tau, 1e-10, scale);
        },
      ),
      { seed: 155, numRuns: 200 },
    );
  });

  it("when the critical point is compared with a search over 36 000 angles on each face of the formulas written out here, then it is at least as high and no higher than the grid's spacing allows (σ = Mc/I + P/A, τ = Tρ/J + transverse shear)", () => {
    fc.assert(
      fc.property(section, loads, (sec, l) => {
        const r = hollowShaftStress(sec, l);
        const ro = sec.outerDiameter / 2;
        const ri = (sec.innerDiameter ?? 0) / 2;
        const A = Math.PI * (ro * ro - ri * ri);
        const I = (Math.PI * (ro ** 4 - ri ** 4)) / 4;
        const k = (ro * ro + ro * ri + ri * ri) / (ro * ro + ri * ri);
        let grid = 0;
        for (const rho of ri > 0 ? [ro, ri] : [ro]) {
          for (let i = 0; i < 36000; i++) {
            const th = (i / 100) * (Math.PI / 180);
            const [y, z] = [rho * Math.cos(th), rho * Math.sin(th)];
            const sigma = (l.momentY * z - l.momentZ * y) / I + l.axialForce / A;
            const vt = -l.shearY * Math.sin(th) + l.shearZ * Math.cos(th);
            const tau = (l.torque * rho) / (2 * I) + ((4 * k) / (3 * A)) * vt;
            grid = Math.max(grid, Math.sqrt(sigma * sigma + 3 * tau * tau));
          }
        }
        expect(r.critical.vonMises).toBeGreaterThanOrEqual(grid * (1 - 1e-12));
        // a 0.01° grid falls short of the peak by about (0.01° in rad)²·2 ≈ 1e-7 of it
        expect(r.critical.vonMises).toBeLessThanOrEqual(grid * (1 + 1e-6) + 1e-300);
        // the reported state is the state at the reported point
        const again = hollowShaftStress(sec, l, {
          point: { surface: r.critical.surface, angle: r.critical.angle },
        }).point!;
        expect(again).toEqual(r.critical);
        near(r.critical.vonMises, vonMises(r.critical.tensor), 1e-12);
      }),
      { seed: 156, numRuns: 40 },
    );
  });

  it("when an axial force alone acts on a hollow shaft, then every point ties and the outer face at 0° is reported", () => {
    const r = hollowShaftStress({ outerDiameter: 60, innerDiameter: 40 }, { axialForce: 1e5 });
    expect(r.critical.surface).toBe("outer");
    expect(r.critical.angle).toBe(0);
    near(r.critical.sigma, 1e5 / (Math.PI * (900 - 400)), 1e-13);
  });

  it("when a compressive thrust meets bending on a hollow shaft, then the critical point is the compressed fibre, on the outer face (common practice, no source)", () => {
    const r = hollowShaftStress({ outerDiameter: 60, innerDiameter: 40 }, { momentY: 2e5, axialForce: -5e4 });
    expect(r.critical.surface).toBe("outer");
    expect(Math.abs(r.critical.angle - 270)).toBeLessThan(1e-9);
    expect(r.critical.sigma).toBeLessThan(0);
  });

  it("when Kt factors are given, then each multiplies only its own stress and transverse shear stays nominal", () => {
    const sec = { outerDiameter: 30, innerDiameter: 10 };
    const l = { momentY: 1e5, torque: 2e5, axialForce: 3e4, shearY: 4e3 };
    const point = { surface: "outer" as const, angle: 60 };
    const plain = hollowShaftStress(sec, l, { point }).point!;
    const kt = hollowShaftStress(sec, l, { point, kt: { bending: 2, torsion: 1.5, axial: 3 } });
    const p = kt.point!;
    near(p.bending, 2 * plain.bending, 1e-14);
    near(p.torsion, 1.5 * plain.torsion, 1e-14);
    near(p.axial, 3 * plain.axial, 1e-14);
    expect(p.transverseShear).toBe(plain.transverseShear);
    expect(kt.kt).toEqual({ bending: 2, torsion: 1.5, axial: 3 });
    expect(kt.nominal).toEqual(hollowShaftStress(sec, l).nominal);
  });

  it("when one moment is given with the angle of the fibre it stretches, then that fibre carries +Mc/I and the opposite one −Mc/I (σ = Mc/I, any strength-of-materials text)", () => {
    fc.assert(
      fc.property(section, load, fc.double({ min: -360, max: 360, noNaN: true }), (sec, M, phi) => {
        const r = hollowShaftStress(sec, bendingTowards(M, phi), { point: { surface: "outer", angle: phi } });
        const c = sec.outerDiameter / 2;
        near(r.point!.bending, (M * c) / r.section.secondMoment, 1e-12);
        const opposite = hollowShaftStress(sec, bendingTowards(M, phi), {
          point: { surface: "outer", angle: phi + 180 },
        });
        near(opposite.point!.bending, (-M * c) / r.section.secondMoment, 1e-12);
      }),
      { seed: 157, numRuns: 200 },
    );
    expect(bendingTowards(7, 90)).toEqual({ momentY: 7, momentZ: 0 });
    expect(() => bendingTowards(Number.NaN, 0)).toThrow(/moment/);
    expect(() => bendingTowards(1, Number.POSITIVE_INFINITY)).toThrow(/tensileFibreAngle/);
  });

  it("when an input is missing, not finite or impossible, then the error names it", () => {
    const sec = { outerDiameter: 30, innerDiameter: 10 };
    expect(() => hollowShaftStress({ outerDiameter: 0 }, {})).toThrow(
      /section.outerDiameter must be positive/,
    );
    expect(() => hollowShaftStress({ outerDiameter: 30, innerDiameter: 30 }, {})).toThrow(
      /section.innerDiameter must be smaller/,
    );
    expect(() => hollowShaftStress({ outerDiameter: 30, innerDiameter: -1 }, {})).toThrow(/innerDiameter/);
    expect(() => hollowShaftStress({ outerDiameter: Number.NaN }, {})).toThrow(/outerDiameter/);
    expect(() => hollowShaftStress(sec, { torque: Number.POSITIVE_INFINITY })).toThrow(/loads.torque/);
    expect(() => hollowShaftStress(sec, { moment: 5 } as never)).toThrow(/loads.moment is not a load/);
    expect(() => hollowShaftStress(sec, null as never)).toThrow(TypeError);
    expect(() => hollowShaftStress(sec, {}, { kt: { bending: 0.8 } })).toThrow(
      /options.kt.bending must be at least 1/,
    );
    expect(() => hollowShaftStress(sec, {}, { point: { surface: "middle" as never, angle: 0 } })).toThrow(
      /options.point.surface/,
    );
    expect(() =>
      hollowShaftStress({ outerDiameter: 30 }, {}, { point: { surface: "inner", angle: 0 } }),
    ).toThrow(/needs a hollow shaft/);
    expect(() => hollowShaftStress(sec, {}, { point: { surface: "outer", angle: Number.NaN } })).toThrow(
      /options.point.angle/,
    );
  });
});
