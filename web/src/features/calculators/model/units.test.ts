import { describe, expect, it } from "vitest";
import { seededRandom } from "../../../../../core/testing/fixtures";
import { convertInput, fromWorking, toWorking, unitFor, type Dimension, type UnitSet } from "./units";

describe("calculator input units", () => {
  it("when US customary inputs go to working units, then 1 in = 25.4 mm, 1 lbf = 4.4482216152605 N, 1 lbf·in = 112.98482902 N·mm and 1 ksi = 6.894757293 MPa (definitions of the inch and the pound-force, 1959 international yard and pound; NIST SP 811 appendix B)", () => {
    expect(toWorking(1, "length", "us-ksi")).toBe(25.4);
    expect(toWorking(1, "force", "us-psi")).toBe(4.4482216152605);
    expect(toWorking(1, "moment", "us-ksi")).toBeCloseTo(112.98482902, 7);
    expect(toWorking(1, "stress", "us-ksi")).toBeCloseTo(6.894757293, 8);
    expect(toWorking(1000, "stress", "us-psi")).toBeCloseTo(6.894757293, 8);
    expect(toWorking(1, "moment", "si")).toBe(1000); // 1 N·m = 1000 N·mm (formula)
    expect(toWorking(200, "modulus", "si")).toBe(200_000); // GPa to MPa (formula)
    expect(toWorking(30_000, "modulus", "us-ksi")).toBeCloseTo(206_842.7, 1); // 30 000 ksi (formula)
  });

  it("when a value goes to working units and back under any set (2000 seeded cases), then the same value comes back to 1e-12 relative (formula)", () => {
    const next = seededRandom(1313);
    const dims: Dimension[] = [
      "length",
      "stress",
      "force",
      "moment",
      "modulus",
      "angle",
      "ratio",
      "microstrain",
    ];
    const sets: UnitSet[] = ["si", "us-psi", "us-ksi"];
    for (let i = 0; i < 2000; i++) {
      const v = (next() - 0.5) * 10 ** (6 * next());
      const d = dims[Math.floor(next() * dims.length)];
      const s = sets[Math.floor(next() * sets.length)];
      expect(Math.abs(fromWorking(toWorking(v, d, s), d, s) - v)).toBeLessThanOrEqual(1e-12 * Math.abs(v));
    }
  });

  it("when an entered value is carried to another set and back, then the typed number returns to 1e-13; angles, ratios and microstrain are never converted (formula)", () => {
    expect(convertInput(60, "length", "si", "us-psi")).toBeCloseTo(2.362204724, 9);
    expect(convertInput(convertInput(60, "length", "si", "us-psi"), "length", "us-psi", "si")).toBeCloseTo(
      60,
      11,
    );
    expect(convertInput(convertInput(1200, "moment", "si", "us-ksi"), "moment", "us-ksi", "si")).toBeCloseTo(
      1200,
      10,
    );
    expect(convertInput(2, "stress", "si", "us-psi")).toBeCloseTo(290.0755, 4);
    expect(convertInput(45, "angle", "si", "us-ksi")).toBe(45);
    expect(convertInput(0.3, "ratio", "us-psi", "si")).toBe(0.3);
    expect(convertInput(650, "microstrain", "si", "us-psi")).toBe(650);
  });

  it("when the page asks for each dimension's unit, then SI reads mm, N, N·m, MPa, GPa and US customary in, lbf, lbf·in, psi or ksi (common practice, no source)", () => {
    expect(
      ["length", "force", "moment", "stress", "modulus"].map((d) => unitFor(d as Dimension, "si")),
    ).toEqual(["mm", "N", "N·m", "MPa", "GPa"]);
    expect(["length", "force", "moment", "stress"].map((d) => unitFor(d as Dimension, "us-ksi"))).toEqual([
      "in",
      "lbf",
      "lbf·in",
      "ksi",
    ]);
    expect(unitFor("stress", "us-psi")).toBe("psi");
  });
});
