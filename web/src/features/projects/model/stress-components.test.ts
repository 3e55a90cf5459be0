import { describe, expect, it } from "vitest";
import { nonZeroComponents, STRESS_KEYS, STRESS_LABELS } from "./stress-components";

describe("stress component labels", () => {
  it("when the six components are listed, then normals come first as σ and shears follow as τ (common practice, no source)", () => {
    expect(STRESS_KEYS).toEqual(["xx", "yy", "zz", "xy", "yz", "zx"]);
    expect(STRESS_KEYS.map((k) => STRESS_LABELS[k])).toEqual(["σxx", "σyy", "σzz", "τxy", "τyz", "τzx"]);
  });
});

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
