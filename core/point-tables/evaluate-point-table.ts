import { FIRST_BAD_ROWS_LIMIT, principalBatch } from "../batch/principal-batch";
import { evaluateState, type EvaluationOptions } from "../checks/evaluate";
import type { CheckRequirement } from "../checks/requirements";
import { utilisation, verdictForUtilisation } from "../checks/verdict";
import type { Criterion, Material } from "../criteria/safety-factor";
import { factorBatch } from "./factor-batch";

// Long because the chunked evaluator keeps one state across chunks (worst points, histogram,
// governing point per criterion) that its summary reads; the types describing it come first.

/** The material and the checks every point of a table is rated against (the load case's allowables). */
export type PointTableSpec = { material: Material; requirements: readonly CheckRequirement[] };

/** Default width of a utilisation histogram bin (dimensionless). */
export const UTILISATION_BIN_WIDTH = 0.05;
/** Default start of the histogram's last, open bin: every utilisation at or above it. */
export const UTILISATION_HISTOGRAM_MAX = 1.5;
/** Default number of worst points kept. */
export const WORST_POINTS = 100;
/** Default number of points per chunk between progress reports and cancellation checks. */
export const EVALUATION_CHUNK = 65_536;

export type PointEvaluationOptions = EvaluationOptions & {
  /** how many of the worst points to keep (default {@link WORST_POINTS}) */
  worstCount?: number;
  /** points per chunk (default {@link EVALUATION_CHUNK}) */
  chunkSize?: number;
  /** histogram bin width (default {@link UTILISATION_BIN_WIDTH}) and open last bin (default {@link UTILISATION_HISTOGRAM_MAX}) */
  binWidth?: number;
  histogramMax?: number;
  /** called after every chunk with the points done and the total */
  onProgress?: (done: number, total: number) => void;
  /** asked before every chunk; true stops the evaluation (the result says `cancelled`) */
  isCancelled?: () => boolean;
};

/** The point where a criterion's utilisation is highest. */
export type GoverningPoint = { index: number; factor: number; utilisation: number };

/** One requirement over the whole table. */
export type CriterionOverTable = {
  criterion: Criterion;
  requiredFactor: number;
  category: string | null;
  /**
   * As the object API decides it for any one state (`evaluateState`): "evaluated", or
   * "not-applicable" / "not-evaluated" with the reason (missing strengths, unsuited material, a
   * material the criterion refuses); then no point is rated with it.
   */
  status: "evaluated" | "not-applicable" | "not-evaluated";
  reason: string | null;
  /** per point: safety factor n and utilisation n_required/n (null unless evaluated) */
  factor: Float64Array | null;
  utilisation: Float64Array | null;
  governing: GoverningPoint | null;
  /** points whose verdict for this criterion is fail / close (`verdictForUtilisation`) */
  failing: number;
  close: number;
};

/**
 * Utilisation histogram: `counts[k]` holds the points whose governing utilisation u has
 * k·binWidth ≤ u < (k+1)·binWidth, for k below the last bin; the last bin holds every u ≥ histogramMax.
 */
export type UtilisationHistogram = { binWidth: number; max: number; counts: number[] };

/** What a table's evaluation gives. Stresses are in the unit of the components (Pa from the parser). */
export type PointTableEvaluation = {
  count: number;
  /** points evaluated (all of them unless cancelled) */
  evaluated: number;
  cancelled: boolean;
  /** 3 per point: σ1 ≥ σ2 ≥ σ3 */
  principal: Float64Array;
  vonMises: Float64Array;
  /** σ1 − σ3 */
  tresca: Float64Array;
  /** per point, the highest utilisation over the rated criteria (NaN when none is rated) */
  utilisation: Float64Array;
  criteria: CriterionOverTable[];
  /** the worst points by governing utilisation, highest first (equal ones: lower index first) */
  worst: { index: number; utilisation: number }[];
  histogram: UtilisationHistogram;
  /** points whose governing verdict is fail / close */
  failing: number;
  close: number;
  /** points with a component that is not finite (outputs NaN), as `principalBatch` reports them */
  badPoints: { count: number; first: number[] };
};

/**
 * Rates a point table a chunk at a time, so a worker can report progress and stop between chunks:
 * call {@link step} until it returns false (or use {@link evaluatePointTable}). Principal
 * stresses, von Mises and Tresca come from `principalBatch`, each factor from `factorBatch` (the
 * batch form of the object API's `factorFromPrincipals`, same doubles) and `utilisation`, and whether a criterion is rated at
 * all from `evaluateState` itself, so a point's figures equal what `evaluateState` gives its tensor.
 */
