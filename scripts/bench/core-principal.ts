import { EigenvalueDecomposition, Matrix } from "ml-matrix";
import { principalBatch, vonMisesBatch } from "../../core/index";
import { seededRandom } from "../../core/testing/fixtures";

const N = 1_000_000;
const BASELINE_N = 100_000; // the naive baseline is timed on a subset and its rate scaled
const REPEATS = 3; // best of REPEATS for every figure

/** Best tensors-per-second rate of `fn` over REPEATS runs on `count` tensors. */
function bestRate(count: number, fn: () => void): number {
  let best = 0;
  for (let r = 0; r < REPEATS; r++) {
    const t0 = performance.now();
    fn();
    const seconds = (performance.now() - t0) / 1000;
    best = Math.max(best, count / seconds);
  }
  return best;
}

/**
 * principalBatch on N = 1,000,000 seeded random tensors (components uniform in ±100, one stress
 * unit) against the naive baseline measured in the same run: one ml-matrix EigenvalueDecomposition
 * per tensor. Prints tensors per second, ratios against the targets (≥ 6× with directions, ≥ 15×
 * values + von Mises + Tresca, ≥ 100× von Mises alone) and heap growth over the core runs.
 */
export async function run(): Promise<void> {
  const rnd = seededRandom(20_260_101);
  const input = new Float64Array(6 * N);
  for (let i = 0; i < input.length; i++) input[i] = (rnd() * 2 - 1) * 100;
  const values = new Float64Array(3 * N);
  const directions = new Float64Array(9 * N);
  const vm = new Float64Array(N);
  const tr = new Float64Array(N);

  // Naive baseline: one Matrix and one decomposition per tensor.
  let sink = 0;
  const baseline = (count: number): void => {
    for (let k = 0; k < count; k++) {
      const o = 6 * k;
      const m = new Matrix([
        [input[o], input[o + 3], input[o + 5]],
        [input[o + 3], input[o + 1], input[o + 4]],
        [input[o + 5], input[o + 4], input[o + 2]],
      ]);
      const e = new EigenvalueDecomposition(m, { assumeSymmetric: true });
      sink += e.realEigenvalues[0];
    }
  };
  baseline(10_000); // warm-up
  const baseRate = bestRate(BASELINE_N, () => baseline(BASELINE_N));

  const full = () => principalBatch(input, { values, directions });
  const noDirs = () => principalBatch(input, { values, vonMises: vm, tresca: tr });
  const vmOnly = () => vonMisesBatch(input, vm);
  const warm = input.subarray(0, 6 * 50_000);
  principalBatch(warm, { values, directions });
  principalBatch(warm, { values, vonMises: vm, tresca: tr });
  vonMisesBatch(warm, vm);

  const heapBefore = process.memoryUsage().heapUsed;
  const fullRate = bestRate(N, full);
  const noDirsRate = bestRate(N, noDirs);
  const vmRate = bestRate(N, vmOnly);
  const heapAfter = process.memoryUsage().heapUsed;
  sink += values[0] + directions[0] + vm[0] + tr[0];

  const fmt = (r: number) => `${(r / 1e6).toFixed(2).padStart(7)} M tensors/s`;
  console.log(
    `N = ${N.toLocaleString("en-US")} seeded random tensors; best of ${REPEATS} runs each; ` +
      `baseline timed on the first ${BASELINE_N.toLocaleString("en-US")} and its rate scaled`,
  );
  console.log(
    `${"naive baseline: ml-matrix EigenvalueDecomposition per tensor".padEnd(62)} ${fmt(baseRate)}`,
  );
  const rows: [string, number, number][] = [
    ["principalBatch values + directions", fullRate, 6],
    ["principalBatch values + von Mises + Tresca (no directions)", noDirsRate, 15],
    ["vonMisesBatch (von Mises alone)", vmRate, 100],
  ];
  let allMet = true;
  for (const [label, rate, target] of rows) {
    const ratio = rate / baseRate;
    const met = ratio >= target;
    allMet &&= met;
    console.log(
      `${label.padEnd(62)} ${fmt(rate)}  ${ratio.toFixed(1).padStart(6)}× baseline (target ≥ ${target}×: ${met ? "met" : "NOT met"})`,
    );
  }
  console.log(
    `heap growth over the ${3 * REPEATS} core runs (${(3 * REPEATS * N).toLocaleString("en-US")} tensors): ` +
      `${((heapAfter - heapBefore) / 1024).toFixed(1)} kB` +
      ` (outputs are caller-owned Float64Arrays allocated before timing)`,
  );
  console.log(allMet ? "all speed targets met" : "some speed targets NOT met");
  if (!Number.isFinite(sink)) console.log("(unexpected non-finite checksum)");
}
