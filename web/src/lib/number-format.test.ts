import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { axisTickFormat, decimalsFor, fixed, sheetValue } from "./number-format";

describe("fixed", () => {
  it("when a negative value rounds to zero at the shown precision, then it shows 0 with its decimals, never −0 (rule of issue 9, common practice, no source)", () => {
    expect(fixed(-0.0004, 3)).toBe("0.000");
    expect(fixed(-1e-15, 2)).toBe("0.00");
    expect(fixed(-0, 3)).toBe("0.000");
    expect(fixed(-0.4, 0)).toBe("0");
    expect(fixed(-0.0004, 3, "-")).toBe("0.000");
  });

  it("when a negative value does not round to zero, then it keeps its sign, a true minus by default and ASCII when asked", () => {
    expect(fixed(-0.0005, 3)).toBe("−0.001");
    expect(fixed(-4.0569, 2)).toBe("−4.06");
    expect(fixed(-4.0569, 2, "-")).toBe("-4.06");
    expect(fixed(12.5, 1)).toBe("12.5");
  });

  it("when the value is not finite, then it reads ∞, −∞ or —", () => {
    expect(fixed(Infinity, 2)).toBe("∞");
    expect(fixed(-Infinity, 2)).toBe("−∞");
    expect(fixed(NaN, 2)).toBe("—");
  });

  it("when any finite value is formatted, then the text never reads as a negative zero and parses back to toFixed's number (property, seeded)", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.integer({ min: 0, max: 6 }), (v, d) => {
        const text = fixed(v, d);
        expect(text).not.toMatch(/^[−-]0(\.0*)?$/);
        const back = Number(text.replace("−", "-"));
        expect(back).toBe(Number(v.toFixed(d)) === 0 ? 0 : Number(v.toFixed(d)));
      }),
      { seed: 9, numRuns: 2000 },
    );
  });
});

describe("decimalsFor and sheetValue", () => {
  it("when the largest value is 154.06, then four significant figures need 1 decimal; 0.0123 needs 4", () => {
    expect(decimalsFor(154.06)).toBe(1);
    expect(decimalsFor(0.0123)).toBe(5);
    expect(decimalsFor(1.5e8)).toBe(0);
    expect(decimalsFor(0)).toBe(2);
  });

  it("when a lone value is shown, then its decimals follow its size and a tiny negative shows 0.000", () => {
    expect(sheetValue(1234.5)).toBe("1235");
    expect(sheetValue(-154.06)).toBe("−154.1");
    expect(sheetValue(-12.345, "-")).toBe("-12.35");
    expect(sheetValue(-0.00004)).toBe("0.000");
  });
});

describe("axisTickFormat", () => {
  it("when ticks run to 150 000 000 (Pa), then they read 0 … 150 under ×10⁶ and stay short", () => {
    const { format, multiplier } = axisTickFormat([0, 50e6, 100e6, 150e6]);
    expect(multiplier).toBe("×10⁶ ");
    expect([0, 50e6, 100e6, 150e6].map(format)).toEqual(["0", "50", "100", "150"]);
  });

  it("when ticks are ordinary MPa values, then no multiplier and decimals follow the step; no negative zero", () => {
    const a = axisTickFormat([-40, -20, 0, 20, 40]);
    expect(a.multiplier).toBe("");
    expect([-40, -0, 20].map(a.format)).toEqual(["−40", "0", "20"]);
    expect(axisTickFormat([0, 0.5, 1]).format(0.5)).toBe("0.5");
    expect(axisTickFormat([-0.004, -0.002, 0]).multiplier).toBe("×10⁻³ ");
  });

  it("when ticks reach 21 756 (psi), then they read in thousands", () => {
    const { format, multiplier } = axisTickFormat([0, 5000, 10000, 15000, 20000]);
    expect(multiplier).toBe("×10³ ");
    expect(format(15000)).toBe("15");
  });
});
