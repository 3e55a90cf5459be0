import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ACCURACY } from "../tolerances";
import { principalBatch } from "../batch/principal-batch";
import { invariants, vonMises } from "./invariants";
import { rotateTensor } from "./rotate";
import type { Mat3, StressTensor } from "./types";
import {
  cross,
  dot,
  frobenius,
  residual,
  rotationFromQuaternion,
  tensorWithPrincipal,
  toMatrix,
} from "../testing/fixtures";
import { principalStresses, principalValues } from "./principal";

const SEED = 20260314;
const RUNS = 2000;

const finite = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const quaternion = fc.tuple(finite(-1, 1), finite(-1, 1), finite(-1, 1), finite(-1, 1));
const randomTensor: fc.Arbitrary<StressTensor> = fc.record({
  xx: finite(-1e3, 1e3),
  yy: finite(-1e3, 1e3),
  zz: finite(-1e3, 1e3),
  xy: finite(-1e3, 1e3),
  yz: finite(-1e3, 1e3),
  zx: finite(-1e3, 1e3),
});

/** Principal-value patterns with repeated and nearly repeated roots. */
const degeneratePattern: fc.Arbitrary<[number, number, number]> = fc.oneof(
  finite(-1, 1).map((a): [number, number, number] => [a, a, a]), // hydrostatic
  finite(-1, 1).map((a): [number, number, number] => [a, 0, 0]), // uniaxial
  finite(-1, 1).map((a): [number, number, number] => [a, a, 0]), // equibiaxial
  finite(-1, 1).map((a): [number, number, number] => [a, 0, -a]), // pure shear
  fc
    .tuple(finite(-1, 1), finite(-1, 1), fc.constantFrom(1e-12, -1e-12, 1e-15, 3e-9, 1e-6))
    .map(([a, b, d]): [number, number, number] => [a, a * (1 + d), b]), // nearly repeated pair
  fc
    .tuple(finite(-1, 1), fc.constantFrom(1e-12, -1e-12, 1e-14))
    .map(([a, d]): [number, number, number] => [a, a + d, a - d]), // nearly hydrostatic
  fc.tuple(finite(-1, 1), finite(-1, 1), finite(-1, 1)),
);
const magnitude = fc.constantFrom(1, 1e-300, 1e200, 1e-150, 1e150, 7.3);

/** A rotated tensor with known principal values (sorted descending). */
const knownTensor = fc.tuple(quaternion, degeneratePattern, magnitude).map(([q, l, k]) => {
  const values = l.map((v) => v * k).sort((a, b) => b - a);
  const tensor = tensorWithPrincipal(rotationFromQuaternion(...q), values);
  return { tensor, values };
});

/**
 * The relative targets hold while ‖σ‖F is a normal double; below about 1e-290 the outputs themselves
 * are subnormal, so their spacing (Number.MIN_VALUE) sets an absolute floor.
 */
function floorFor(f: number): number {
  return f > 0 ? (64 * Number.MIN_VALUE) / f : 0;
}

function checkEigenpairs(s: StressTensor): void {
  const f = frobenius(s);
  const { values, directions } = principalStresses(s);
  expect(values.every(Number.isFinite)).toBe(true);
  expect(values[0]).toBeGreaterThanOrEqual(values[1]);
  expect(values[1]).toBeGreaterThanOrEqual(values[2]);
  for (let k = 0; k < 3; k++) {
    if (f > 0)
      expect(residual(s, values[k], directions[k])).toBeLessThanOrEqual(ACCURACY.residual + floorFor(f));
    for (let l = 0; l < 3; l++) {
      expect(Math.abs(dot(directions[k], directions[l]) - (k === l ? 1 : 0))).toBeLessThanOrEqual(
        ACCURACY.orthonormality,
      );
    }
  }
  const c = cross(directions[0], directions[1]);
  for (let i = 0; i < 3; i++)
    expect(Math.abs(c[i] - directions[2][i])).toBeLessThanOrEqual(ACCURACY.orthonormality);
}

