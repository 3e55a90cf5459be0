import { describe, expect, it } from "vitest";
import { cloudSample } from "./cloud-sample";

/** A seeded pseudo-random sequence (mulberry32, common practice, no source), so a failure repeats. */
function random(seed: number) {
  return () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe("which points the 3D view draws", () => {
  it("when the table fits the budget, then every point is drawn", () => {
    const s = cloudSample(new Float64Array([0.1, 0.5, 2]), 3);
    expect(s).toEqual({ indices: null, drawn: 3, total: 3, keptFrom: null });
  });

  it("when the table is larger, then at most the budget is drawn, in table order, and every point at or above the threshold — the most utilised half of the budget — is among them", () => {
    const next = random(7);
    const u = Float64Array.from({ length: 50_000 }, () => next() * 1.4);
    const s = cloudSample(u, 5_000);
    expect(s.drawn).toBe(s.indices!.length);
    expect(s.drawn).toBe(5_000);
    for (let j = 1; j < s.indices!.length; j++) expect(s.indices![j]).toBeGreaterThan(s.indices![j - 1]);
    const drawn = new Set(s.indices);
    const above = [...u.keys()].filter((i) => u[i] >= s.keptFrom!);
    expect(above.length).toBeGreaterThanOrEqual(2_500);
    expect(above.every((i) => drawn.has(i))).toBe(true);
    // The worst point of all is always drawn.
    const worst = u.indexOf(Math.max(...u));
    expect(drawn.has(worst)).toBe(true);
  });

  it("when some points are unrated (NaN), many tie and one is infinitely utilised, then the infinite one is drawn, the tied rated points share the budget evenly and no unrated point is drawn", () => {
    const u = new Float64Array(10_000).fill(0.2);
    for (let i = 0; i < 3_000; i++) u[i] = NaN;
    u[9_999] = Infinity;
    const s = cloudSample(u, 1_000);
    expect(s.indices!.includes(9_999)).toBe(true);
    expect(s.drawn).toBe(1_000);
    // The 7,000 rated points tie at the threshold and fill the budget, so no unrated point is drawn.
    expect([...s.indices!].filter((i) => Number.isNaN(u[i]))).toEqual([]);
  });
});
