import { evaluatePointTable, type CheckRequirement, type Material } from "../../core/index";
import { seededRandom } from "../../core/testing/fixtures";
import {
  RATING_SLICE,
  TURNING_SLICE,
  rateInSlices,
  tableFromColumnsInSlices,
} from "../../web/src/features/point-tables/model/stored-results";

const N = 1_000_000;
const MATERIAL: Material = { yield: 260e6, ultimateTension: 485e6 };
const CHECKS: CheckRequirement[] = [
  { criterion: "von-mises", requiredFactor: 1.5 },
  { criterion: "tresca", requiredFactor: 1.5 },
];

/**
 * Opening a stored table of N = 1,000,000 points in the browser, the work done on the page's
 * own thread (run here in Node's V8, one core): turning the server's nine columns into the table
 * and rating every point for the colours in slices of RATING_SLICE points with a
 * yield between them. Prints the longest single task (goal: under 50 ms, the page stays
 * responsive) and the sliced rating's total against core's evaluatePointTable in one go on the
 * same points in the same run (the cost of slicing).
 */
export async function run(): Promise<void> {
  const next = seededRandom(20_261_203);
  const columns = new Float64Array(9 * N);
  for (let i = 0; i < 6 * N; i++) columns[i] = (2 * next() - 1) * 150e6;
  for (let i = 6 * N; i < 9 * N; i++) columns[i] = next() * 100;
  const stored = { idKind: "number" as const, hasCoordinates: true, badRows: { count: 0, first: [] } };

  // each slice's time: from the end of the pause before it to the next pause or the end
  let longestTurn = 0;
  let sliceBegan = 0;
  const timedPause = (longest: (ms: number) => void) => () => {
    if (sliceBegan > 0) longest(performance.now() - sliceBegan);
    sliceBegan = performance.now();
    return Promise.resolve();
  };
  let began = performance.now();
  const table = (await tableFromColumnsInSlices(columns, N, null, stored, {
    pause: timedPause((ms) => (longestTurn = Math.max(longestTurn, ms))),
  }))!;
  longestTurn = Math.max(longestTurn, performance.now() - sliceBegan);
  const turnMs = performance.now() - began;

  const spec = { material: MATERIAL, requirements: CHECKS };
  began = performance.now();
  evaluatePointTable(table.components, spec, { worstCount: 0 });
  const wholeMs = performance.now() - began;

  let longest = 0;
  sliceBegan = 0;
  began = performance.now();
  await rateInSlices(table.components, spec, false, {
    pause: timedPause(() => undefined),
    onProgress: () => (longest = Math.max(longest, performance.now() - sliceBegan)),
  });
  const slicedMs = performance.now() - began;

  console.log(`stored table open, ${N.toLocaleString("en-US")} points`);
  console.log(
    `  columns → table ${turnMs.toFixed(0)} ms in slices of ${TURNING_SLICE.toLocaleString("en-US")} points, longest ${longestTurn.toFixed(1)} ms (goal < 50 ms)`,
  );
  console.log(
    `  longest rating slice (${RATING_SLICE.toLocaleString("en-US")} points): ${longest.toFixed(1)} ms (goal < 50 ms)`,
  );
  console.log(
    `  rating in slices ${slicedMs.toFixed(0)} ms / in one go ${wholeMs.toFixed(0)} ms: ${(slicedMs / wholeMs).toFixed(2)}×`,
  );
}
