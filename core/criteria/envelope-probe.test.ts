import { describe, expect, it } from "vitest";
import { probeEnvelopes } from "./envelope-probe";

describe("probing a point of the σA–σB envelope plot", () => {
  it("when the point is (100, 0) with Sy = 250, then von Mises and Tresca both give n = Sy/σA = 2.5 (uniaxial tension reaches yield at σ = Sy under both; common practice, no source)", () => {
    const p = probeEnvelopes(100, 0, ["von-mises", "tresca"], { yield: 250 });
    expect(p.hits.map((h) => h.criterion)).toEqual(["von-mises", "tresca"]);
    for (const h of p.hits) {
      expect(h.n).toBeCloseTo(2.5, 12);
      expect(h.distance).toBeCloseTo(150, 9);
    }
  });

  it("when the point is pure shear (100, −100) with Sy = 250, then Tresca gives n = Sy/(σA − σB) = 1.25, von Mises n = Sy/(√3·100) ≈ 1.443, and Tresca is nearest (Tresca hexagon and von Mises ellipse; Shigley's Mechanical Engineering Design §5-4, §5-5 — recalled from memory)", () => {
    const p = probeEnvelopes(100, -100, ["von-mises", "tresca"], { yield: 250 });
    const byName = Object.fromEntries(p.hits.map((h) => [h.criterion, h]));
    expect(byName.tresca.n).toBeCloseTo(1.25, 12);
    expect(byName["von-mises"].n).toBeCloseTo(250 / (Math.sqrt(3) * 100), 12);
    expect(p.nearest?.criterion).toBe("tresca");
    expect(p.nearest?.distance).toBeCloseTo(0.25 * Math.hypot(100, 100), 9);
  });

  it("when the point lies outside an envelope, then n < 1 and the distance still counts back to it", () => {
    const p = probeEnvelopes(500, 0, ["von-mises"], { yield: 250 });
    expect(p.nearest?.n).toBeCloseTo(0.5, 12);
    expect(p.nearest?.distance).toBeCloseTo(250, 9);
  });

  it("when the point is the origin or a strength is missing, then that envelope is left out and nothing is nearest", () => {
    expect(probeEnvelopes(0, 0, ["von-mises"], { yield: 250 })).toEqual({ hits: [], nearest: null });
    const p = probeEnvelopes(100, 50, ["mohr-coulomb", "von-mises"], { yield: 250 });
    expect(p.hits.map((h) => h.criterion)).toEqual(["von-mises"]);
  });
});
