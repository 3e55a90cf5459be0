import { describe, expect, it } from "vitest";
import { convertStress, PASCALS_PER_PSI, STRESS_UNITS, type StressUnit } from "./stress";

// Exact definitions (common practice, no source): 1 lbf = 4.4482216152605 N, 1 in = 0.0254 m.
const LBF = 4.4482216152605;
const INCH = 0.0254;

describe("convertStress against the exact unit definitions (common practice, no source)", () => {
  it("when converting 1 psi to Pa, then it is 1 lbf / (1 in)² = 6894.757293168… Pa", () => {
    expect(convertStress(1, "psi", "Pa")).toBeCloseTo(LBF / (INCH * INCH), 9);
    expect(Math.abs(convertStress(1, "psi", "Pa") - 6894.757293168) / 6894.757293168).toBeLessThan(1e-12);
    expect(PASCALS_PER_PSI).toBeCloseTo(6894.757293168361, 9);
  });

  it("when converting ksi to MPa and back, then 1 ksi = 6.894757293168 MPa and the round trip is exact to rounding", () => {
    expect(Math.abs(convertStress(1, "ksi", "MPa") - 6.894757293168) / 6.894757293168).toBeLessThan(1e-12);
    expect(convertStress(convertStress(36, "ksi", "MPa"), "MPa", "ksi")).toBeCloseTo(36, 12);
  });

  it("when converting between SI prefixes, then the factors are powers of 1000", () => {
    expect(convertStress(250, "MPa", "Pa")).toBe(250e6);
    expect(convertStress(1, "GPa", "MPa")).toBe(1000);
    expect(convertStress(1500, "kPa", "MPa")).toBe(1.5);
    expect(convertStress(7, "Pa", "Pa")).toBe(7);
  });

  it("when every pair of units is converted there and back, then the value returns within 1e-15 relative", () => {
    for (const a of STRESS_UNITS) {
      for (const b of STRESS_UNITS) {
        const v = 123.456;
        expect(Math.abs(convertStress(convertStress(v, a, b), b, a) - v) / v).toBeLessThan(1e-15);
      }
    }
  });

  it("when a unit is unknown or the value is not a number, then it throws a precise error", () => {
    expect(() => convertStress(1, "bar" as StressUnit, "Pa")).toThrow(
      /unknown stress unit "bar"; expected one of Pa, kPa, MPa, GPa, psi, ksi/,
    );
    expect(() => convertStress("1" as unknown as number, "Pa", "MPa")).toThrow(TypeError);
  });

  it("when the value is NaN, then it throws instead of returning NaN", () => {
    expect(() => convertStress(Number.NaN, "MPa", "Pa")).toThrow(/cannot convert NaN from MPa to Pa/);
    expect(() => convertStress(Number.NaN, "MPa", "MPa")).toThrow(RangeError);
  });

  it("when a finite value would overflow to Infinity in the new unit, then it throws naming the value and units (largest double ≈ 1.8e308, IEEE 754)", () => {
    expect(() => convertStress(1e305, "GPa", "Pa")).toThrow(/1e\+305 GPa is too large to express in Pa/);
    expect(() => convertStress(-1e303, "ksi", "Pa")).toThrow(RangeError);
    // 1e300 GPa is 1e309 Pa: overflow; the same value the other way stays finite.
    expect(convertStress(1e300, "Pa", "GPa")).toBeCloseTo(1e291, -280);
  });

  it("when value·factor alone would overflow but the result fits, then the result is still given", () => {
    // Number.MAX_VALUE Pa in kPa is finite; value·1 / 1000 does not overflow, but psi → ksi does value·6894.76 first.
    const v = convertStress(Number.MAX_VALUE / 2, "psi", "ksi");
    expect(v).toBeCloseTo(Number.MAX_VALUE / 2 / 1000, -300);
    expect(Number.isFinite(v)).toBe(true);
  });

  it("when the value is ±Infinity (an unbounded quantity), then it stays infinite and does not throw", () => {
    expect(convertStress(Number.POSITIVE_INFINITY, "MPa", "psi")).toBe(Number.POSITIVE_INFINITY);
  });
});
