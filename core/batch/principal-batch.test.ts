import { describe, expect, it } from "vitest";
import { vonMises } from "../tensor/invariants";
import { seededRandom } from "../testing/fixtures";
import { principalBatch, vonMisesBatch } from "./principal-batch";

describe("principalBatch and vonMisesBatch boundaries", () => {
  it("when arrays have the wrong type or length, then TypeError/RangeError name the array", () => {
    const input = new Float64Array(12);
    expect(() => principalBatch(new Float64Array(7), { values: new Float64Array(3) })).toThrow(
      /input length 7 is not a multiple of 6/,
    );
    expect(() => principalBatch(input, { values: new Float64Array(5) })).toThrow(
      /out.values has length 5, needs at least 6/,
    );
    expect(() =>
      principalBatch(input, { values: new Float64Array(6), directions: new Float64Array(9) }),
    ).toThrow(/out.directions has length 9, needs at least 18/);
    expect(() => principalBatch(input, { values: new Float64Array(6), tresca: new Float64Array(1) })).toThrow(
      /out.tresca has length 1, needs at least 2/,
    );
    expect(() =>
      principalBatch([1, 2, 3, 4, 5, 6] as unknown as Float64Array, { values: new Float64Array(3) }),
    ).toThrow(TypeError);
    expect(() => vonMisesBatch(input, new Float64Array(1))).toThrow(/out has length 1, needs at least 2/);
  });

  it("when a tensor has a non-finite component, then the error names the tensor", () => {
    const input = new Float64Array([1, 2, 3, 0, 0, 0, 1, NaN, 0, 0, 0, 0]);
    expect(() => principalBatch(input, { values: new Float64Array(6) })).toThrow(
      /input tensor 1 \(input\[6\.\.11\]\)/,
    );
    expect(() => vonMisesBatch(input, new Float64Array(2))).toThrow(/input tensor 1/);
  });

  it("when N = 0, then nothing is written and nothing throws", () => {
    const values = new Float64Array(0);
    principalBatch(new Float64Array(0), { values });
    expect(values.length).toBe(0);
  });

  it("when von Mises stresses are computed in batch, then they equal vonMises per tensor", () => {
    const rnd = seededRandom(5);
    const n = 1000;
    const input = new Float64Array(6 * n).map(() => (rnd() * 2 - 1) * 300);
    input[0] = 1e200; // one huge and one tiny tensor on the scaled path
    input[6] = 1e-300;
    const out = new Float64Array(n);
    vonMisesBatch(input, out);
    for (let k = 0; k < n; k++) {
      const [xx, yy, zz, xy, yz, zx] = input.subarray(6 * k, 6 * k + 6);
      expect(out[k]).toBe(vonMises({ xx, yy, zz, xy, yz, zx }));
      expect(Number.isFinite(out[k])).toBe(true);
    }
    expect(out[1]).toBeGreaterThan(0);
  });
});

describe("principalBatch at the top of the number range", () => {
  it("when components are near Number.MAX_VALUE but finite, then they are not mistaken for non-finite ones", () => {
    const big = 1e308;
    const input = new Float64Array([big, big, big, 0, 0, 0, big, -big, 0, 0, 0, 0]);
    const values = new Float64Array(6);
    principalBatch(input, { values });
    const want = [big, big, big, big, 0, -big];
    want.forEach((w, i) => expect(Math.abs(values[i] - w)).toBeLessThanOrEqual(1e-15 * big));
  });
});
