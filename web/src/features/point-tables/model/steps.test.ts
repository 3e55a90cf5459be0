import { describe, expect, it } from "vitest";
import { runSteps, runStepsInSlices, sweep, type Steps } from "./steps";

/** Sums 0..total−1 over a sweep of `slice`, recording each run it was handed. */
function* summing(total: number, slice: number, runs: [number, number][]): Steps<number> {
  let sum = 0;
  yield* sweep(total, slice, (from, to) => {
    runs.push([from, to]);
    for (let i = from; i < to; i++) sum += i;
  });
  return sum;
}

describe("jobs that pause between slices", () => {
  it("when 10 points are swept in slices of 4, then the runs are 0–4, 4–8 and 8–10 and every point is visited once (sum 0..9 = 45, formula)", () => {
    const runs: [number, number][] = [];
    expect(runSteps(summing(10, 4, runs))).toBe(45);
    expect(runs).toEqual([
      [0, 4],
      [4, 8],
      [8, 10],
    ]);
  });

  it("when the slice is unbounded, then the sweep is one run without a pause", () => {
    const runs: [number, number][] = [];
    const steps = summing(7, Infinity, runs);
    const first = steps.next();
    expect(first).toEqual({ done: true, value: 21 });
    expect(runs).toEqual([[0, 7]]);
  });

  it("when a job runs in slices on the page, then it pauses before every step and returns what the job returns in one go", async () => {
    let pauses = 0;
    const result = await runStepsInSlices(summing(10, 4, []), { pause: async () => void pauses++ });
    expect(result).toBe(45);
    // three runs: a pause before each, and one before the step that returns
    expect(pauses).toBe(3);
  });

  it("when the job is cancelled between slices, then it stops and gives null", async () => {
    const runs: [number, number][] = [];
    let pauses = 0;
    const result = await runStepsInSlices(summing(100, 10, runs), {
      pause: async () => void pauses++,
      isCancelled: () => pauses > 2,
    });
    expect(result).toBeNull();
    expect(runs).toEqual([
      [0, 10],
      [10, 20],
    ]);
  });
});
