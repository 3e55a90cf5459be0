import { eigSym3, vonMisesOf } from "../eigen/sym3";

/** Caller-owned outputs of {@link principalBatch}; all lengths are "at least". */
export type PrincipalBatchOutput = {
  /** 3N: σ1 σ2 σ3 per tensor */
  values: Float64Array;
  /** 9N: d1 d2 d3 per tensor (unit vectors, right-handed); omit to skip the directions */
  directions?: Float64Array;
  /** N: von Mises stress per tensor */
  vonMises?: Float64Array;
  /** N: Tresca stress σ1 − σ3 per tensor */
  tresca?: Float64Array;
};

function tensorCount(input: Float64Array): number {
  if (!(input instanceof Float64Array)) throw new TypeError("input must be a Float64Array");
  if (input.length % 6 !== 0) {
    throw new RangeError(
      `input length ${input.length} is not a multiple of 6 (xx yy zz xy yz zx per tensor)`,
    );
  }
  return input.length / 6;
}

function checkOut(arr: unknown, name: string, needed: number): Float64Array {
  if (!(arr instanceof Float64Array)) throw new TypeError(`${name} must be a Float64Array`);
  if (arr.length < needed) throw new RangeError(`${name} has length ${arr.length}, needs at least ${needed}`);
  return arr;
}

/** How many bad rows a {@link BatchReport} lists by index; the count covers them all. */
export const FIRST_BAD_ROWS_LIMIT = 10;

/**
 * What a batch call found wrong in its input. A bad row is a tensor with a component that is NaN or
 * ±Infinity (an empty or garbled cell of a finite-element table): its outputs are NaN and the other
 * rows are computed as usual, so one bad line never costs the million good ones around it.
 */
export type BatchReport = {
  /** how many tensors had a component that is not finite */
  badRows: number;
  /** the first of them (0-based tensor indices, ascending), at most {@link FIRST_BAD_ROWS_LIMIT} */
  firstBadRows: number[];
};

function noteBad(report: BatchReport, k: number): void {
  if (report.badRows < FIRST_BAD_ROWS_LIMIT) report.firstBadRows.push(k);
  report.badRows++;
}

function fillNaN(arr: Float64Array, from: number, count: number): void {
  arr.fill(Number.NaN, from, from + count);
}

/**
 * Principal stresses (and optionally directions, von Mises and Tresca stresses) of N tensors, into
 * caller-owned arrays; nothing is allocated per tensor. Same kernel, conventions and accuracy as
 * `principalStresses`: σ1 ≥ σ2 ≥ σ3, d3 = d1 × d2.
 * @param input 6N components per tensor in the order xx yy zz xy yz zx (any one stress unit)
 * @param out `values` (3N, stress unit), optional `directions` (9N, dimensionless), `vonMises` (N,
 *   stress unit), `tresca` (N, σ1 − σ3, stress unit)
 * A tensor with a non-finite component is a bad row: its values, directions, von Mises and Tresca
 * outputs are NaN, the call goes on with the next tensor, and the returned report counts the bad
 * rows and lists the first ones.
 * @returns which rows were bad ({@link BatchReport}); `badRows` is 0 when every tensor was finite
 * @throws TypeError/RangeError for wrong array types or lengths (a programmer error, found before
 *   anything is written)
 */
export function principalBatch(input: Float64Array, out: PrincipalBatchOutput): BatchReport {
  const n = tensorCount(input);
  if (typeof out !== "object" || out === null) throw new TypeError("out must be an object");
  const values = checkOut(out.values, "out.values", 3 * n);
  const dirs = out.directions === undefined ? null : checkOut(out.directions, "out.directions", 9 * n);
  const vm = out.vonMises === undefined ? null : checkOut(out.vonMises, "out.vonMises", n);
  const tr = out.tresca === undefined ? null : checkOut(out.tresca, "out.tresca", n);
  const report: BatchReport = { badRows: 0, firstBadRows: [] };
  for (let k = 0; k < n; k++) {
    const io = 6 * k;
    if (!eigSym3(input, io, values, 3 * k, dirs, 9 * k)) {
      noteBad(report, k);
      fillNaN(values, 3 * k, 3);
      if (dirs !== null) fillNaN(dirs, 9 * k, 9);
      if (vm !== null) vm[k] = Number.NaN;
      if (tr !== null) tr[k] = Number.NaN;
      continue;
    }
    if (vm !== null) {
      vm[k] = vonMisesOf(
        input[io],
        input[io + 1],
        input[io + 2],
        input[io + 3],
        input[io + 4],
        input[io + 5],
      );
    }
    if (tr !== null) tr[k] = values[3 * k] - values[3 * k + 2];
  }
  return report;
}

/**
 * Von Mises stress of N tensors, into a caller-owned array, without computing principal stresses.
 * @param input 6N components per tensor in the order xx yy zz xy yz zx (any one stress unit)
 * @param out N von Mises stresses (same unit); length at least N
 * A tensor with a non-finite component is a bad row: its output is NaN and the call goes on.
 * @returns which rows were bad ({@link BatchReport})
 * @throws TypeError/RangeError for wrong array types or lengths
 */
export function vonMisesBatch(input: Float64Array, out: Float64Array): BatchReport {
  const n = tensorCount(input);
  checkOut(out, "out", n);
  const report: BatchReport = { badRows: 0, firstBadRows: [] };
  for (let k = 0; k < n; k++) {
    const io = 6 * k;
    const v = vonMisesOf(
      input[io],
      input[io + 1],
      input[io + 2],
      input[io + 3],
      input[io + 4],
      input[io + 5],
    );
    // vonMisesOf is NaN exactly when a component is NaN or ±Infinity (its scaled path refuses them).
    if (v !== v) {
      noteBad(report, k);
      out[k] = Number.NaN;
      continue;
    }
    out[k] = v;
  }
  return report;
}
