import { SYMMETRY_REL_TOL } from "../tolerances";
import type { Component, StressTensor } from "../tensor/types";
import { stressInputProblem } from "../tensor/validate";
import type { StressUnit } from "../units/stress";
import { componentOf, parseNumberToken, tokenize, unitOf, type DecimalMark, type Token } from "./tokens";

export type { DecimalMark } from "./tokens";

// One file for the forms a paste can take (matrix, six or three components, listing row): they
// share the rows, the header and the error shape; the lexical part lives in tokens.ts.

/**
 * The two orders in which six bare components usually come: normal stresses first, then the shears
 * in one of two orders (common practice, no source). Offered by name where a plain row of six
 * numbers has to be read.
 */
export const COMMON_SIX_ORDERS = {
  /** σx σy σz τxy τyz τxz */
  "xy-yz-xz": ["xx", "yy", "zz", "xy", "yz", "zx"],
  /** σx σy σz τxy τxz τyz */
  "xy-xz-yz": ["xx", "yy", "zz", "xy", "zx", "yz"],
} as const satisfies Record<string, readonly Component[]>;

/** Options of {@link parseTensor}. */
export type ParseTensorOptions = {
  /**
   * Order of six (or three plane-stress) bare components, by name ("xx", "sxx", "txy", "s12", …).
   * A header line in the text takes precedence.
   */
  order?: readonly string[];
  /** Relative symmetry tolerance for a 3×3 matrix, as a fraction of its largest absolute entry (default 1e-6). */
  symmetryTolerance?: number;
  /**
   * The decimal mark the numbers are written with. "." : commas separate values. ",": a comma is the
   * decimal mark ("1,5" = 1.5) and values are separated by spaces, tabs or `;`. Not given: commas
   * separate values, and a comma that could also be a decimal comma or a thousands separator
   * ("1,5 2", "1,000") is refused so that the caller asks.
   */
  decimal?: DecimalMark;
};

/**
 * What kind of problem a refusal is, for a caller that offers a way out: "ambiguous-comma" (state
 * the decimal mark), "order-needed" (six bare values: state their order), "empty-field" (a blank
 * cell between commas), "too-large" (a value beyond `MAX_INPUT_STRESS`). Other refusals have
 * no kind.
 */
export type ParseProblem = "ambiguous-comma" | "order-needed" | "empty-field" | "too-large";

/** Where and why pasted text was rejected (1-based line and column). */
export type ParseError = { message: string; line?: number; column?: number; problem?: ParseProblem };

/** The node or element a finite-element listing row belongs to (its first column). */
export type ListingPoint = { kind: "node" | "element"; number: number };

/** Result of {@link parseTensor}. */
export type ParseTensorResult =
  | {
      ok: true;
      tensor: StressTensor;
      unit?: StressUnit;
      form: "matrix" | "components" | "plane";
      /** present when the text was a finite-element listing row headed "Node …" or "Elem …" */
      point?: ListingPoint;
    }
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

function fail(message: string, at?: Token, problem?: ParseProblem): ParseTensorResult {
  const error: ParseError =
    at === undefined
      ? { message }
      : { message: `line ${at.line}, column ${at.column}: ${message}`, line: at.line, column: at.column };
  if (problem !== undefined) error.problem = problem;
  return { ok: false, error };
}

/**
 * The first column of a finite-element listing, by its header word: "Node" or "Elem"/"Element",
 * optionally with "ID", "No" or "#" ("Node_ID", "ElemNo"); case-insensitive (the trade's generic
 * terms, product rule).
 */
