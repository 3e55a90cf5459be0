/**
 * The mapping screen's state as plain data: the layout of the text, which column holds what, the
 * unit and the kind of ids, and the rules that fill it in (a guess from the file's first lines, or
 * the project's newest table) and check it before anything is parsed.
 */
import {
  COMPONENTS,
  guessColumns,
  guessLayout,
  splitLine,
  type Component,
  type PointColumns,
  type PointTableOptions,
} from "../../../../../core";
import type { StressUnitName } from "../../../../../core/contract/materials";
import type {
  IdKind,
  PointTableColumnsBody,
  PointTableLayoutBody,
} from "../../../entities/point-table/contract";

/** What a column can be: one of the six components, a coordinate or the point id. */
export type ColumnRole = Component | "x" | "y" | "z" | "id";
export const COLUMN_ROLES: readonly ColumnRole[] = [...COMPONENTS, "id", "x", "y", "z"];

export type MappingDraft = PointTableLayoutBody & {
  /** column index (0-based) per role; null when no column is mapped to it */
  columns: Record<ColumnRole, number | null>;
  unit: StressUnitName;
  idKind: IdKind;
};

/** The mapping a stored table was read with (the project's newest one is offered again). */
export type RememberedMapping = {
  layout: PointTableLayoutBody;
  columns: PointTableColumnsBody;
  unit: StressUnitName;
  idKind: IdKind;
};

/** How many of the file's first lines the screen shows and the guesses read. */
export const PREVIEW_LINES = 8;

const NUMBER = /^[+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+-]?\d+)?$/;

const emptyColumns = (): Record<ColumnRole, number | null> =>
  Object.fromEntries(COLUMN_ROLES.map((r) => [r, null])) as Record<ColumnRole, number | null>;

/** The non-blank lines of a sample after the skipped ones, without a byte-order mark or CR. */
function contentLines(sample: string, skipRows: number): string[] {
  const lines = sample.replace(/^\uFEFF/, "").split("\n");
  // the last line of a sample may be cut short, unless the sample is the whole text
  if (lines.length > 1 && !sample.endsWith("\n")) lines.pop();
  return lines
    .slice(skipRows)
    .map((l) => l.replace(/\r$/, ""))
    .filter((l) => l.trim() !== "");
}

/** What the screen shows of the text under the current layout: the header's names and the first rows. */
export type Preview = { names: string[] | null; rows: string[][]; fieldCount: number };

export function previewOf(
  sample: string,
  draft: Pick<MappingDraft, "separator" | "skipRows" | "header">,
): Preview {
  const lines = contentLines(sample, draft.skipRows).slice(0, PREVIEW_LINES + 1);
  const split = lines.map((l) => splitLine(l, draft.separator));
  const names = draft.header && split.length > 0 ? split[0] : null;
  const rows = draft.header ? split.slice(1) : split;
  const fieldCount = Math.max(0, ...split.map((r) => r.length));
  return { names, rows: rows.slice(0, PREVIEW_LINES), fieldCount };
}

function columnsFromRemembered(c: PointTableColumnsBody): Record<ColumnRole, number | null> {
  const out = emptyColumns();
  for (const role of COLUMN_ROLES) out[role] = c[role] ?? null;
  return out;
}

/** The highest column a mapping uses. */
const highestColumn = (columns: Record<ColumnRole, number | null>) =>
  Math.max(-1, ...COLUMN_ROLES.map((r) => columns[r] ?? -1));

/** True when the id column of the sample's rows holds anything but numbers. */
function idsLookTextual(rows: string[][], column: number | null): boolean {
  if (column === null) return false;
  return rows.some((r) => r[column] !== undefined && r[column] !== "" && !NUMBER.test(r[column]));
}

/**
 * The mapping to start from. The project's newest table's mapping when it fits this text (its
 * separator splits the rows into enough fields for every column it names), since a team's files
 * tend to come from one source; otherwise a guess: separator and decimal mark from guessLayout, a
 * header when the first line is not all numbers, the columns from its names (guessColumns) or,
 * without names, the last six columns as the components in core's order.
 * @param sample the file's first few kilobytes
 * @param remembered the project's newest table's mapping, or null
 * @param fallbackUnit the project's display unit, when neither names nor memory give one
 */