export class PointTableEvaluator {
  readonly result: PointTableEvaluation;
  private readonly components: Float64Array;
  private readonly material: Material;
  private readonly chunk: number;
  private readonly rated: CriterionOverTable[];
  private readonly heapIndex: Int32Array;
  private readonly heapU: Float64Array;
  private heapSize = 0;

  constructor(components: Float64Array, spec: PointTableSpec, options: PointEvaluationOptions = {}) {
    if (!(components instanceof Float64Array)) throw new TypeError("components must be a Float64Array");
    if (components.length % 6 !== 0) {
      throw new RangeError(`components length ${components.length} is not a multiple of 6`);
    }
    const n = components.length / 6;
    this.components = components;
    this.material = spec.material;
    this.chunk = positiveInteger(options.chunkSize ?? EVALUATION_CHUNK, "chunkSize");
    const worst = options.worstCount ?? WORST_POINTS;
    if (!Number.isInteger(worst) || worst < 0)
      throw new RangeError(`worstCount must be an integer ≥ 0, got ${worst}`);
    const binWidth = options.binWidth ?? UTILISATION_BIN_WIDTH;
    const max = options.histogramMax ?? UTILISATION_HISTOGRAM_MAX;
    const bins = max / binWidth;
    if (!(binWidth > 0) || !(bins >= 1 && bins <= 10_000) || Math.abs(bins - Math.round(bins)) > 1e-9) {
      throw new RangeError(
        `binWidth must be > 0 and histogramMax a finite multiple of it, got ${binWidth}, ${max}`,
      );
    }
    // The object API decides once which criteria are rated: its verdict on any finite state.
    const probe = evaluateState(
      { xx: 1, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 },
      spec.material,
      spec.requirements,
      {
        includeUnsuited: options.includeUnsuited,
      },
    );
    const criteria: CriterionOverTable[] = probe.checks.map((check) => {
      const evaluated = check.status === "evaluated";
      return {
        criterion: check.criterion,
        requiredFactor: check.requiredFactor,
        category: check.category,
        status: check.status,
        reason: check.status === "evaluated" ? check.unsuited : check.reason,
        factor: evaluated ? new Float64Array(n) : null,
        utilisation: evaluated ? new Float64Array(n) : null,
        governing: null,
        failing: 0,
        close: 0,
      };
    });
    this.rated = criteria.filter((c) => c.status === "evaluated");
    this.heapIndex = new Int32Array(worst);
    this.heapU = new Float64Array(worst);
    this.result = {
      count: n,
      evaluated: 0,
      cancelled: false,
      principal: new Float64Array(3 * n),
      vonMises: new Float64Array(n),
      tresca: new Float64Array(n),
      utilisation: new Float64Array(n).fill(Number.NaN),
      criteria,
      worst: [],
      histogram: { binWidth, max, counts: new Array<number>(Math.round(bins) + 1).fill(0) },
      failing: 0,
      close: 0,
      badPoints: { count: 0, first: [] },
    };
  }