describe("principalStresses (property tests, fast-check seeded)", () => {
  it("when the tensor is random, then σ·D = D·Λ, DᵀD = I, values sorted, d3 = d1 × d2", () => {
    fc.assert(
      fc.property(randomTensor, (s) => checkEigenpairs(s)),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it("when principal values are repeated or nearly repeated (any magnitude), then the eigenpairs keep full accuracy", () => {
    fc.assert(
      fc.property(knownTensor, ({ tensor }) => checkEigenpairs(tensor)),
      { seed: SEED + 1, numRuns: RUNS * 2 },
    );
  });

  it("when the principal values are known by construction, then each is found within 1e-13·‖σ‖F", () => {
    fc.assert(
      fc.property(knownTensor, ({ tensor, values }) => {
        const f = frobenius(tensor);
        const got = principalStresses(tensor).values;
        for (let i = 0; i < 3; i++) {
          expect(Math.abs(got[i] - values[i])).toBeLessThanOrEqual(
            ACCURACY.eigenvalue * f + 64 * Number.MIN_VALUE,
          );
        }
        const fast = principalValues(tensor);
        for (let i = 0; i < 3; i++) {
          expect(Math.abs(fast[i] - values[i])).toBeLessThanOrEqual(
            ACCURACY.eigenvalue * f + 64 * Number.MIN_VALUE,
          );
        }
      }),
      { seed: SEED + 2, numRuns: RUNS * 2 },
    );
  });

  it("when the tensor is scaled by k, then the principal values scale by k (order reversed for k < 0)", () => {
    const k = fc.constantFrom(2, 0.5, 1e-3, 3.7, -1, -2.5, 1e100, 1e-100);
    fc.assert(
      fc.property(randomTensor, k, (s, kk) => {
        const scaled = {
          xx: kk * s.xx,
          yy: kk * s.yy,
          zz: kk * s.zz,
          xy: kk * s.xy,
          yz: kk * s.yz,
          zx: kk * s.zx,
        };
        const a = principalStresses(s).values.map((v) => kk * v);
        if (kk < 0) a.reverse();
        const b = principalStresses(scaled).values;
        const tol = ACCURACY.eigenvalue * frobenius(scaled);
        for (let i = 0; i < 3; i++) expect(Math.abs(a[i] - b[i])).toBeLessThanOrEqual(tol);
        expect(Math.abs(vonMises(scaled) - Math.abs(kk) * vonMises(s))).toBeLessThanOrEqual(
          1e-14 * Math.abs(kk) * frobenius(s) * 4,
        );
      }),
      { seed: SEED + 3, numRuns: RUNS },
    );
  });

  it("when the axes are rotated, then invariants, von Mises stress and principal values do not change", () => {
    fc.assert(
      fc.property(randomTensor, quaternion, (s, q) => {
        const r = rotationFromQuaternion(...q) as unknown as Mat3;
        const t = rotateTensor(s, r);
        const f = frobenius(s);
        const a = invariants(s);
        const b = invariants(t);
        const floor = 64 * Number.MIN_VALUE; // products of tiny components are subnormal
        expect(Math.abs(a.i1 - b.i1)).toBeLessThanOrEqual(1e-13 * f + floor);
        expect(Math.abs(a.i2 - b.i2)).toBeLessThanOrEqual(1e-13 * f * f + floor);
        expect(Math.abs(a.i3 - b.i3)).toBeLessThanOrEqual(1e-13 * f * f * f + floor);
        expect(Math.abs(a.j2 - b.j2)).toBeLessThanOrEqual(1e-13 * f * f + floor);
        expect(Math.abs(a.j3 - b.j3)).toBeLessThanOrEqual(1e-13 * f * f * f + floor);
        expect(Math.abs(vonMises(s) - vonMises(t))).toBeLessThanOrEqual(1e-13 * f + floor);
        const pa = principalStresses(s).values;
        const pb = principalStresses(t).values;
        for (let i = 0; i < 3; i++)
          expect(Math.abs(pa[i] - pb[i])).toBeLessThanOrEqual(2 * ACCURACY.eigenvalue * f + floor);
      }),
      { seed: SEED + 4, numRuns: RUNS },
    );
  });

  it("when rotated into its principal frame (rows d1, d2, d3), then the tensor is diagonal with σ1, σ2, σ3", () => {
    fc.assert(
      fc.property(
        fc.oneof(
          randomTensor,
          knownTensor.map((k) => k.tensor),
        ),
        (s) => {
          const { values, directions } = principalStresses(s);
          const d = rotateTensor(s, directions);
          const f = frobenius(s);
          const tol = ACCURACY.residual * f + 64 * Number.MIN_VALUE;
          for (const c of [d.xy, d.yz, d.zx]) expect(Math.abs(c)).toBeLessThanOrEqual(tol);
          expect(Math.abs(d.xx - values[0])).toBeLessThanOrEqual(tol);
          expect(Math.abs(d.yy - values[1])).toBeLessThanOrEqual(tol);
          expect(Math.abs(d.zz - values[2])).toBeLessThanOrEqual(tol);
        },
      ),
      { seed: SEED + 5, numRuns: RUNS },
    );
  });

  it("when tensors go through principalBatch, then it agrees with principalStresses", () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.oneof(
            randomTensor,
            knownTensor.map((k) => k.tensor),
          ),
          { minLength: 1, maxLength: 40 },
        ),
        (list) => {
          const n = list.length;
          const input = new Float64Array(6 * n);
          list.forEach((s, k) => input.set([s.xx, s.yy, s.zz, s.xy, s.yz, s.zx], 6 * k));
          const out = {
            values: new Float64Array(3 * n),
            directions: new Float64Array(9 * n),
            vonMises: new Float64Array(n),
            tresca: new Float64Array(n),
          };
          principalBatch(input, out);
          const valuesOnly = new Float64Array(3 * n);
          principalBatch(input, { values: valuesOnly });
          list.forEach((s, k) => {
            const p = principalStresses(s);
            const f = frobenius(s);
            expect(Array.from(out.values.subarray(3 * k, 3 * k + 3))).toEqual(p.values);
            expect(Array.from(out.directions.subarray(9 * k, 9 * k + 9))).toEqual(p.directions.flat());
            for (let i = 0; i < 3; i++) {
              expect(Math.abs(valuesOnly[3 * k + i] - p.values[i])).toBeLessThanOrEqual(
                2 * ACCURACY.eigenvalue * f + 64 * Number.MIN_VALUE,
              );
            }
            expect(out.vonMises[k]).toBe(vonMises(s));
            expect(out.tresca[k]).toBe(p.values[0] - p.values[2]);
          });
        },
      ),
      { seed: SEED + 6, numRuns: 300 },
    );
  });
});

