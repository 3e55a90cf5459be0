/**
 * A stored table's results as the results view reads them: the binary columns the server sends
 * turned into core's PointTable, the server's evaluation into the view's TableEvaluation (the
 * server's governing points, counts and histogram are what the view shows), and the per-point
 * utilisation that colours the 3D view and feeds the region filter, rated in this browser in
 * slices with core's evaluator, since the server sends no per-point figures.
 */
import {
  PointTableEvaluator,
  type Criterion,
  type PointTable,
  type PointTableEvaluation,
  type PointTableSpec,
} from "../../../../../core";
import type { PointTableDetailView, PointTableEvaluationView } from "../../../entities/point-table/contract";
import type { TableEvaluation } from "./merge-evaluations";
import { yieldToPage } from "./steps";

/** The columns the server sends, in order: six components (Pa), then three coordinates. */
const COLUMNS = 9;

/**
 * The table as core's PointTable: components 6 per point (Pa) and coordinates 3 per point (null
 * when the table has none), from `columns` (the server's 9 columns of `count` values one after
 * another); ids as numbers or text as the table keeps them, null when it maps no id column (the
 * view then names a point by its row number, as the server does).
 */
export function tableFromColumns(
  columns: Float64Array,
  count: number,
  ids: readonly (number | string)[] | null,
  stored: Pick<PointTableDetailView, "idKind" | "hasCoordinates" | "badRows">,
): PointTable {
  const turning = startTurning(columns, count, ids, stored);
  turning.turn(0, count);
  return turning.table;
}

/**
 * {@link tableFromColumns} a slice of points at a time, yielding to the page between slices:
 * turning a million points is a few hundred milliseconds of strided writes, too long for one task.
 */
export async function tableFromColumnsInSlices(
  columns: Float64Array,
  count: number,
  ids: readonly (number | string)[] | null,
  stored: Pick<PointTableDetailView, "idKind" | "hasCoordinates" | "badRows">,
  { pause = yieldToPage, slice = TURNING_SLICE, isCancelled }: SliceOptions = {},
): Promise<PointTable | null> {
  const turning = startTurning(columns, count, ids, stored);
  for (let from = 0; from < count; from += slice) {
    await pause();
    if (isCancelled?.() === true) return null;
    turning.turn(from, Math.min(count, from + slice));
  }
  return turning.table;
}

/** How a sliced job pauses, how big a slice is, and whether to stop. */
export type SliceOptions = { pause?: () => Promise<void>; slice?: number; isCancelled?: () => boolean };

/** Points turned from columns between two yields to the page. */
export const TURNING_SLICE = 65_536;

/** The table's arrays allocated, ids read, and `turn(from, to)` to fill points from..to-1 from the columns. */
function startTurning(
  columns: Float64Array,
  count: number,
  ids: readonly (number | string)[] | null,
  stored: Pick<PointTableDetailView, "idKind" | "hasCoordinates" | "badRows">,
): { table: PointTable; turn: (from: number, to: number) => void } {
  if (columns.length !== COLUMNS * count) {
    throw new RangeError(`columns hold ${columns.length} values, not ${COLUMNS} × ${count} points`);
  }
  if (ids !== null && ids.length !== count) {
    throw new RangeError(`${ids.length} point ids for ${count} points`);
  }
  const components = new Float64Array(6 * count);
  const coordinates = stored.hasCoordinates ? new Float64Array(3 * count) : null;
  const table: PointTable = {
    count,
    components,
    coordinates,
    ids:
      ids === null
        ? null
        : stored.idKind === "text"
          ? ids.map(String)
          : Float64Array.from(ids, (id) => Number(id)),
    header: null,
    badRows: stored.badRows,
    lines: 0,
  };
  const turn = (from: number, to: number) => {
    for (let c = 0; c < 6; c++) {
      const at = c * count;
      for (let i = from; i < to; i++) components[6 * i + c] = columns[at + i];
    }
    if (coordinates === null) return;
    for (let a = 0; a < 3; a++) {
      const at = (6 + a) * count;
      for (let i = from; i < to; i++) coordinates[3 * i + a] = columns[at + i];
    }
  };
  return { table, turn };
}

