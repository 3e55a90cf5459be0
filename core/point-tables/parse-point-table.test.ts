import { describe, expect, it } from "vitest";
import { seededRandom } from "../testing/fixtures";
import { convertStress, PASCALS_PER_PSI } from "../units/stress";
import { lineCuts, mergePointTables } from "./merge-point-tables";
import { estimateRows, parsePointTable, PointTableParser } from "./parse-point-table";
import { numberScan, readNumber, readNumberAt } from "./read-number";
import type { PointTable, PointTableOptions } from "./types";

const COLUMNS = { id: 0, x: 1, y: 2, z: 3, xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9 };
const CSV: PointTableOptions = { separator: ",", header: true, unit: "MPa", columns: COLUMNS };

/** The two points every layout below writes, in MPa (components) and mm (coordinates). */
const EXPECTED_COMPONENTS_MPA = [
  [120.5, -30.25, 0, 15, 0, -2.5],
  [-80, 40, 10.125, 0, 7.75, 0],
];
const EXPECTED_COORDS = [
  [1.5, 2, 0],
  [10, -20.25, 3],
];

function expectTwoPoints(t: PointTable): void {
  expect(t.count).toBe(2);
  expect(t.badRows).toEqual({ count: 0, first: [] });
  expect(Array.from(t.ids as Float64Array)).toEqual([101, 102]);
  // MPa → Pa is × 1e6 (convertStress, core's unit functions)
  expect(Array.from(t.components)).toEqual(
    EXPECTED_COMPONENTS_MPA.flat().map((v) => convertStress(v, "MPa", "Pa")),
  );
  expect(Array.from(t.coordinates!)).toEqual(EXPECTED_COORDS.flat());
}

