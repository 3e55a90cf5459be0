import { scaleLinear } from "d3";
import { CLOSE_UTILISATION } from "../../../../../core";
import type { Comparison } from "../../../../../core/contract/comparison";
import type { CriterionName } from "../../../../../core/contract/projects";
import { checkOf } from "./rows";

/** One bar of the utilisation chart: a row's utilisation and the verdict core gave it. */
export type ChartBar = { id: string; label: string; u: number; verdict: "pass" | "close" | "fail" };

/** The rated checks of `criterion`, one bar per row (verdicts as the server's evaluator gave them). */
export function chartBars(comparison: Comparison, criterion: CriterionName): ChartBar[] {
  return comparison.rows.flatMap((r) => {
    const c = checkOf(r, criterion);
    return c?.status === "evaluated"
      ? [{ id: r.rowId, label: `${r.caseName} · ${r.locationName}`, u: c.utilisation, verdict: c.verdict }]
      : [];
  });
}

/** Horizontal layout of the chart, in SVG units. */
export const CHART = { labelWidth: 260, width: 760, rightMargin: 56 } as const;

/**
 * The utilisation axis: 0 … a little beyond the largest bar (at least 1.2), and the x of the
 * two lines drawn on it — the allowable (u = 1) and the close-band edge at core's
 * CLOSE_UTILISATION, the very constant core's verdict rule uses, so a bar ends left of the
 * edge exactly when its verdict is "pass".
 */
export function chartAxis(bars: readonly Pick<ChartBar, "u">[]) {
  const maxU = Math.max(1.2, ...bars.map((b) => b.u)) * 1.08;
  const x = scaleLinear()
    .domain([0, maxU])
    .range([CHART.labelWidth, CHART.width - CHART.rightMargin]);
  return { x, closeEdgeX: x(CLOSE_UTILISATION), allowableX: x(1) };
}
