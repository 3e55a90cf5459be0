/**
 * Property tests of linearize on seeded random smooth fields: reversing the points, refining the
 * path, turning the tensors about the line, turning the whole problem; and the equivalent stresses
 * against mathjs `eigs` (a general-purpose library) for Tresca.
 */
import { eigs } from "mathjs";
import { describe, expect, it } from "vitest";
import { rotateTensor, rotationFromAxisAngle } from "../tensor/rotate";
import { multiplyMat3 } from "../tensor/rotation-tools";
import type { Mat3, Vec3 } from "../tensor/types";
import { seededRandom } from "../testing/fixtures";
import { linearize } from "./linearize";
import { distancesTo, fieldAt, maxDiff6, pointsAlong, randomFrame, toGlobal } from "./test-fields";

/** A smooth random field: per component a + b·x + c·sin(k·x + φ) (stress unit ~ 100). */
function smoothField(rnd: () => number, t: number) {
  const p = Array.from({ length: 6 }, () => ({
    a: (rnd() * 2 - 1) * 100,
    b: ((rnd() * 2 - 1) * 50) / t,
    c: (rnd() * 2 - 1) * 40,
    k: ((0.5 + rnd() * 3) * Math.PI) / t,
    f: rnd() * Math.PI * 2,
  }));
  return (x: number) => p.map((q) => q.a + q.b * x + q.c * Math.sin(q.k * x + q.f));
}

/** The six local components' signs when the local x and z axes flip (x′ = −x, y′ = y, z′ = −z). */
const FLIP_XZ = [1, 1, 1, -1, -1, 1];

function turnedTensors(stresses: Float64Array, r: Mat3): Float64Array {
  const out = new Float64Array(stresses.length);
  for (let o = 0; o < stresses.length; o += 6) {
    const g = rotateTensor(
      {
        xx: stresses[o],
        yy: stresses[o + 1],
        zz: stresses[o + 2],
        xy: stresses[o + 3],
        yz: stresses[o + 4],
        zx: stresses[o + 5],
      },
      r,
    );
    out.set([g.xx, g.yy, g.zz, g.xy, g.yz, g.zx], o);
  }
  return out;
}

/** v turned by the rotation whose rows are the new axes (σ′ = RσRᵀ pairs with v′ = R v). */
function turned(r: Mat3, v: Vec3): Vec3 {
  return [
    r[0][0] * v[0] + r[0][1] * v[1] + r[0][2] * v[2],
    r[1][0] * v[0] + r[1][1] * v[1] + r[1][2] * v[2],
    r[2][0] * v[0] + r[2][1] * v[1] + r[2][2] * v[2],
  ];
}

