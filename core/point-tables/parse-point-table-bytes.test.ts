import { describe, expect, it } from "vitest";
import { seededRandom } from "../testing/fixtures";
import { decodeUtf8 } from "./decode-utf8";
import { parsePointTable, PointTableParser } from "./parse-point-table";
import { numberScan, readNumberAtBytes } from "./read-number";
import type { PointTable, PointTableOptions } from "./types";

// The byte path (PointTableParser.pushBytes) must give exactly what the text path gives for the
// same file; the text path's own tests check it against hand-written tables (common practice, no
// source: the usual layouts of delimited text). Numbers are checked against Number() (ECMAScript
// StringToNumber) and the decoder against TextDecoder (WHATWG Encoding Standard, Node's own).

const COLUMNS = { id: 0, x: 1, y: 2, z: 3, xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9 };
const SIX = { xx: 0, yy: 1, zz: 2, xy: 3, yz: 4, zx: 5 };

/** Hand-written files with the layout each is read with. */
const FILES: [string, string, PointTableOptions][] = [
  [
    "CSV with a header",
    "id,x,y,z,sxx,syy,szz,sxy,syz,szx\n101,1.5,2,0,120.5,-30.25,0,15,0,-2.5\n102,10,-20.25,3,-80,40,10.125,0,7.75,0\n",
    { separator: ",", header: true, unit: "MPa", columns: COLUMNS },
  ],
  [
    "BOM, CRLF, quoted fields, no final line break",
    '\uFEFF"id","x","y","z","sxx","syy","szz","sxy","syz","szx"\r\n101,"1.5",2,0,"120.5",-30.25,0,15,0,-2.5\r\n"102",10,-20.25,3,-80,40,10.125,0,7.75,"0"',
    { separator: ",", header: true, unit: "MPa", columns: COLUMNS },
  ],
  [
    "title lines, decimal comma, semicolons, a blank line and a bad row",
    "\uFEFFTitle line\r\nid;x;y;z;sxx;syy;szz;sxy;syz;szx\r\n101;1,5;2;0;120,5;-30,25;0;15;0;-2,5\r\n\r\n" +
      '"102";10;-20,25;3;-80;40;10,125;0;7,75;0\r\n103;1;1;1;1;2;zz;4;5;6\r\n104;1;1;1;1,5e2;2;3;4;5;6',
    { separator: ";", decimal: ",", skipRows: 1, header: true, unit: "kPa", columns: COLUMNS },
  ],
  [
    "whitespace-separated with padding and tabs",
    "   101      1.5  \t 2 0 120.5 -30.25 0 15 0 -2.5  \n\t102 10 -20.25 3 -80 40 10.125 0 7.75 0\n  \n",
    { separator: "whitespace", unit: "MPa", columns: COLUMNS },
  ],
  [
    "tabs with a decimal comma",
    "101\t1,5\t2\t0\t120,5\t-30,25\t0\t15\t0\t-2,5\n102\t10\t-20,25\t3\t-80\t40\t10,125\t0\t7,75\t0\n",
    { separator: "\t", decimal: ",", unit: "MPa", columns: COLUMNS },
  ],
  [
    "quoted text ids with separators and quotes inside, and plain ones with spaces around",
    'name;sxx;syy;szz;sxy;syz;szx\n"A;7";1;2;3;4;5;6\n"say ""B""";1;2;3;4;5;6\n  N 12 ;1;2;3;4;5;6\n;1;2;3;4;5;6\nΣ-4;1;2;3;4;5;6\n',
    { separator: ";", header: true, unit: "Pa", idKind: "text", columns: { id: 0, ...shifted(1) } },
  ],
  [
    "every kind of bad row",
    [
      "id,x,y,z,sxx,syy,szz,sxy,syz,szx",
      "1,0,0,0,1,2,3,4,5,6",
      "2,0,0,0,1,,3,4,5,6",
      "3,0,0,0,1,2,3,4,5",
      "",
      "4,0,0,0,1,2,3,4,5,1e13",
      "x5,0,0,0,1,2,3,4,5,6",
      "6,0,0,0,1,2,3,4,5,6",
      "7,0,0,0,1,2,3,4,5,1,5",
      "8,0,0,0,1,2,3,4,5,NaN",
      "9,0,Infinity,0,1,2,3,4,5,6",
      "10,0,0,0,1, 2,3,4,5,6",
      "11,0,0,0,\u22121.5,2,3,4,5,6",
      "12,0,0,0,1.5e-3,2E+2,+3,.5,5.,6",
      "13,0,0,0,1234.5678901234567,2,3,4,5,6",
      '14,0,0,0,"1,2,3,4,5,6',
    ].join("\n"),
    { separator: ",", header: true, unit: "MPa", columns: COLUMNS },
  ],
  [
    "unmapped columns holding quotes, separators and non-ASCII text",
    'label,sxx,syy,szz,sxy,syz,szx,note\n"a,b",1,2,3,4,5,6,σ ≥ 1\nplain,1,2,3,4,5,6,"x,y"\nµ-node,1,2,3,4,5,6,\n',
    { separator: ",", header: true, unit: "Pa", columns: shifted(1) },
  ],
  [
    "psi, shears in the order xy zx yz, no ids",
    "1 2 3 4 5 6\r\n-1e3 0 0 0 0 2.5e-1\r\n",
    { separator: "whitespace", unit: "psi", columns: { xx: 0, yy: 1, zz: 2, xy: 3, zx: 4, yz: 5 } },
  ],
];

