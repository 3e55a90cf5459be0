import { axisBottom, axisLeft, line, scaleLinear, select } from "d3";
import {
  useEffect,
  useMemo,
  useRef,
  useState,
  type FocusEvent,
  type KeyboardEvent,
  type PointerEvent,
} from "react";
import { Panel } from "../../../components/Panel";
import { CRITERIA, convertStress, type Criterion } from "../../../../../core";
import { useEnvelopes, useSummary } from "../hooks/use-derived";
import {
  CRITERION_LABEL,
  envelopeProbe,
  envelopeRay,
  planePairNames,
  planePrincipals,
} from "../model/derive";
import { factor, fixed, decimalsFor } from "../model/format";
import { axisTickFormat } from "../../../lib/number-format";
import { useBenchStore } from "../model/store";
import { useOutOfDate } from "../hooks/use-out-of-date";

const W = 300;
const H = 270;
const M = { left: 46, right: 10, top: 10, bottom: 34 };

/** Stroke style per criterion: distinguished by dash pattern as well as shade, never by colour alone. */
const STYLE: Readonly<Record<Criterion, { dash: string; className: string }>> = {
  "von-mises": { dash: "", className: "stroke-ink" },
  tresca: { dash: "6 3", className: "stroke-graphite" },
  "max-principal": { dash: "2 3", className: "stroke-graphite-soft" },
  "mohr-coulomb": { dash: "8 3 2 3", className: "stroke-close" },
  "modified-mohr": { dash: "1 2", className: "stroke-fail" },
};

