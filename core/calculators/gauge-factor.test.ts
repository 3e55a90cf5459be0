import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { correctForGaugeFactor, microstrain, strain, toMicrostrain } from "./rosette";

// ε = ε_read · GF_set / GF_gauge follows from the definition of the gauge factor, GF = (ΔR/R)/ε
// (formula; the definition recalled from memory).

describe("gauge-factor correction of a rosette reading (formula from GF = (ΔR/R)/ε, recalled from memory)", () => {
  it("when the instrument was set to 2.00 and the gauge's factor is 2.10, then 1000 µε read is 1000·2.00/2.10 = 952.38 µε (formula, worked by hand)", () => {
    expect(toMicrostrain(correctForGaugeFactor(microstrain(1000), 2, 2.1))).toBeCloseTo(952.381, 3);
  });

  it("when the instrument was set to the gauge's own factor, then the reading is unchanged; otherwise the same ΔR/R gives back the same strain whatever the setting (seeded property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -5e-3, max: 5e-3, noNaN: true }),
        fc.double({ min: 1.5, max: 3.5, noNaN: true }),
        fc.double({ min: 1.5, max: 3.5, noNaN: true }),
        (trueStrain, set, gauge) => {
          expect(correctForGaugeFactor(strain(trueStrain), gauge, gauge)).toBeCloseTo(trueStrain, 15);
          // The instrument shows (ΔR/R)/GF_set with ΔR/R = GF_gauge·ε.
          const shown = (gauge * trueStrain) / set;
          const back = correctForGaugeFactor(strain(shown), set, gauge);
          expect(Math.abs(back - trueStrain)).toBeLessThanOrEqual(1e-15 + 1e-12 * Math.abs(trueStrain));
        },
      ),
      { seed: 1301, numRuns: 300 },
    );
  });

  it("when a factor is zero, negative or not a number, then the error names it", () => {
    expect(() => correctForGaugeFactor(microstrain(100), 0, 2)).toThrow(/instrumentFactor/);
    expect(() => correctForGaugeFactor(microstrain(100), 2, -2)).toThrow(/gaugeFactor/);
    expect(() => correctForGaugeFactor(microstrain(100), Number.NaN, 2)).toThrow(/instrumentFactor/);
    expect(() => correctForGaugeFactor(Number.NaN as never, 2, 2)).toThrow(/reading/);
  });
});
