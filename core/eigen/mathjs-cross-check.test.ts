import { eigs } from "mathjs";
import { describe, expect, it } from "vitest";
import { principalBatch } from "../batch/principal-batch";
import { frobenius, seededRandom } from "../testing/fixtures";
import { principalStresses } from "../tensor/principal";

const COUNT = 10_000;

/** mathjs eigs on a plain 3×3 array: values (ascending) and the matching unit eigenvectors. */
function reference(m: number[][]): { values: number[]; vectors: number[][] } {
  const r = eigs(m) as unknown as { values: number[]; eigenvectors: { value: number; vector: number[] }[] };
  const pairs = r.eigenvectors
    .map((e) => ({ value: e.value, vector: e.vector }))
    .sort((a, b) => b.value - a.value);
  return {
    values: pairs.map((p) => p.value),
    vectors: pairs.map((p) => {
      const n = Math.hypot(...p.vector);
      return p.vector.map((x) => x / n);
    }),
  };
}

describe("cross-check against an independent solver (mathjs eigs, npm mathjs 15.2.0)", () => {
  it(`when ${COUNT} seeded random tensors are solved, then principal values agree within 1e-13·‖σ‖F and directions agree up to sign within 1e-12·‖σ‖F/gap`, () => {
    const rnd = seededRandom(7_100_123);
    let worstValue = 0;
    let worstVector = 0;
    let vectorsCompared = 0;
    const input = new Float64Array(6 * COUNT);
    for (let k = 0; k < COUNT; k++) {
      // mixed magnitudes: most entries O(100), some tensors dominated by the mean or by one shear
      const scale = k % 10 === 0 ? 1e6 : 100;
      for (let j = 0; j < 6; j++) input[6 * k + j] = (rnd() * 2 - 1) * (j < 3 || k % 7 !== 0 ? scale : 1);
    }
    const values = new Float64Array(3 * COUNT);
    const directions = new Float64Array(9 * COUNT);
    principalBatch(input, { values, directions });
    for (let k = 0; k < COUNT; k++) {
      const [xx, yy, zz, xy, yz, zx] = input.subarray(6 * k, 6 * k + 6);
      const s = { xx, yy, zz, xy, yz, zx };
      const f = frobenius(s);
      const ref = reference([
        [xx, xy, zx],
        [xy, yy, yz],
        [zx, yz, zz],
      ]);
      const mine = principalStresses(s);
      for (let i = 0; i < 3; i++) {
        expect(values[3 * k + i]).toBe(mine.values[i]);
        worstValue = Math.max(worstValue, Math.abs(mine.values[i] - ref.values[i]) / f);
      }
      for (let i = 0; i < 3; i++) {
        const gap = Math.min(
          i > 0 ? ref.values[i - 1] - ref.values[i] : Infinity,
          i < 2 ? ref.values[i] - ref.values[i + 1] : Infinity,
        );
        if (gap < 1e-3 * f) continue; // a near-degenerate pair: the direction is not well defined
        const d = mine.directions[i];
        const v = ref.vectors[i];
        const sign = d[0] * v[0] + d[1] * v[1] + d[2] * v[2] < 0 ? -1 : 1;
        const dist = Math.hypot(d[0] - sign * v[0], d[1] - sign * v[1], d[2] - sign * v[2]);
        // Distance between the two unit vectors, up to sign, in units of ‖σ‖F/gap: a direction can
        // only be as good as (residual / gap), and mathjs iterates to a relative 1e-12 by default.
        worstVector = Math.max(worstVector, (dist * gap) / f);
        vectorsCompared++;
      }
    }
    expect(worstValue).toBeLessThanOrEqual(1e-13);
    expect(worstVector).toBeLessThanOrEqual(1e-12);
    expect(vectorsCompared).toBeGreaterThan(2 * COUNT);
    console.info(
      `mathjs cross-check: ${COUNT} tensors, worst |Δλ|/‖σ‖F = ${worstValue.toExponential(2)}, ` +
        `worst direction distance × gap/‖σ‖F = ${worstVector.toExponential(2)} over ${vectorsCompared} directions`,
    );
  }, 60_000); // 10 000 mathjs eigs calls take seconds on a loaded 2-core machine; this bounds a hang, not speed
});
