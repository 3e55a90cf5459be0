import { describe, expect, it } from "vitest";
import {
  evaluateState,
  verdictForUtilisation,
  type CheckRequirement,
  type EvaluatedCheck,
  type Material,
} from "../../../core";
import { seededRandom } from "../../../core/testing/fixtures";
import { rateChunk } from "./rate-chunk";

// The reference is core's object API, evaluateState, one tensor at a time (itself checked against
// mathjs and the reference cases in core's tests): the server's chunk
// rating must give its verdicts, governing points and worst points (formula; no outside source
// beyond what core's own tests check evaluateState against).
const STEEL: Material = { yield: 250e6, ultimateTension: 400e6, ultimateCompression: 600e6 };
const REQUIREMENTS: CheckRequirement[] = [
  { criterion: "von-mises", requiredFactor: 1.5 },
  { criterion: "tresca", requiredFactor: 1.5 },
  { criterion: "max-principal", requiredFactor: 2 },
];
const COMPONENTS = ["xx", "yy", "zz", "xy", "yz", "zx"] as const;

/** `n` seeded random tensors (Pa) as a stored chunk holds them: xx[n] yy[n] zz[n] xy[n] yz[n] zx[n]. */
function storedColumns(n: number, seed: number): Float64Array {
  const rnd = seededRandom(seed);
  const columns = new Float64Array(6 * n);
  for (let k = 0; k < n; k++) {
    const size = 250e6 * rnd() ** 2;
    for (let c = 0; c < 6; c++) columns[c * n + k] = (rnd() * 2 - 1) * size;
  }
  return columns;
}

/** The rated figures of check `i` (every check is rated: unsuited criteria are included). */
function rated(r: ReturnType<typeof evaluateState>, i: number): EvaluatedCheck {
  const check = r.checks[i];
  if (check.status !== "evaluated") throw new Error(`check ${i} was not rated: ${check.reason}`);
  return check;
}

const tensorAt = (columns: Float64Array, n: number, k: number) =>
  Object.fromEntries(COMPONENTS.map((name, c) => [name, columns[c * n + k]])) as Record<
    (typeof COMPONENTS)[number],
    number
  >;

describe("rating a stored chunk (the server's rating worker)", () => {
  const N = 2000;
  const columns = storedColumns(N, 20_261_203);
  columns[3 * N + 17] = Number.NaN; // point 17's xy: a bad point
  const rating = rateChunk(columns, N, {
    spec: { material: STEEL, requirements: REQUIREMENTS },
    includeUnsuited: true,
  });
  const refs = Array.from({ length: N }, (_, k) =>
    k === 17 ? null : evaluateState(tensorAt(columns, N, k), STEEL, REQUIREMENTS, { includeUnsuited: true }),
  );

  it("when 2000 seeded random tensors stored column by column are rated, then each criterion's fail and close counts and governing point equal evaluateState's, point by point", () => {
    REQUIREMENTS.forEach((requirement, i) => {
      const us = refs.map((r) => (r === null ? Number.NaN : rated(r, i).utilisation));
      let governing = -1;
      us.forEach((u, k) => {
        if (u === u && (governing < 0 || u > us[governing])) governing = k;
      });
      const verdicts = us.filter((u) => u === u).map(verdictForUtilisation);
      const c = rating.criteria[i];
      expect(c.criterion).toBe(requirement.criterion);
      expect(c.failing).toBe(verdicts.filter((v) => v === "fail").length);
      expect(c.close).toBe(verdicts.filter((v) => v === "close").length);
      expect(c.governing).toEqual({
        index: governing,
        factor: rated(refs[governing]!, i).factor,
        utilisation: us[governing],
      });
    });
    // the random states give every verdict, so the counts above are not all zero
    expect(rating.criteria[0].failing).toBeGreaterThan(0);
    expect(rating.criteria[0].close).toBeGreaterThan(0);
  });

  it("when the chunk is rated, then the worst points are evaluateState's highest governing utilisations with their stored components, and the bad point is counted and left out", () => {
    const expected = refs
      .map((r, index) => ({ index, utilisation: r === null ? Number.NaN : r.governing!.utilisation }))
      .filter((p) => p.utilisation === p.utilisation)
      .sort((a, b) => b.utilisation - a.utilisation || a.index - b.index)
      .slice(0, rating.worst.length);
    expect(rating.worst.length).toBe(100);
    expect(rating.worst.map(({ index, utilisation }) => ({ index, utilisation }))).toEqual(expected);
    for (const w of rating.worst) {
      expect(w.components).toEqual(COMPONENTS.map((_, c) => columns[c * N + w.index]));
    }
    expect(rating.badPoints).toBe(1);
    expect(rating.histogram.counts.reduce((a, b) => a + b, 0)).toBe(N - 1);
  });

  it("when the columns hold fewer values than six per point, then the rating is refused naming both counts", () => {
    expect(() =>
      rateChunk(new Float64Array(11), 2, {
        spec: { material: STEEL, requirements: REQUIREMENTS },
        includeUnsuited: true,
      }),
    ).toThrow("a chunk of 2 points needs 12 components, got 11");
  });
});
