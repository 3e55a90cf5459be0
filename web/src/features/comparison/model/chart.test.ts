import { describe, expect, it } from "vitest";
import { verdictForFactor } from "../../../../../core";
import { seededRandom } from "../../../../../core/testing/fixtures";
import { chartAxis } from "./chart";

describe("the utilisation chart's band edge (common practice, no source: close = less than 10 % above the required factor)", () => {
  it("when factors are drawn all around the edge (5000 seeded cases, plus exactly 10 % above), then a bar ends left of or on the close edge exactly when core's verdict is pass, and beyond the allowable line exactly when it fails", () => {
    const next = seededRandom(1165);
    const cases: { factor: number; required: number }[] = [
      { factor: 1.65, required: 1.5 },
      { factor: 2.2, required: 2 },
      { factor: 1.5, required: 1.5 },
    ];
    for (let i = 0; i < 5000; i++) {
      const hundredths = Math.round((1 + 2 * next()) * 100);
      const required = hundredths / 100;
      // Half the cases within ±1 % of the edge (n = 1.1·n_req), the rest anywhere from 0.8 to 1.4 × n_req.
      const factor = i % 2 === 0 ? required * 1.1 * (0.99 + 0.02 * next()) : required * (0.8 + 0.6 * next());
      cases.push({ factor, required });
    }
    cases.push({ factor: (hundredths(1.37) * 11) / 1000, required: 1.37 });
    const bars = cases.map((c) => ({
      u: c.required / c.factor,
      verdict: verdictForFactor(c.factor, c.required),
    }));
    const { x, closeEdgeX, allowableX } = chartAxis(bars);
    // Sub-pixel allowance: the verdict rule allows 1e-9 relative at the edge for binary rounding.
    const px = 1e-6;
    for (const b of bars) {
      const end = x(b.u);
      if (b.verdict === "pass") expect(end).toBeLessThanOrEqual(closeEdgeX + px);
      if (b.verdict === "close") {
        expect(end).toBeGreaterThan(closeEdgeX - px);
        expect(end).toBeLessThanOrEqual(allowableX + px);
      }
      if (b.verdict === "fail") expect(end).toBeGreaterThan(allowableX);
    }
    expect(bars[0]).toMatchObject({ verdict: "pass" });
    expect(bars.filter((b) => b.verdict === "pass").length).toBeGreaterThan(100);
    expect(bars.filter((b) => b.verdict === "close").length).toBeGreaterThan(100);
  });
});

function hundredths(v: number): number {
  return Math.round(v * 100);
}
