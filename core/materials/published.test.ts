import { describe, expect, it } from "vitest";
import { FROM_MEMORY_NOTE, PUBLISHED_MATERIALS, publishedMaterial } from "./published";

describe("published materials", () => {
  it("when the list is read, then every entry names its standard, carries the verify note and has consistent strengths", () => {
    const ids = new Set<string>();
    for (const m of PUBLISHED_MATERIALS) {
      expect(ids.has(m.id)).toBe(false);
      ids.add(m.id);
      expect(m.standard).toMatch(/^(EN|ASTM|ASME) /);
      expect(m.fromMemory).toBe(true);
      expect(m.note).toBe(FROM_MEMORY_NOTE);
      expect(m.ultimateTension).toBeGreaterThan(0);
      expect(m.ultimateCompression).toBeGreaterThanOrEqual(m.ultimateTension);
      if (m.brittle) expect(m.yield).toBeUndefined();
      else expect(m.yield).toBeLessThan(m.ultimateTension);
    }
    expect(FROM_MEMORY_NOTE).toMatch(/verify against the standard and your material certificate/);
  });

  it("when S355 is looked up, then the EN 10025-2 minimum yield for t ≤ 16 mm is 355 MPa (the grade's name states it; EN 10025-2)", () => {
    expect(publishedMaterial("s355")?.yield).toBe(355);
    expect(publishedMaterial("s355")?.standard).toBe("EN 10025-2");
    expect(publishedMaterial("nope")).toBeNull();
  });
});
