import { describe, expect, it } from "vitest";
import type { StressTensor } from "../tensor/types";
import { parseTensor, type ParseTensorOptions } from "./parse-tensor";

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
      "line 1, column 1: six components need their order: give options.order or a header line such as 'xx yy zz xy yz zx'",
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
