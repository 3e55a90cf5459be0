import fc from "fast-check";
import { eigs } from "mathjs";
import { describe, expect, it } from "vitest";
import { dot, cross } from "../testing/fixtures";
import { invariants, lodeAngle, maxShear, octahedral, triaxiality, tresca, vonMises } from "./invariants";
import { rotateTensor, rotationFromAxisAngle, rotationFromEuler } from "./rotate";
import { tractionOnPlane } from "./traction";
import type { Mat3, StressTensor } from "./types";

const S: StressTensor = { xx: 50, yy: 40, zz: 20, xy: 20, yz: 20, zx: -30 };
const diag = (a: number, b: number, c: number): StressTensor => ({
  xx: a,
  yy: b,
  zz: c,
  xy: 0,
  yz: 0,
  zx: 0,
});

function expectRotation(r: Mat3): void {
  for (let i = 0; i < 3; i++)
    for (let j = 0; j < 3; j++) expect(dot(r[i], r[j])).toBeCloseTo(i === j ? 1 : 0, 14);
  const c = cross(r[0], r[1]);
  for (let i = 0; i < 3; i++) expect(c[i]).toBeCloseTo(r[2][i], 14);
}

describe("rotations (rows = new axes in the old frame, σ' = RσRᵀ)", () => {
  it("when rotating the axes 30° about z, then x' = (cos 30°, sin 30°, 0) and the plane-stress formula holds", () => {
    const r = rotationFromAxisAngle([0, 0, 2], 30);
    expect(r[0][0]).toBeCloseTo(Math.sqrt(3) / 2, 15);
    expect(r[0][1]).toBeCloseTo(0.5, 15);
    const t = rotateTensor({ xx: 80, yy: -40, zz: 0, xy: 25, yz: 0, zx: 0 }, r);
    // handbook: σx' = (σx+σy)/2 + (σx−σy)/2·cos2θ + τxy·sin2θ (common practice, no source)
    expect(t.xx).toBeCloseTo(20 + 60 * 0.5 + 25 * (Math.sqrt(3) / 2), 12);
    expect(t.xy).toBeCloseTo(-60 * (Math.sqrt(3) / 2) + 25 * 0.5, 12);
  });

  it("when rotating by 90° about z, then x and y swap exactly", () => {
    const t = rotateTensor(diag(1, 2, 3), rotationFromAxisAngle([0, 0, 1], 90));
    expect([t.xx, t.yy, t.zz]).toEqual([2, 1, 3]);
    expect([t.xy, t.yz, t.zx].map(Math.abs)).toEqual([0, 0, 0]);
  });

  it("when building intrinsic ZYX Euler rotations, then R is the transpose of Rz(ψ)·Ry(θ)·Rx(φ) (handbook yaw–pitch–roll matrix, common practice, no source)", () => {
    const angle = fc.double({ min: -360, max: 360, noNaN: true });
    fc.assert(
      fc.property(fc.tuple(angle, angle, angle), ([psi, theta, phi]) => {
        const r = rotationFromEuler("ZYX", [psi, theta, phi]);
        expectRotation(r);
        const [ca, sa] = [Math.cos((psi * Math.PI) / 180), Math.sin((psi * Math.PI) / 180)];
        const [cb, sb] = [Math.cos((theta * Math.PI) / 180), Math.sin((theta * Math.PI) / 180)];
        const [cc, sc] = [Math.cos((phi * Math.PI) / 180), Math.sin((phi * Math.PI) / 180)];
        const q = [
          [cb * ca, sc * sb * ca - cc * sa, cc * sb * ca + sc * sa],
          [cb * sa, sc * sb * sa + cc * ca, cc * sb * sa - sc * ca],
          [-sb, sc * cb, cc * cb],
        ];
        for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) expect(r[i][j]).toBeCloseTo(q[j][i], 12);
      }),
      { seed: 99, numRuns: 300 },
    );
    for (const seq of ["XYZ", "XZY", "YXZ", "YZX", "ZXY", "ZYX", "XYX", "XZX", "YXY", "YZY", "ZXZ", "ZYZ"]) {
      expectRotation(rotationFromEuler(seq, [10, -35, 120]));
    }
    expect(() => rotationFromEuler("ZZX", [0, 0, 0])).toThrow(/no axis twice in a row/);
    expect(() => rotationFromEuler("zyx", [0, 0, 0])).toThrow(RangeError);
  });

  it("when the matrix is not orthonormal or the axis is zero, then a RangeError says so", () => {
    expect(() =>
      rotateTensor(S, [
        [1, 0, 0],
        [0, 2, 0],
        [0, 0, 1],
      ]),
    ).toThrow(/orthonormal rows: max \|R·Rᵀ − I\| = 3/);
    expect(() => rotationFromAxisAngle([0, 0, 0], 10)).toThrow(/axis must be a non-zero vector/);
  });
});

