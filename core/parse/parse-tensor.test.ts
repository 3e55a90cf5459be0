import { describe, expect, it } from "vitest";
import type { StressTensor } from "../tensor/types";
import { COMMON_SIX_ORDERS, parseTensor, type ParseTensorOptions } from "./parse-tensor";

const T = (xx: number, yy: number, zz: number, xy: number, yz: number, zx: number): StressTensor => ({
  xx,
  yy,
  zz,
  xy,
  yz,
  zx,
});
const M = T(100, 50, -30, 20, 10, -5); // matrix [[100,20,-5],[20,50,10],[-5,10,-30]]

describe("parseTensor on good inputs", () => {
  const good: [string, string, ParseTensorOptions | undefined, StressTensor, string, string | undefined][] = [
    ["3×3 rows on lines, spaces", "100 20 -5\n20 50 10\n-5 10 -30", undefined, M, "matrix", undefined],
    [
      "3×3 rows on lines, tabs (spreadsheet paste)",
      "100\t20\t-5\r\n20\t50\t10\r\n-5\t10\t-30\r\n",
      undefined,
      M,
      "matrix",
      undefined,
    ],
    [
      "3×3 rows separated by ';' with brackets",
      "[100 20 -5; 20 50 10; -5 10 -30]",
      undefined,
      M,
      "matrix",
      undefined,
    ],
    [
      "nested brackets with commas",
      "[[100, 20, -5], [20, 50, 10], [-5, 10, -30]]",
      undefined,
      M,
      "matrix",
      undefined,
    ],
    [
      "commas and a unit suffix",
      "100MPa, 20MPa, -5MPa\n20, 50, 10\n-5, 10, -30",
      undefined,
      M,
      "matrix",
      "MPa",
    ],
    [
      "numbers in exponent, hex and signed forms, unit word",
      "1e2 2E1 -0.5e1\n+20 0x32 10.\n-5 1e1 -3e1 MPa",
      undefined,
      M,
      "matrix",
      "MPa",
    ],
    [
      "unicode minus sign",
      "100 20 \u22125\n20 50 10\n\u22125 10 \u221230",
      undefined,
      M,
      "matrix",
      undefined,
    ],
    [
      "almost symmetric within tolerance",
      "100 20 -5\n20.00000001 50 10\n-5 10 -30",
      undefined,
      T(100, 50, -30, 20.000000005, 10, -5),
      "matrix",
      undefined,
    ],
    [
      "six components with a header",
      "sxx syy szz sxy syz szx\n100 50 -30 20 10 -5",
      undefined,
      M,
      "components",
      undefined,
    ],
    [
      "six components with a Voigt-order header",
      "σ11 σ22 σ33 σ23 σ13 σ12\n100 50 -30 10 -5 20 ksi",
      undefined,
      M,
      "components",
      "ksi",
    ],
    [
      "six components with options.order",
      "100, 50, -30, 20, 10, -5",
      { order: ["xx", "yy", "zz", "xy", "yz", "zx"] },
      M,
      "components",
      undefined,
    ],
    [
      "six components, xz naming, values one per line",
      "xx yy zz xz yz xy\n100\n50\n-30\n-5\n10\n20",
      undefined,
      M,
      "components",
      undefined,
    ],
    ["three plane-stress components", "80 -40 25", undefined, T(80, -40, 0, 25, 0, 0), "plane", undefined],
    [
      "three plane-stress components with psi",
      "80psi -40psi 25psi",
      undefined,
      T(80, -40, 0, 25, 0, 0),
      "plane",
      "psi",
    ],
    [
      "plane stress with a header in another order",
      "txy sx sy\n25 80 -40",
      undefined,
      T(80, -40, 0, 25, 0, 0),
      "plane",
      undefined,
    ],
    ["plane stress in N/mm²", "(80, -40, 25) N/mm²", undefined, T(80, -40, 0, 25, 0, 0), "plane", "MPa"],
  ];
  for (const [name, text, options, tensor, form, unit] of good) {
    it(`when given ${name}, then it returns the tensor`, () => {
      const r = parseTensor(text, options);
      expect(r).toEqual(unit === undefined ? { ok: true, tensor, form } : { ok: true, tensor, unit, form });
    });
  }
});

