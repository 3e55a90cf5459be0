import { componentOf, unitOf } from "../parse/tokens";
import type { Component } from "../tensor/types";
import { COMPONENTS } from "../tensor/types";
import type { StressUnit } from "../units/stress";
import { splitLine } from "./split-line";
import type { PointColumns, PointTableDecimal, PointTableSeparator } from "./types";

/** What the header names suggest; the engineer confirms or corrects it on the mapping screen. */
export type ColumnGuess = {
  /** the full mapping when all six components were found, else null */
  columns: PointColumns | null;
  /** every role found, by column index */
  found: Partial<PointColumns>;
  /** components no column was found for */
  missing: Component[];
  /** the unit named in the headers ("sxx [MPa]", "syy (psi)"), when they all name the same one */
  unit: StressUnit | null;
};

/** A header name without its bracketed unit, spaces, underscores, dashes and dots, in lower case. */
function bare(name: string): string {
  return name
    .replace(/[[(].*?[\])]/g, "")
    .replace(/[\s_.\-:]/g, "")
    .toLowerCase();
}

const ID_NAMES = new Set([
  "id",
  "point",
  "pointid",
  "pt",
  "ptid",
  "node",
  "nodeid",
  "element",
  "elem",
  "elementid",
  "no",
  "number",
  "#",
]);
const AXIS_NAMES: Record<string, "x" | "y" | "z"> = {};
for (const a of ["x", "y", "z"] as const) {
  for (const n of [a, `coord${a}`, `${a}coord`, `pos${a}`, `${a}pos`, `loc${a}`, `${a}loc`])
    AXIS_NAMES[n] = a;
}

/**
 * Guesses the column mapping from generic header names: components written as xx yy zz xy yz zx,
 * with or without a prefix s, t, sigma, tau, σ or τ (sxx, sigma_xy, τyz), or in index form s11 … s13;
 * xz and s13 name the same component as zx, so either shear order maps. Coordinates: x y z (also
 * coord_x, x_coord, pos_x). The id: id, point, node, element, no, #. A name may carry its unit in
 * brackets ("sxx [MPa]"). The first column that names a role takes it; bare x, y, z are
 * coordinates, never components.
 * @param names the header's column names
 */
export function guessColumns(names: readonly string[]): ColumnGuess {
  const found: Partial<Record<keyof PointColumns, number>> = {};
  const units = new Set<StressUnit>();
  names.forEach((name, col) => {
    const b = bare(name);
    const role: keyof PointColumns | undefined = ID_NAMES.has(b) ? "id" : (AXIS_NAMES[b] ?? componentOf(b));
    if (role === undefined || found[role] !== undefined) return;
    found[role] = col;
    if (role !== "id" && !(role in AXIS_NAMES)) {
      const unit = /[[(]\s*([^\])]+?)\s*[\])]/.exec(name);
      const u = unit === null ? undefined : unitOf(unit[1]);
      if (u !== undefined) units.add(u);
    }
  });
  const missing = COMPONENTS.filter((c) => found[c] === undefined);
  return {
    columns: missing.length === 0 ? (found as PointColumns) : null,
    found: found as Partial<PointColumns>,
    missing,
    unit: units.size === 1 ? [...units][0] : null,
  };
}

/** The separator and decimal mark the first lines suggest. */
export type LayoutGuess = { separator: PointTableSeparator; decimal: PointTableDecimal };

/**
 * Guesses the separator from the first lines of a text: the first of tab, semicolon, comma and
 * whitespace that splits every sampled line (after the first, which may be a header or title)
 * into the same number of fields, at least six; whitespace when none does. The decimal mark is a
 * comma when the separator is not and a field reads like 12,5.
 * @param sample the first few kilobytes of the file
 */
export function guessLayout(sample: string): LayoutGuess {
  const lines = sample
    .replace(/^\uFEFF/, "")
    .split("\n")
    .slice(0, 21)
    .filter((l) => l.trim() !== "");
  // the last line of a sample may be cut short
  const rows = lines.length > 2 ? lines.slice(1, -1) : lines;
  const candidates: PointTableSeparator[] = ["\t", ";", ",", "whitespace"];
  let separator: PointTableSeparator = "whitespace";
  for (const c of candidates) {
    const counts = rows.map((l) => splitLine(l, c).length);
    if (counts.length > 0 && counts[0] >= 6 && counts.every((n) => n === counts[0])) {
      separator = c;
      break;
    }
  }
  const decimalComma =
    separator !== "," &&
    rows.some((l) => splitLine(l, separator).some((f) => /^[+-]?\d*,\d+(?:[eE][+-]?\d+)?$/.test(f)));
  return { separator, decimal: decimalComma ? "," : "." };
}