function listingColumnOf(text: string): ListingPoint["kind"] | undefined {
  const m = /^(node|elem|element)(?:[_-]?(?:id|no|number|#))?$/i.exec(text);
  if (m === null) return undefined;
  return m[1].toLowerCase() === "node" ? "node" : "element";
}

/**
 * The refusal for commas between digits, naming each reading they allow.
 * @param chain the tokens joined by those commas, in order ("1", "250", "000" for "1,250,000")
 */
function ambiguousComma(chain: readonly Token[]): ParseTensorResult {
  const texts = chain.map((t) => t.text);
  const joined = texts.join(",");
  const groups = texts.slice(1).every((t) => /^\d{3}$/.test(t)) && /^[+-\u2212]?\d{1,3}$/.test(texts[0]);
  const readings: string[] = [];
  if (chain.length === 2) readings.push(`a decimal comma (${texts[0]}.${texts[1]})`);
  if (groups)
    readings.push(
      `${chain.length === 2 ? "a thousands separator" : "thousands separators"} (${texts.join("")})`,
    );
  const values = `${texts.slice(0, -1).join(", ")} and ${texts.at(-1)}`;
  readings.push(
    chain.length === 2
      ? `a separator between two values (${values})`
      : `separators between values (${values})`,
  );
  const list =
    readings.length === 1 ? readings[0] : `${readings.slice(0, -1).join(", ")} or ${readings.at(-1)}`;
  const zero = texts.slice(1).find((t) => /^0\d/.test(t));
  const why =
    readings.length === 1 && zero !== undefined ? ` ('${zero}' starts with 0, as a decimal part does)` : "";
  return fail(
    `'${joined}' is ambiguous: the comma${chain.length === 2 ? "" : "s"} may be ${list}${why}. ` +
      "State the decimal mark (point or comma), or put a space after each comma that separates values",
    chain[0],
    "ambiguous-comma",
  );
}

/**
 * With no decimal mark stated, a comma between two digits is read as a value separator only where
 * the row shows it is one (product rule): every value of the row is separated by commas, and either
 * the row is in brackets, or it holds at least three values that do not look like one number with
 * thousands separators ("1,250,000"). A value after such a comma that starts with 0 and another
 * digit ("1,05") is always ambiguous. Otherwise the first such comma is refused.
 */
function checkGluedCommas(row: readonly Num[]): ParseTensorResult | undefined {
  const firstGlued = row.findIndex((n) => n.token.glued === true);
  if (firstGlued <= 0) return undefined;
  const refuse = (k: number) => {
    let from = k - 1;
    while (from > 0 && row[from].token.glued === true) from--;
    let to = k;
    while (to + 1 < row.length && row[to + 1].token.glued === true) to++;
    return ambiguousComma(row.slice(from, to + 1).map((n) => n.token));
  };
  const commaLayout = row.every((n, k) => k === 0 || n.token.after === "comma");
  if (!commaLayout) return refuse(firstGlued);
  for (let k = 1; k < row.length; k++) {
    if (row[k].token.glued === true && /^0\d/.test(row[k].token.text)) return refuse(k);
  }
  if (row[firstGlued].token.inBrackets === true) return undefined;
  const thousands =
    /^[+-\u2212]?\d{1,3}$/.test(row[0].token.text) && row.slice(1).every((n) => /^\d{3}$/.test(n.token.text));
  if (row.length < 3 || thousands) return refuse(firstGlued);
  return undefined;
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
 *   or of `options.order` (see {@link COMMON_SIX_ORDERS}); six bare values without either are refused
 *   with the problem "order-needed", never guessed;
 * - three plane-stress components σx σy τxy (or in a header's or `options.order`'s order);
 * - one row of a finite-element listing whose header starts with a node or element column
 *   (`Node SX SY SZ SXY SYZ SXZ` then `101 150 20 0 25 0 0`): the first number is the node or
 *   element number, returned as `point`.
 * Numbers take any form JavaScript's Number() accepts, optionally with a unit suffix or a separate
 * unit word (Pa, kPa, MPa, GPa, psi, ksi, N/mm²); all units given must agree, and values are not
 * converted. Commas (product rules): with `options.decimal` "," a comma is the decimal mark; with
 * "." commas separate values; without it, a comma between two digits that could be a decimal comma
 * or a thousands separator (`1,5 2`, `12,5 30`, `1,000 500`) is refused with the problem
 * "ambiguous-comma", and an empty field (`150,0,,25`) is refused whatever the mark ("empty-field").
 * Every value must be finite and at most `MAX_INPUT_STRESS` (1e12) in magnitude, in the unit
 * written ("too-large" otherwise).
 * @param text pasted text
 * @param options component order for bare six or three values; symmetry tolerance (relative);
 *   decimal mark
 * @returns the tensor (in the pasted unit) and the unit if one was named, or an error whose message
 *   names the line and column (and, for the refusals a caller can resolve, its `problem`)
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
  const decimal = options.decimal;
  if (decimal !== undefined && decimal !== "." && decimal !== ",") {
    throw new RangeError(`options.decimal must be "." or ",", got ${JSON.stringify(decimal)}`);
  }

  const tokens = tokenize(text, decimal ?? "auto");
  if (!tokens.ok) {
    const { message, line, column } = tokens;
    return fail(
      message,
      { text: "", line, column },
      tokens.problem === "empty-field" ? "empty-field" : undefined,
    );
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

  let header: { order: Component[]; first: Token; listing?: ListingPoint["kind"] } | undefined;
  const rows: Num[][] = [];
  for (let r = 0; r < tokens.rows.length; r++) {
    const row: Num[] = [];
    const names: { c: Component; token: Token }[] = [];
    let listing: { kind: ListingPoint["kind"]; token: Token } | undefined;
    for (const [t, token] of tokens.rows[r].entries()) {
      const column =
        t === 0 && rows.length === 0 && header === undefined ? listingColumnOf(token.text) : undefined;
      if (column !== undefined) {
        listing = { kind: column, token };
        continue;
      }
      const u = unitOf(token.text);
      if (u !== undefined) {
        const bad = noteUnit(u, token);
        if (bad !== undefined) return bad;
        continue;
      }
      if (decimal === "," && token.text.indexOf(",") !== token.text.lastIndexOf(",")) {
        return fail(
          `'${token.text}' has more than one comma, but the comma is the decimal mark: separate values with spaces, tabs or ';'`,
          token,
        );
      }
      const n = parseNumberToken(token.text, decimal ?? ".");
      if (n.kind === "number") {
        if (n.unit !== undefined) {
          const bad = noteUnit(n.unit, token);
          if (bad !== undefined) return bad;
        }
        row.push({ value: n.value, token });
        continue;
      }
      if (n.kind === "non-finite") return fail(`'${token.text}' is not a finite number`, token);
      if (n.kind === "point-with-decimal-comma") {
        return fail(
          `'${token.text}' has a point, but the decimal mark is a comma: write the number without a thousands point (e.g. 1000,5)`,
          token,
        );
      }
      if (n.kind === "bad-unit") {
        return fail(
          `unknown unit '${n.unit}' after ${n.value}; expected Pa, kPa, MPa, GPa, psi, ksi or N/mm²`,
          token,
        );
      }
      const c = componentOf(token.text);
      if (c === undefined) {
        return fail(`'${token.text}' is neither a number nor a component name`, token);
      }
      names.push({ c, token });
    }
    if (listing !== undefined && names.length === 0) {
      return fail(
        `'${listing.token.text}' names the first column of a finite-element listing; it must begin a header line of component names such as '${listing.token.text} SX SY SZ SXY SYZ SXZ'`,
        listing.token,
      );
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
      if (listing !== undefined) header.listing = listing.kind;
      continue;
    }
    if (decimal === undefined) {
      const ambiguous = checkGluedCommas(row);
      if (ambiguous !== undefined) return ambiguous;
    }
    if (row.length > 0) rows.push(row);
  }

  const nums = rows.flat();
  const n = nums.length;
  if (n === 0)
    return fail(header === undefined ? "no numbers found" : "the header line is not followed by numbers");

  for (const num of nums) {
    const problem = stressInputProblem(num.value);
    if (problem !== undefined) return fail(`'${num.token.text}' ${problem}`, num.token, "too-large");
  }

  const done = (tensor: StressTensor, form: "matrix" | "components" | "plane"): ParseTensorResult =>
    unit === undefined ? { ok: true, tensor, form } : { ok: true, tensor, unit, form };

  if (header?.listing !== undefined) return listingRow(header as Required<typeof header>, rows, done);

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
        "six values and no header line: their order is needed — σx σy σz τxy τyz τxz, σx σy σz τxy τxz τyz " +
          "or another; choose it, or add a header line such as 'sx sy sz sxy syz sxz'",
        nums[0].token,
        "order-needed",
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

/**
 * One row of a finite-element listing: the node or element number, then the components in the
 * header's order. A listing of several rows is refused (the bench checks one point at a time).
 */
function listingRow(
  header: { order: Component[]; first: Token; listing: ListingPoint["kind"] },
  rows: readonly Num[][],
  done: (t: StressTensor, form: "components" | "plane") => ParseTensorResult,
): ParseTensorResult {
  const k = header.order.length;
  const word = header.listing;
  if (rows.length > 1) {
    const numbers = rows.slice(0, 3).map((r) => r[0].token.text);
    return fail(
      `the listing holds ${rows.length} rows (${word}s ${numbers.join(", ")}${rows.length > 3 ? ", …" : ""}); ` +
        `paste the one row of the ${word} to check`,
      rows[1][0].token,
    );
  }
  const row = rows[0];
  if (row.length !== k + 1) {
    return fail(
      `the header names ${word === "element" ? "an" : "a"} ${word} number and ${k} components, so a row needs ${k + 1} numbers; this one has ${row.length}`,
      row[Math.min(row.length, k + 1) - 1].token,
    );
  }
  const id = row[0].value;
  if (!Number.isInteger(id) || id < 0) {
    return fail(
      `'${row[0].token.text}' is not ${word === "element" ? "an" : "a"} ${word} number (a whole number ≥ 0 is expected)`,
      row[0].token,
    );
  }
  const result = done(fromOrder(header.order, row.slice(1)), k === 6 ? "components" : "plane");
  return result.ok ? { ...result, point: { kind: word, number: id } } : result;
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