describe("parseTensor on bad inputs names the place", () => {
  const bad: [
    string,
    string,
    ParseTensorOptions | undefined,
    string,
    number | undefined,
    number | undefined,
  ][] = [
    ["empty text", "", undefined, "no numbers found", undefined, undefined],
    ["only spaces and brackets", "  [ ]  ", undefined, "no numbers found", undefined, undefined],
    [
      "four numbers",
      "1 2 3 4",
      undefined,
      "line 1, column 7: found 4 numbers; expected 9 (a 3×3 matrix), 6 (components) or 3 (plane stress σx σy τxy)",
      1,
      7,
    ],
    ["seven numbers", "1 2 3 4 5 6 7", undefined, "line 1, column 13: found 7 numbers", 1, 13],
    ["ten numbers", "1 2 3 4 5 6 7 8 9 10", undefined, "line 1, column 19: found 10 numbers", 1, 19],
    [
      "a short matrix row",
      "1 2 3\n2 5\n3 6 9",
      undefined,
      "line 2, column 1: matrix row 2 has 2 entries, expected 3",
      2,
      1,
    ],
    [
      "a long matrix row",
      "1 2 3\n2 5 6\n3 6 9 9",
      undefined,
      "line 3, column 1: matrix row 3 has 4 entries, expected 3",
      3,
      1,
    ],
    [
      "nine numbers on one row",
      "1 2 3 2 5 6 3 6 9",
      undefined,
      "line 1, column 1: 9 numbers on one row",
      1,
      1,
    ],
    [
      "an asymmetric pair",
      "100 20 0\n25 50 0\n0 0 0",
      undefined,
      "line 2, column 1: matrix is not symmetric: σxy = 20 (line 1, column 5) but σyx = 25; they differ by 5, more than 0.000001 × the largest entry 100",
      2,
      1,
    ],
    [
      "an asymmetric yz pair",
      "1 0 0; 0 1 2; 0 3 1",
      undefined,
      "line 1, column 17: matrix is not symmetric: σyz = 2",
      1,
      17,
    ],
    [
      "an asymmetric zx pair beyond a loose tolerance",
      "1 0 2\n0 1 0\n2.5 0 1",
      { symmetryTolerance: 0.1 },
      "line 3, column 1: matrix is not symmetric: σxz = 2 (line 1, column 5) but σzx = 2.5; they differ by 0.5, more than 0.1 × the largest entry 2.5",
      3,
      1,
    ],
    ["Infinity", "1 Infinity 3", undefined, "line 1, column 3: 'Infinity' is not a finite number", 1, 3],
    ["NaN", "NaN 2 3", undefined, "line 1, column 1: 'NaN' is not a finite number", 1, 1],
    [
      "an overflowing number",
      "1 2 1e999",
      undefined,
      "line 1, column 5: '1e999' is not a finite number",
      1,
      5,
    ],
    [
      "a word",
      "1 2 abc",
      undefined,
      "line 1, column 5: 'abc' is neither a number nor a component name",
      1,
      5,
    ],
    [
      "an unknown unit suffix",
      "1 2 3MPaa",
      undefined,
      "line 1, column 5: unknown unit 'MPaa' after 3; expected Pa, kPa, MPa, GPa, psi, ksi or N/mm²",
      1,
      5,
    ],
    [
      "mixed units",
      "1MPa 2MPa\n3psi",
      undefined,
      "line 2, column 1: mixed units: MPa (line 1, column 6) and psi",
      2,
      1,
    ],
    [
      "six numbers without an order",
      "1 2 3 4 5 6",
      undefined,
      "line 1, column 1: six values and no header line: their order is needed — σx σy σz τxy τyz τxz, σx σy σz τxy τxz τyz or another",
      1,
      1,
    ],
    [
      "a header with a repeated name",
      "sxx syy sxx sxy syz szx\n1 2 3 4 5 6",
      undefined,
      "line 1, column 1: header names σxx twice",
      1,
      1,
    ],
    [
      "a three-name header that is not plane stress",
      "sxx syy szz\n1 2 3",
      undefined,
      "line 1, column 1: header three components must be σxx, σyy and σxy (plane stress)",
      1,
      1,
    ],
    [
      "a header and too few numbers",
      "sxx syy szz sxy syz szx\n1 2 3 4 5",
      undefined,
      "line 2, column 9: the header names 6 components but 5 numbers follow",
      2,
      9,
    ],
    [
      "a header and too many numbers",
      "sx sy txy\n1 2 3 4",
      undefined,
      "line 2, column 7: the header names 3 components but 4 numbers follow",
      2,
      7,
    ],
    [
      "a header mixing names and numbers",
      "sxx 1 2",
      undefined,
      "line 1, column 1: a header line must hold component names only",
      1,
      1,
    ],
    [
      "a name after the numbers",
      "1 2 3\nsxy",
      undefined,
      "line 2, column 1: component name 'sxy' outside the header line",
      2,
      1,
    ],
    ["an unclosed bracket", "[1 2 3", undefined, "line 1, column 1: bracket '[' is never closed", 1, 1],
    [
      "an unmatched closing bracket",
      "1 2 3]",
      undefined,
      "line 1, column 6: unmatched closing bracket ']'",
      1,
      6,
    ],
    [
      "mismatched brackets",
      "[1 2 3)",
      undefined,
      "line 1, column 7: closing bracket ')' does not match '[' opened at line 1, column 1",
      1,
      7,
    ],
  ];
  for (const [name, text, options, message, line, column] of bad) {
    it(`when given ${name}, then it rejects with "${message.slice(0, 60)}…"`, () => {
      const r = parseTensor(text, options);
      expect(r.ok).toBe(false);
      if (r.ok) return;
      expect(r.error.message.startsWith(message), `message was: ${r.error.message}`).toBe(true);
      expect(r.error.line).toBe(line);
      expect(r.error.column).toBe(column);
    });
  }

  it("when options are invalid (a programmer error), then it throws instead of returning an error", () => {
    expect(() => parseTensor("1 2 3", { order: ["xx", "yy", "qq"] })).toThrow(
      /options.order\[2\] is not a component name: "qq"/,
    );
    expect(() => parseTensor("1 2 3", { order: ["xx", "yy", "xx"] })).toThrow(
      /options.order names σxx twice/,
    );
    expect(() => parseTensor("1 2 3", { symmetryTolerance: -1 })).toThrow(RangeError);
    expect(() => parseTensor(42 as unknown as string)).toThrow(TypeError);
  });
});

