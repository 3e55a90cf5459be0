import type { Comparison } from "../../../../../core/contract/comparison";
import { CLOSE_UTILISATION } from "../../../../../core";
import { CRITERION_LABELS, type CriterionName } from "../../../../../core/contract/projects";
import { utilisationChartGeometry } from "../../../../../core/diagrams";
import { chartBars } from "../model/chart";

const VERDICT_FILL = { pass: "fill-pass", close: "fill-close", fail: "fill-fail" } as const;
const VERDICT_MARK = { pass: "✓", close: "≈", fail: "✗" } as const;

/**
 * Utilisation u = n_required / n of every row for one criterion, as horizontal bars, with the
 * allowable line at u = 1 and the "close" band edge at CLOSE_UTILISATION (n 10 % above the required
 * factor). The geometry comes from core/diagrams/utilisation-chart.ts; React draws. Every bar carries
 * its value and verdict mark, so colour is never the only cue.
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
  const g = utilisationChartGeometry(bars);
  return (
    <figure>
      {/* On a phone the chart keeps a readable size and scrolls sideways in its own focusable box. */}
      <div
        className="relative overflow-x-auto focus-visible:outline focus-visible:outline-2 focus-visible:outline-ink"
        role="region"
        aria-label="Utilisation chart, scrolls sideways"
        tabIndex={0}
      >
        <svg
          viewBox={`0 0 ${g.width} ${g.height}`}
          role="img"
          aria-label={`Utilisation per case, ${CRITERION_LABELS[criterion]}, with the allowable line at 1`}
          className="w-full min-w-[40rem] bg-grid bg-[length:16px_16px]"
        >
          {g.ticks.map((t) => (
            <g key={t.value}>
              <line x1={t.at} x2={t.at} y1={g.top} y2={g.bottom} className="stroke-rule" strokeWidth={0.6} />
              <text
                x={t.at}
                y={g.height - 10}
                textAnchor="middle"
                className="num fill-graphite-soft text-[11px]"
              >
                {t.label}
              </text>
            </g>
          ))}
          {g.rows.map((r) => (
            <g key={r.id}>
              <text
                x={r.label.x}
                y={r.label.y}
                dominantBaseline="middle"
                textAnchor="end"
                className="fill-graphite text-[12px]"
              >
                {r.label.text}
              </text>
              <rect
                x={r.rect.x}
                y={r.rect.y}
                width={r.rect.width}
                height={r.rect.height}
                className={VERDICT_FILL[r.bar.verdict]}
                opacity={0.8}
              />
              <text
                x={r.value.x}
                y={r.value.y}
                dominantBaseline="middle"
                className="num fill-graphite text-[11px]"
              >
                {r.value.text} {VERDICT_MARK[r.bar.verdict]}
              </text>
            </g>
          ))}
          <line
            x1={g.closeEdgeX}
            x2={g.closeEdgeX}
            y1={4}
            y2={g.bottom}
            className="stroke-close"
            strokeDasharray="3 3"
            strokeWidth={1}
          />
          <line
            x1={g.allowableX}
            x2={g.allowableX}
            y1={4}
            y2={g.bottom}
            className="stroke-fail"
            strokeWidth={1.6}
          />
          <text x={g.allowableLabel.x} y={g.allowableLabel.y} className="fill-fail text-[11px] font-semibold">
            allowable (u = 1)
          </text>
          <text
            x={g.axisTitle.x}
            y={g.axisTitle.y}
            textAnchor="end"
            className="fill-graphite-soft text-[11px]"
          >
            u = n_req / n
          </text>
        </svg>
      </div>
      {/* Every line of the chart is named here, with its value, beside the mark it is drawn with. */}
      <figcaption className="flex flex-wrap gap-x-6 gap-y-1 border-t border-rule px-3 py-1.5 text-[12px] text-graphite-soft">
        <span>
          <svg width="22" height="10" aria-hidden="true" className="mr-1 inline-block align-middle">
            <line x1="0" x2="22" y1="5" y2="5" className="stroke-fail" strokeWidth={1.6} />
          </svg>
          allowable, u = 1: a bar past it fails
        </span>
        <span>
          <svg width="22" height="10" aria-hidden="true" className="mr-1 inline-block align-middle">
            <line
              x1="0"
              x2="22"
              y1="5"
              y2="5"
              className="stroke-close"
              strokeDasharray="3 3"
              strokeWidth={1}
            />
          </svg>
          close-band edge, u = 1/1.1 ≈ <span className="num">{CLOSE_UTILISATION.toFixed(2)}</span>: a bar
          between it and the allowable passes, but by less than 10 %
        </span>
        <span>bars: ✓ passes · ≈ close · ✗ fails</span>
      </figcaption>
    </figure>
  );
}
