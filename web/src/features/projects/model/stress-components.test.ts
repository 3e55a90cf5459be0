import { describe, expect, it } from "vitest";
import { nonZeroComponents, stateRevisionWords } from "./stress-components";

describe("non-zero components", () => {
  it("when some components are zero, then only the others are listed, in order, with their values", () => {
    const shown = nonZeroComponents({ xx: 120e6, yy: 0, zz: 0, xy: -35e6, yz: 0, zx: 1 });
    expect(shown).toEqual([
      { key: "xx", label: "σxx", pa: 120e6 },
      { key: "xy", label: "τxy", pa: -35e6 },
      { key: "zx", label: "τzx", pa: 1 },
    ]);
  });

  it("when every component is zero (negative zero too), then nothing is listed: a zero state", () => {
    expect(nonZeroComponents({ xx: 0, yy: -0, zz: 0, xy: 0, yz: 0, zx: 0 })).toEqual([]);
  });
});

// Product wording (no outside source): a state's revision counts its saves.
describe("state revision words", () => {
  it("when a state was saved once or three times, then the words count the saves", () => {
    expect(stateRevisionWords(1)).toBe("saved once");
    expect(stateRevisionWords(3)).toBe("saved 3 times (revision 3)");
  });
});
