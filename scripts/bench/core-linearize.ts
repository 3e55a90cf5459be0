import { linearize, principalBatch } from "../../core/index";
import { seededRandom } from "../../core/testing/fixtures";
import { bestRate } from "./support/best-rate";

const LINES = 10_000;
const POINTS = 21;

/**
 * linearize on 10,000 seeded random lines of 21 points each (components uniform in ±100, one stress
 * unit; lines in random directions given by coordinates; von Mises; general primary checks) against
 * a baseline measured in the same run: principalBatch (values + von Mises + Tresca) over the same
 * 210,000 point tensors, i.e. one principal-stress pass over the points the lines hold. No target is
 * set; the ratio says what a linearization costs beside looking at its points once.
 */
export async function run(): Promise<void> {
  const rnd = seededRandom(20_261_203);
  const stresses: Float64Array[] = [];
  const coordinates: Float64Array[] = [];
  const all = new Float64Array(6 * POINTS * LINES);
  for (let k = 0; k < LINES; k++) {
    const s = new Float64Array(6 * POINTS);
    for (let i = 0; i < s.length; i++) s[i] = (rnd() * 2 - 1) * 100;
    all.set(s, 6 * POINTS * k);
    const d = [rnd() - 0.5, rnd() - 0.5, rnd() - 0.5];
    const c = new Float64Array(3 * POINTS);
    for (let i = 0; i < POINTS; i++)
      for (let j = 0; j < 3; j++) c[3 * i + j] = 10 + (i * d[j] * 20) / (POINTS - 1);
    stresses.push(s);
    coordinates.push(c);
  }
  const values = new Float64Array(3 * POINTS * LINES);
  const vm = new Float64Array(POINTS * LINES);
  const tr = new Float64Array(POINTS * LINES);

  let sink = 0;
  const lin = (count: number) => {
    for (let k = 0; k < count; k++) {
      const r = linearize({
        stresses: stresses[k],
        coordinates: coordinates[k],
        classification: { membrane: "general", stresses: "primary" },
        allowables: { S: 150 },
      });
      sink += r.equivalent.membranePlusBending.start;
    }
  };
  const base = () => principalBatch(all, { values, vonMises: vm, tresca: tr });
  lin(1000); // warm-up
  base();
  const baseRate = bestRate(LINES, base);
  const linRate = bestRate(LINES, () => lin(LINES));
  sink += vm[0];

  const fmt = (r: number) => `${Math.round(r).toLocaleString("en-US").padStart(10)} lines/s`;
  console.log(
    `${LINES.toLocaleString("en-US")} seeded random lines of ${POINTS} points; best of 3 runs each`,
  );
  console.log(
    `${"baseline: principalBatch + von Mises + Tresca over the same points".padEnd(66)} ${fmt(baseRate)}`,
  );
  console.log(
    `${"linearize (frame, membrane, bending, peak, von Mises, checks)".padEnd(66)} ${fmt(linRate)}  ` +
      `${(baseRate / linRate).toFixed(1)}× the baseline's time`,
  );
  if (!Number.isFinite(sink)) console.log("(unexpected non-finite checksum)");
}