export function initialDraft(
  sample: string,
  remembered: RememberedMapping | null,
  fallbackUnit: StressUnitName,
): MappingDraft {
  if (remembered !== null) {
    const columns = columnsFromRemembered(remembered.columns);
    const preview = previewOf(sample, remembered.layout);
    const rows = preview.rows;
    if (rows.length > 0 && rows.every((r) => r.length > highestColumn(columns))) {
      return { ...remembered.layout, columns, unit: remembered.unit, idKind: remembered.idKind };
    }
  }
  const { separator, decimal } = guessLayout(sample);
  const first = contentLines(sample, 0).map((l) => splitLine(l, separator));
  const header = first.length > 0 && first[0].some((f) => f !== "" && !NUMBER.test(f));
  const draft: MappingDraft = {
    separator,
    decimal,
    skipRows: 0,
    header,
    columns: emptyColumns(),
    unit: fallbackUnit,
    idKind: "number",
  };
  const rows = header ? first.slice(1) : first;
  if (header) {
    const guess = guessColumns(first[0]);
    for (const role of COLUMN_ROLES) draft.columns[role] = guess.found[role] ?? null;
    if (guess.unit !== null) draft.unit = guess.unit;
  } else {
    const width = rows.length > 0 ? rows[0].length : 0;
    if (width >= 6) COMPONENTS.forEach((c, i) => (draft.columns[c] = width - 6 + i));
  }
  draft.idKind = idsLookTextual(rows, draft.columns.id) ? "text" : "number";
  return draft;
}

/**
 * Maps `column` to `role` (null: unmaps the role). A column holds one thing, so a role that had
 * this column loses it.
 */
export function assignColumn(draft: MappingDraft, role: ColumnRole, column: number | null): MappingDraft {
  const columns = { ...draft.columns };
  if (column !== null) {
    for (const r of COLUMN_ROLES) if (columns[r] === column) columns[r] = null;
  }
  columns[role] = column;
  return { ...draft, columns };
}

/** A problem with the mapping, naming the field to change. */
export type MappingIssue = { field: string; message: string };

/** What must change before the text can be read; empty when the mapping is complete. */
export function mappingIssues(draft: MappingDraft, fieldCount: number): MappingIssue[] {
  const issues: MappingIssue[] = [];
  if (!Number.isInteger(draft.skipRows) || draft.skipRows < 0 || draft.skipRows > 1000) {
    issues.push({ field: "skipRows", message: "Rows to skip must be a whole number from 0 to 1000." });
  }
  if (draft.decimal === "," && draft.separator === ",") {
    issues.push({
      field: "decimal",
      message: "A decimal comma needs another separator (semicolon, tab or whitespace).",
    });
  }
  for (const c of COMPONENTS) {
    if (draft.columns[c] === null) {
      issues.push({ field: `columns.${c}`, message: `Choose the column that holds ${c}.` });
    }
  }
  for (const role of COLUMN_ROLES) {
    const col = draft.columns[role];
    if (col !== null && fieldCount > 0 && col >= fieldCount) {
      issues.push({
        field: `columns.${role}`,
        message: `Column ${col + 1} for ${role} is past the ${fieldCount} columns the rows have.`,
      });
    }
  }
  return issues;
}

/** The mapping as the API stores it (roles not mapped are left out). */
export function columnsBody(draft: MappingDraft): PointTableColumnsBody {
  const out: Partial<Record<ColumnRole, number>> = {};
  for (const role of COLUMN_ROLES) {
    const col = draft.columns[role];
    if (col !== null) out[role] = col;
  }
  return out as PointTableColumnsBody;
}

/** The parser's options for a complete mapping (check `mappingIssues` first). */
export function parserOptions(draft: MappingDraft, columnNames: readonly string[] | null): PointTableOptions {
  return {
    separator: draft.separator,
    decimal: draft.decimal,
    skipRows: draft.skipRows,
    header: draft.header,
    columns: columnsBody(draft) as PointColumns,
    unit: draft.unit,
    idKind: draft.idKind,
    ...(columnNames === null ? {} : { columnNames }),
  };
}

/** The project's newest stored table's mapping (tables listed in any order), or null without one. */
export function newestMapping(
  tables: readonly {
    createdAt: string;
    layout: PointTableLayoutBody;
    columns: PointTableColumnsBody;
    unit: StressUnitName;
    idKind: IdKind;
  }[],
): RememberedMapping | null {
  if (tables.length === 0) return null;
  const newest = tables.reduce((a, b) => (Date.parse(b.createdAt) > Date.parse(a.createdAt) ? b : a));
  return { layout: newest.layout, columns: newest.columns, unit: newest.unit, idKind: newest.idKind };
}
