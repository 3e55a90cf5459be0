/**
 * Picking a path from a point table: property tests on seeded random lines and clouds of points.
 * The geometry is common practice, no source: a point's distance to a segment is its distance to
 * the projection held between the ends, and a path is ordered by the projections.
 */
import { describe, expect, it } from "vitest";
import type { Vec3 } from "../tensor/types";
import { seededRandom } from "../testing/fixtures";
import { linearize } from "./linearize";
import { COINCIDENT_FRACTION, pickPath, pointsNearSegment } from "./pick-path";
import { MIN_POINTS, RECOMMENDED_MIN_POINTS } from "./path";

type Line = { start: Vec3; end: Vec3; u: Vec3; length: number; normal: Vec3 };

/** A random segment and a unit vector perpendicular to it. */
function randomLine(rnd: () => number): Line {
  const start: Vec3 = [(rnd() - 0.5) * 200, (rnd() - 0.5) * 200, (rnd() - 0.5) * 200];
  const length = 5 + rnd() * 50;
  const raw: Vec3 = [rnd() - 0.5, rnd() - 0.5, rnd() - 0.5];
  const r = Math.hypot(...raw);
  const u: Vec3 = [raw[0] / r, raw[1] / r, raw[2] / r];
  const end: Vec3 = [start[0] + length * u[0], start[1] + length * u[1], start[2] + length * u[2]];
  // Any vector not along u, with its part along u removed.
  const pick: Vec3 = Math.abs(u[0]) < 0.9 ? [1, 0, 0] : [0, 1, 0];
  const dot = pick[0] * u[0] + pick[1] * u[1] + pick[2] * u[2];
  const p: Vec3 = [pick[0] - dot * u[0], pick[1] - dot * u[1], pick[2] - dot * u[2]];
  const pn = Math.hypot(...p);
  return { start, end, u, length, normal: [p[0] / pn, p[1] / pn, p[2] / pn] };
}

/** The point at distance s along the line and `off` away from it along the normal. */
function at(line: Line, s: number, off = 0): Vec3 {
  return [0, 1, 2].map((c) => line.start[c] + s * line.u[c] + off * line.normal[c]) as unknown as Vec3;
}

const flat = (points: Vec3[]) => Float64Array.from(points.flat());
/** Six components per point that identify the point: its index in every component. */
const tagged = (n: number) =>
  Float64Array.from({ length: 6 * n }, (_, k) => Math.floor(k / 6) + (k % 6) / 10);

describe("pickPath: which points are picked (common practice, no source)", () => {
  it("when a point lies on the segment among random points far from it, then it is picked and the far ones are not", () => {
    const rnd = seededRandom(16_01);
    for (let trial = 0; trial < 200; trial++) {
      const line = randomLine(rnd);
      const tol = 0.01 + rnd() * 0.5;
      const s = rnd() * line.length;
      const points = [at(line, s)];
      for (let k = 0; k < 20; k++) points.push(at(line, rnd() * line.length, tol * (2 + rnd() * 10)));
      const near = pointsNearSegment(flat(points), line.start, line.end, tol);
      expect(Array.from(near.indices)).toEqual([0]);
      expect(near.along[0]).toBeCloseTo(s, 9);
    }
  });

  it("when a point lies just inside or just outside the tolerance of the line, then it is picked or not", () => {
    const rnd = seededRandom(16_02);
    for (let trial = 0; trial < 200; trial++) {
      const line = randomLine(rnd);
      const tol = 0.01 + rnd() * 0.5;
      const s = (0.05 + 0.9 * rnd()) * line.length;
      const inside = at(line, s, tol * 0.999);
      const outside = at(line, s, tol * 1.001);
      const near = pointsNearSegment(flat([inside, outside]), line.start, line.end, tol);
      expect(Array.from(near.indices)).toEqual([0]);
      expect(near.offLine[0]).toBeCloseTo(tol * 0.999, 9);
    }
  });

  it("when a point lies beyond an end by more than the tolerance, then it is not picked; within it, it is, with its projection past the end", () => {
    const rnd = seededRandom(16_03);
    for (let trial = 0; trial < 100; trial++) {
      const line = randomLine(rnd);
      const tol = 0.01 + rnd() * 0.5;
      const points = [
        at(line, -tol * 1.01),
        at(line, -tol * 0.5),
        at(line, line.length + tol * 0.5),
        at(line, line.length + tol * 1.01),
      ];
      const near = pointsNearSegment(flat(points), line.start, line.end, tol);
      expect(Array.from(near.indices)).toEqual([1, 2]);
      expect(near.along[0]).toBeCloseTo(-tol * 0.5, 9);
      expect(near.along[1]).toBeCloseTo(line.length + tol * 0.5, 9);
    }
  });

  it("when a coordinate is not a number, then that point is never picked", () => {
    const near = pointsNearSegment(Float64Array.from([NaN, 0, 0, 1, 0, 0]), [0, 0, 0], [2, 0, 0], 0.1);
    expect(Array.from(near.indices)).toEqual([1]);
  });
});