// The comma rules below are product rules (Sigmacube's own, written in parseTensor's JSDoc): a comma
// that could be a decimal comma, a thousands separator or a value separator is never guessed.
describe("parseTensor and commas (product rules)", () => {
  const ambiguous: [string, string][] = [
    [
      "1,5 2",
      "'1,5' is ambiguous: the comma may be a decimal comma (1.5) or a separator between two values (1 and 5)",
    ],
    [
      "12,5 30",
      "'12,5' is ambiguous: the comma may be a decimal comma (12.5) or a separator between two values (12 and 5)",
    ],
    [
      "1,000 500",
      "'1,000' is ambiguous: the comma may be a decimal comma (1.000), a thousands separator (1000) or a separator between two values (1 and 000)",
    ],
    ["1,250,000 0 0", "'1,250,000' is ambiguous: the commas may be thousands separators (1250000)"],
    ["100,200,300", "'100,200,300' is ambiguous: the commas may be thousands separators (100200300)"],
    ["1,05,3", "'1,05,3' is ambiguous"],
  ];
  for (const [text, message] of ambiguous) {
    it(`when '${text}' is pasted with no decimal mark stated, then it is refused as ambiguous and nothing is guessed`, () => {
      const r = parseTensor(text);
      expect(r.ok).toBe(false);
      if (r.ok) return;
      expect(r.error.message).toContain(message);
      expect(r.error.message).toContain("State the decimal mark");
      expect(r.error.problem).toBe("ambiguous-comma");
    });
  }

  it("when the decimal mark is stated as a comma, then '1,5 2 3' is σx = 1.5, σy = 2, τxy = 3 and '12,5 30 4' is 12.5, 30, 4", () => {
    expect(parseTensor("1,5 2 3", { decimal: "," })).toEqual({
      ok: true,
      tensor: T(1.5, 2, 0, 3, 0, 0),
      form: "plane",
    });
    expect(parseTensor("12,5\t30\t4 MPa", { decimal: "," })).toEqual({
      ok: true,
      tensor: T(12.5, 30, 0, 4, 0, 0),
      unit: "MPa",
      form: "plane",
    });
    expect(parseTensor("100,5 20 -5\n20 50 10,25\n-5 10,25 -30", { decimal: "," })).toEqual({
      ok: true,
      tensor: T(100.5, 50, -30, 20, 10.25, -5),
      form: "matrix",
    });
  });

  it("when the decimal mark is a comma and a number has a point or two commas, then it is refused with the reason", () => {
    const point = parseTensor("1.000,5 2 3", { decimal: "," });
    expect(point.ok || point.error.message).toMatch(
      /'1\.000,5' has a point, but the decimal mark is a comma/,
    );
    const two = parseTensor("1,5,2 3 4", { decimal: "," });
    expect(two.ok || two.error.message).toMatch(/'1,5,2' has more than one comma/);
  });

  it("when the decimal mark is stated as a point, then commas separate values: '1,000 500' is 1, 0, 500", () => {
    expect(parseTensor("1,000 500", { decimal: "." })).toEqual({
      ok: true,
      tensor: T(1, 0, 0, 500, 0, 0),
      form: "plane",
    });
  });

  it("when commas plainly separate values (a space after them, brackets, or three or more comma-only values), then no decimal mark is needed", () => {
    expect(parseTensor("100,20,-5\n20,50,10\n-5,10,-30")).toEqual({ ok: true, tensor: M, form: "matrix" });
    expect(parseTensor("[[100,200,300],[200,50,10],[300,10,-30]]")).toEqual({
      ok: true,
      tensor: T(100, 50, -30, 200, 10, 300),
      form: "matrix",
    });
    expect(parseTensor("80, -40, 25")).toEqual({ ok: true, tensor: T(80, -40, 0, 25, 0, 0), form: "plane" });
    expect(parseTensor("1,5,2")).toEqual({ ok: true, tensor: T(1, 5, 0, 2, 0, 0), form: "plane" });
  });

  const empty: [string, ParseTensorOptions | undefined, string, number][] = [
    ["150,0,,25", undefined, "empty field (two commas with nothing between them) in '150,0,,25'", 7],
    ["150,0,,25", { decimal: "." }, "empty field (two commas with nothing between them)", 7],
    [",1, 2, 3", undefined, "empty field (a comma starts the row)", 1],
    ["1, 2, 3,", undefined, "empty field (a comma ends the row)", 8],
    ["[1, 2, 3,]", undefined, "empty field (a comma before a closing bracket)", 9],
  ];
  for (const [text, options, message, column] of empty) {
    it(`when '${text}' holds an empty field${options ? " (decimal point stated)" : ""}, then it is refused, not read as zero or shifted`, () => {
      const r = parseTensor(text, options);
      expect(r.ok).toBe(false);
      if (r.ok) return;
      expect(r.error.message).toContain(message);
      expect(r.error.message).toContain("a blank cell is not read as zero");
      expect(r.error.problem).toBe("empty-field");
      expect(r.error.column).toBe(column);
    });
  }

  it("when the decimal option is neither '.' nor ',' (a programmer error), then it throws", () => {
    expect(() => parseTensor("1 2 3", { decimal: ";" as unknown as "." })).toThrow(/options.decimal must be/);
  });
});

