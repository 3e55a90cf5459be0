import type { Comparison } from "../../../../../core/contract/comparison";
import type { CriterionName } from "../../../../../core/contract/projects";
import type { UtilisationBar } from "../../../../../core/diagrams";
import { checkOf } from "./rows";

// The chart's geometry (axis, close-band edge, bars) lives in core/diagrams so a printed report draws the same chart.
export { CHART, utilisationAxis as chartAxis } from "../../../../../core/diagrams";

/** One bar of the utilisation chart: a row's utilisation and the verdict core gave it. */
export type ChartBar = UtilisationBar;

/** The rated checks of `criterion`, one bar per row (verdicts as the server's evaluator gave them). */
export function chartBars(comparison: Comparison, criterion: CriterionName): ChartBar[] {
  return comparison.rows.flatMap((r) => {
    const c = checkOf(r, criterion);
    return c?.status === "evaluated"
      ? [{ id: r.rowId, label: `${r.caseName} · ${r.locationName}`, u: c.utilisation, verdict: c.verdict }]
      : [];
  });
}
