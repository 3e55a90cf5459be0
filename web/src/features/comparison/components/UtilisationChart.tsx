import { scaleBand } from "d3";
import type { Comparison } from "../../../../../core/contract/comparison";
import { CRITERION_LABELS, type CriterionName } from "../../../../../core/contract/projects";
import { CHART, chartAxis, chartBars } from "../model/chart";

const VERDICT_FILL = { pass: "fill-pass", close: "fill-close", fail: "fill-fail" } as const;
const VERDICT_MARK = { pass: "✓", close: "≈", fail: "✗" } as const;

/**
 * Utilisation u = n_required / n of every row for one criterion, as horizontal bars, with the
 * allowable line at u = 1 and the "close" band edge at CLOSE_UTILISATION (n 10 % above the required factor). d3 supplies the scales;
 * React draws. Every bar carries its value and verdict mark, so colour is never the only cue.
 */
export function UtilisationChart({
  comparison,
  criterion,
}: {
  comparison: Comparison;
  criterion: CriterionName;
}) {
  const bars = chartBars(comparison, criterion);
  if (bars.length === 0)
    return (
      <p className="p-3 text-graphite-soft">No row could be evaluated with {CRITERION_LABELS[criterion]}.</p>
    );
  const { labelWidth, width } = CHART;
  const rowHeight = 22;
  const height = bars.length * rowHeight + 34;
  const { x, closeEdgeX, allowableX } = chartAxis(bars);
  const y = scaleBand<string>()
    .domain(bars.map((b) => b.id))
    .range([8, height - 26])
    .padding(0.22);
  const ticks = x.ticks(6);
  return (
    <svg
      viewBox={`0 0 ${width} ${height}`}
      role="img"
      aria-label={`Utilisation per case, ${CRITERION_LABELS[criterion]}, with the allowable line at 1`}
      className="w-full bg-grid bg-[length:16px_16px]"
    >
      {ticks.map((t) => (
        <g key={t}>
          <line x1={x(t)} x2={x(t)} y1={8} y2={height - 26} className="stroke-rule" strokeWidth={0.6} />
          <text x={x(t)} y={height - 10} textAnchor="middle" className="num fill-graphite-soft text-[11px]">
            {t.toFixed(1)}
          </text>
        </g>
      ))}
      {bars.map((b) => (
        <g key={b.id}>
          <text
            x={labelWidth - 8}
            y={y(b.id)! + y.bandwidth() / 2}
            dominantBaseline="middle"
            textAnchor="end"
            className="fill-graphite text-[12px]"
          >
            {b.label.length > 40 ? `${b.label.slice(0, 39)}…` : b.label}
          </text>
          <rect
            x={x(0)}
            y={y(b.id)}
            width={Math.max(1, x(b.u) - x(0))}
            height={y.bandwidth()}
            className={VERDICT_FILL[b.verdict]}
            opacity={0.8}
          />
          <text
            x={x(b.u) + 4}
            y={y(b.id)! + y.bandwidth() / 2}
            dominantBaseline="middle"
            className="num fill-graphite text-[11px]"
          >
            {b.u.toFixed(2)} {VERDICT_MARK[b.verdict]}
          </text>
        </g>
      ))}
      <line
        x1={closeEdgeX}
        x2={closeEdgeX}
        y1={4}
        y2={height - 26}
        className="stroke-close"
        strokeDasharray="3 3"
        strokeWidth={1}
      />
      <line
        x1={allowableX}
        x2={allowableX}
        y1={4}
        y2={height - 26}
        className="stroke-fail"
        strokeWidth={1.6}
      />
      <text x={allowableX + 3} y={12} className="fill-fail text-[11px] font-semibold">
        allowable (u = 1)
      </text>
      <text x={labelWidth - 24} y={height - 10} textAnchor="end" className="fill-graphite-soft text-[11px]">
        u = n_req / n
      </text>
    </svg>
  );
}