/**
 * The server's evaluation in the view's shape, with `utilisation` per point (from this
 * browser's rating, or {@link utilisationOfWorst}). The first bad points are not sent, only
 * their count.
 */
export function evaluationFromServer(
  evaluation: PointTableEvaluationView,
  count: number,
  utilisation: Float64Array,
): TableEvaluation {
  if (utilisation.length !== count) {
    throw new RangeError(`utilisation holds ${utilisation.length} values for ${count} points`);
  }
  return {
    count,
    utilisation,
    worst: evaluation.worst.map((w) => ({ index: w.index, utilisation: w.utilisation })),
    histogram: evaluation.histogram,
    failing: evaluation.countFail,
    close: evaluation.countClose,
    badPoints: { count: evaluation.badPoints, first: [] },
    criteria: evaluation.perCriterion.map((c) => ({
      criterion: c.criterion,
      requiredFactor: c.requiredFactor,
      category: c.category,
      status: c.status,
      reason: c.reason,
      // the wire writes an infinite factor (a point without stress) as null
      governing:
        c.governing === null
          ? null
          : {
              index: c.governing.index,
              factor: c.governing.factor ?? Infinity,
              utilisation: c.governing.utilisation,
            },
      failing: c.countFail,
      close: c.countClose,
    })),
  };
}

/** Per point, the utilisation the server's worst points give; NaN for every other point. */
export function utilisationOfWorst(
  count: number,
  worst: readonly { index: number; utilisation: number }[],
): Float64Array {
  const out = new Float64Array(count).fill(Number.NaN);
  for (const w of worst) if (w.index >= 0 && w.index < count) out[w.index] = w.utilisation;
  return out;
}

/** Relative difference under which two utilisations are the same figure (rounding only). */
const SAME_UTILISATION = 1e-9;

/**
 * The criteria whose governing point this browser's rating puts elsewhere, or at another
 * utilisation, than the server's: a sign the two rated against different allowables (the
 * project changed between them), which the view then says.
 */
export function ratingDisagreements(
  server: TableEvaluation["criteria"],
  browser: PointTableEvaluation["criteria"],
): Criterion[] {
  const out: Criterion[] = [];
  for (const s of server) {
    const b = browser.find((c) => c.criterion === s.criterion);
    const sg = s.governing;
    const bg = b?.governing ?? null;
    if (sg === null && bg === null) continue;
    const agree =
      sg !== null &&
      bg !== null &&
      sg.index === bg.index &&
      Math.abs(sg.utilisation - bg.utilisation) <= SAME_UTILISATION * Math.max(1, Math.abs(sg.utilisation));
    if (!agree) out.push(s.criterion);
  }
  return out;
}

/** Points rated between two yields to the page: small enough that one slice stays well under 50 ms. */
export const RATING_SLICE = 8192;

/**
 * Rates every point with core's evaluator a slice at a time, yielding to the page between
 * slices (`pause`, by default {@link yieldToPage}) so it stays responsive, reporting progress, and
 * stopping when `isCancelled` says so (then null).
 */
export async function rateInSlices(
  components: Float64Array,
  spec: PointTableSpec,
  includeUnsuited: boolean,
  {
    onProgress,
    isCancelled,
    pause = yieldToPage,
    slice = RATING_SLICE,
  }: SliceOptions & { onProgress?: (done: number, total: number) => void } = {},
): Promise<PointTableEvaluation | null> {
  const evaluator = new PointTableEvaluator(components, spec, {
    includeUnsuited,
    chunkSize: slice,
    worstCount: 0,
  });
  const r = evaluator.result;
  while (r.evaluated < r.count) {
    await pause();
    if (isCancelled?.() === true) return null;
    evaluator.step();
    onProgress?.(r.evaluated, r.count);
  }
  return r;
}
