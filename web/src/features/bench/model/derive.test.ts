import { describe, expect, it } from "vitest";
import { safetyFactor } from "../../../../../core";
import { criteriaResults, envelopeProbe } from "./derive";

const state = { xx: 120, yy: 40, zz: 0, xy: 30, yz: 0, zx: 0 };

describe("criteriaResults", () => {
  it("when a typed strength is zero or negative, then that criterion says what it needs instead of failing to compute", () => {
    const results = criteriaResults(
      state,
      "MPa",
      { presetId: null, yield: 0, ultimateTension: -5, ultimateCompression: null },
      1.5,
    );
    for (const r of results) expect(r.available).toBe(false);
    expect(results.find((r) => r.criterion === "von-mises")).toMatchObject({
      reason: "needs the yield strength Sy",
    });
    expect(results.find((r) => r.criterion === "mohr-coulomb")).toMatchObject({
      reason: "needs the tensile strength Sut and compressive strength Suc",
    });
  });

  it("when the state is in kPa, then factors equal core's safetyFactor on the state in MPa", () => {
    const kpa = { xx: 120e3, yy: 40e3, zz: 0, xy: 30e3, yz: 0, zx: 0 };
    const [vm] = criteriaResults(
      kpa,
      "kPa",
      { presetId: null, yield: 355, ultimateTension: 470, ultimateCompression: 470 },
      1.5,
    );
    if (!vm.available) throw new Error("von Mises must be available");
    expect(vm.n).toBeCloseTo(safetyFactor(state, "von-mises", { yield: 355 }), 12);
    expect(vm.utilisation).toBeCloseTo(1.5 / vm.n, 14);
  });
});

describe("envelopeProbe", () => {
  it("when the plot is in kPa, then the point is read in MPa against MPa strengths and the hit comes back in kPa (uniaxial yield at σ = Sy; common practice, no source)", () => {
    const material = { presetId: null, yield: 250, ultimateTension: null, ultimateCompression: null };
    const probe = envelopeProbe(100_000, 0, "kPa", ["von-mises"], material);
    expect(probe.nearest?.criterion).toBe("von-mises");
    expect(probe.nearest?.n).toBeCloseTo(2.5, 12);
    expect(probe.nearest?.point[0]).toBeCloseTo(250_000, 6);
    expect(probe.nearest?.point[1]).toBe(0);
    expect(probe.nearest?.distance).toBeCloseTo(150_000, 6);
  });
});
