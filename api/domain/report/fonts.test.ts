import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import * as fontkit from "fontkit";
import { describe, expect, it } from "vitest";
import { reportFaces, runsOf, STAND_INS } from "./fonts";

const require = createRequire(import.meta.url);

/** The tags of a TrueType file's tables (OpenType spec, "Table directory"). */
function tagsOf(data: Buffer): string[] {
  return Array.from({ length: data.readUInt16BE(4) }, (_, i) =>
    data.toString("latin1", 12 + 16 * i, 16 + 16 * i),
  );
}

/** Whether any of @fontsource's files of the two faces, read directly with fontkit, has a glyph for `ch`. */
function shippedFilesHave(ch: string): boolean {
  const files = ["latin", "greek", "latin-ext"].flatMap((subset) => [
    `@fontsource-variable/source-sans-3/files/source-sans-3-${subset}-wght-normal.woff2`,
    `@fontsource/jetbrains-mono/files/jetbrains-mono-${subset}-400-normal.woff`,
  ]);
  return files.some((file) =>
    fontkit.create(readFileSync(require.resolve(file))).hasGlyphForCodePoint(ch.codePointAt(0)!),
  );
}

describe("the report's faces", () => {
  it("when the faces are prepared, then each is a static TrueType file (sfnt 0x00010000) without the layout tables GSUB and GPOS, and the text face carries no variation tables", () => {
    const faces = reportFaces();
    expect(faces.filter((f) => f.family === "text")).toHaveLength(6);
    expect(faces.filter((f) => f.family === "number")).toHaveLength(6);
    for (const face of faces) {
      expect(face.data.readUInt32BE(0)).toBe(0x00010000);
      const tags = tagsOf(face.data);
      expect(tags).toContain("glyf");
      expect(tags).not.toContain("GSUB");
      expect(tags).not.toContain("GPOS");
      if (face.family === "text") {
        expect(tags).not.toContain("fvar");
        expect(tags).not.toContain("gvar");
      }
    }
  });

  it("when Source Sans 3 is instanced at 400 and 600, then the bold file is wider for the same letters and JetBrains Mono keeps one advance (600/1000 em) for every letter (common practice, no source: heavier weights set wider; a monospaced face has one advance)", () => {
    const byName = new Map(reportFaces().map((f) => [f.name, f]));
    const regular = byName.get("text-regular-latin")!;
    const bold = byName.get("text-bold-latin")!;
    const word = [..."Governing"].map((c) => c.codePointAt(0)!);
    const width = (face: typeof regular) => word.reduce((sum, cp) => sum + face.advance(cp), 0);
    expect(width(bold)).toBeGreaterThan(width(regular));
    // A proportional face: "i" is narrower than "m".
    expect(regular.advance(0x69)).toBeLessThan(regular.advance(0x6d));
    const mono = byName.get("number-regular-latin")!;
    for (const cp of [0x69, 0x6d, 0x31, 0x2e]) expect(mono.advance(cp)).toBeCloseTo(0.6, 6);
  });

  it("when a line of prose mixes Latin and Greek, then it is cut into runs of the text face's files that carry each glyph; σ and τ are glyphs, and only characters no shipped file carries print as words", () => {
    const runs = runsOf("SF ∞, σ1 = 5 τ", "text", "regular");
    expect(runs.map(({ font, text }) => ({ font, text }))).toEqual([
      { font: "text-regular-latin", text: `SF ${STAND_INS["∞"]}, ` },
      { font: "text-regular-greek", text: "σ" },
      { font: "text-regular-latin", text: "1 = 5 " },
      { font: "text-regular-greek", text: "τ" },
    ]);
    // Checked against the shipped files themselves, read with fontkit: a stand-in only where no file has the glyph.
    for (const ch of ["∞", "≥", "≤", "✓", "σ", "τ"]) {
      const printed = runsOf(ch, "text", "regular")
        .map((r) => r.text)
        .join("");
      expect(printed).toBe(shippedFilesHave(ch) ? ch : STAND_INS[ch]);
    }
  });

  it("when Source Sans 3 is instanced at 400 and 600, then each file is named after its own named instance (read back with fontkit) and keeps the variable file's copyright and licence names (OpenType spec, name ids 0, 6 and 14)", () => {
    const original = fontkit.create(
      readFileSync(
        require.resolve("@fontsource-variable/source-sans-3/files/source-sans-3-latin-wght-normal.woff2"),
      ),
    );
    const byName = new Map(reportFaces().map((f) => [f.name, fontkit.create(f.data)]));
    const regular = byName.get("text-regular-latin")!;
    const bold = byName.get("text-bold-latin")!;
    expect(regular.postscriptName).toBe("SourceSans3-Regular");
    expect(bold.postscriptName).toBe("SourceSans3-SemiBold");
    expect(regular.fullName).toBe("Source Sans 3 Regular");
    expect(bold.fullName).toBe("Source Sans 3 SemiBold");
    expect(regular.copyright).toBe(original.copyright);
    expect(bold.copyright).toBe(original.copyright);
    const licenceUrl = (font: fontkit.Font) =>
      (font as unknown as { name: { records: { licenseURL?: Record<string, string> } } }).name.records
        .licenseURL;
    expect(licenceUrl(bold)).toEqual(licenceUrl(original));
    // Every other script's file of a weight carries the same name as its latin file.
    expect(byName.get("text-bold-greek")!.postscriptName).toBe("SourceSans3-SemiBold");
  });

  it("when numbers are set, then they come from the number face and a run's width is its glyphs' advances", () => {
    const [run] = runsOf("120.5", "number", "bold");
    expect(run.font).toBe("number-bold-latin");
    expect(run.em).toBeCloseTo(5 * 0.6, 6);
  });
});
