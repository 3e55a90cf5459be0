import { SYMMETRY_REL_TOL } from "../tolerances";
import type { Component, StressTensor } from "../tensor/types";
import type { StressUnit } from "../units/stress";
import { componentOf, parseNumberToken, tokenize, unitOf, type Token } from "./tokens";

/** Options of {@link parseTensor}. */
export type ParseTensorOptions = {
  /**
   * Order of six (or three plane-stress) bare components, by name ("xx", "sxx", "txy", "s12", …).
   * A header line in the text takes precedence.
   */
  order?: readonly string[];
  /** Relative symmetry tolerance for a 3×3 matrix, as a fraction of its largest absolute entry (default 1e-6). */
  symmetryTolerance?: number;
};

/** Where and why pasted text was rejected (1-based line and column). */
export type ParseError = { message: string; line?: number; column?: number };

/** Result of {@link parseTensor}. */
export type ParseTensorResult =
  | { ok: true; tensor: StressTensor; unit?: StressUnit; form: "matrix" | "components" | "plane" }
  | { ok: false; error: ParseError };

type Num = { value: number; token: Token };

const PLANE_DEFAULT: readonly Component[] = ["xx", "yy", "xy"];
const SUB: Readonly<Record<Component, string>> = {
  xx: "xx",
  yy: "yy",
  zz: "zz",
  xy: "xy",
  yz: "yz",
  zx: "zx",
};

function fail(message: string, at?: Token): ParseTensorResult {
  if (at === undefined) return { ok: false, error: { message } };
  return {
    ok: false,
    error: { message: `line ${at.line}, column ${at.column}: ${message}`, line: at.line, column: at.column },
  };
}

function checkOrder(order: readonly Component[]): string | undefined {
  if (order.length !== 6 && order.length !== 3)
    return `names ${order.length} components; expected 6, or 3 for plane stress`;
  const seen = new Set<Component>();
  for (const c of order) {
    if (seen.has(c)) return `names σ${SUB[c]} twice`;
    seen.add(c);
  }
  if (order.length === 3 && !(seen.has("xx") && seen.has("yy") && seen.has("xy"))) {
    return "three components must be σxx, σyy and σxy (plane stress)";
  }
  return undefined;
}

function optionOrder(options: ParseTensorOptions): readonly Component[] | undefined {
  if (options.order === undefined) return undefined;
  if (!Array.isArray(options.order)) throw new TypeError("options.order must be an array of component names");
  const order = options.order.map((name, i) => {
    const c = typeof name === "string" ? componentOf(name) : undefined;
    if (c === undefined)
      throw new RangeError(`options.order[${i}] is not a component name: ${JSON.stringify(name)}`);
    return c;
  });
  const problem = checkOrder(order);
  if (problem !== undefined) throw new RangeError(`options.order ${problem}`);
  return order;
}

function fromOrder(order: readonly Component[], nums: readonly Num[]): StressTensor {
  const t: StressTensor = { xx: 0, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 };
  order.forEach((c, i) => (t[c] = nums[i].value));
  return t;
}

/**
 * Reads a stress tensor pasted by an engineer. Accepted forms:
 * - a 3×3 matrix: rows on separate lines or separated by `;`, entries by spaces, tabs or commas,
 *   brackets optional (`[a b c; d e f; g h i]`, `[[a,b,c],[d,e,f],[g,h,i]]`); it must be symmetric
 *   within `symmetryTolerance` × its largest entry, and the two triangles are averaged;
 * - six components, in the order of a header line (e.g. `sxx syy szz sxy syz szx`, `s11 s22 s33 s12 s23 s13`)
 *   or of `options.order`;
 * - three plane-stress components σx σy τxy (or in a header's or `options.order`'s order).
 * Numbers take any form JavaScript's Number() accepts, optionally with a unit suffix or a separate
 * unit word (Pa, kPa, MPa, GPa, psi, ksi, N/mm²); all units given must agree, and values are not converted.
 * @param text pasted text
 * @param options component order for bare six or three values; symmetry tolerance (relative)
 * @returns the tensor (in the pasted unit) and the unit if one was named, or an error whose message
 *   names the line and column
 * @throws TypeError/RangeError for invalid options (a programmer error, not a user one)
 */
