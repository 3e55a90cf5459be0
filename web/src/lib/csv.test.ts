import { describe, expect, it } from "vitest";
import { csvCell, toCsv } from "./csv";

// OWASP "CSV Injection": cells beginning with = + - @ (and tab, carriage return) are read as
// formulas by spreadsheets; a leading apostrophe keeps them text.
describe("csvCell", () => {
  it("when text begins with = + - or @, then it is escaped with a leading apostrophe", () => {
    expect(csvCell('=HYPERLINK("http://x")')).toBe('"\'=HYPERLINK(""http://x"")"');
    expect(csvCell("+1+2")).toBe("'+1+2");
    expect(csvCell("-2+3")).toBe("'-2+3");
    expect(csvCell("@SUM(A1)")).toBe("'@SUM(A1)");
    expect(csvCell("\tcmd")).toBe("'\tcmd");
  });

  it("when text is ordinary, then it is left alone; with a comma, quote or line break it is quoted (RFC 4180)", () => {
    expect(csvCell("Hydrostatic test")).toBe("Hydrostatic test");
    expect(csvCell("shell, ring 2")).toBe('"shell, ring 2"');
    expect(csvCell('say "hi"')).toBe('"say ""hi"""');
    expect(csvCell("two\nlines")).toBe('"two\nlines"');
  });

  it("when a number is negative, then it stays a number (not escaped); infinite factors are written inf", () => {
    expect(csvCell(-7.5)).toBe("-7.5");
    expect(csvCell(1.34)).toBe("1.34");
    expect(csvCell(Infinity)).toBe("inf");
    expect(csvCell(null)).toBe("");
  });
});

describe("toCsv", () => {
  it("when rows are written, then cells are joined by commas and lines end in CRLF", () => {
    expect(
      toCsv([
        ["case", "SF"],
        ["=evil", 1.5],
      ]),
    ).toBe("case,SF\r\n'=evil,1.5\r\n");
  });
});