/** The six components in columns `from`…`from + 5`. */
function shifted(from: number) {
  return Object.fromEntries(Object.entries(SIX).map(([k, v]) => [k, v + from])) as typeof SIX;
}

const utf8 = (text: string) => new TextEncoder().encode(text);

function parseBytes(pieces: Uint8Array[], options: PointTableOptions): PointTable {
  const parser = new PointTableParser(options);
  for (const piece of pieces) parser.pushBytes(piece);
  return parser.finish();
}

/** `bytes` cut into pieces of 1–`longest` bytes at seeded random places. */
function randomPieces(bytes: Uint8Array, longest: number, random: () => number): Uint8Array[] {
  const out: Uint8Array[] = [];
  for (let at = 0; at < bytes.length;) {
    const len = 1 + Math.floor(random() * longest);
    out.push(bytes.subarray(at, at + len));
    at += len;
  }
  return out;
}

describe("PointTableParser.pushBytes (a worker parsing a file's bytes without decoding them)", () => {
  it("when each hand-written file is given as UTF-8 bytes whole, cut at every offset, or in random pieces, then the table equals the one read from its text", () => {
    const random = seededRandom(1515);
    for (const [name, text, options] of FILES) {
      const expected = parsePointTable(text, options);
      const bytes = utf8(text);
      expect(parseBytes([bytes], options), name).toEqual(expected);
      for (let cut = 0; cut <= bytes.length; cut++) {
        expect(
          parseBytes([bytes.subarray(0, cut), bytes.subarray(cut)], options),
          `${name}, cut ${cut}`,
        ).toEqual(expected);
      }
      for (let trial = 0; trial < 20; trial++) {
        expect(parseBytes(randomPieces(bytes, 12, random), options), `${name}, trial ${trial}`).toEqual(
          expected,
        );
      }
    }
  });

  it("when the bad-row file is read from bytes, then the rows left out are named by line and the forms Number() takes are read (common practice, no source)", () => {
    const [, text, options] = FILES[6];
    const t = parseBytes([utf8(text)], options);
    // rows 1, 6, 7 (the extra 11th field is ignored), 11 (U+2212 minus), 12 (exponents, a leading
    // '+', '.5', '5.') are read; 2 (empty), 3 (short), 4 (too large), x5, 8 (NaN), 9 (Infinity), 10
    // (a space before a number in a comma file reads as a number there), 13 (17 digits: Number()
    // reads it, so the text path does), 14 (unclosed quote)
    expect(Array.from(t.ids as Float64Array)).toEqual([1, 6, 7, 10, 11, 12, 13]);
    expect(t.badRows.first.map((b) => b.line)).toEqual([3, 4, 6, 7, 10, 11, 16]);
    expect(t.components[6 * 4]).toBe(-1.5e6); // U+2212 minus, MPa → Pa
    expect(Array.from(t.components.subarray(6 * 5, 6 * 6))).toEqual([1.5e3, 200e6, 3e6, 0.5e6, 5e6, 6e6]);
    expect(t.components[6 * 6]).toBe(Number("1234.5678901234567") * 1e6);
  });

  it("when a generated table of 5000 rows with scattered bad rows is fed in 64 kB pieces, then it equals the text path's", () => {
    const random = seededRandom(77);
    const lines = ["id,x,y,z,sxx,syy,szz,sxy,syz,szx"];
    for (let i = 0; i < 5000; i++) {
      const f = [String(i + 1), ...Array.from({ length: 9 }, () => ((random() - 0.5) * 800).toFixed(4))];
      if (i % 997 === 5) f[5] = "–";
      lines.push(f.join(","));
    }
    const text = lines.join("\r\n");
    const options: PointTableOptions = { separator: ",", header: true, unit: "MPa", columns: COLUMNS };
    const expected = parsePointTable(text, options);
    expect(expected.badRows.count).toBe(6);
    const bytes = utf8(text);
    const pieces: Uint8Array[] = [];
    for (let at = 0; at < bytes.length; at += 65_536) pieces.push(bytes.subarray(at, at + 65_536));
    expect(parseBytes(pieces, options)).toEqual(expected);
  });

  it("when text and bytes are given to one parser, then it refuses the second kind", () => {
    const options = FILES[0][2];
    const a = new PointTableParser(options);
    a.push("id,x");
    expect(() => a.pushBytes(utf8(",y\n"))).toThrow(/do not mix/);
    const b = new PointTableParser(options);
    b.pushBytes(utf8("id,x"));
    expect(() => b.push(",y\n")).toThrow(/do not mix/);
  });
});