export function parseTensor(text: string, options: ParseTensorOptions = {}): ParseTensorResult {
  if (typeof text !== "string") throw new TypeError(`text must be a string, got ${typeof text}`);
  if (typeof options !== "object" || options === null) throw new TypeError("options must be an object");
  const tol = options.symmetryTolerance ?? SYMMETRY_REL_TOL;
  if (typeof tol !== "number" || !(tol >= 0) || !Number.isFinite(tol)) {
    throw new RangeError(`options.symmetryTolerance must be a finite number ≥ 0, got ${tol}`);
  }
  const givenOrder = optionOrder(options);

  const tokens = tokenize(text);
  if (!tokens.ok) {
    const { message, line, column } = tokens;
    return fail(message, { text: "", line, column });
  }

  let unit: StressUnit | undefined;
  let unitToken: Token | undefined;
  const noteUnit = (u: StressUnit, at: Token): ParseTensorResult | undefined => {
    if (unit !== undefined && unit !== u && unitToken !== undefined) {
      return fail(`mixed units: ${unit} (line ${unitToken.line}, column ${unitToken.column}) and ${u}`, at);
    }
    unit = u;
    unitToken = at;
    return undefined;
  };

  let header: { order: Component[]; first: Token } | undefined;
  const rows: Num[][] = [];
  for (let r = 0; r < tokens.rows.length; r++) {
    const row: Num[] = [];
    const names: { c: Component; token: Token }[] = [];
    for (const token of tokens.rows[r]) {
      const u = unitOf(token.text);
      if (u !== undefined) {
        const bad = noteUnit(u, token);
        if (bad !== undefined) return bad;
        continue;
      }
      const n = parseNumberToken(token.text);
      if (n.kind === "number") {
        if (n.unit !== undefined) {
          const bad = noteUnit(n.unit, token);
          if (bad !== undefined) return bad;
        }
        row.push({ value: n.value, token });
        continue;
      }
      if (n.kind === "non-finite") return fail(`'${token.text}' is not a finite number`, token);
      if (n.kind === "bad-unit") {
        return fail(
          `unknown unit '${n.unit}' after ${n.value}; expected Pa, kPa, MPa, GPa, psi, ksi or N/mm²`,
          token,
        );
      }
      const c = componentOf(token.text);
      if (c === undefined) return fail(`'${token.text}' is neither a number nor a component name`, token);
      names.push({ c, token });
    }
    if (names.length > 0) {
      if (rows.length > 0 || header !== undefined) {
        return fail(`component name '${names[0].token.text}' outside the header line`, names[0].token);
      }
      if (row.length > 0) {
        const first =
          row[0].token.line === names[0].token.line && row[0].token.column < names[0].token.column;
        return fail("a header line must hold component names only", first ? row[0].token : names[0].token);
      }
      const order = names.map((n) => n.c);
      const problem = checkOrder(order);
      if (problem !== undefined) return fail(`header ${problem}`, names[0].token);
      header = { order, first: names[0].token };
      continue;
    }
    if (row.length > 0) rows.push(row);
  }

  const nums = rows.flat();
  const n = nums.length;
  if (n === 0)
    return fail(header === undefined ? "no numbers found" : "the header line is not followed by numbers");

  const done = (tensor: StressTensor, form: "matrix" | "components" | "plane"): ParseTensorResult =>
    unit === undefined ? { ok: true, tensor, form } : { ok: true, tensor, unit, form };

  if (header !== undefined) {
    const k = header.order.length;
    if (n !== k) {
      return fail(
        `the header names ${k} components but ${n} number${n === 1 ? "" : "s"} follow`,
        nums[Math.min(n, k + 1) - 1].token,
      );
    }
    return done(fromOrder(header.order, nums), k === 6 ? "components" : "plane");
  }

  const isMatrixShape = rows.length === 3 && rows.every((row) => row.length === 3);
  const looksLikeMatrix = rows.length === 3 && !rows.every((row) => row.length === 1);
  if (isMatrixShape) return matrix(rows, tol, done);
  if (looksLikeMatrix || (n === 9 && rows.length > 1)) {
    // Some row is not 3 long here (three rows of three returned above).
    const bad = Math.max(
      0,
      rows.findIndex((row) => row.length !== 3),
    );
    return fail(`matrix row ${bad + 1} has ${rows[bad].length} entries, expected 3`, rows[bad][0].token);
  }
  if (n === 9) {
    return fail(
      "9 numbers on one row: put the three matrix rows on separate lines or separate them with ';'",
      nums[0].token,
    );
  }
  if (n === 6) {
    if (givenOrder === undefined || givenOrder.length !== 6) {
      return fail(
        "six components need their order: give options.order or a header line such as 'xx yy zz xy yz zx'",
        nums[0].token,
      );
    }
    return done(fromOrder(givenOrder, nums), "components");
  }
  if (n === 3) {
    const order = givenOrder !== undefined && givenOrder.length === 3 ? givenOrder : PLANE_DEFAULT;
    return done(fromOrder(order, nums), "plane");
  }
  const at = n > 9 ? nums[9] : n > 6 ? nums[6] : n > 3 ? nums[3] : nums[n - 1];
  return fail(
    `found ${n} number${n === 1 ? "" : "s"}; expected 9 (a 3×3 matrix), 6 (components) or 3 (plane stress σx σy τxy)`,
    at.token,
  );
}

function matrix(
  rows: readonly Num[][],
  tol: number,
  done: (t: StressTensor, form: "matrix") => ParseTensorResult,
): ParseTensorResult {
  let big = 0;
  for (const row of rows) for (const e of row) big = Math.max(big, Math.abs(e.value));
  const pairs: readonly [number, number, string, string][] = [
    [0, 1, "xy", "yx"],
    [1, 2, "yz", "zy"],
    [0, 2, "xz", "zx"],
  ];
  for (const [i, j, upper, lower] of pairs) {
    const a = rows[i][j];
    const b = rows[j][i];
    const diff = Math.abs(a.value - b.value);
    if (diff > tol * big) {
      return fail(
        `matrix is not symmetric: σ${upper} = ${a.value} (line ${a.token.line}, column ${a.token.column}) but ` +
          `σ${lower} = ${b.value}; they differ by ${diff}, more than ${tol} × the largest entry ${big}`,
        b.token,
      );
    }
  }
  const avg = (i: number, j: number): number => rows[i][j].value / 2 + rows[j][i].value / 2;
  return done(
    {
      xx: rows[0][0].value,
      yy: rows[1][1].value,
      zz: rows[2][2].value,
      xy: avg(0, 1),
      yz: avg(1, 2),
      zx: avg(2, 0),
    },
    "matrix",
  );
}
