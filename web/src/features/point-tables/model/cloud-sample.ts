import { runSteps, sweep, type Steps } from "./steps";

/**
 * Which points the 3D view draws. A million points in one draw call held the page for 3–10 s on
 * the first frame in the browser bench (Chromium drawing WebGL in software, BENCH_POINT_PROFILE=1),
 * and a screen of a few hundred thousand pixels shows no more detail than a few hundred thousand
 * points. So above `maxDrawn` the view draws every point from the most utilised down (those an
 * engineer looks for) and an even sample of the rest, and says so.
 */
export type CloudSample = {
  /** Indices into the table, in table order; null: every point is drawn. */
  indices: Uint32Array | null;
  /** Points drawn. */
  drawn: number;
  /** Points in the table. */
  total: number;
  /** Every point with a utilisation at or above this is drawn (null: all drawn). */
  keptFrom: number | null;
};

/** Points the view draws at most. */
export const MAX_DRAWN_POINTS = 200_000;
const BINS = 4096;

/** NaN (not rated) sorts below every rated point; ∞ above. */
const rank = (u: number) => (Number.isNaN(u) ? -Infinity : u);

/**
 * Picks the points to draw: the most utilised half of the budget by a histogram threshold (no sort of
 * a million values), then an even share of the others to fill the budget exactly.
 */
export const cloudSample = (utilisation: Float64Array, maxDrawn = MAX_DRAWN_POINTS): CloudSample =>
  runSteps(cloudSampleSteps(utilisation, maxDrawn));

/**
 * {@link cloudSample} as steps of at most `slice` points each (every pass over the table pauses
 * after each slice), so the page can pick a sample without a long task.
 */
export function* cloudSampleSteps(
  utilisation: Float64Array,
  maxDrawn = MAX_DRAWN_POINTS,
  slice = Infinity,
): Steps<CloudSample> {
  const total = utilisation.length;
  if (total <= maxDrawn) return { indices: null, drawn: total, total, keptFrom: null };
  const keptFrom = yield* thresholdForTop(utilisation, Math.floor(maxDrawn / 2), slice);
  const chosen = new Uint8Array(total);
  const top = (i: number) => rank(utilisation[i]) >= keptFrom;
  const topCount = yield* countWhere(total, top, slice);
  let drawn = 0;
  if (topCount <= maxDrawn) {
    yield* sweep(total, slice, (from, to) => {
      for (let i = from; i < to; i++) if (top(i)) chosen[i] = 1;
    });
    drawn = topCount;
  } else {
    // Ties at the threshold outnumber the budget: the infinitely utilised first, then an even share.
    yield* sweep(total, slice, (from, to) => {
      for (let i = from; i < to && drawn < maxDrawn; i++) {
        if (utilisation[i] !== Infinity) continue;
        chosen[i] = 1;
        drawn++;
      }
    });
  }
  drawn += yield* pickEvenly(
    chosen,
    (i) => !chosen[i] && (topCount <= maxDrawn || top(i)),
    maxDrawn - drawn,
    slice,
  );
  const indices = new Uint32Array(drawn);
  let j = 0;
  yield* sweep(total, slice, (from, to) => {
    for (let i = from; i < to; i++) if (chosen[i]) indices[j++] = i;
  });
  return { indices, drawn, total, keptFrom };
}

function* countWhere(total: number, test: (i: number) => boolean, slice: number): Steps<number> {
  let n = 0;
  yield* sweep(total, slice, (from, to) => {
    for (let i = from; i < to; i++) if (test(i)) n++;
  });
  return n;
}

/** Marks `room` of the points passing `test`, spread evenly through the table; returns how many it marked. */
function* pickEvenly(
  chosen: Uint8Array,
  test: (i: number) => boolean,
  room: number,
  slice: number,
): Steps<number> {
  const candidates = yield* countWhere(chosen.length, test, slice);
  const want = Math.min(room, candidates);
  if (want <= 0) return 0;
  let seen = 0;
  let picked = 0;
  yield* sweep(chosen.length, slice, (from, to) => {
    for (let i = from; i < to && picked < want; i++) {
      if (!test(i)) continue;
      // The j-th candidate is taken when ⌊(j + 1)·want/candidates⌋ steps up: exactly `want` in all.
      if (Math.floor(((seen + 1) * want) / candidates) > Math.floor((seen * want) / candidates)) {
        chosen[i] = 1;
        picked++;
      }
      seen++;
    }
  });
  return picked;
}

/** A utilisation such that about `count` points (at least `count`, unless ties) are at or above it. */
function* thresholdForTop(utilisation: Float64Array, count: number, slice: number): Steps<number> {
  let lo = Infinity;
  let hi = -Infinity;
  let infinite = 0;
  yield* sweep(utilisation.length, slice, (from, to) => {
    for (let i = from; i < to; i++) {
      const u = utilisation[i];
      if (u === Infinity) infinite++;
      else if (Number.isFinite(u)) {
        if (u < lo) lo = u;
        if (u > hi) hi = u;
      }
    }
  });
  if (infinite >= count || hi === -Infinity) return infinite > 0 ? Infinity : -Infinity;
  if (hi === lo) return lo;
  const counts = new Uint32Array(BINS);
  const scale = (BINS - 1) / (hi - lo);
  yield* sweep(utilisation.length, slice, (from, to) => {
    for (let i = from; i < to; i++) {
      const u = utilisation[i];
      if (Number.isFinite(u)) counts[Math.floor((u - lo) * scale)]++;
    }
  });
  let above = infinite;
  for (let b = BINS - 1; b >= 0; b--) {
    above += counts[b];
    if (above >= count) return lo + b / scale;
  }
  return lo;
}