describe("pickPath: the path it returns (common practice, no source)", () => {
  it("when points near the line come in random order, then the path lists them by their projection, with their own tensors", () => {
    const rnd = seededRandom(16_04);
    for (let trial = 0; trial < 100; trial++) {
      const line = randomLine(rnd);
      const tol = 0.05 + rnd() * 0.2;
      const n = 3 + Math.floor(rnd() * 40);
      const s = Array.from({ length: n }, () => rnd() * line.length);
      const points = s.map((v) => at(line, v, (rnd() - 0.5) * tol));
      // Decoys off the line that must not enter the path.
      for (let k = 0; k < 10; k++) points.push(at(line, rnd() * line.length, tol * (1.5 + rnd())));
      const stresses = tagged(points.length);
      const path = pickPath(flat(points), stresses, line.start, line.end, tol);
      const expected = s.map((v, i) => ({ v, i })).sort((p, q) => p.v - q.v);
      expect(path.found).toBe(n);
      expect(path.count).toBe(n);
      expect(Array.from(path.sourceIndex)).toEqual(expected.map((e) => e.i));
      expected.forEach((e, k) => {
        expect(path.distances[k]).toBeCloseTo(e.v, 9);
        expect(Array.from(path.stresses.subarray(6 * k, 6 * k + 6))).toEqual(
          Array.from(stresses.subarray(6 * e.i, 6 * e.i + 6)),
        );
      });
      for (let k = 1; k < path.count; k++) expect(path.distances[k]).toBeGreaterThan(path.distances[k - 1]);
      expect(path.direction[0]).toBeCloseTo(line.u[0], 12);
      expect(path.lineLength).toBeCloseTo(line.length, 9);
    }
  });

  it("when a node is listed twice at one place (once per element), then it becomes one place with the mean of the two tensors, and the notes say so", () => {
    const line = randomLine(seededRandom(16_05));
    const s = [0, 0.25, 0.5, 0.5 + COINCIDENT_FRACTION * 0.1, 0.75, 1].map((f) => f * line.length);
    const stresses = new Float64Array(36);
    s.forEach((_, i) => stresses.set([i, 2 * i, 0, 0, 0, 10 * i], 6 * i));
    const path = pickPath(flat(s.map((v) => at(line, v))), stresses, line.start, line.end, 0.01);
    expect(path.found).toBe(6);
    expect(path.count).toBe(5);
    expect(Array.from(path.stresses.subarray(12, 18))).toEqual([2.5, 5, 0, 0, 0, 25]);
    expect(path.notes.join(" ")).toMatch(/1 point\(s\) sat at the same place/);
  });

  it("when fewer points than the minimum lie near the line, then the path says how many and warns; below the recommended count it warns too", () => {
    const line = randomLine(seededRandom(16_06));
    const two = pickPath(
      flat([at(line, 0), at(line, line.length)]),
      new Float64Array(12),
      line.start,
      line.end,
      0.01,
    );
    expect(two.count).toBe(2);
    expect(two.warnings.join(" ")).toContain(`needs at least ${MIN_POINTS}`);
    const five = pickPath(
      flat([0, 0.25, 0.5, 0.75, 1].map((f) => at(line, f * line.length))),
      new Float64Array(30),
      line.start,
      line.end,
      0.01,
    );
    expect(five.count).toBe(5);
    expect(five.warnings.join(" ")).toContain(`at least ${RECOMMENDED_MIN_POINTS} are recommended`);
    const none = pickPath(new Float64Array(0), new Float64Array(0), line.start, line.end, 0.01);
    expect(none.count).toBe(0);
    expect(none.warnings[0]).toMatch(/Only 0 place/);
  });

  it("when no point lies near one end, then a warning says the linearized wall is thinner than the line", () => {
    const line = randomLine(seededRandom(16_07));
    const s = Array.from({ length: 11 }, (_, i) => (0.5 * i * line.length) / 10);
    const path = pickPath(flat(s.map((v) => at(line, v))), new Float64Array(66), line.start, line.end, 0.01);
    expect(path.warnings.join(" ")).toMatch(/no point lies within the tolerance of the second end/);
  });

  it("when a linear field is picked from a cloud and linearized, then the membrane is its mean and the bending its linear part, as for the same points given directly", () => {
    // σyy = 100 + 20·s/L along the line: membrane 110, bending ∓10 at the ends (a linear
    // distribution is membrane + bending, common practice, no source).
    const rnd = seededRandom(16_08);
    const line: Line = { start: [0, 0, 0], end: [12, 0, 0], u: [1, 0, 0], length: 12, normal: [0, 1, 0] };
    const s = Array.from({ length: 13 }, (_, i) => i);
    const points = s.map((v) => at(line, v, (rnd() - 0.5) * 1e-3));
    for (let k = 0; k < 30; k++) points.push([rnd() * 12, 1 + rnd() * 5, rnd() * 5]);
    const stresses = new Float64Array(6 * points.length);
    points.forEach((p, i) => stresses.set([0, 100 + (20 * p[0]) / 12, 30, 0, 0, 0], 6 * i));
    // Shuffle by reversing: the table's order must not matter.
    const order = points.map((_, i) => points.length - 1 - i);
    const shuffled = flat(order.map((i) => points[i]));
    const shuffledStress = Float64Array.from(
      order.flatMap((i) => Array.from(stresses.subarray(6 * i, 6 * i + 6))),
    );
    const path = pickPath(shuffled, shuffledStress, line.start, line.end, 0.01);
    expect(path.count).toBe(13);
    const r = linearize({
      stresses: path.stresses,
      distances: path.distances,
      lineDirection: path.direction,
      secondAxis: [0, 1, 0],
    });
    expect(r.membrane[1]).toBeCloseTo(110, 9);
    expect(r.bending.start[1]).toBeCloseTo(-10, 9);
    expect(r.bending.end[1]).toBeCloseTo(10, 9);
  });
});