describe("readNumberAtBytes against Number() (ECMAScript StringToNumber: the correctly rounded double)", () => {
  it("when 10 000 seeded random values are written with toFixed, toPrecision and toExponential, then it gives the same double as Number() or declines", () => {
    const random = seededRandom(4243);
    const mismatches: string[] = [];
    let fast = 0;
    for (let i = 0; i < 10_000; i++) {
      const v = (random() - 0.5) * 10 ** Math.floor(random() * 30 - 12);
      for (const s of [
        v.toFixed(4),
        v.toPrecision(1 + Math.floor(random() * 17)),
        v.toExponential(5),
        String(v),
      ]) {
        for (const [written, mark] of [
          [s, 46],
          [s.replace(".", ","), 44],
        ] as const) {
          const bytes = utf8(`;${written};`);
          const at = readNumberAtBytes(bytes, 1, bytes.length - 1, mark);
          if (at !== at) continue; // declined: the text path reads it
          fast++;
          if (!Object.is(at, Number(s)) || numberScan.end !== bytes.length - 1) mismatches.push(written);
        }
      }
    }
    expect(fast).toBeGreaterThan(40_000);
    expect(mismatches).toEqual([]);
  });
});

describe("decodeUtf8 against TextDecoder (WHATWG Encoding Standard)", () => {
  it("when seeded random byte runs, valid UTF-8 or not, are decoded, then the text equals TextDecoder's", () => {
    const random = seededRandom(8);
    const decoder = new TextDecoder();
    const samples = [
      utf8("σ₁ ≥ 250 MPa; µ-node 😀 Ω"),
      Uint8Array.of(0xc0, 0x80, 0xed, 0xa0, 0x80, 0xf4, 0x90),
    ];
    for (let k = 0; k < 2000; k++) {
      // mostly the bytes that start and continue multi-byte characters, so that bad runs are common
      const pool = [0x41, 0x7f, 0x80, 0xbf, 0xc2, 0xdf, 0xe0, 0xed, 0xef, 0xf0, 0xf4, 0xf5, 0xa0, 0x9f, 0x90];
      samples.push(
        Uint8Array.from(
          { length: 1 + Math.floor(random() * 12) },
          () => pool[Math.floor(random() * pool.length)],
        ),
      );
    }
    const differ = samples.filter((b) => decodeUtf8(b, 0, b.length) !== decoder.decode(b));
    expect(differ.map((b) => Array.from(b))).toEqual([]);
  });
});
