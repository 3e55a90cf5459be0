import {
  PointTableEvaluator,
  WORST_POINTS,
  type CriterionOverTable,
  type GoverningPoint,
  type PointTableSpec,
  type UtilisationHistogram,
} from "../../../core";

/** What a chunk is rated against: core's spec and whether unsuited criteria are rated too. */
export type ChunkRatingBasis = { spec: PointTableSpec; includeUnsuited: boolean };

/** One of the chunk's worst points: its index in the chunk, utilisation and components (Pa). */
export type ChunkWorstPoint = {
  index: number;
  utilisation: number;
  components: [number, number, number, number, number, number];
};

/**
 * A chunk's evaluation without its per-point arrays: what the table's summary is merged from.
 * Small (a few kB), so it crosses from the rating worker to the event loop cheaply.
 */
export type ChunkRating = {
  criteria: (Omit<CriterionOverTable, "factor" | "utilisation" | "governing"> & {
    governing: GoverningPoint | null;
  })[];
  histogram: UtilisationHistogram;
  failing: number;
  close: number;
  badPoints: number;
  worst: ChunkWorstPoint[];
};

/**
 * Rates the `n` points of one stored chunk with core's PointTableEvaluator in one step.
 * @param columns the chunk's components as stored: xx[n] yy[n] zz[n] xy[n] yz[n] zx[n] (Pa),
 *   turned here into the evaluator's xx yy zz xy yz zx per point
 */
export function rateChunk(columns: Float64Array, n: number, basis: ChunkRatingBasis): ChunkRating {
  if (columns.length !== 6 * n) {
    throw new RangeError(`a chunk of ${n} points needs ${6 * n} components, got ${columns.length}`);
  }
  const components = new Float64Array(6 * n);
  for (let c = 0; c < 6; c++) {
    const from = c * n;
    for (let k = 0; k < n; k++) components[6 * k + c] = columns[from + k];
  }
  const evaluator = new PointTableEvaluator(components, basis.spec, {
    includeUnsuited: basis.includeUnsuited,
    chunkSize: Math.max(1, n),
    worstCount: WORST_POINTS,
  });
  while (evaluator.step());
  const r = evaluator.result;
  return {
    criteria: r.criteria.map((c) => ({
      criterion: c.criterion,
      requiredFactor: c.requiredFactor,
      category: c.category,
      status: c.status,
      reason: c.reason,
      governing: c.governing,
      failing: c.failing,
      close: c.close,
    })),
    histogram: r.histogram,
    failing: r.failing,
    close: r.close,
    badPoints: r.badPoints.count,
    worst: r.worst.map((w) => ({
      index: w.index,
      utilisation: w.utilisation,
      components: [
        components[6 * w.index],
        components[6 * w.index + 1],
        components[6 * w.index + 2],
        components[6 * w.index + 3],
        components[6 * w.index + 4],
        components[6 * w.index + 5],
      ],
    })),
  };
}
