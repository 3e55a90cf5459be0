/**
 * Panel 5: the failure envelopes in the σA–σB plane for plane stress, with the state, its
 * safety-factor ray and a probe. Scales, ticks and outlines come from core/diagrams/envelope.ts,
 * the probe's handling from hooks/use-envelope-probe.ts; this file draws.
 */
import { useMemo, useRef } from "react";
import { convertStress } from "../../../../../core";
import { envelopeGeometry } from "../../../../../core/diagrams";
import { Panel } from "../../../components/Panel";
import { SvgAxis } from "../../../components/SvgAxis";
import { useEnvelopeProbe } from "../hooks/use-envelope-probe";
import { useEnvelopes, useSummary } from "../hooks/use-derived";
import { useOutOfDate } from "../hooks/use-out-of-date";
import {
  CRITERION_LABEL,
  envelopeProbe,
  envelopeRay,
  planePairNames,
  planePrincipals,
} from "../model/derive";
import { fixed } from "../model/format";
import { useBenchStore } from "../model/store";
import { EnvelopeNotes } from "./EnvelopeNotes";
import { ENVELOPE_STYLE } from "./envelope-style";

export function EnvelopePlot() {
  const outOfDate = useOutOfDate();
  const unit = useBenchStore((s) => s.unit);
  const chosen = useBenchStore((s) => s.envelopeCriteria);
  const material = useBenchStore((s) => s.material);
  const act = useBenchStore((s) => s.act);
  const summary = useSummary();
  const curves = useEnvelopes();
  const ab = planePrincipals(summary.principal.values);
  const pairNames = planePairNames(summary.principal.values);
  const first = curves[0]?.criterion;
  const ray =
    ab && first
      ? envelopeRay(convertStress(ab[0], unit, "MPa"), convertStress(ab[1], unit, "MPa"), first, material)
      : null;

  // Envelopes come in MPa; the plot is drawn in the bench unit.
  const g = useMemo(() => {
    const toUnit = (mpa: number) => convertStress(mpa, "MPa", unit);
    return envelopeGeometry({
      curves: curves.map((c) => ({
        key: c.criterion,
        points: c.points.map(([a, b]) => [toUnit(a), toUnit(b)] as const),
      })),
      state: ab,
      rayEnd: ray && [toUnit(ray.point[0]), toUnit(ray.point[1])],
    });
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [curves, ab?.[0], ab?.[1], ray?.point[0], ray?.point[1], unit]);
  const { plot, frame, x, y, decimals: d } = g;

  const svg = useRef<SVGSVGElement>(null);
  const { probe, handlers } = useEnvelopeProbe({ svg, geometry: g, state: ab });
  const reading =
    probe &&
    envelopeProbe(
      probe[0],
      probe[1],
      unit,
      curves.map((c) => c.criterion),
      material,
    );

  return (
    <Panel
      outOfDate={outOfDate}
      id="envelope"
      index="5"
      title="Failure envelopes"
      subtitle={`σA–σB, plane stress, ${unit}`}
      bodyClassName="flex gap-2 px-2 py-1.5"
    >
      <svg
        ref={svg}
        viewBox={`0 0 ${frame.width} ${frame.height}`}
        className="block h-auto w-[56%] max-w-[300px] min-w-0 shrink-0 cursor-crosshair rounded-sm outline-none focus-visible:ring-2 focus-visible:ring-ink"
        role="group"
        tabIndex={0}
        aria-labelledby="envelope-title"
        aria-describedby="envelope-probe"
        aria-roledescription="envelope plot"
        {...handlers}
        data-testid="envelope-svg"
      >
        <title id="envelope-title">
          {ab
            ? `Failure envelopes of ${curves.map((c) => CRITERION_LABEL[c.criterion]).join(", ")} with the state (${fixed(ab[0], d)}, ${fixed(ab[1], d)}) ${unit}`
            : "Failure envelopes; the current state is triaxial and is not shown"}
        </title>
        <rect
          x={plot.x}
          y={plot.y}
          width={plot.width}
          height={plot.height}
          fill="url(#mohr-grid)"
          className="stroke-rule"
        />
        <line
          x1={g.axisLines.a.x1}
          x2={g.axisLines.a.x2}
          y1={g.axisLines.a.y}
          y2={g.axisLines.a.y}
          className="stroke-graphite-faint"
        />
        <line
          x1={g.axisLines.b.x}
          x2={g.axisLines.b.x}
          y1={g.axisLines.b.y1}
          y2={g.axisLines.b.y2}
          className="stroke-graphite-faint"
        />
        {g.curves.map((c) => (
          <path
            key={c.key}
            d={c.d}
            fill="none"
            strokeWidth={1.4}
            strokeDasharray={ENVELOPE_STYLE[c.key].dash}
            className={ENVELOPE_STYLE[c.key].className}
          />
        ))}
        {g.ray && (
          <line
            x1={g.ray.x1}
            y1={g.ray.y1}
            x2={g.ray.x2}
            y2={g.ray.y2}
            className="stroke-graphite-soft"
            strokeDasharray="3 2"
            strokeWidth={1}
          />
        )}
        {g.ray && <circle cx={g.ray.x2} cy={g.ray.y2} r={3} className="fill-panel stroke-graphite" />}
        {g.state && (
          <circle
            cx={g.state.cx}
            cy={g.state.cy}
            r={4.5}
            className="fill-tension stroke-panel"
            strokeWidth={1.5}
            data-testid="envelope-state"
          />
        )}
        {probe && (
          <g data-testid="envelope-probe-mark" aria-hidden="true" pointerEvents="none">
            {reading?.nearest && (
              <line
                x1={x.map(0)}
                y1={y.map(0)}
                x2={x.map(reading.nearest.point[0])}
                y2={y.map(reading.nearest.point[1])}
                className="stroke-ink"
                strokeDasharray="1 2"
                strokeWidth={1}
              />
            )}
            <line
              x1={x.map(probe[0]) - 6}
              x2={x.map(probe[0]) + 6}
              y1={y.map(probe[1])}
              y2={y.map(probe[1])}
              className="stroke-ink"
            />
            <line
              x1={x.map(probe[0])}
              x2={x.map(probe[0])}
              y1={y.map(probe[1]) - 6}
              y2={y.map(probe[1]) + 6}
              className="stroke-ink"
            />
            {reading?.nearest && (
              <circle
                cx={x.map(reading.nearest.point[0])}
                cy={y.map(reading.nearest.point[1])}
                r={2.5}
                className="fill-ink"
              />
            )}
          </g>
        )}
        <SvgAxis
          orient="bottom"
          ticks={g.xTicks.ticks}
          range={x.range}
          transform={`translate(0 ${plot.y + plot.height})`}
          className="font-mono text-[10px] text-graphite-soft"
        />
        <SvgAxis
          orient="left"
          ticks={g.yTicks.ticks}
          range={y.range}
          transform={`translate(${plot.x} 0)`}
          className="font-mono text-[10px] text-graphite-soft"
        />
        <text x={g.titles.a.x} y={g.titles.a.y} textAnchor="end" className="fill-graphite text-[11px]">
          σA, {g.xTicks.multiplier}
          {unit}
        </text>
        <text
          transform={`translate(${g.titles.b.x} ${g.titles.b.y}) rotate(-90)`}
          textAnchor="middle"
          className="fill-graphite text-[11px]"
        >
          σB, {g.yTicks.multiplier}
          {unit}
        </text>
      </svg>
      <EnvelopeNotes
        chosen={chosen}
        onToggle={act.toggleEnvelope}
        unit={unit}
        decimals={d}
        probe={probe}
        reading={reading}
        state={ab}
        pairNames={pairNames}
        ray={ray}
        first={first}
      />
    </Panel>
  );
}