describe("parsePointTable on hand-written files (common practice, no source: the usual layouts of delimited text)", () => {
  it("when a CSV has a header, then the components are in Pa, the ids and coordinates are read and the header is returned", () => {
    const text =
      "id,x,y,z,sxx,syy,szz,sxy,syz,szx\n" +
      "101,1.5,2,0,120.5,-30.25,0,15,0,-2.5\n" +
      "102,10,-20.25,3,-80,40,10.125,0,7.75,0\n";
    const t = parsePointTable(text, CSV);
    expectTwoPoints(t);
    expect(t.header).toEqual(["id", "x", "y", "z", "sxx", "syy", "szz", "sxy", "syz", "szx"]);
    expect(t.lines).toBe(3);
  });

  it("when the same table is written with a BOM, CRLF line ends, quoted fields and no final line break, then it reads the same", () => {
    const text =
      '\uFEFF"id","x","y","z","sxx","syy","szz","sxy","syz","szx"\r\n' +
      '101,"1.5",2,0,"120.5",-30.25,0,15,0,-2.5\r\n' +
      '"102",10,-20.25,3,-80,40,10.125,0,7.75,"0"';
    const t = parsePointTable(text, CSV);
    expectTwoPoints(t);
    expect(t.header?.[0]).toBe("id");
  });

  it("when the table is semicolon-, tab- or whitespace-separated (point or comma decimal), then it reads the same", () => {
    const rows = [
      ["101", "1.5", "2", "0", "120.5", "-30.25", "0", "15", "0", "-2.5"],
      ["102", "10", "-20.25", "3", "-80", "40", "10.125", "0", "7.75", "0"],
    ];
    const comma = (r: string[]) => r.map((f, i) => (i === 0 ? f : f.replace(".", ",")));
    const layouts: [PointTableOptions["separator"], "." | ",", string][] = [
      [";", ".", rows.map((r) => r.join(";")).join("\n")],
      [";", ",", rows.map((r) => comma(r).join(";")).join("\n")],
      ["\t", ".", rows.map((r) => r.join("\t")).join("\n")],
      ["\t", ",", rows.map((r) => comma(r).join("\t")).join("\n")],
      [
        "whitespace",
        ".",
        rows.map((r) => "   " + r.map((f) => f.padStart(9)).join("  \t") + "  ").join("\n"),
      ],
      ["whitespace", ",", rows.map((r) => comma(r).join(" ")).join("\n")],
    ];
    for (const [separator, decimal, text] of layouts) {
      expectTwoPoints(parsePointTable(text, { separator, decimal, unit: "MPa", columns: COLUMNS }));
    }
  });

  it("when a semicolon table has quoted text ids with separators inside, then the ids are kept as text", () => {
    const text = 'name;sxx;syy;szz;sxy;syz;szx\n"A;7";1;2;3;4;5;6\n"say ""B""";1;2;3;4;5;6\n';
    const t = parsePointTable(text, {
      separator: ";",
      header: true,
      unit: "Pa",
      idKind: "text",
      columns: { id: 0, xx: 1, yy: 2, zz: 3, xy: 4, yz: 5, zx: 6 },
    });
    expect(t.ids).toEqual(["A;7", 'say "B"']);
    expect(t.coordinates).toBeNull();
    expect(Array.from(t.components)).toEqual([1, 2, 3, 4, 5, 6, 1, 2, 3, 4, 5, 6]);
  });

  it("when the shears come in the order xy zx yz, then the mapping puts them in storage order xx yy zz xy yz zx", () => {
    const t = parsePointTable("1 2 3 4 5 6\n", {
      separator: "whitespace",
      unit: "Pa",
      columns: { xx: 0, yy: 1, zz: 2, xy: 3, zx: 4, yz: 5 },
    });
    expect(Array.from(t.components)).toEqual([1, 2, 3, 4, 6, 5]);
    expect(t.ids).toBeNull();
  });

  it("when the unit is psi or ksi, then the components are converted to Pa with 1 psi = 6894.757… Pa (exact definition, common practice)", () => {
    const t = parsePointTable("1,0,0,0,0,2", {
      separator: ",",
      unit: "ksi",
      columns: {
        ...COLUMNS,
        id: undefined,
        x: undefined,
        y: undefined,
        z: undefined,
        xx: 0,
        yy: 1,
        zz: 2,
        xy: 3,
        yz: 4,
        zx: 5,
      },
    });
    expect(t.components[0]).toBeCloseTo(1000 * PASCALS_PER_PSI, 6);
    expect(t.components[5]).toBeCloseTo(2000 * PASCALS_PER_PSI, 6);
  });

  it("when rows are skipped before the header, then line numbers still count every line of the file", () => {
    const text =
      "Result export\nLoad case 3\n\nid,x,y,z,sxx,syy,szz,sxy,syz,szx\n101,0,0,0,1,2,3,4,5,6\n102,0,0,0,1,2,oops,4,5,6\n";
    const t = parsePointTable(text, { ...CSV, skipRows: 3 });
    expect(t.count).toBe(1);
    expect(t.badRows.first).toEqual([{ line: 6, reason: "column 7 (σzz, 'szz'): 'oops' is not a number" }]);
  });

  it("when rows are bad, then each is left out and reported by line with a reason naming the column, and the rest are read", () => {
    const text = [
      "id,x,y,z,sxx,syy,szz,sxy,syz,szx", // 1
      "1,0,0,0,1,2,3,4,5,6", // 2
      "2,0,0,0,1,,3,4,5,6", // 3 empty field
      "3,0,0,0,1,2,3,4,5", // 4 too few fields
      "", // 5 blank: passed over
      "4,0,0,0,1,2,3,4,5,1e13", // 6 beyond MAX_INPUT_STRESS
      "x5,0,0,0,1,2,3,4,5,6", // 7 id not a number
      "6,0,0,0,1,2,3,4,5,6", // 8
      "7,0,0,0,1,2,3,4,5,1,5", // 9 decimal comma in a comma file: an extra field, ignored column 11 → read as 1
      "8,0,0,0,1,2,3,4,5,NaN", // 10
      "9,0,Infinity,0,1,2,3,4,5,6", // 11 coordinate not finite
      '10,0,0,0,"1,2,3,4,5,6', // 12 unclosed quote swallows the rest
    ].join("\n");
    const t = parsePointTable(text, CSV);
    expect(Array.from(t.ids as Float64Array)).toEqual([1, 6, 7]);
    expect(t.badRows.count).toBe(7);
    expect(t.badRows.first).toEqual([
      { line: 3, reason: "column 6 (σyy, 'syy'): is empty" },
      { line: 4, reason: "9 fields; column 10 (σzx, 'szx') is missing" },
      { line: 6, reason: "column 10 (σzx, 'szx'): '1e13' is beyond ±1000000000000 in the unit of the table" },
      { line: 7, reason: "column 1 (point id, 'id'): 'x5' is not a number" },
      { line: 10, reason: "column 10 (σzx, 'szx'): 'NaN' is not a number" },
      { line: 11, reason: "column 3 (y, 'y'): 'Infinity' is not a number" },
      {
        line: 12,
        reason: `column 5 (σxx, 'sxx'): '"1,2,3,4,5,6' opens a quote that is not closed on this line`,
      },
    ]);
  });

  it("when the decimal mark is a comma and a field has a point, or the mark is a point and a field reads 1,5, then the reason says which mark is set", () => {
    const opts: PointTableOptions = {
      separator: ";",
      decimal: ",",
      unit: "Pa",
      columns: { xx: 0, yy: 1, zz: 2, xy: 3, yz: 4, zx: 5 },
    };
    expect(parsePointTable("1;2;3;4;5;6.5", opts).badRows.first[0].reason).toBe(
      "column 6 (σzx): '6.5' is not a number (the decimal mark is set to a comma)",
    );
    expect(parsePointTable("1;2;3;4;5;6,5", { ...opts, decimal: "." }).badRows.first[0].reason).toBe(
      "column 6 (σzx): '6,5' is not a number (the decimal mark is set to a point)",
    );
  });

  it("when there are more bad rows than are listed, then the first 10 are listed and all are counted", () => {
    const lines = ["1,2,3,4,5,6"];
    for (let i = 0; i < 25; i++) lines.push("1,2,bad,4,5,6");
    lines.push("7,8,9,10,11,12");
    const t = parsePointTable(lines.join("\n"), {
      separator: ",",
      unit: "Pa",
      columns: { xx: 0, yy: 1, zz: 2, xy: 3, yz: 4, zx: 5 },
    });
    expect(t.count).toBe(2);
    expect(t.badRows.count).toBe(25);
    expect(t.badRows.first.map((b) => b.line)).toEqual([2, 3, 4, 5, 6, 7, 8, 9, 10, 11]);
  });

  it("when the options are wrong, then the parser refuses them naming the option (a programmer error)", () => {
    expect(() => new PointTableParser({ ...CSV, decimal: "," })).toThrow(/decimal comma needs a separator/);
    expect(() => new PointTableParser({ ...CSV, columns: { ...COLUMNS, zx: 4 } })).toThrow(
      /columns.xx and columns.zx|columns.zx and columns.xx/,
    );
    expect(() => new PointTableParser({ ...CSV, columns: { ...COLUMNS, yy: -1 } })).toThrow(
      /columns.yy must be a column index/,
    );
    expect(() => new PointTableParser({ ...CSV, unit: "bar" as "Pa" })).toThrow(/unknown stress unit/);
  });
});

