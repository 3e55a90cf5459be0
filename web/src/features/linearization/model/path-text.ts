import { guessColumns, guessLayout, splitLine } from "../../../../../core";
import type { PathPoint } from "../../../../../core/contract/linearizations";

/**
 * Reading a pasted or uploaded path: one point per line, from one surface to the other, with its
 * place (a distance along the line, or x y z) and the six components. The separator and decimal
 * mark are guessed as for point tables (core's guessLayout); a header is read with core's
 * guessColumns, plus a distance column ("d", "dist", "distance", "s"); without a header, 7 columns
 * are distance + xx yy zz xy yz zx and 9 columns are x y z + xx yy zz xy yz zx.
 */

export type PathPositions = "distance" | "xyz";

export type ParsedPath =
  | { ok: true; positions: PathPositions; points: PathPoint[]; columns: string; unitInHeader: string | null }
  | { ok: false; message: string };

const COMPONENT_ORDER = ["xx", "yy", "zz", "xy", "yz", "zx"] as const;
const DISTANCE_NAMES = new Set(["d", "dist", "distance", "s", "pathdistance", "depth"]);

/** A header name without its bracketed unit, spaces and punctuation, in lower case. */
const bare = (name: string) =>
  name
    .replace(/[[(].*?[\])]/g, "")
    .replace(/[\s_.\-:]/g, "")
    .toLowerCase();

function numberOf(text: string, decimal: "." | ","): number {
  const t = text.trim();
  if (t === "") return NaN;
  const normal = decimal === "," ? t.replace(",", ".") : t;
  // Number() accepts "1e3" and "-2.5" but also "" and "0x10"; the checks above and below refuse those.
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(normal)) return NaN;
  return Number(normal);
}

/**
 * Reads a pasted path.
 * @param text the pasted or uploaded text
 * @returns the points and what was understood, or a message that names the line and column at fault
 */
export function parsePathText(text: string): ParsedPath {
  const lines = text
    .replace(/^\uFEFF/, "")
    .split("\n")
    .map((l) => l.replace(/\r$/, ""))
    .filter((l) => l.trim() !== "");
  if (lines.length === 0) return { ok: false, message: "Paste a path: one point per line." };
  const { separator, decimal } = guessLayout(lines.slice(0, 22).join("\n"));
  const split = (line: string) => splitLine(line, separator).map((f) => f.trim());
  const first = split(lines[0]);
  const hasHeader = first.some((f) => Number.isNaN(numberOf(f, decimal)));
  let map: Record<string, number>;
  let positions: PathPositions;
  let unitInHeader: string | null = null;
  if (hasHeader) {
    const guess = guessColumns(first);
    if (guess.columns === null) {
      return {
        ok: false,
        message: `The header does not name every component: ${guess.missing.join(", ")} not found (name them e.g. sxx syy szz sxy syz szx).`,
      };
    }
    unitInHeader = guess.unit;
    const distanceAt = first.findIndex((name) => DISTANCE_NAMES.has(bare(name)));
    const { x, y, z } = guess.found;
    if (x !== undefined && y !== undefined && z !== undefined) {
      positions = "xyz";
      map = { ...guess.columns, x, y, z };
    } else if (distanceAt >= 0) {
      positions = "distance";
      map = { ...guess.columns, distance: distanceAt };
    } else {
      return {
        ok: false,
        message: "The header names no distance column (d, dist, distance) and not all of x, y and z.",
      };
    }
  } else if (first.length === 7) {
    positions = "distance";
    map = { distance: 0, ...Object.fromEntries(COMPONENT_ORDER.map((c, i) => [c, i + 1])) };
  } else if (first.length === 9) {
    positions = "xyz";
    map = { x: 0, y: 1, z: 2, ...Object.fromEntries(COMPONENT_ORDER.map((c, i) => [c, i + 3])) };
  } else {
    return {
      ok: false,
      message: `Line 1 has ${first.length} values. Give 7 per line (distance, σxx σyy σzz τxy τyz τzx), 9 (x y z and the six), or a header naming the columns.`,
    };
  }
  const keys =
    positions === "distance" ? ["distance", ...COMPONENT_ORDER] : ["x", "y", "z", ...COMPONENT_ORDER];
  const points: PathPoint[] = [];
  for (let i = hasHeader ? 1 : 0; i < lines.length; i++) {
    const fields = split(lines[i]);
    const point: Record<string, number> = {};
    for (const key of keys) {
      const value = numberOf(fields[map[key]] ?? "", decimal);
      if (!Number.isFinite(value)) {
        return {
          ok: false,
          message: `Line ${i + 1}: ${key} (column ${map[key] + 1}) is ${fields[map[key]] === undefined ? "missing" : `"${fields[map[key]]}", not a number`}.`,
        };
      }
      point[key] = value;
    }
    points.push(point as PathPoint);
  }
  return {
    ok: true,
    positions,
    points,
    columns: keys.map((k) => `${k} ← column ${map[k] + 1}`).join(", "),
    unitInHeader,
  };
}
