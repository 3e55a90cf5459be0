import { describe, expect, it } from "vitest";
import { looksLikeSeveralNumbers, readNumberText } from "./number-text";

// Product rule (readNumberText's JSDoc): one field holds one value, so a comma there is a decimal
// comma unless three digits follow it, which a thousands separator would also give.
describe("readNumberText (product rule)", () => {
  it("when a field holds '1,5' or '−12,25', then the comma is the decimal mark", () => {
    expect(readNumberText("1,5")).toEqual({ value: 1.5 });
    expect(readNumberText("−12,25")).toEqual({ value: -12.25 });
    expect(readNumberText(" 150 ")).toEqual({ value: 150 });
  });

  it("when a field holds '1,000' or '12,500', then it is refused naming both readings", () => {
    const r = readNumberText("1,000");
    expect(r).toEqual({
      refused:
        "“1,000” is ambiguous: 1.000 with a decimal comma, or 1000 with a thousands separator — type it with a point or without the comma",
    });
    expect("refused" in readNumberText("12,500")).toBe(true);
    expect("refused" in readNumberText("-1,250")).toBe(true);
  });

  it("when a field holds two commas or a comma and a point, then it is not a number", () => {
    expect(readNumberText("1,000,000")).toEqual({ value: Number.NaN });
    expect(readNumberText("1.000,5")).toEqual({ value: Number.NaN });
  });
});

describe("looksLikeSeveralNumbers (product rule: what a paste into one field means)", () => {
  it("when one number is pasted (1.5, 1e5, 1,5, −12), then it belongs in the field", () => {
    for (const t of ["1.5", "1e5", " 1,5 ", "−12", "+.5"]) expect(looksLikeSeveralNumbers(t), t).toBe(false);
  });
  it("when a row or a matrix is pasted, then it is read as a whole", () => {
    for (const t of ["1 2 3", "120\t-25\t0\n-25\t60\t10\n0\t10\t-30", "1,5 2", "100,20,-5", "[1, 2, 3]"]) {
      expect(looksLikeSeveralNumbers(t), t).toBe(true);
    }
  });
});
