import fc from "fast-check";
import { eigs } from "mathjs";
import { describe, expect, it } from "vitest";
import { vonMises } from "../tensor/invariants";
import { seededRandom } from "../testing/fixtures";
import { FIRST_BAD_ROWS_LIMIT, principalBatch, vonMisesBatch } from "./principal-batch";

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

  it("when a tensor has a non-finite component, then its outputs are NaN, the next tensor is still computed and the report names it", () => {
    const input = new Float64Array([1, 2, 3, 0, 0, 0, 1, NaN, 0, 0, 0, 0, 5, 0, 0, 0, 0, 0]);
    const out = {
      values: new Float64Array(9),
      directions: new Float64Array(27),
      vonMises: new Float64Array(3),
      tresca: new Float64Array(3),
    };
    expect(principalBatch(input, out)).toEqual({ badRows: 1, firstBadRows: [1] });
    expect(Array.from(out.values.subarray(3, 6)).every(Number.isNaN)).toBe(true);
    expect(Array.from(out.directions.subarray(9, 18)).every(Number.isNaN)).toBe(true);
    expect(out.vonMises[1]).toBeNaN();
    expect(out.tresca[1]).toBeNaN();
    // Uniaxial σ = 5 after the bad row: σ1 = 5, von Mises = 5 (common practice, no source).
    expect(Array.from(out.values.subarray(6, 9))).toEqual([5, 0, 0]);
    expect(out.vonMises[2]).toBe(5);
    const vm = new Float64Array(3);
    expect(vonMisesBatch(input, vm)).toEqual({ badRows: 1, firstBadRows: [1] });
    expect(vm[1]).toBeNaN();
    expect(vm[2]).toBe(5);
  });

  it("when every tensor is finite, then the report says no bad rows", () => {
    const input = new Float64Array([1, 2, 3, 0, 0, 0]);
    expect(principalBatch(input, { values: new Float64Array(3) })).toEqual({ badRows: 0, firstBadRows: [] });
    expect(vonMisesBatch(input, new Float64Array(1))).toEqual({ badRows: 0, firstBadRows: [] });
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

/** mathjs eigs on a 3×3 array: eigenvalues in descending order (an independent solver, npm mathjs). */
function mathjsValues(xx: number, yy: number, zz: number, xy: number, yz: number, zx: number): number[] {
  const r = eigs([
    [xx, xy, zx],
    [xy, yy, yz],
    [zx, yz, zz],
  ]) as unknown as { values: number[] };
  return [...r.values].sort((a, b) => b - a);
}

describe("principalBatch keeps going past bad rows (a finite-element table with broken lines)", () => {
  it("when 10 000 rows hold 37 bad ones sprinkled through, then every good row agrees with mathjs eigs within 1e-13·‖σ‖F, every bad row is NaN, and the report counts 37 and lists the first 10", () => {
    const n = 10_000;
    const rnd = seededRandom(90_210);
    const input = new Float64Array(6 * n).map(() => (rnd() * 2 - 1) * 250);
    const bad: number[] = [];
    const poison = [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY];
    for (let i = 0; i < 37; i++) {
      const k = 13 + i * 269; // spread from near the start to near the end
      input[6 * k + (i % 6)] = poison[i % 3];
      bad.push(k);
    }
    const out = {
      values: new Float64Array(3 * n),
      directions: new Float64Array(9 * n),
      vonMises: new Float64Array(n),
      tresca: new Float64Array(n),
    };
    const report = principalBatch(input, out);
    expect(report.badRows).toBe(37);
    expect(report.firstBadRows).toEqual(bad.slice(0, FIRST_BAD_ROWS_LIMIT));
    expect(FIRST_BAD_ROWS_LIMIT).toBe(10);
    const badSet = new Set(bad);
    let worst = 0;
    for (let k = 0; k < n; k++) {
      const row = Array.from(input.subarray(6 * k, 6 * k + 6));
      const got = Array.from(out.values.subarray(3 * k, 3 * k + 3));
      if (badSet.has(k)) {
        expect(got.every(Number.isNaN)).toBe(true);
        expect(out.vonMises[k]).toBeNaN();
        expect(out.tresca[k]).toBeNaN();
        continue;
      }
      const [xx, yy, zz, xy, yz, zx] = row;
      const f = Math.hypot(xx, yy, zz, Math.SQRT2 * xy, Math.SQRT2 * yz, Math.SQRT2 * zx);
      if (k % 10 === 0) {
        // mathjs on every tenth good row keeps the run short; the kernel is the same for all rows.
        const ref = mathjsValues(xx, yy, zz, xy, yz, zx);
        for (let i = 0; i < 3; i++) worst = Math.max(worst, Math.abs(got[i] - ref[i]) / f);
      }
      expect(out.vonMises[k]).toBe(vonMises({ xx, yy, zz, xy, yz, zx }));
      expect(Number.isFinite(out.tresca[k])).toBe(true);
    }
    expect(worst).toBeLessThanOrEqual(1e-13);
    const vm = new Float64Array(n);
    const vmReport = vonMisesBatch(input, vm);
    expect(vmReport).toEqual(report);
  }, 60_000); // generous: mathjs on 1 000 rows, on a machine shared with other test runs

  it("when bad rows are placed anywhere (property test, fast-check), then the report lists exactly them, in order, and good rows equal a run without the bad ones", () => {
    const row = fc.tuple(...Array.from({ length: 6 }, () => fc.double({ min: -1e6, max: 1e6, noNaN: true })));
    const badValue = fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY);
    fc.assert(
      fc.property(
        fc.array(fc.tuple(row, fc.option(fc.tuple(fc.integer({ min: 0, max: 5 }), badValue))), {
          minLength: 0,
          maxLength: 60,
        }),
        (rows) => {
          const n = rows.length;
          const input = new Float64Array(6 * n);
          const badIdx: number[] = [];
          rows.forEach(([r, poison], k) => {
            input.set(r, 6 * k);
            if (poison !== null) {
              input[6 * k + poison[0]] = poison[1];
              badIdx.push(k);
            }
          });
          const values = new Float64Array(3 * n);
          const vm = new Float64Array(n);
          const report = principalBatch(input, { values, vonMises: vm });
          expect(report).toEqual({
            badRows: badIdx.length,
            firstBadRows: badIdx.slice(0, FIRST_BAD_ROWS_LIMIT),
          });
          const one = new Float64Array(3);
          rows.forEach(([r], k) => {
            if (badIdx.includes(k)) {
              expect(Number.isNaN(values[3 * k]) && Number.isNaN(vm[k])).toBe(true);
              return;
            }
            // the same row alone gives the same numbers: a bad neighbour changes nothing
            expect(principalBatch(new Float64Array(r), { values: one }).badRows).toBe(0);
            expect(Array.from(values.subarray(3 * k, 3 * k + 3))).toEqual(Array.from(one));
          });
        },
      ),
      { seed: 4242, numRuns: 200 },
    );
  });
});
