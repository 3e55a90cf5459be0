/**
 * Geometry of the comparison's utilisation chart, without React or a DOM, so the comparison page
 * and a printed report draw the same chart: one horizontal bar per row, u = n_required / n, from 0
 * to a little beyond the largest bar, with the allowable line at u = 1 and the close-band edge at
 * core's CLOSE_UTILISATION (the very constant the verdict rule uses, so a bar ends left of the edge
 * exactly when its verdict is "pass").
 */
import { CLOSE_UTILISATION } from "../checks/verdict";
import { bandScale } from "./band-scale";
import { linearScale, type LinearScale } from "./linear-scale";

/** One bar: a row's id, its label, its utilisation and the verdict core gave it. */
export type UtilisationBar = { id: string; label: string; u: number; verdict: "pass" | "close" | "fail" };

/** Horizontal layout of the chart, in SVG units. */
export const CHART = { labelWidth: 260, width: 760, rightMargin: 56 } as const;

/** Vertical layout: one row per bar, with room above for the allowable's name and below for the ticks. */
export const CHART_ROWS = { rowHeight: 22, top: 8, bottom: 26, extra: 34, padding: 0.22 } as const;

/** Longest row label shown whole; longer ones are cut with an ellipsis. */
export const CHART_LABEL_CHARS = 40;

/** Ticks asked of the utilisation axis. */
const TICKS = 6;

/**
 * The utilisation axis: 0 … 1.08 × the largest bar (at least 1.2), and the x of the allowable line
 * and of the close-band edge.
 */
export function utilisationAxis(bars: readonly Pick<UtilisationBar, "u">[]): {
  scale: LinearScale;
  x: (u: number) => number;
  closeEdgeX: number;
  allowableX: number;
} {
  const maxU = Math.max(1.2, ...bars.map((b) => b.u)) * 1.08;
  const scale = linearScale([0, maxU], [CHART.labelWidth, CHART.width - CHART.rightMargin]);
  return { scale, x: scale.map, closeEdgeX: scale.map(CLOSE_UTILISATION), allowableX: scale.map(1) };
}

export type UtilisationChartGeometry = {
  width: number;
  height: number;
  /** top and bottom of the bars' area (grid lines run between them) */
  top: number;
  bottom: number;
  ticks: { value: number; at: number; label: string }[];
  rows: {
    id: string;
    bar: UtilisationBar;
    /** the row's label, cut to CHART_LABEL_CHARS */
    label: { text: string; x: number; y: number };
    rect: { x: number; y: number; width: number; height: number };
    /** "1.02": written just past the bar's end */
    value: { text: string; x: number; y: number };
  }[];
  closeEdgeX: number;
  allowableX: number;
  /** the allowable's name above its line, and the axis title under the row labels */
  allowableLabel: { x: number; y: number };
  axisTitle: { x: number; y: number };
};

/** The whole chart's geometry for `bars` (none: a chart with no rows). */
export function utilisationChartGeometry(bars: readonly UtilisationBar[]): UtilisationChartGeometry {
  const { labelWidth, width } = CHART;
  const height = bars.length * CHART_ROWS.rowHeight + CHART_ROWS.extra;
  const top = CHART_ROWS.top;
  const bottom = height - CHART_ROWS.bottom;
  const { scale, closeEdgeX, allowableX } = utilisationAxis(bars);
  const band = bandScale(
    bars.map((b) => b.id),
    [top, bottom],
    CHART_ROWS.padding,
  );
  const x0 = scale.map(0);
  return {
    width,
    height,
    top,
    bottom,
    ticks: scale.ticks(TICKS).map((t) => ({ value: t, at: scale.map(t), label: t.toFixed(1) })),
    rows: bars.map((b) => {
      const y = band.start(b.id)!;
      const mid = y + band.bandwidth / 2;
      return {
        id: b.id,
        bar: b,
        label: {
          text: b.label.length > CHART_LABEL_CHARS ? `${b.label.slice(0, CHART_LABEL_CHARS - 1)}…` : b.label,
          x: labelWidth - 8,
          y: mid,
        },
        rect: { x: x0, y, width: Math.max(1, scale.map(b.u) - x0), height: band.bandwidth },
        value: { text: b.u.toFixed(2), x: scale.map(b.u) + 4, y: mid },
      };
    }),
    closeEdgeX,
    allowableX,
    allowableLabel: { x: allowableX + 3, y: 12 },
    axisTitle: { x: labelWidth - 24, y: height - 10 },
  };
}