describe("invariants and equivalent stresses (handbook formulas, common practice, no source)", () => {
  it("when the tensor is known, then i1, i2, i3 match the sum of principal minors and the determinant", () => {
    const v = invariants(S);
    expect(v.i1).toBe(110);
    expect(v.i2).toBe(50 * 40 + 40 * 20 + 20 * 50 - 400 - 400 - 900);
    expect(v.i3).toBe(50 * (40 * 20 - 400) - 20 * (20 * 20 - 20 * -30) + -30 * (20 * 20 - 40 * -30));
    expect(v.j2).toBeCloseTo(v.i1 ** 2 / 3 - v.i2, 10);
    expect(v.j3).toBeCloseTo((2 * v.i1 ** 3) / 27 - (v.i1 * v.i2) / 3 + v.i3, 8);
    // The same invariants from the principal stresses found by mathjs (an independent eigen solver):
    // I1 = λ1 + λ2 + λ3, I2 = λ1λ2 + λ2λ3 + λ3λ1, I3 = λ1λ2λ3.
    const [l1, l2, l3] = eigs([
      [S.xx, S.xy, S.zx],
      [S.xy, S.yy, S.yz],
      [S.zx, S.yz, S.zz],
    ]).values as number[];
    expect(v.i1).toBeCloseTo(l1 + l2 + l3, 9);
    expect(v.i2).toBeCloseTo(l1 * l2 + l2 * l3 + l3 * l1, 8);
    expect(v.i3).toBeCloseTo(l1 * l2 * l3, 6);
  });

  it("when the state is pure shear τ, then von Mises = √3τ, Tresca = 2τ, τmax = τ, Lode angle 30°, triaxiality 0", () => {
    const s = { xx: 0, yy: 0, zz: 0, xy: 70, yz: 0, zx: 0 };
    expect(vonMises(s)).toBeCloseTo(70 * Math.sqrt(3), 12);
    expect(tresca(s)).toBeCloseTo(140, 12);
    expect(maxShear(s)).toBeCloseTo(70, 12);
    expect(lodeAngle(s)).toBeCloseTo(30, 12);
    expect(triaxiality(s)).toBe(0);
  });

  it("when the state is uniaxial, then the Lode angle is 0° in tension and 60° in compression and η = ±1/3", () => {
    expect(lodeAngle(diag(100, 0, 0))).toBeCloseTo(0, 12);
    expect(lodeAngle(diag(-100, 0, 0))).toBeCloseTo(60, 12);
    expect(triaxiality(diag(100, 0, 0))).toBeCloseTo(1 / 3, 15);
    expect(triaxiality(diag(-100, 0, 0))).toBeCloseTo(-1 / 3, 15);
    expect(lodeAngle(diag(-80, -80, -80))).toBeNaN();
    expect(triaxiality(diag(-80, -80, -80))).toBe(-Infinity);
  });

  it("when tensors are random, then the Lode angle satisfies cos 3θ = (3√3/2)·j3/j2^(3/2)", () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -100, max: 100, noNaN: true }), { minLength: 6, maxLength: 6 }),
        (a) => {
          const s = { xx: a[0], yy: a[1], zz: a[2], xy: a[3], yz: a[4], zx: a[5] };
          const { j2, j3 } = invariants(s);
          fc.pre(j2 > 1e-6);
          const theta = (lodeAngle(s) * Math.PI) / 180;
          expect(theta).toBeGreaterThanOrEqual(-1e-12);
          expect(theta).toBeLessThanOrEqual(Math.PI / 3 + 1e-12);
          expect(Math.cos(3 * theta)).toBeCloseTo(((3 * Math.sqrt(3)) / 2) * (j3 / j2 ** 1.5), 6);
        },
      ),
      { seed: 31337, numRuns: 1000 },
    );
  });

  it("when computing octahedral stresses, then σoct = i1/3 and τoct = √(2 j2 / 3)", () => {
    const o = octahedral(S);
    expect(o.normal).toBeCloseTo(110 / 3, 13);
    expect(o.shear).toBeCloseTo(Math.sqrt((2 * invariants(S).j2) / 3), 12);
  });

  it("when von Mises stress is huge or tiny, then it neither overflows nor underflows", () => {
    expect(vonMises(diag(1e200, 0, 0))).toBeCloseTo(1e200, -186);
    expect(vonMises(diag(1e-300, 0, 0)) / 1e-300).toBeCloseTo(1, 14);
  });
});

describe("tractionOnPlane", () => {
  it("when the normal is not unit length, then it is normalised and t·n, |t − σn n| follow", () => {
    const r = tractionOnPlane(S, [0, 0, 5]);
    expect(r.traction).toEqual([-30, 20, 20]);
    expect(r.normal).toBe(20);
    expect(r.shear).toBeCloseTo(Math.hypot(30, 20), 12);
  });

  it("when the normal is a principal direction, then the shear is zero", () => {
    const r = tractionOnPlane(diag(3, 2, 1), [0, 1, 0]);
    expect(r.normal).toBe(2);
    expect(r.shear).toBe(0);
    expect(() => tractionOnPlane(S, [0, 0, 0])).toThrow(/n must be a non-zero vector/);
  });
});
