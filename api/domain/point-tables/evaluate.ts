import { PointTableEvaluator, verdictForUtilisation, WORST_POINTS } from "../../../core";
import type {
  PointTableCriterionView,
  PointTableEvaluationView,
  PointTableGoverningView,
} from "../../../core/contract/point-tables";
import {
  readChunk,
  readPointPlaces,
  saveEvaluation,
  type PointPlace,
  type PointTableRow,
} from "../../../db/repositories/point-tables";
import { doublesOf, POINTS_PER_CHUNK } from "../../../db/repositories/point-table-chunks";
import type { ChunkRating } from "./rate-chunk";
import { rateInWorker } from "./rating-thread";
import type { PointTableRating } from "./spec";

/** A factor as JSON carries it: null for infinite (the state never reaches the criterion's surface). */
const finiteOrNull = (v: number) => (Number.isFinite(v) ? v : null);

/** A stored chunk's components as the rating worker takes them (its own buffer, to transfer). */
type ChunkColumns = { pointCount: number; columns: Float64Array };

/** Chunk `chunkIndex`'s components only (coordinates and ids are read for the few points shown). */
async function readColumns(tableId: string, chunkIndex: number): Promise<ChunkColumns | null> {
  const chunk = await readChunk(tableId, chunkIndex, { coordinates: false, ids: false });
  if (chunk === null) return null;
  return { pointCount: chunk.pointCount, columns: doublesOf(chunk.components!) };
}

/** A governing or worst point before its id and coordinates are known: its index in the table. */
type Unplaced<T> = Omit<T, "id" | "x" | "y" | "z">;

/**
 * Rates every point of a stored table against `rating` with core's PointTableEvaluator (the same
 * kernels the browser runs, so both give the same doubles) and merges the chunks' results: per
 * criterion the governing point (highest utilisation; on a tie the earlier point, core's
 * `moreCritical` rule), the points that fail or are close, the histogram and the worst
 * {@link WORST_POINTS} points.
 *
 * The event loop only reads: each chunk's components (one statement, 3 MB) go to the rating
 * worker (rating-thread.ts), which runs the kernels on another thread while the next chunk is
 * read, so reading and rating overlap and no request waits behind the kernels. One chunk in the
 * worker and one being read are in memory at a time, not the table. The ids and coordinates of
 * the governing and worst points are read at the end, a few bytes each.
 */
export async function evaluateStoredTable(
  table: Pick<PointTableRow, "id">,
  rating: PointTableRating,
): Promise<PointTableEvaluationView> {
  const basis = { spec: rating.spec, includeUnsuited: rating.includeUnsuited };
  let perCriterion: Unplaced<PointTableCriterionView>[] | null = null;
  let governing: (Unplaced<PointTableGoverningView> | null)[] = [];
  let histogram: PointTableEvaluationView["histogram"] | null = null;
  let worst: Unplaced<PointTableEvaluationView["worst"][number]>[] = [];
  let countFail = 0;
  let countClose = 0;
  let badPoints = 0;
  let offset = 0;
  let next = readColumns(table.id, 0);
  try {
    for (let chunkIndex = 0; ; chunkIndex++) {
      const chunk = await next;
      if (chunk === null) break;
      // Read the next chunk while the worker rates this one.
      next = readColumns(table.id, chunkIndex + 1);
      const r: ChunkRating = await rateInWorker(chunk.columns, chunk.pointCount, basis);
      if (perCriterion === null) {
        perCriterion = r.criteria.map(emptyCriterion);
        governing = r.criteria.map(() => null);
      }
      r.criteria.forEach((c, i) => {
        perCriterion![i].countFail += c.failing;
        perCriterion![i].countClose += c.close;
        const g = c.governing;
        const current = governing[i];
        // Chunks come in table order, so an equal utilisation keeps the earlier point.
        if (g === null || (current !== null && !(g.utilisation > current.utilisation))) return;
        governing[i] = {
          index: offset + g.index,
          factor: finiteOrNull(g.factor),
          utilisation: g.utilisation,
          verdict: verdictForUtilisation(g.utilisation),
        };
      });
      if (histogram === null) histogram = { ...r.histogram, counts: [...r.histogram.counts] };
      else r.histogram.counts.forEach((count, i) => (histogram!.counts[i] += count));
      countFail += r.failing;
      countClose += r.close;
      badPoints += r.badPoints;
      const candidates = r.worst.map((w) => ({
        index: offset + w.index,
        utilisation: w.utilisation,
        verdict: verdictForUtilisation(w.utilisation),
        componentsPa: {
          xx: w.components[0],
          yy: w.components[1],
          zz: w.components[2],
          xy: w.components[3],
          yz: w.components[4],
          zx: w.components[5],
        },
      }));
      worst = [...worst, ...candidates]
        .sort((a, b) => b.utilisation - a.utilisation || a.index - b.index)
        .slice(0, WORST_POINTS);
      offset += chunk.pointCount;
    }
  } finally {
    // A failed rating leaves the read ahead running: let it end without an unhandled rejection.
    next.catch(() => undefined);
  }
  if (perCriterion === null) {
    // A table always has at least one point; an empty one still says which criteria it would rate.
    const probe = new PointTableEvaluator(new Float64Array(0), rating.spec, {
      includeUnsuited: rating.includeUnsuited,
    }).result;
    perCriterion = probe.criteria.map(emptyCriterion);
    governing = probe.criteria.map(() => null);
    histogram = probe.histogram;
  }
  const places = await readPointPlaces(
    table.id,
    [...governing.flatMap((g) => (g ? [g.index] : [])), ...worst.map((w) => w.index)],
    POINTS_PER_CHUNK,
  );
  const placed = <T extends { index: number }>(p: T): T & PointPlace => ({
    ...p,
    ...(places.get(p.index) ?? { id: p.index + 1, x: null, y: null, z: null }),
  });
  return {
    evaluatedAt: new Date().toISOString(),
    material: { label: rating.material.label, note: rating.material.note },
    countFail,
    countClose,
    badPoints,
    perCriterion: perCriterion.map((c, i) => {
      const g = governing[i];
      return { ...c, governing: g === null ? null : placed(g) };
    }),
    histogram: histogram!,
    worst: worst.map(placed),
  };
}

function emptyCriterion(c: ChunkRating["criteria"][number]): Unplaced<PointTableCriterionView> {
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
