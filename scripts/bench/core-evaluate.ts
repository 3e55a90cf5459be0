import {
  CRITERIA,
  evaluateState,
  evaluateStates,
  principalValues,
  safetyFactor,
  tresca,
  vonMises,
  type CheckRequirement,
  type Material,
  type StressTensor,
} from "../../core/index";
import { seededRandom } from "../../core/testing/fixtures";
import { bestRate } from "./support/best-rate";

const N = 100_000;

/**
 * The evaluator on N = 100,000 seeded states (components uniform in ±300 MPa) against all five
 * criteria, beside the per-criterion path measured in the same run: what a screen would compute
 * without the evaluator (principal stresses, von Mises and Tresca, then safetyFactor once per
 * criterion, each of which validates and, but for von Mises, solves the state again). Prints
 * states per second and the ratios; the evaluator solves each state once.
 */
export async function run(): Promise<void> {
  const next = seededRandom(20_261_203);
  const c = () => (2 * next() - 1) * 300;
  const tensors: StressTensor[] = Array.from({ length: N }, () => ({
    xx: c(),
    yy: c(),
    zz: c(),
    xy: c(),
    yz: c(),
    zx: c(),
  }));
  const material: Material = { yield: 250, ultimateTension: 300, ultimateCompression: 900 };
  const requirements: CheckRequirement[] = CRITERIA.map((criterion) => ({ criterion, requiredFactor: 1.5 }));
  const options = { includeUnsuited: true };
  const states = tensors.map((tensor) => ({ tensor, material, requirements }));

  let sink = 0;
  const perCriterion = () => {
    for (const s of tensors) {
      sink += principalValues(s)[0] + vonMises(s) + tresca(s);
      for (const criterion of CRITERIA) sink += safetyFactor(s, criterion, material);
    }
  };
  const single = () => {
    for (const s of tensors) sink += evaluateState(s, material, requirements, options).principal[0];
  };
  const batch = () => {
    sink += evaluateStates(states, options).length;
  };
  // Warm-up on a tenth of the states.
  const warm = tensors.slice(0, N / 10);
  for (const s of warm) {
    evaluateState(s, material, requirements, options);
    for (const criterion of CRITERIA) safetyFactor(s, criterion, material);
  }

  const baseRate = bestRate(N, perCriterion);
  const singleRate = bestRate(N, single);
  const batchRate = bestRate(N, batch);
  const fmt = (r: number) => `${(r / 1e6).toFixed(3).padStart(7)} M states/s`;
  console.log(`N = ${N.toLocaleString("en-US")} seeded states, five criteria each; best of 3 runs`);
  console.log(
    `${"baseline: principal, von Mises, Tresca, then safetyFactor per criterion".padEnd(72)} ${fmt(baseRate)}`,
  );
  for (const [label, rate] of [
    ["evaluateState per state (one solve, every check, the governing one)", singleRate],
    ["evaluateStates on all N (the comparison's path)", batchRate],
  ] as const) {
    console.log(`${label.padEnd(72)} ${fmt(rate)}  ${(rate / baseRate).toFixed(2).padStart(5)}× baseline`);
  }
  if (!Number.isFinite(sink) && !Number.isNaN(sink)) console.log("(unexpected checksum)");
}