describe("parseTensor, six bare values and finite-element listings (product rules)", () => {
  it("when six bare values come without an order, then the refusal says so in σ/τ terms and carries the problem 'order-needed'", () => {
    const r = parseTensor("150 20 0 25 5 0");
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.problem).toBe("order-needed");
    expect(r.error.message).not.toContain("options.order");
    expect(r.error.message).toContain("σx σy σz τxy τyz τxz");
    expect(r.error.message).toContain("σx σy σz τxy τxz τyz");
  });

  it("when one of the two common orders is chosen (common practice, no source), then the fifth and sixth values land on τyz/τxz or τxz/τyz", () => {
    const a = parseTensor("150 20 0 25 5 -3", { order: COMMON_SIX_ORDERS["xy-yz-xz"] });
    expect(a).toEqual({ ok: true, tensor: T(150, 20, 0, 25, 5, -3), form: "components" });
    const b = parseTensor("150 20 0 25 5 -3", { order: COMMON_SIX_ORDERS["xy-xz-yz"] });
    expect(b).toEqual({ ok: true, tensor: T(150, 20, 0, 25, -3, 5), form: "components" });
  });

  it("when a listing row is headed 'Node SX SY SZ SXY SYZ SXZ', then the first column is the node number and the rest the components", () => {
    expect(parseTensor("Node SX SY SZ SXY SYZ SXZ\n101 150 20 0 25 5 -3 MPa")).toEqual({
      ok: true,
      tensor: T(150, 20, 0, 25, 5, -3),
      unit: "MPa",
      form: "components",
      point: { kind: "node", number: 101 },
    });
    expect(parseTensor("Elem\tSX\tSY\tSXY\n7\t80\t-40\t25")).toEqual({
      ok: true,
      tensor: T(80, -40, 0, 25, 0, 0),
      form: "plane",
      point: { kind: "element", number: 7 },
    });
    expect(parseTensor("ELEMENT_ID s11 s22 s33 s12 s23 s13\n12 1 2 3 4 5 6")).toMatchObject({
      ok: true,
      point: { kind: "element", number: 12 },
    });
  });

  const badListings: [string, string][] = [
    [
      "Node SX SY SZ SXY SYZ SXZ\n101 150 20 0 25 5 -3\n102 1 2 3 4 5 6",
      "line 3, column 1: the listing holds 2 rows (nodes 101, 102); paste the one row of the node to check",
    ],
    [
      "Node SX SY SZ SXY SYZ SXZ\n150 20 0 25 5 -3",
      "line 2, column 15: the header names a node number and 6 components, so a row needs 7 numbers; this one has 6",
    ],
    ["Elem SX SY SXY\n7.5 80 -40 25", "line 2, column 1: '7.5' is not an element number"],
    ["Node\n1 2 3", "line 1, column 1: 'Node' names the first column of a finite-element listing"],
  ];
  for (const [text, message] of badListings) {
    it(`when a listing is pasted as '${text.replace(/\n/g, " ⏎ ").slice(0, 40)}…', then it is refused with "${message.slice(0, 50)}…"`, () => {
      const r = parseTensor(text);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.error.message.startsWith(message), r.error.message).toBe(true);
    });
  }
});

describe("parseTensor refuses values beyond the input range", () => {
  it("when a value is 1e300 (σ² would overflow) or just above 1e12, then it is refused naming the value; 1e12 itself is accepted", () => {
    for (const text of ["1e300 0 0", "0 -1e13 0", "1.0000001e12 0 0"]) {
      const r = parseTensor(text);
      expect(r.ok).toBe(false);
      if (r.ok) continue;
      expect(r.error.problem).toBe("too-large");
      expect(r.error.message).toMatch(/is larger than 1e\+12 in magnitude/);
    }
    expect(parseTensor("1e12 0 0")).toMatchObject({ ok: true, tensor: T(1e12, 0, 0, 0, 0, 0) });
  });
});
