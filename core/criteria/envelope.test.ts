import { describe, expect, it } from "vitest";
import { envelopeHit, envelopeInPlane } from "./envelope";

describe("failure envelopes in the σA–σB plane", () => {
  it("when the criterion is von Mises, then every point satisfies σA² − σAσB + σB² = Sy² (the distortion-energy ellipse; Shigley's Mechanical Engineering Design, eq. 5-13 — equation number recalled from memory, edition not checked)", () => {
    const pts = envelopeInPlane("von-mises", { yield: 355 });
    expect(pts).toHaveLength(720);
    for (const [a, b] of pts) expect(Math.sqrt(a * a - a * b + b * b)).toBeCloseTo(355, 9);
  });

  it("when the criterion is Tresca, then every point has max(|σA|, |σB|, |σA − σB|) = Sy (the maximum-shear hexagon; Shigley, §5-4 — recalled from memory)", () => {
    for (const [a, b] of envelopeInPlane("tresca", { yield: 250 })) {
      expect(Math.max(Math.abs(a), Math.abs(b), Math.abs(a - b))).toBeCloseTo(250, 9);
    }
  });

  it("when the criterion is Mohr–Coulomb with St = 200, Sc = 750, then the fourth-quadrant points satisfy σA/St − σB/Sc = 1 and the corners are on the axes (Shigley, eq. 5-26 — recalled from memory)", () => {
    const pts = envelopeInPlane("mohr-coulomb", { ultimateTension: 200, ultimateCompression: 750 }, 720);
    const fourth = pts.filter(([a, b]) => a > 0 && b < 0);
    expect(fourth.length).toBeGreaterThan(100);
    for (const [a, b] of fourth) expect(a / 200 - b / 750).toBeCloseTo(1, 9);
    expect(pts[0][0]).toBeCloseTo(200, 9);
    expect(pts[540][1]).toBeCloseTo(-750, 9);
  });

  it("when a plane state is scaled to the envelope, then the hit is n times the state and n is the safety factor", () => {
    const hit = envelopeHit(100, 50, "von-mises", { yield: 355 });
    const vm = Math.sqrt(100 * 100 - 100 * 50 + 50 * 50);
    expect(hit?.n).toBeCloseTo(355 / vm, 12);
    expect(hit?.point[0]).toBeCloseTo((100 * 355) / vm, 9);
    expect(envelopeHit(0, 0, "von-mises", { yield: 355 })).toBeNull();
    expect(() => envelopeInPlane("tresca", {})).toThrow(/material.yield/);
  });

  it("when modified Mohr is drawn for a material with Suc < Sut, then no envelope is drawn and the refusal says why (Shigley's Mechanical Engineering Design: modified Mohr is stated for Suc ≥ Sut; recalled from memory)", () => {
    const weakInCompression = { ultimateTension: 700, ultimateCompression: 200 };
    expect(() => envelopeInPlane("modified-mohr", weakInCompression)).toThrow(/Suc ≥ Sut/);
    expect(() => envelopeHit(200, -200, "modified-mohr", weakInCompression)).toThrow(/Suc 200 < Sut 700/);
    // Suc = Sut is still accepted: the criterion then coincides with maximum principal.
    expect(
      envelopeHit(200, -200, "modified-mohr", { ultimateTension: 400, ultimateCompression: 400 })?.n,
    ).toBeCloseTo(2, 12);
  });
});
