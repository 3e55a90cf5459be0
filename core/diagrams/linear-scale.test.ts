import { line, scaleBand, scaleLinear, ticks as d3Ticks } from "d3";
import { describe, expect, it } from "vitest";
import { seededRandom } from "../testing/fixtures";
import { bandScale } from "./band-scale";
import { linearScale, niceTicks } from "./linear-scale";
import { polylinePath } from "./polyline";

/** A random interval of random size and sign, from 1e-6 to 1e9 wide. */
function randomInterval(next: () => number): [number, number] {
  const size = 10 ** (-6 + 15 * next());
  const start = (next() - 0.5) * 4 * size;
  return next() < 0.2 ? [start + size, start] : [start, start + size];
}

describe("linearScale", () => {
  it("when any domain is mapped (2000 seeded domains and ranges), then its ends land on the ends of the range and invert brings every point back", () => {
    const next = seededRandom(611);
    for (let i = 0; i < 2000; i++) {
      const domain = randomInterval(next);
      const range: [number, number] = next() < 0.5 ? [50, 466] : [210, 14];
      const s = linearScale(domain, range);
      const span = Math.abs(domain[1] - domain[0]);
      expect(s.map(domain[0])).toBeCloseTo(range[0], 9);
      expect(s.map(domain[1])).toBeCloseTo(range[1], 9);
      const v = domain[0] + next() * (domain[1] - domain[0]);
      expect(Math.abs(s.invert(s.map(v)) - v)).toBeLessThanOrEqual(1e-12 * Math.max(span, Math.abs(v)));
    }
  });

  it("when compared with d3-scale's scaleLinear (npm d3 7, an independent implementation) on 2000 seeded domains, then every mapped and inverted value is the same number", () => {
    const next = seededRandom(612);
    for (let i = 0; i < 2000; i++) {
      const domain = randomInterval(next);
      const range: [number, number] = [next() * 300, next() * 300];
      const ours = linearScale(domain, range);
      const theirs = scaleLinear().domain(domain).range(range);
      const v = domain[0] + (next() * 1.4 - 0.2) * (domain[1] - domain[0]);
      expect(ours.map(v)).toBe(theirs(v));
      const px = range[0] + next() * (range[1] - range[0]);
      expect(ours.invert(px)).toBe(theirs.invert(px));
    }
  });
});

describe("niceTicks", () => {
  it("when asked for ticks of 1500 seeded domains, then they are the ticks d3-array gives (npm d3 7), lie inside the domain, and step by 1, 2 or 5 × 10ⁿ", () => {
    const next = seededRandom(613);
    for (let i = 0; i < 1500; i++) {
      const [a, b] = randomInterval(next);
      const count = 1 + Math.floor(next() * 10);
      const t = niceTicks(a, b, count);
      expect(t).toEqual(d3Ticks(a, b, count));
      const lo = Math.min(a, b);
      const hi = Math.max(a, b);
      for (const v of t) {
        expect(v).toBeGreaterThanOrEqual(lo);
        expect(v).toBeLessThanOrEqual(hi);
      }
      if (t.length > 1) {
        const step = Math.abs(t[1] - t[0]);
        const mantissa = step / 10 ** Math.floor(Math.log10(step) + 1e-9);
        expect([1, 2, 5].some((m) => Math.abs(mantissa - m) < 1e-6)).toBe(true);
        // Round numbers: each tick is a whole multiple of the step.
        for (const v of t) expect(Math.abs(v / step - Math.round(v / step))).toBeLessThan(1e-6);
      }
    }
  });

  it("when the domain is a point or the count is not positive, then the ticks are that point or none", () => {
    expect(niceTicks(5, 5, 6)).toEqual([5]);
    expect(niceTicks(0, 10, 0)).toEqual([]);
    expect(niceTicks(0, 10, 5)).toEqual([0, 2, 4, 6, 8, 10]);
    expect(niceTicks(10, 0, 5)).toEqual([10, 8, 6, 4, 2, 0]);
  });
});

describe("bandScale", () => {
  it("when bands are laid out for 1 to 60 keys (seeded), then each start and the bandwidth equal d3-scale's scaleBand().padding(p) (npm d3 7), and bands never overlap", () => {
    const next = seededRandom(614);
    for (let i = 0; i < 300; i++) {
      const n = 1 + Math.floor(next() * 60);
      const keys = Array.from({ length: n }, (_, k) => `row-${k}`);
      const range: [number, number] = [8, 8 + 22 * n];
      const padding = next() * 0.5;
      const ours = bandScale(keys, range, padding);
      const theirs = scaleBand<string>().domain(keys).range(range).padding(padding);
      expect(ours.bandwidth).toBeCloseTo(theirs.bandwidth(), 12);
      for (const k of keys) expect(ours.start(k)).toBeCloseTo(theirs(k)!, 9);
      for (let k = 1; k < n; k++)
        expect(ours.start(keys[k])!).toBeGreaterThanOrEqual(ours.start(keys[k - 1])! + ours.bandwidth);
      expect(ours.start(keys[0])!).toBeGreaterThanOrEqual(range[0]);
      expect(ours.start(keys[n - 1])! + ours.bandwidth).toBeLessThanOrEqual(range[1] + 1e-9);
    }
    expect(bandScale(["a"], [0, 10], 0).start("missing")).toBeUndefined();
  });
});

describe("polylinePath", () => {
  it("when a seeded outline is written, then the path is the one d3-shape's line() writes (npm d3 7, three decimals)", () => {
    const next = seededRandom(615);
    const points = Array.from(
      { length: 50 },
      () => [next() * 400 - 200, next() * 400 - 200] as [number, number],
    );
    const x = (v: number) => 46 + (v + 200) * 0.565;
    const y = (v: number) => 236 - (v + 200) * 0.565;
    const theirs = line<[number, number]>()
      .x((p) => x(p[0]))
      .y((p) => y(p[1]))(points);
    expect(polylinePath(points, x, y)).toBe(theirs);
    expect(polylinePath(points, x, y, true)).toBe(`${theirs}Z`);
    expect(polylinePath([], x, y, true)).toBe("Z");
  });
});