  /** Evaluates the next chunk; false when every point is done. */
  step(): boolean {
    const r = this.result;
    const from = r.evaluated;
    if (from >= r.count) return false;
    const to = Math.min(r.count, from + this.chunk);
    const report = principalBatch(this.components.subarray(6 * from, 6 * to), {
      values: r.principal.subarray(3 * from, 3 * to),
      vonMises: r.vonMises.subarray(from, to),
      tresca: r.tresca.subarray(from, to),
    });
    for (const k of report.firstBadRows) {
      if (r.badPoints.first.length < FIRST_BAD_ROWS_LIMIT) r.badPoints.first.push(from + k);
    }
    r.badPoints.count += report.badRows;
    const { principal, vonMises, utilisation: worstU } = r;
    for (const c of this.rated) {
      const factors = c.factor!;
      const us = c.utilisation!;
      const required = c.requiredFactor;
      const criterion = c.criterion;
      const material = this.material;
      // the governing point is kept as two numbers in the loop and made an object once a chunk
      let govIndex = c.governing === null ? -1 : c.governing.index;
      let govU = c.governing === null ? Number.NEGATIVE_INFINITY : c.governing.utilisation;
      let failing = 0;
      let close = 0;
      factorBatch(criterion, material, principal, vonMises, from, to, factors);
      for (let k = from; k < to; k++) {
        if (principal[3 * k] !== principal[3 * k]) {
          factors[k] = Number.NaN;
          us[k] = Number.NaN;
          continue;
        }
        const u = utilisation(factors[k], required);
        us[k] = u;
        if (govIndex < 0 || u > govU) {
          govIndex = k;
          govU = u;
        }
        const verdict = verdictForUtilisation(u);
        if (verdict === "fail") failing++;
        else if (verdict === "close") close++;
        // NaN (no criterion yet) loses every comparison, so the first rated one replaces it
        if (!(u <= worstU[k])) worstU[k] = u;
      }
      c.failing += failing;
      c.close += close;
      if (govIndex >= 0) c.governing = { index: govIndex, factor: factors[govIndex], utilisation: govU };
    }
    const bins = r.histogram.counts;
    const last = bins.length - 1;
    const width = r.histogram.binWidth;
    for (let k = from; k < to; k++) {
      const u = worstU[k];
      if (u !== u) continue;
      bins[u >= r.histogram.max ? last : Math.min(last, Math.floor(u / width))]++;
      const verdict = verdictForUtilisation(u);
      if (verdict === "fail") r.failing++;
      else if (verdict === "close") r.close++;
      this.offerWorst(k, u);
    }
    r.evaluated = to;
    if (to === r.count) r.worst = this.sortedWorst();
    return to < r.count;
  }

  /** Keeps the point among the worst: a min-heap on utilisation (ties: the later index is dropped first). */
  private offerWorst(index: number, u: number): void {
    const cap = this.heapIndex.length;
    const hi = this.heapIndex;
    const hu = this.heapU;
    if (this.heapSize < cap) {
      let i = this.heapSize++;
      while (i > 0) {
        const parent = (i - 1) >> 1;
        if (!lessCritical(u, index, hu[parent], hi[parent])) break;
        hi[i] = hi[parent];
        hu[i] = hu[parent];
        i = parent;
      }
      hi[i] = index;
      hu[i] = u;
      return;
    }
    if (cap === 0 || !lessCritical(hu[0], hi[0], u, index)) return;
    let i = 0;
    for (;;) {
      const l = 2 * i + 1;
      if (l >= cap) break;
      const r = l + 1;
      const m = r < cap && lessCritical(hu[r], hi[r], hu[l], hi[l]) ? r : l;
      if (!lessCritical(hu[m], hi[m], u, index)) break;
      hi[i] = hi[m];
      hu[i] = hu[m];
      i = m;
    }
    hi[i] = index;
    hu[i] = u;
  }

  private sortedWorst(): { index: number; utilisation: number }[] {
    const out: { index: number; utilisation: number }[] = [];
    for (let i = 0; i < this.heapSize; i++)
      out.push({ index: this.heapIndex[i], utilisation: this.heapU[i] });
    return out.sort((a, b) => b.utilisation - a.utilisation || a.index - b.index);
  }
}

/** True when (ua, ia) is less critical than (ub, ib): lower utilisation, or equal and met later. */
function lessCritical(ua: number, ia: number, ub: number, ib: number): boolean {
  return ua < ub || (ua === ub && ia > ib);
}

function positiveInteger(v: number, name: string): number {
  if (!Number.isInteger(v) || v < 1) throw new RangeError(`${name} must be an integer ≥ 1, got ${v}`);
  return v;
}

/**
 * Evaluates every point of a table (see {@link PointTableEvaluator}), reporting progress and asking
 * whether to stop after every chunk. A worker that must read a cancel message between chunks drives
 * `PointTableEvaluator.step()` itself and yields to its event loop; one that shares a flag
 * (SharedArrayBuffer) passes `isCancelled`.
 * @param components 6 per point, xx yy zz xy yz zx, in the unit of the material's strengths
 */
export function evaluatePointTable(
  components: Float64Array,
  spec: PointTableSpec,
  options: PointEvaluationOptions = {},
): PointTableEvaluation {
  const evaluator = new PointTableEvaluator(components, spec, options);
  const r = evaluator.result;
  while (r.evaluated < r.count) {
    if (options.isCancelled?.() === true) {
      r.cancelled = true;
      break;
    }
    evaluator.step();
    options.onProgress?.(r.evaluated, r.count);
  }
  return r;
}
