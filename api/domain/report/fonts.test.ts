import { describe, expect, it } from "vitest";
import { parseUnicodeRanges, printedLength, reportFaces, runsOf, STAND_INS } from "./fonts";

describe("the report's faces", () => {
  it("when @fontsource's unicode ranges are read, then single code points and spans both parse (the CSS unicode-range syntax)", () => {
    expect(parseUnicodeRanges("U+0000-00FF,U+0131,U+2212")).toEqual([
      [0, 0xff],
      [0x131, 0x131],
      [0x2212, 0x2212],
    ]);
  });

  it("when the WOFF files are unpacked, then each is a TrueType file (sfnt version 0x00010000) without the ligature tables GSUB and GPOS", () => {
    const faces = reportFaces();
    expect(faces).toHaveLength(6);
    for (const face of faces) {
      expect(face.data.readUInt32BE(0)).toBe(0x00010000);
      const tags = Array.from({ length: face.data.readUInt16BE(4) }, (_, i) =>
        face.data.toString("latin1", 12 + 16 * i, 16 + 16 * i),
      );
      expect(tags).toContain("glyf");
      expect(tags).not.toContain("GSUB");
      expect(tags).not.toContain("GPOS");
    }
  });

  it("when a line mixes Latin and Greek, then it is cut into runs by the file that covers each character, and uncovered characters print as their stand-ins", () => {
    expect(runsOf("SF ∞, σ1 = 5", "regular")).toEqual([
      { font: "mono-regular-latin", text: `SF ${STAND_INS["∞"]}, ` },
      { font: "mono-regular-greek", text: "σ" },
      { font: "mono-regular-latin", text: "1 = 5" },
    ]);
    expect(printedLength("SF ∞")).toBe(3 + STAND_INS["∞"].length);
  });
});
