import { describe, expect, it } from "vitest";
import { CLOSE_UTILISATION, verdictForUtilisation } from "../index";
import { seededRandom } from "../testing/fixtures";
import { boxesOverlap } from "./label-placement";
import { CHART, utilisationAxis, utilisationChartGeometry, type UtilisationBar } from "./utilisation-chart";

function bars(us: number[]): UtilisationBar[] {
  return us.map((u, i) => ({
    id: `r${i}`,
    label: `Case ${i} · location`,
    u,
    verdict: verdictForUtilisation(u),
  }));
}

describe("the utilisation chart's geometry", () => {
  it("when the largest utilisation is below 1.2, then the axis runs 0 … 1.2 × 1.08 from the row labels' edge to the right margin", () => {
    const { scale, closeEdgeX, allowableX } = utilisationAxis(bars([0.4, 0.9]));
    expect(scale.domain[0]).toBe(0);
    expect(scale.domain[1]).toBeCloseTo(1.296, 12);
    expect(scale.map(0)).toBe(CHART.labelWidth);
    expect(scale.map(scale.domain[1])).toBeCloseTo(CHART.width - CHART.rightMargin, 9);
    expect(allowableX).toBe(scale.map(1));
    expect(closeEdgeX).toBe(scale.map(CLOSE_UTILISATION));
    expect(closeEdgeX).toBeLessThan(allowableX);
  });

  it("when 200 seeded sets of 1 to 40 rows are charted, then every bar fits between 0 and the axis end, rows never overlap, and ticks are round numbers inside the axis labelled to one decimal", () => {
    const next = seededRandom(622);
    for (let k = 0; k < 200; k++) {
      const n = 1 + Math.floor(next() * 40);
      const g = utilisationChartGeometry(bars(Array.from({ length: n }, () => 3 * next() ** 2)));
      const end = CHART.width - CHART.rightMargin;
      expect(g.height).toBe(n * 22 + 34);
      for (const r of g.rows) {
        expect(r.rect.x).toBe(CHART.labelWidth);
        expect(r.rect.x + r.rect.width).toBeLessThanOrEqual(end + 1e-9);
        expect(r.rect.width).toBeGreaterThanOrEqual(1);
        expect(r.rect.y).toBeGreaterThanOrEqual(g.top);
        expect(r.rect.y + r.rect.height).toBeLessThanOrEqual(g.bottom + 1e-9);
      }
      for (let i = 1; i < g.rows.length; i++)
        expect(boxesOverlap({ ...g.rows[i - 1].rect, width: 1 }, { ...g.rows[i].rect, width: 1 })).toBe(
          false,
        );
      const step = g.ticks[1].value - g.ticks[0].value;
      for (const t of g.ticks) {
        expect(t.at).toBeGreaterThanOrEqual(CHART.labelWidth);
        expect(t.at).toBeLessThanOrEqual(end + 1e-9);
        expect(Math.abs(t.value / step - Math.round(t.value / step))).toBeLessThan(1e-6);
        expect(t.label).toBe(t.value.toFixed(1));
      }
    }
  });

  it("when a row's label is longer than 40 characters, then it is cut to 39 and an ellipsis; its value reads to two decimals past the bar", () => {
    const long = "Hydrostatic test plus wind at the head-to-shell junction";
    const g = utilisationChartGeometry([{ id: "a", label: long, u: 1.0249, verdict: "fail" }]);
    expect(g.rows[0].label.text).toBe(`${long.slice(0, 39)}…`);
    expect([...g.rows[0].label.text].length).toBe(40);
    expect(g.rows[0].value.text).toBe("1.02");
    expect(g.rows[0].value.x).toBe(g.rows[0].rect.x + g.rows[0].rect.width + 4);
  });
});
