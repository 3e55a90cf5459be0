import { moreCritical } from "../../../core";
import {
  governingSentence,
  type Comparison,
  type PagedComparison,
  type ComparisonQuery,
  type GoverningView,
} from "../../../core/contract/comparison";
import { buildComparisonWindow, type ComparisonInput } from "./build";
import { pointTableSection } from "./point-tables";

/** How long one chunk of computation may hold the event loop before the next waits its turn. */
const CHUNK_TARGET_MS = 20;
/**
 * Rows the first chunk computes; later chunks are sized from the time the previous ones took.
 * Small because the first chunk also packs every state for the superposition and runs colder code:
 * at the project limits 2,000 rows held the loop 74 ms on a quiet machine and 500 rows 58 ms under
 * load (the packing alone 10 ms).
 */
const FIRST_CHUNK_ROWS = 100;

const nextTurn = () => new Promise<void>((resolve) => setImmediate(resolve));

/**
 * Of several governing rows given in row order, the one that governs per criterion, chosen by
 * core's one rule (moreCritical: the highest utilisation; ties keep the earlier row), so the rule
 * is core's, not repeated here. Criteria keep the order in which they first appear.
 */
export function mergeGoverning(candidates: readonly GoverningView[]): GoverningView[] {
  const best = new Map<GoverningView["criterion"], GoverningView>();
  for (const g of candidates) {
    if (moreCritical(g, best.get(g.criterion) ?? null)) best.set(g.criterion, g);
  }
  return [...best.values()];
}

/** The one governing check of several runs' overall winners, by the same rule (ties: the earlier run). */
function mergeOverall(candidates: readonly (GoverningView | null)[]): GoverningView | null {
  let top: GoverningView | null = null;
  for (const g of candidates) if (g && moreCritical(g, top)) top = g;
  return top;
}

type Item = { kind: "case"; index: number } | { kind: "combination"; index: number };

/**
 * The inputs of the comparison cut into consecutive runs of cases, then of combinations,
 * each run holding about `rows` rows (at least one case or combination). Runs keep the
 * comparison's row order: cases first, then combinations, each at every location.
 */
function takeRun(input: ComparisonInput, items: Item[], start: number, rows: number): ComparisonInput {
  const perItem = Math.max(1, input.locations.length);
  const count = Math.max(1, Math.floor(rows / perItem));
  const run = items.slice(start, start + count);
  return {
    ...input,
    cases: run.filter((i) => i.kind === "case").map((i) => input.cases[i.index]),
    combinations: run.filter((i) => i.kind === "combination").map((i) => input.combinations[i.index]),
  };
}

/**
 * One page of the comparison of `input`, with the governing results over every row.
 *
 * The comparison is computed by build.ts in runs of cases and combinations, yielding the
 * event loop between runs (setImmediate), so other requests — health among them — are
 * answered while a large project is computed; each run is sized from the time the last one
 * took to hold the loop about CHUNK_TARGET_MS. Only the rows and skipped pairs of the
 * requested page are kept, so memory does not grow with the project. The governing rows of
 * the runs are merged with core's findGoverning, overall and per location.
 */
export async function comparisonPage(
  input: ComparisonInput,
  query: ComparisonQuery,
): Promise<Omit<PagedComparison, "linearizations">> {
  const items: Item[] = [
    ...input.cases.map((_, index) => ({ kind: "case" as const, index })),
    ...input.combinations.map((_, index) => ({ kind: "combination" as const, index })),
  ];
  const from = (query.page - 1) * query.limit;
  const to = from + query.limit;
  const rows: Comparison["rows"] = [];
  const skipped: Comparison["skipped"] = [];
  let totalRows = 0;
  let totalSkipped = 0;
  const governing: GoverningView[] = [];
  const overallCandidates: (GoverningView | null)[] = [];
  const byLocation = new Map<string, GoverningView[]>(input.locations.map((l) => [l.id, []]));
  const cautions: string[] = [];
  let first: Comparison | null = null;

  let runRows = FIRST_CHUNK_ROWS;
  let start = 0;
  // A large project's input was just parsed in this turn: let waiting requests in before computing.
  if (items.length * input.locations.length > FIRST_CHUNK_ROWS) await nextTurn();
  do {
    const run = takeRun(input, items, start, runRows);
    const began = performance.now();
    // Only this page's rows are written out; every row of the run counts for governing.
    const { comparison: part, rowCount } = buildComparisonWindow(run, {
      from: Math.max(0, from - totalRows),
      to: Math.max(0, to - totalRows),
    });
    const took = performance.now() - began;
    first ??= part;
    rows.push(...part.rows);
    skipped.push(...part.skipped.slice(Math.max(0, from - totalSkipped), Math.max(0, to - totalSkipped)));
    totalRows += rowCount;
    totalSkipped += part.skipped.length;
    governing.push(...part.governing);
    overallCandidates.push(part.governingOverall);
    for (const l of part.governingByLocation) byLocation.get(l.locationId)?.push(...l.governing);
    for (const c of part.cautions) if (!cautions.includes(c)) cautions.push(c);
    start += Math.max(1, run.cases.length + run.combinations.length);
    if (start < items.length) {
      // Aim the next run at CHUNK_TARGET_MS from the rate this one ran at.
      const computed = rowCount + part.skipped.length;
      runRows = Math.max(1, Math.round((computed * CHUNK_TARGET_MS) / Math.max(took, 1)));
      await nextTurn();
    }
  } while (start < items.length);

  const tables = pointTableSection(input.pointTables ?? []);
  governing.push(...tables.governing);
  overallCandidates.push(...tables.governing);
  const overall = mergeGoverning(governing);
  const top = mergeOverall(overallCandidates);
  return {
    ...first!,
    rows,
    skipped,
    governing: overall,
    governingByLocation: input.locations.map((l) => ({
      locationId: l.id,
      locationName: l.name,
      governing: mergeGoverning(byLocation.get(l.id)!),
    })),
    governingOverall: top,
    summary: top ? `governs: ${governingSentence(top)}` : null,
    cautions,
    paging: {
      page: query.page,
      limit: query.limit,
      totalRows,
      totalSkipped,
      totalPages: Math.max(1, Math.ceil(Math.max(totalRows, totalSkipped) / query.limit)),
    },
    pointTables: tables.views,
  };
}
