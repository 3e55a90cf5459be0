import { FIRST_BAD_ROWS_LIMIT } from "../batch/principal-batch";
import type { BadRow, PointTable } from "./types";

/**
 * Joins the parts of one file parsed separately (e.g. by two workers, each given a run of whole
 * lines, every part parsed with the default `firstLine` 1), in file order: the points one after the
 * other, and each bad row's line number shifted by the lines of the parts before it, so it names
 * the line of the whole file.
 * @throws RangeError when the parts disagree on coordinates or on the kind of ids
 */
export function mergePointTables(parts: readonly PointTable[]): PointTable {
  if (parts.length === 0) throw new RangeError("mergePointTables needs at least one part");
  const count = parts.reduce((s, p) => s + p.count, 0);
  const withCoords = parts[0].coordinates !== null;
  const idKind = kindOf(parts[0].ids);
  parts.forEach((p, i) => {
    if ((p.coordinates !== null) !== withCoords)
      throw new RangeError(`part ${i} differs in having coordinates`);
    if (kindOf(p.ids) !== idKind) throw new RangeError(`part ${i} has ids of another kind`);
  });
  const components = new Float64Array(6 * count);
  const coordinates = withCoords ? new Float64Array(3 * count) : null;
  const numericIds = idKind === "number" ? new Float64Array(count) : null;
  const textIds: string[] | null = idKind === "text" ? [] : null;
  const first: BadRow[] = [];
  let bad = 0;
  let at = 0;
  let lines = 0;
  for (const p of parts) {
    components.set(p.components, 6 * at);
    if (coordinates !== null) coordinates.set(p.coordinates!, 3 * at);
    if (numericIds !== null) numericIds.set(p.ids as Float64Array, at);
    if (textIds !== null) for (const id of p.ids as string[]) textIds.push(id);
    for (const row of p.badRows.first) {
      if (first.length < FIRST_BAD_ROWS_LIMIT) first.push({ line: row.line + lines, reason: row.reason });
    }
    bad += p.badRows.count;
    at += p.count;
    lines += p.lines;
  }
  return {
    count,
    components,
    coordinates,
    ids: numericIds ?? textIds,
    header: parts[0].header,
    badRows: { count: bad, first },
    lines,
  };
}

function kindOf(ids: PointTable["ids"]): "number" | "text" | "none" {
  return ids === null ? "none" : ids instanceof Float64Array ? "number" : "text";
}

/**
 * Where to cut a text into `parts` runs of whole lines of about equal length (for workers): the
 * indices just after a line break, ascending, `parts − 1` of them (fewer when lines are long).
 * @param text the whole file
 * @param parts how many runs are wanted (≥ 1)
 */
export function lineCuts(text: string, parts: number): number[] {
  if (!Number.isInteger(parts) || parts < 1)
    throw new RangeError(`parts must be an integer ≥ 1, got ${parts}`);
  const cuts: number[] = [];
  for (let k = 1; k < parts; k++) {
    const nl = text.indexOf("\n", Math.floor((k * text.length) / parts));
    if (nl < 0 || nl + 1 >= text.length) break;
    if (cuts.length === 0 || nl + 1 > cuts[cuts.length - 1]) cuts.push(nl + 1);
  }
  return cuts;
}
