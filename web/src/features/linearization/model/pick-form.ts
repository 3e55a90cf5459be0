import type { PathFromPointTable, PathFromPointTableBody } from "../../../../../core/contract/linearizations";
import type { LineForm } from "./line-form";
import { pathTextOf } from "./line-form";

/**
 * Picking a path out of a stored point table: the form as typed (a table, the two ends, the
 * tolerance), the request the server answers with the picked path, and the line form that takes
 * the picked path in. Pure: the page draws and calls these.
 */
export type PickForm = {
  tableId: string;
  start: [string, string, string];
  end: [string, string, string];
  tolerance: string;
};

export const EMPTY_PICK: PickForm = { tableId: "", start: ["", "", ""], end: ["", "", ""], tolerance: "" };

/** A table as the picker lists it: usable only with x y z columns mapped. */
export type PickableTable = { id: string; fileName: string; pointCount: number; hasCoordinates: boolean };

/** The tables of a load case as the picker offers them (a table without x y z cannot be picked from). */
export function pickableTables(
  tables: readonly { id: string; fileName: string; pointCount: number; columns: Record<string, unknown> }[],
): PickableTable[] {
  return tables.map((t) => ({
    id: t.id,
    fileName: t.fileName,
    pointCount: t.pointCount,
    hasCoordinates: ["x", "y", "z"].every((k) => typeof t.columns[k] === "number"),
  }));
}

const numberOf = (text: string) => {
  const t = text.trim().replace(",", ".");
  return t === "" ? NaN : Number(t);
};

/**
 * The request for the pick, or the problems that keep it from being sent, by field name. The
 * server bounds the numbers again and names the field in its 400.
 */
export function pickRequestOf(
  form: PickForm,
  lengthUnit: LineForm["lengthUnit"],
): { ok: true; body: PathFromPointTableBody } | { ok: false; problems: Record<string, string> } {
  const problems: Record<string, string> = {};
  if (form.tableId === "") problems.tableId = "choose a point table of this load case";
  const point = (v: [string, string, string], field: "start" | "end") => {
    const n = v.map(numberOf);
    if (n.some((c) => !Number.isFinite(c))) problems[field] = "give three numbers, x y z";
    return n as [number, number, number];
  };
  const start = point(form.start, "start");
  const end = point(form.end, "end");
  if (!problems.start && !problems.end && start.every((v, i) => v === end[i])) {
    problems.end = "must differ from the first end (the line would have zero length)";
  }
  const tolerance = numberOf(form.tolerance);
  if (!Number.isFinite(tolerance) || !(tolerance > 0)) {
    problems.tolerance = "give a distance greater than 0 (how far from the line a point may lie)";
  }
  if (Object.keys(problems).length > 0) return { ok: false, problems };
  return { ok: true, body: { tableId: form.tableId, start, end, tolerance, lengthUnit } };
}

/** What the pick found, in one sentence for the form. */
export function pickSummary(picked: PathFromPointTable): string {
  const merged = picked.found - picked.pointCount;
  const found = `${picked.found} point${picked.found === 1 ? "" : "s"} of "${picked.table.fileName}" within the tolerance`;
  const places =
    merged > 0 ? `, ${picked.pointCount} places along the line (${merged} coincident merged)` : "";
  const usable = picked.path
    ? ` Ready to use: ${picked.path.points.length} points in ${picked.table.unit}.`
    : " Too few or too many to use as a path.";
  return `${found}${places}.${usable}`;
}

/**
 * The line form with the picked path in it: the points written as a distance table, the line's
 * direction, and the table's stress unit (the components are in it). Other fields stay as typed.
 */
export function formWithPickedPath(form: LineForm, picked: PathFromPointTable): LineForm {
  if (!picked.path) return form;
  const d = picked.path.lineDirection;
  return {
    ...form,
    pathText: pathTextOf("distance", picked.path.points),
    lineDirection: [String(d[0]), String(d[1]), String(d[2])],
    stressUnit: picked.path.stressUnit,
    lengthUnit: picked.path.lengthUnit,
  };
}