describe("linearize: properties (common practice, no source: they follow from the definitions)", () => {
  it("when the points are given in reverse order, then the membrane is unchanged and the ends swap, so the bending changes sign (both bending rules)", () => {
    const rnd = seededRandom(1611);
    for (let k = 0; k < 100; k++) {
      const frame = randomFrame(rnd);
      const t = 2 + rnd() * 40;
      const n = 3 + Math.floor(rnd() * 30);
      const x = distancesTo(t, n, rnd);
      const stresses = toGlobal(fieldAt(x, smoothField(rnd, t)), frame);
      const rev = new Float64Array(stresses.length);
      const xr = new Float64Array(n);
      for (let i = 0; i < n; i++) {
        rev.set(stresses.subarray(6 * (n - 1 - i), 6 * (n - i)), 6 * i);
        xr[i] = -x[n - 1 - i];
      }
      const back: Vec3 = [-frame[0][0], -frame[0][1], -frame[0][2]];
      for (const bending of ["annex-5a", "all-components"] as const) {
        const f = linearize({
          stresses,
          distances: x,
          lineDirection: frame[0],
          secondAxis: frame[1],
          bending,
        });
        const r = linearize({
          stresses: rev,
          distances: xr,
          lineDirection: back,
          secondAxis: frame[1],
          bending,
        });
        // reversing turns local x and z round; components change sign as FLIP_XZ says
        const flip = (v: Float64Array) => v.map((value, c) => FLIP_XZ[c] * value);
        expect(maxDiff6(r.membrane, flip(f.membrane), 200)).toBeLessThan(1e-12);
        expect(maxDiff6(r.bending.start, flip(f.bending.end), 200)).toBeLessThan(1e-12);
        expect(
          maxDiff6(
            r.bending.start,
            flip(f.bending.start).map((v) => -v),
            200,
          ),
        ).toBeLessThan(1e-12);
        expect(maxDiff6(r.peak.start, flip(f.peak.end), 200)).toBeLessThan(1e-12);
        expect(Math.abs(r.equivalent.membrane - f.equivalent.membrane) / 200).toBeLessThan(1e-12);
        expect(
          Math.abs(r.equivalent.membranePlusBending.start - f.equivalent.membranePlusBending.end) / 200,
        ).toBeLessThan(1e-12);
      }
    }
  });

  it("when the path through a smooth field is refined, then the results converge: each halving of the interval cuts the error against a 4001-point path by at least 3×", () => {
    const rnd = seededRandom(1612);
    for (let k = 0; k < 20; k++) {
      const frame = randomFrame(rnd);
      const t = 5 + rnd() * 20;
      const f = smoothField(rnd, t);
      const run = (n: number) => {
        const x = distancesTo(t, n);
        return linearize({ stresses: toGlobal(fieldAt(x, f), frame), distances: x, lineDirection: frame[0] });
      };
      const ref = run(4001);
      let last = Infinity;
      for (const n of [6, 11, 21, 41, 81]) {
        const r = run(n);
        const err = Math.max(
          maxDiff6(r.membrane, ref.membrane),
          maxDiff6(r.membranePlusBending.start, ref.membranePlusBending.start),
          maxDiff6(r.peak.end, ref.peak.end),
        );
        expect(err).toBeLessThan(last / 3);
        last = err;
      }
      expect(last).toBeLessThan(0.05); // 81 points: within 0.05 on stresses of about 100
    }
  });

  it("when each tensor is turned about the line and the second axis with it, then every local component and equivalent stress is unchanged", () => {
    const rnd = seededRandom(1613);
    for (let k = 0; k < 100; k++) {
      const frame = randomFrame(rnd);
      const t = 2 + rnd() * 40;
      const x = distancesTo(t, 4 + Math.floor(rnd() * 20), rnd);
      const stresses = toGlobal(fieldAt(x, smoothField(rnd, t)), frame);
      const coordinates = pointsAlong([0, 0, 0], frame[0], x);
      const q = rotationFromAxisAngle(frame[0], (rnd() * 2 - 1) * 180);
      const a = linearize({ stresses, coordinates, secondAxis: frame[1] });
      const b = linearize({
        stresses: turnedTensors(stresses, q),
        coordinates,
        secondAxis: turned(q, frame[1]),
      });
      for (const end of ["start", "end"] as const) {
        expect(maxDiff6(b.membranePlusBending[end], a.membranePlusBending[end], 200)).toBeLessThan(1e-12);
        expect(maxDiff6(b.peak[end], a.peak[end], 200)).toBeLessThan(1e-12);
        expect(Math.abs(b.equivalent.peak[end] - a.equivalent.peak[end]) / 200).toBeLessThan(1e-12);
      }
      expect(maxDiff6(b.membrane, a.membrane, 200)).toBeLessThan(1e-12);
    }
  });

  it("when each tensor is turned about the line but the frame is kept, then the membrane equivalent is unchanged always, and with 'bend every component' every equivalent stress is unchanged", () => {
    const rnd = seededRandom(1614);
    for (let k = 0; k < 100; k++) {
      const frame = randomFrame(rnd);
      const t = 2 + rnd() * 40;
      const x = distancesTo(t, 4 + Math.floor(rnd() * 20), rnd);
      const stresses = toGlobal(fieldAt(x, smoothField(rnd, t)), frame);
      const coordinates = pointsAlong([1, 2, 3], frame[0], x);
      const q = rotationFromAxisAngle(frame[0], (rnd() * 2 - 1) * 180);
      for (const criterion of ["von-mises", "tresca"] as const) {
        const opts = { coordinates, secondAxis: frame[1], equivalent: criterion };
        const a = linearize({ stresses, ...opts });
        const b = linearize({ stresses: turnedTensors(stresses, q), ...opts });
        expect(Math.abs(b.equivalent.membrane - a.equivalent.membrane) / 200).toBeLessThan(1e-12);
        const all = { ...opts, bending: "all-components" as const };
        const c = linearize({ stresses, ...all });
        const d = linearize({ stresses: turnedTensors(stresses, q), ...all });
        for (const key of ["bending", "membranePlusBending", "peak", "total"] as const) {
          for (const end of ["start", "end"] as const) {
            expect(Math.abs(d.equivalent[key][end] - c.equivalent[key][end]) / 200).toBeLessThan(1e-12);
          }
        }
      }
    }
  });

  it("when Annex 5-A bending is used and the in-plane axes are turned away from the field's own, then membrane + bending changes (the rule bends σyy, σzz but not σyz, so the second axis must be the hoop or meridional direction)", () => {
    // bending of σyy only, in the field's own axes: σyy = 100·(1 − 2x/t)
    const x = distancesTo(10, 21);
    const s = fieldAt(x, (xi) => [0, 100 * (1 - xi / 5), 0, 0, 0, 0]);
    const own = linearize({ stresses: s, distances: x, lineDirection: [1, 0, 0], secondAxis: [0, 1, 0] });
    const turned45 = linearize({
      stresses: s,
      distances: x,
      lineDirection: [1, 0, 0],
      secondAxis: [0, 1, 1],
    });
    expect(own.equivalent.membranePlusBending.start).toBeCloseTo(100, 10);
    // by hand: at 45° σy′y′ = σz′z′ = 50·(1 − 2x/t) and |σy′z′| = 50·|1 − 2x/t|; Annex 5-A bends the
    // first two but leaves σy′z′ as peak, so membrane + bending at x = 0 is (0, 50, 50, 0, 0, 0),
    // von Mises √(½(50² + 0 + 50²)) = 50 instead of 100
    expect(turned45.equivalent.membranePlusBending.start).toBeCloseTo(50, 10);
    expect(Math.abs(turned45.local[4])).toBeCloseTo(50, 10);
    expect(Math.abs(turned45.peak.start[4])).toBeCloseTo(50, 10);
    expect(own.peak.start[4]).toBe(0);
  });

  it("when the whole problem (points, tensors and second axis) is turned rigidly, then every local result is unchanged", () => {
    const rnd = seededRandom(1615);
    for (let k = 0; k < 100; k++) {
      const frame = randomFrame(rnd);
      const t = 2 + rnd() * 40;
      const x = distancesTo(t, 4 + Math.floor(rnd() * 20), rnd);
      const stresses = toGlobal(fieldAt(x, smoothField(rnd, t)), frame);
      const q = randomFrame(rnd);
      const a = linearize({
        stresses,
        coordinates: pointsAlong([0, 0, 0], frame[0], x),
        secondAxis: frame[1],
      });
      const turnedFrame = multiplyMat3(frame, transpose(q));
      const b = linearize({
        stresses: turnedTensors(stresses, q),
        coordinates: pointsAlong([0, 0, 0], turnedFrame[0], x),
        secondAxis: turnedFrame[1],
      });
      expect(maxDiff6(b.membrane, a.membrane, 200)).toBeLessThan(1e-12);
      expect(maxDiff6(b.bending.start, a.bending.start, 200)).toBeLessThan(1e-12);
      expect(maxDiff6(b.peak.end, a.peak.end, 200)).toBeLessThan(1e-12);
    }
  });

  it("when Tresca is asked for, then each equivalent stress is σ1 − σ3 of the linearized tensor by mathjs eigs", () => {
    const rnd = seededRandom(1616);
    for (let k = 0; k < 50; k++) {
      const frame = randomFrame(rnd);
      const t = 2 + rnd() * 40;
      const x = distancesTo(t, 11, rnd);
      const r = linearize({
        stresses: toGlobal(fieldAt(x, smoothField(rnd, t)), frame),
        distances: x,
        lineDirection: frame[0],
        equivalent: "tresca",
      });
      expect(r.equivalent.label).toContain("Tresca");
      const check = (v: Float64Array, got: number) => {
        const m = [
          [v[0], v[3], v[5]],
          [v[3], v[1], v[4]],
          [v[5], v[4], v[2]],
        ];
        const values = (eigs(m).values as number[]).slice().sort((p, q) => p - q);
        expect(Math.abs(got - (values[2] - values[0])) / 200).toBeLessThan(1e-10);
      };
      check(r.membrane, r.equivalent.membrane);
      check(r.membranePlusBending.start, r.equivalent.membranePlusBending.start);
      check(r.peak.end, r.equivalent.peak.end);
    }
  });
});

function transpose(m: Mat3): Mat3 {
  return [
    [m[0][0], m[1][0], m[2][0]],
    [m[0][1], m[1][1], m[2][1]],
    [m[0][2], m[1][2], m[2][2]],
  ];
}