describe("chunked parsing (a worker feeding a file in pieces)", () => {
  const text =
    "\uFEFFTitle line\r\nid;x;y;z;sxx;syy;szz;sxy;syz;szx\r\n" +
    "101;1,5;2;0;120,5;-30,25;0;15;0;-2,5\r\n" +
    "\r\n" +
    '"102";10;-20,25;3;-80;40;10,125;0;7,75;0\r\n' +
    "103;1;1;1;1;2;zz;4;5;6\r\n" +
    "104;1;1;1;1,5e2;2;3;4;5;6";
  const options: PointTableOptions = {
    separator: ";",
    decimal: ",",
    skipRows: 1,
    header: true,
    unit: "kPa",
    columns: COLUMNS,
  };

  it("when the text is split into two chunks at every offset, then the result equals the whole text's", () => {
    const whole = parsePointTable(text, options);
    expect(whole.count).toBe(3);
    expect(whole.badRows.first).toEqual([{ line: 6, reason: "column 7 (σzz, 'szz'): 'zz' is not a number" }]);
    expect(whole.components[12]).toBe(150e3); // 1,5e2 kPa
    for (let cut = 0; cut <= text.length; cut++) {
      const p = new PointTableParser(options);
      p.push(text.slice(0, cut));
      p.push(text.slice(cut));
      expect(p.finish(), `cut at ${cut}`).toEqual(whole);
    }
  });

  it("when the text is fed one character at a time or in random pieces, then the result is the same", () => {
    const whole = parsePointTable(text, options);
    const p = new PointTableParser(options);
    for (const ch of text) p.push(ch);
    expect(p.finish()).toEqual(whole);
    const rnd = seededRandom(15);
    for (let trial = 0; trial < 50; trial++) {
      const q = new PointTableParser(options);
      let at = 0;
      while (at < text.length) {
        const len = 1 + Math.floor(rnd() * 20);
        q.push(text.slice(at, at + len));
        at += len;
      }
      expect(q.finish()).toEqual(whole);
    }
  });

  it("when a file is cut at a line boundary and the halves parsed apart and merged, then the points and bad-row line numbers equal the whole file's", () => {
    const lines = ["id,x,y,z,sxx,syy,szz,sxy,syz,szx"];
    for (let i = 1; i <= 200; i++) {
      lines.push(i % 37 === 0 ? `${i},0,0,0,1,2,?,4,5,6` : `${i},${i},0,0,${i},2,3,4,5,6`);
    }
    const csv = lines.join("\n") + "\n";
    const whole = parsePointTable(csv, CSV);
    for (const parts of [2, 3, 5]) {
      const cuts = [0, ...lineCuts(csv, parts), csv.length];
      const tables = cuts
        .slice(0, -1)
        .map((from, k) =>
          parsePointTable(
            csv.slice(from, cuts[k + 1]),
            k === 0 ? CSV : { ...CSV, header: false, columnNames: whole.header! },
          ),
        );
      const merged = mergePointTables(tables);
      expect(merged).toEqual(whole);
    }
    expect(whole.badRows.first.map((b) => b.line)).toEqual([38, 75, 112, 149, 186]);
  });
});