describe("principalStresses at the edges of the number range", () => {
  it("when the tensor is zero, then values are 0 and directions are the x, y, z axes", () => {
    const p = principalStresses({ xx: 0, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 });
    expect(p.values).toEqual([0, 0, 0]);
    expect(p.directions).toEqual([
      [1, 0, 0],
      [0, 1, 0],
      [0, 0, 1],
    ]);
  });

  it("when entries are 1e-300, 1e200 or subnormal, then nothing overflows, underflows to NaN, or loses accuracy", () => {
    for (const k of [1e-300, 1e200, 1e-310, 5e-324, 1e300]) {
      const base = { xx: 3, yy: -1, zz: 2, xy: 1, yz: -2, zx: 0.5 };
      const s = { xx: 3 * k, yy: -1 * k, zz: 2 * k, xy: k, yz: -2 * k, zx: 0.5 * k };
      const p = principalStresses(s);
      expect(p.values.every(Number.isFinite)).toBe(true);
      expect(p.directions.flat().every(Number.isFinite)).toBe(true);
      checkEigenpairs(s);
      if (k >= 1e-300) {
        // exact multiples: the values must be k times those of the unit-scale tensor
        const ref = principalStresses(base).values;
        for (let i = 0; i < 3; i++)
          expect(Math.abs(p.values[i] - k * ref[i])).toBeLessThanOrEqual(1e-13 * frobenius(s));
      }
    }
  });

  it("when a component is NaN or infinite, then a RangeError names it", () => {
    expect(() => principalStresses({ xx: NaN, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 })).toThrow(
      /s\.xx must be finite/,
    );
    expect(() => principalStresses({ xx: 0, yy: 0, zz: 0, xy: 0, yz: Infinity, zx: 0 })).toThrow(RangeError);
    expect(() => principalStresses({ xx: 0, yy: 0, zz: 0, xy: 0, yz: 0 } as StressTensor)).toThrow(TypeError);
  });

  it("when the state is uniaxial along x, then σ1 is along ±x and the others span the y–z plane (handbook fact, common practice, no source)", () => {
    const p = principalStresses({ xx: 100, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 });
    expect(p.values).toEqual([100, 0, 0]);
    expect(Math.abs(p.directions[0][0])).toBeCloseTo(1, 15);
    expect(toMatrix({ xx: 1, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 })[0][0]).toBe(1);
  });
});
