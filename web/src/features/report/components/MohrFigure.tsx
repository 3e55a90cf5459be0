import type { ReportMohr } from "../../../../../core/report";

const LABEL = "fill-graphite font-mono text-[12px]";
const TICK = "fill-graphite-soft font-mono text-[10px]";

/** A state's Mohr's circles as the report draws them: every position comes from core/diagrams. */
export function MohrFigure({ figure, caption }: { figure: ReportMohr; caption: string }) {
  const { plot } = figure;
  const bottom = plot.y + plot.height;
  const t = figure.tauAxis;
  return (
    <figure className="my-2 break-inside-avoid">
      <svg
        viewBox={`0 0 ${figure.width} ${figure.height}`}
        className="w-full max-w-[420px]"
        role="img"
        aria-label={caption}
      >
        <rect
          x={plot.x}
          y={plot.y}
          width={plot.width}
          height={plot.height}
          className="fill-none stroke-rule"
        />
        <path d={figure.halfDisks[0]} className="fill-ink-wash stroke-ink" strokeWidth={1.4} />
        <path d={figure.halfDisks[1]} className="fill-panel stroke-ink" strokeWidth={1} />
        <path d={figure.halfDisks[2]} className="fill-panel stroke-ink" strokeWidth={1} />
        <line
          x1={figure.sigmaAxis.x1}
          x2={figure.sigmaAxis.x2}
          y1={figure.sigmaAxis.y}
          y2={figure.sigmaAxis.y}
          className="stroke-graphite-soft"
        />
        {t.x >= plot.x && t.x <= plot.x + plot.width && (
          <line x1={t.x} x2={t.x} y1={t.y1} y2={t.y2} className="stroke-graphite-soft" />
        )}
        <line
          x1={figure.maxShearGuide.x}
          x2={figure.maxShearGuide.x}
          y1={figure.maxShearGuide.y1}
          y2={figure.maxShearGuide.y2}
          className="stroke-graphite-soft"
          strokeDasharray="3 3"
        />
        {figure.xTicks.map((x) => (
          <g key={`x${x.at}`}>
            <line x1={x.at} x2={x.at} y1={bottom} y2={bottom + 4} className="stroke-graphite-soft" />
            <text x={x.at} y={bottom + 15} textAnchor="middle" className={TICK}>
              {x.label}
            </text>
          </g>
        ))}
        {figure.yTicks.map((y) => (
          <g key={`y${y.at}`}>
            <line x1={plot.x - 4} x2={plot.x} y1={y.at} y2={y.at} className="stroke-graphite-soft" />
            <text x={plot.x - 6} y={y.at + 3.5} textAnchor="end" className={TICK}>
              {y.label}
            </text>
          </g>
        ))}
        <text x={plot.x + plot.width} y={bottom + 30} textAnchor="end" className={TICK}>
          {figure.xTitle}
        </text>
        <text x={plot.x + 4} y={plot.y + 11} className={TICK}>
          {figure.yTitle}
        </text>
        {figure.principal.map((p) => (
          <g key={p.text}>
            <circle cx={p.cx} cy={p.cy} r={3.2} className="fill-ink" />
            <text x={p.label.x} y={p.label.y} textAnchor={p.label.anchor} className={LABEL}>
              {p.text}
            </text>
          </g>
        ))}
        {figure.faces.map((f) => (
          <g key={f.text}>
            <circle cx={f.cx} cy={f.cy} r={4.5} className="fill-panel stroke-graphite" strokeWidth={1.4} />
            <text x={f.label.x} y={f.label.y} textAnchor={f.label.anchor} className={LABEL}>
              {f.text}
            </text>
          </g>
        ))}
        <text
          x={figure.maxShear.label.x}
          y={figure.maxShear.label.y}
          textAnchor={figure.maxShear.label.anchor}
          className={LABEL}
        >
          {figure.maxShear.text}
        </text>
      </svg>
      <figcaption className="text-sm text-graphite-soft">{caption}</figcaption>
    </figure>
  );
}