describe("estimateRows (how much the parser allocates up front)", () => {
  it("when a table of 5000 rows of similar length is estimated from its first 64 kB, then the estimate is within 0–10 % above the count", () => {
    const rnd = seededRandom(99);
    const lines: string[] = [];
    for (let i = 0; i < 5000; i++)
      lines.push([i, ...Array.from({ length: 6 }, () => (rnd() * 1000).toFixed(3))].join(","));
    const text = lines.join("\n") + "\n";
    const e = estimateRows(text);
    expect(e).toBeGreaterThanOrEqual(5000);
    expect(e).toBeLessThanOrEqual(5500);
    expect(estimateRows("\n".repeat(1200))).toBeLessThanOrEqual(101);
  });
});

describe("readNumber against JavaScript's Number() (ECMAScript StringToNumber: the correctly rounded double)", () => {
  it("when 10 000 seeded random values are written with toFixed, toPrecision and toExponential, then readNumber gives the same double as Number()", () => {
    const rnd = seededRandom(4242);
    const mismatches: string[] = [];
    let compared = 0;
    let fast = 0;
    for (let i = 0; i < 10_000; i++) {
      const v = (rnd() - 0.5) * 10 ** Math.floor(rnd() * 30 - 12);
      for (const s of [
        v.toFixed(4),
        v.toPrecision(1 + Math.floor(rnd() * 17)),
        v.toExponential(Math.floor(rnd() * 16)),
        String(v),
      ]) {
        const comma = s.replace(".", ",");
        if (!Object.is(readNumber(s, 0, s.length, 46), Number(s))) mismatches.push(s);
        if (!Object.is(readNumber(comma, 0, comma.length, 44), Number(s))) mismatches.push(comma);
        // the one-pass reader either gives the same double, having read the whole field, or declines (NaN)
        const at = readNumberAt(s, 0, s.length, 46);
        if (at === at && (!Object.is(at, Number(s)) || numberScan.end !== s.length))
          mismatches.push(`at ${s}`);
        if (at === at) fast++;
        compared += 2;
      }
    }
    expect(compared).toBe(80_000);
    expect(fast).toBeGreaterThan(20_000);
    expect(mismatches).toEqual([]);
  });

  it("when a field is not a plain decimal number, then readNumber gives NaN", () => {
    for (const s of [
      "",
      " ",
      "0x10",
      "Infinity",
      "-",
      "1.2.3",
      "1,000.5",
      "1e",
      "abc",
      "1 2",
      "NaN",
      "--1",
      "1e+",
    ]) {
      expect(readNumber(s, 0, s.length, 46), JSON.stringify(s)).toBeNaN();
    }
    expect(readNumber(" -1.5E+03 ", 0, 10, 46)).toBe(-1500);
    expect(readNumber("\u22122.5", 0, 4, 46)).toBe(-2.5);
  });
});