describe("pickPath: refusals", () => {
  const xyz = Float64Array.from([0, 0, 0, 1, 0, 0, 2, 0, 0]);
  const six = new Float64Array(18);
  it("when the two ends coincide, then a RangeError says the line has zero length", () => {
    expect(() => pickPath(xyz, six, [1, 2, 3], [1, 2, 3], 0.1)).toThrow(/end: the two end points coincide/);
  });
  it("when the tolerance is zero, negative or not a number, then a RangeError names the tolerance", () => {
    for (const t of [0, -1, NaN, Infinity]) {
      expect(() => pickPath(xyz, six, [0, 0, 0], [2, 0, 0], t)).toThrow(
        /^tolerance must be a finite number greater than 0/,
      );
    }
  });
  it("when an end is not three finite numbers, then a RangeError names it", () => {
    expect(() => pickPath(xyz, six, [0, NaN, 0], [2, 0, 0], 0.1)).toThrow(
      /^start must be three finite numbers/,
    );
    expect(() => pickPath(xyz, six, [0, 0, 0], [2, 0] as unknown as Vec3, 0.1)).toThrow(
      /^end must be three finite numbers/,
    );
  });
  it("when the stresses do not match the coordinates, then a RangeError says how many were expected", () => {
    expect(() => pickPath(xyz, new Float64Array(12), [0, 0, 0], [2, 0, 0], 0.1)).toThrow(
      /stresses has 12 values.*need 18/,
    );
    expect(() => pickPath(new Float64Array(4), new Float64Array(8), [0, 0, 0], [2, 0, 0], 0.1)).toThrow(
      /coordinates has 4 values/,
    );
  });
});
