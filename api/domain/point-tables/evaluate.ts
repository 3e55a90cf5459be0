import {
  PointTableEvaluator,
  verdictForUtilisation,
  WORST_POINTS,
  type CriterionOverTable,
} from "../../../core";
import type {
  PointTableCriterionView,
  PointTableEvaluationView,
  PointTableGoverningView,
} from "../../../core/contract/point-tables";
import { readChunk, saveEvaluation, type PointTableRow } from "../../../db/repositories/point-tables";
import { chunkIds, doublesOf, interleavedComponents } from "../../../db/repositories/point-table-chunks";
import type { PointTableRating } from "./spec";

/**
 * Points core's evaluator rates between two turns of the event loop. At the 3–5 M points/s the
 * batch kernels reach here (scripts/bench/point-tables.ts) a slice of 16,384 points holds the loop
 * for a few milliseconds per criterion, far below the 50 ms any request may wait behind it.
 */
const SLICE_POINTS = 16_384;

const nextTurn = () => new Promise<void>((resolve) => setImmediate(resolve));

/** A factor as JSON carries it: null for infinite (the state never reaches the criterion's surface). */
const finiteOrNull = (v: number) => (Number.isFinite(v) ? v : null);

type Where = { id: number | string; x: number | null; y: number | null; z: number | null };

/**
 * Rates every point of a stored table against `rating` with core's PointTableEvaluator (the same
 * kernels the browser runs, so both give the same doubles), one stored chunk at a time, and
 * merges the chunks' results: per criterion the governing point (highest utilisation; on a tie
 * the earlier point, core's `moreCritical` rule), the points that fail or are close, the
 * histogram and the worst {@link WORST_POINTS} points. It yields the event loop after every slice of
 * {@link SLICE_POINTS} points, so the API keeps answering while a table at the row limit is rated,
 * and holds one chunk's points (65,536) in memory at a time, not the table's.
 */
export async function evaluateStoredTable(
  table: Pick<PointTableRow, "id" | "hasCoordinates">,
  rating: PointTableRating,
): Promise<PointTableEvaluationView> {
  let perCriterion: PointTableCriterionView[] | null = null;
  let histogram: PointTableEvaluationView["histogram"] | null = null;
  let worst: PointTableEvaluationView["worst"] = [];
  let countFail = 0;
  let countClose = 0;
  let badPoints = 0;
  let offset = 0;
  for (let chunkIndex = 0; ; chunkIndex++) {
    const chunk = await readChunk(table.id, chunkIndex, { coordinates: table.hasCoordinates, ids: true });
    if (chunk === null) break;
    const components = interleavedComponents(chunk);
    const ids = chunkIds(chunk);
    const xyz = chunk.coordinates ? doublesOf(chunk.coordinates) : null;
    const n = chunk.pointCount;
    const where = (k: number): Where => ({
      id: ids[k],
      x: xyz ? xyz[k] : null,
      y: xyz ? xyz[n + k] : null,
      z: xyz ? xyz[2 * n + k] : null,
    });
    const evaluator = new PointTableEvaluator(components, rating.spec, {
      includeUnsuited: rating.includeUnsuited,
      chunkSize: SLICE_POINTS,
      worstCount: WORST_POINTS,
    });
    while (evaluator.step()) await nextTurn();
    const r = evaluator.result;
    perCriterion ??= r.criteria.map(emptyCriterion);
    r.criteria.forEach((c, i) => mergeCriterion(perCriterion![i], c, offset, where));
    if (histogram === null) histogram = { ...r.histogram, counts: [...r.histogram.counts] };
    else r.histogram.counts.forEach((count, i) => (histogram!.counts[i] += count));
    countFail += r.failing;
    countClose += r.close;
    badPoints += r.badPoints.count;
    const candidates = r.worst.map((w) => ({
      index: offset + w.index,
      ...where(w.index),
      utilisation: w.utilisation,
      verdict: verdictForUtilisation(w.utilisation),
      componentsPa: {
        xx: components[6 * w.index],
        yy: components[6 * w.index + 1],
        zz: components[6 * w.index + 2],
        xy: components[6 * w.index + 3],
        yz: components[6 * w.index + 4],
        zx: components[6 * w.index + 5],
      },
    }));
    worst = [...worst, ...candidates]
      .sort((a, b) => b.utilisation - a.utilisation || a.index - b.index)
      .slice(0, WORST_POINTS);
    offset += n;
    await nextTurn();
  }
  if (perCriterion === null) {
    // A table always has at least one point; an empty one still says which criteria it would rate.
    const probe = new PointTableEvaluator(new Float64Array(0), rating.spec, {
      includeUnsuited: rating.includeUnsuited,
    }).result;
    perCriterion = probe.criteria.map(emptyCriterion);
    histogram = probe.histogram;
  }
  return {
    evaluatedAt: new Date().toISOString(),
    material: { label: rating.material.label, note: rating.material.note },
    countFail,
    countClose,
    badPoints,
    perCriterion,
    histogram: histogram!,
    worst,
  };
}

function emptyCriterion(c: CriterionOverTable): PointTableCriterionView {
  return {
    criterion: c.criterion,
    status: c.status,
    reason: c.reason,
    requiredFactor: c.requiredFactor,
    category: c.category,
    governing: null,
    countFail: 0,
    countClose: 0,
  };
}

/** Adds one chunk's result for a criterion to the table's (the governing point by core's rule). */
function mergeCriterion(
  into: PointTableCriterionView,
  c: CriterionOverTable,
  offset: number,
  where: (k: number) => Where,
): void {
  into.countFail += c.failing;
  into.countClose += c.close;
  const g = c.governing;
  if (g === null || (into.governing !== null && !(g.utilisation > into.governing.utilisation))) return;
  const governing: PointTableGoverningView = {
    index: offset + g.index,
    ...where(g.index),
    factor: finiteOrNull(g.factor),
    utilisation: g.utilisation,
    verdict: verdictForUtilisation(g.utilisation),
  };
  into.governing = governing;
}

/** Evaluations running now, by table and basis: a second request for the same one waits for it. */
const running = new Map<string, Promise<PointTableEvaluationView>>();

/**
 * The table's evaluation against `rating`: the stored one when it was made against the same
 * basis, otherwise evaluated now (once, however many requests ask at the same time) and stored.
 * Null while the table awaits its content.
 */
export async function currentEvaluation(
  table: Pick<PointTableRow, "id" | "status" | "hasCoordinates" | "evaluation" | "evaluationBasis">,
  rating: PointTableRating,
): Promise<PointTableEvaluationView | null> {
  if (table.status !== "ready") return null;
  if (table.evaluation && table.evaluationBasis === rating.basis) {
    return table.evaluation as PointTableEvaluationView;
  }
  const key = `${table.id}|${rating.basis}`;
  let pending = running.get(key);
  if (!pending) {
    pending = (async () => {
      try {
        const evaluation = await evaluateStoredTable(table, rating);
        await saveEvaluation(table.id, evaluation, rating.basis);
        return evaluation;
      } finally {
        running.delete(key);
      }
    })();
    running.set(key, pending);
  }
  return pending;
}