/** Panel 6: the failure envelopes in the σA–σB plane for plane stress, with the state and its safety-factor ray. */
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
  const toUnit = (mpa: number) => convertStress(mpa, "MPa", unit);
  const stateMpa = ab && ([convertStress(ab[0], unit, "MPa"), convertStress(ab[1], unit, "MPa")] as const);
  const first = curves[0]?.criterion;
  const ray = stateMpa && first ? envelopeRay(stateMpa[0], stateMpa[1], first, material) : null;

  const extent = useMemo(() => {
    let m = 0;
    for (const c of curves) for (const [a, b] of c.points) m = Math.max(m, Math.abs(a), Math.abs(b));
    if (stateMpa) m = Math.max(m, Math.abs(stateMpa[0]), Math.abs(stateMpa[1]));
    return toUnit(m > 0 ? m * 1.08 : 1);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [curves, stateMpa?.[0], stateMpa?.[1], unit]);
  const size = Math.min(W - M.left - M.right, H - M.top - M.bottom);
  const x = useMemo(
    () =>
      scaleLinear()
        .domain([-extent, extent])
        .range([M.left, M.left + size]),
    [extent, size],
  );
  const y = useMemo(
    () =>
      scaleLinear()
        .domain([-extent, extent])
        .range([M.top + size, M.top]),
    [extent, size],
  );
  const xAxis = useRef<SVGGElement>(null);
  const yAxis = useRef<SVGGElement>(null);
  // Short tick labels in any unit: Pa values are written under a power of ten named by the title.
  const xTicks = useMemo(() => axisTickFormat(x.ticks(5)), [x]);
  const yTicks = useMemo(() => axisTickFormat(y.ticks(5)), [y]);
  useEffect(() => {
    if (xAxis.current)
      select(xAxis.current).call(
        axisBottom(x)
          .ticks(5)
          .tickSizeOuter(0)
          .tickFormat((v) => xTicks.format(Number(v))),
      );
    if (yAxis.current)
      select(yAxis.current).call(
        axisLeft(y)
          .ticks(5)
          .tickSizeOuter(0)
          .tickFormat((v) => yTicks.format(Number(v))),
      );
  }, [x, y, xTicks, yTicks]);
  const path = line<[number, number]>()
    .x((p) => x(toUnit(p[0])))
    .y((p) => y(toUnit(p[1])));
  const d = decimalsFor(extent);

  // The probed point (bench unit): under the pointer, or moved with the arrow keys while the plot has focus.
  const svg = useRef<SVGSVGElement>(null);
  const [probe, setProbe] = useState<[number, number] | null>(null);
  const drawn = curves.map((c) => c.criterion);
  const reading = probe && envelopeProbe(probe[0], probe[1], unit, drawn, material);
  const clampToPlot = (v: number) => Math.max(-extent, Math.min(extent, v));

  function onPointerMove(event: PointerEvent<SVGSVGElement>) {
    const el = svg.current!;
    const pt = el.createSVGPoint();
    pt.x = event.clientX;
    pt.y = event.clientY;
    const local = pt.matrixTransform(el.getScreenCTM()!.inverse());
    const inside =
      local.x >= M.left && local.x <= M.left + size && local.y >= M.top && local.y <= M.top + size;
    setProbe(inside ? [x.invert(local.x), y.invert(local.y)] : null);
  }

  function onKeyDown(event: KeyboardEvent<SVGSVGElement>) {
    const step = (extent / 20) * (event.shiftKey ? 5 : 1);
    const at = probe ?? [0, 0];
    const moves: Record<string, [number, number]> = {
      ArrowRight: [step, 0],
      ArrowLeft: [-step, 0],
      ArrowUp: [0, step],
      ArrowDown: [0, -step],
    };
    if (event.key === "Escape") setProbe(null);
    else if (event.key === "Home") setProbe(ab ? [ab[0], ab[1]] : [0, 0]);
    else if (moves[event.key])
      setProbe([clampToPlot(at[0] + moves[event.key][0]), clampToPlot(at[1] + moves[event.key][1])]);
    else return;
    event.preventDefault();
  }

  function onFocus(event: FocusEvent<SVGSVGElement>) {
    // Keyboard users start the probe on the state (or the origin).
    if (event.target === svg.current && probe === null) setProbe(ab ? [ab[0], ab[1]] : [0, 0]);
  }

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
        viewBox={`0 0 ${W} ${H}`}
        className="block h-auto w-[56%] max-w-[300px] min-w-0 shrink-0 cursor-crosshair rounded-sm outline-none focus-visible:ring-2 focus-visible:ring-ink"
        role="group"
        tabIndex={0}
        aria-labelledby="envelope-title"
        aria-describedby="envelope-probe"
        aria-roledescription="envelope plot"
        onPointerMove={onPointerMove}
        onPointerLeave={() => setProbe(null)}
        onKeyDown={onKeyDown}
        onFocus={onFocus}
        onBlur={() => setProbe(null)}
        data-testid="envelope-svg"
      >
        <title id="envelope-title">
          {ab
            ? `Failure envelopes of ${curves.map((c) => CRITERION_LABEL[c.criterion]).join(", ")} with the state (${fixed(ab[0], d)}, ${fixed(ab[1], d)}) ${unit}`
            : "Failure envelopes; the current state is triaxial and is not shown"}
        </title>
        <rect
          x={M.left}
          y={M.top}
          width={size}
          height={size}
          fill="url(#mohr-grid)"
          className="stroke-rule"
        />
        <line x1={x(-extent)} x2={x(extent)} y1={y(0)} y2={y(0)} className="stroke-graphite-faint" />
        <line x1={x(0)} x2={x(0)} y1={y(-extent)} y2={y(extent)} className="stroke-graphite-faint" />
        {curves.map((c) => (
          <path
            key={c.criterion}
            d={`${path(c.points) ?? ""}Z`}
            fill="none"
            strokeWidth={1.4}
            strokeDasharray={STYLE[c.criterion].dash}
            className={STYLE[c.criterion].className}
          />
        ))}
        {ab && ray && (
          <line
            x1={x(0)}
            y1={y(0)}
            x2={x(toUnit(ray.point[0]))}
            y2={y(toUnit(ray.point[1]))}
            className="stroke-graphite-soft"
            strokeDasharray="3 2"
            strokeWidth={1}
          />
        )}
        {ab && ray && (
          <circle
            cx={x(toUnit(ray.point[0]))}
            cy={y(toUnit(ray.point[1]))}
            r={3}
            className="fill-panel stroke-graphite"
          />
        )}
        {ab && (
          <circle
            cx={x(ab[0])}
            cy={y(ab[1])}
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
                x1={x(0)}
                y1={y(0)}
                x2={x(reading.nearest.point[0])}
                y2={y(reading.nearest.point[1])}
                className="stroke-ink"
                strokeDasharray="1 2"
                strokeWidth={1}
              />
            )}
            <line
              x1={x(probe[0]) - 6}
              x2={x(probe[0]) + 6}
              y1={y(probe[1])}
              y2={y(probe[1])}
              className="stroke-ink"
            />
            <line
              x1={x(probe[0])}
              x2={x(probe[0])}
              y1={y(probe[1]) - 6}
              y2={y(probe[1]) + 6}
              className="stroke-ink"
            />
            {reading?.nearest && (
              <circle
                cx={x(reading.nearest.point[0])}
                cy={y(reading.nearest.point[1])}
                r={2.5}
                className="fill-ink"
              />
            )}
          </g>
        )}
        <g
          ref={xAxis}
          transform={`translate(0 ${M.top + size})`}
          className="font-mono text-[10px] text-graphite-soft"
          aria-hidden="true"
        />
        <g
          ref={yAxis}
          transform={`translate(${M.left} 0)`}
          className="font-mono text-[10px] text-graphite-soft"
          aria-hidden="true"
        />
        <text x={M.left + size} y={H - 1} textAnchor="end" className="fill-graphite text-[11px]">
          σA, {xTicks.multiplier}
          {unit}
        </text>
        <text
          transform={`translate(11 ${M.top + size / 2}) rotate(-90)`}
          textAnchor="middle"
          className="fill-graphite text-[11px]"
        >
          σB, {yTicks.multiplier}
          {unit}
        </text>
      </svg>
      <div className="min-w-0 flex-1 space-y-1 text-[12px] leading-4">
        <fieldset>
          <legend className="mb-0.5 text-graphite-soft">Draw</legend>
          {CRITERIA.map((c) => (
            <label key={c} className="flex items-center gap-1.5">
              <input type="checkbox" checked={chosen.includes(c)} onChange={() => act.toggleEnvelope(c)} />
              <svg width="22" height="6" aria-hidden="true">
                <line
                  x1="0"
                  x2="22"
                  y1="3"
                  y2="3"
                  strokeWidth={1.6}
                  strokeDasharray={STYLE[c].dash}
                  className={STYLE[c].className}
                />
              </svg>
              {CRITERION_LABEL[c]}
            </label>
          ))}
        </fieldset>
        <p
          id="envelope-probe"
          aria-live="polite"
          className="min-h-8 text-graphite"
          data-testid="envelope-probe"
        >
          {probe ? (
            <>
              Point (σA, σB) = (<span className="num">{fixed(probe[0], d)}</span>,{" "}
              <span className="num">{fixed(probe[1], d)}</span>) <span className="unit">{unit}</span>
              {reading?.nearest ? (
                <>
                  ; nearest along its ray: {CRITERION_LABEL[reading.nearest.criterion]}, at{" "}
                  <span className="num" data-testid="envelope-probe-n">
                    {factor(reading.nearest.n)}
                  </span>{" "}
                  × the point.
                </>
              ) : (
                "; no envelope on its ray."
              )}
            </>
          ) : (
            <span className="text-graphite-soft">
              Point at the plot (or focus it and use the arrow keys) to read σA, σB and the nearest envelope.
            </span>
          )}
        </p>
        {ab ? (
          <p className="text-graphite-soft" data-testid="envelope-ray">
            State (σA, σB) = ({pairNames?.join(", ")}) = (<span className="num">{fixed(ab[0], d)}</span>,{" "}
            <span className="num">{fixed(ab[1], d)}</span>) {unit}.{" "}
            {ray && first ? (
              <>
                The dashed ray meets the {CRITERION_LABEL[first]} envelope at n ={" "}
                <span className="num text-graphite">{factor(ray.n)}</span> times the state.
              </>
            ) : (
              "No envelope drawn for this state."
            )}
          </p>
        ) : (
          <p className="text-graphite-soft">
            The state is triaxial (no principal stress is zero): this plot applies to plane stress; the table
            still holds.
          </p>
        )}
      </div>
    </Panel>
  );
}
