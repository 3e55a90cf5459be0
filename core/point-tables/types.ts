import type { Component } from "../tensor/types";
import type { StressUnit } from "../units/stress";

/**
 * How the fields of a line are separated: one comma, semicolon or tab per field boundary (an empty
 * field between two is a blank cell), or "whitespace": any run of spaces and tabs (leading and
 * trailing ones ignored), the layout of fixed-width listings.
 */
export type PointTableSeparator = "," | ";" | "\t" | "whitespace";

/** The decimal mark: "," is accepted only when the separator is not a comma. */
export type PointTableDecimal = "." | ",";

/**
 * Which column (0-based) holds what. The six components are required and may come in any order
 * (so either shear order, xy yz zx or xy zx yz, is just a different mapping); the point id and the
 * coordinates are optional. Columns not named are ignored.
 */
export type PointColumns = Record<Component, number> & {
  id?: number;
  x?: number;
  y?: number;
  z?: number;
};

/** The layout of the text: what the engineer states beside the column mapping. */
export type PointTableLayout = {
  separator: PointTableSeparator;
  /** default "." */
  decimal?: PointTableDecimal;
  /** lines skipped before anything is read (a title block); default 0 */
  skipRows?: number;
  /** the first line after the skipped ones names the columns; default false */
  header?: boolean;
};

/** Everything the parser needs. */
export type PointTableOptions = PointTableLayout & {
  columns: PointColumns;
  /** the unit the components are written in; they are converted to Pa */
  unit: StressUnit;
  /**
   * "number" (default): ids are numbers (node or element numbers), stored in a Float64Array, and a
   * row whose id is not a number is a bad row. "text": ids are kept as strings ("N101", "A-7").
   */
  idKind?: "number" | "text";
  /**
   * The line number of the first line of the text given (default 1). A worker that parses the
   * second half of a file passes where that half starts, when it knows; otherwise
   * {@link mergePointTables} renumbers from each part's `lines`.
   */
  firstLine?: number;
  /**
   * Names of the columns, for the reasons of bad rows, when this text has no header line of its own
   * (the second half of a file whose header the first half read).
   */
  columnNames?: readonly string[];
  /** rows expected (e.g. estimated from the file size), so the arrays are allocated once */
  expectedRows?: number;
};

/** A row left out of the table, and why (the reason names the column). */
export type BadRow = { line: number; reason: string };

/** The bad rows of a table: the first few in full, and how many there were in all. */
export type BadRows = { count: number; first: BadRow[] };

/**
 * What a parsed point table holds; every array has exactly one entry (or stride) per point. The
 * Float64Arrays start at offset 0 of their buffers but a buffer may be up to a quarter longer than
 * its array (spare room the parser did not copy away); transferring one to another thread moves
 * the whole buffer.
 */
export type PointTable = {
  /** points read (bad rows excluded) */
  count: number;
  /** 6 per point: xx yy zz xy yz zx, in Pa */
  components: Float64Array;
  /** 3 per point: x y z in the file's length unit (an axis not mapped is 0), or null when none is mapped */
  coordinates: Float64Array | null;
  /** the point ids: numbers (idKind "number"), strings (idKind "text"), or null when no id column is mapped */
  ids: Float64Array | string[] | null;
  /** the header's column names, or null when the layout has no header */
  header: string[] | null;
  badRows: BadRows;
  /** lines read, the skipped and header lines and a last line without a line break included */
  lines: number;
};
