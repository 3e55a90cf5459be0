import { scaleLinear } from "d3";
import { useEffect, useRef, useState } from "react";
import { PlotGridTicks } from "../../../components/PlotGridTicks";
import { axisTickFormat } from "../../../lib/number-format";

/** One line of the plot: its name (as typeset on the page), its stroke and its values by radius. */
export type PlotSeries = {
  id: string;
  label: string;
  stroke: string;
  dash?: string;
  values: readonly number[];
};

/** Drawn at the width it is shown (so its labels keep their size on a phone), never narrower than this. */
const MIN_WIDTH = 300;
const H = 260;
const M = { left: 56, right: 70, top: 12, bottom: 40 };

/**
 * The stresses through the wall, radius across and stress up, each line named at its outside end
 * and the axes labelled with their units; the chosen radius is marked. d3 only scales: the
 * mechanics come from core.
 */
export function ThroughWallPlot({
  radii,
  series,
  lengthUnit,
  stressUnit,
  marked,
}: {
  radii: readonly number[];
  series: readonly PlotSeries[];
  lengthUnit: string;
  stressUnit: string;
  marked: number;
}) {
  const box = useRef<HTMLDivElement>(null);
  const [W, setW] = useState(560);
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const observer = new ResizeObserver(([entry]) =>
      setW(Math.max(MIN_WIDTH, Math.round(entry.contentRect.width))),
    );
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  const all = series.flatMap((s) => s.values);
  const lo = Math.min(0, ...all);
  const hi = Math.max(0, ...all);
  const x = scaleLinear()
    .domain([radii[0], radii[radii.length - 1]])
    .range([M.left, W - M.right]);
  const y = scaleLinear()
    .domain([lo, hi === lo ? lo + 1 : hi])
    .nice()
    .range([H - M.bottom, M.top]);
  const xTicks = x.ticks(W < 450 ? 4 : 6);
  const yTicks = y.ticks(6);
  const xf = axisTickFormat(xTicks);
  const yf = axisTickFormat(yTicks);
  const path = (values: readonly number[]) =>
    values.map((v, i) => `${i === 0 ? "M" : "L"}${x(radii[i]).toFixed(2)},${y(v).toFixed(2)}`).join("");
  return (
    <div ref={box} className="w-full">
      <svg
        viewBox={`0 0 ${W} ${H}`}
        className="h-auto w-full bg-grid bg-[length:16px_16px]"
        role="img"
        aria-label={`Stresses through the wall: ${series.map((s) => s.label).join(", ")} in ${stressUnit} against radius in ${lengthUnit}`}
        data-testid="through-wall-plot"
      >
        <PlotGridTicks
          width={W}
          height={H}
          margins={M}
          x={x}
          y={y}
          xTicks={xTicks}
          yTicks={yTicks}
          xFormat={xf}
          yFormat={yf}
        />
        <line
          x1={x(marked)}
          x2={x(marked)}
          y1={M.top}
          y2={H - M.bottom}
          stroke="#1d5a55"
          strokeDasharray="3 3"
          strokeWidth={1}
        />
        <text x={(M.left + W - M.right) / 2} y={H - 6} textAnchor="middle" fontSize="12" fill="#2a2c30">
          radius r ({xf.multiplier}
          {lengthUnit})
        </text>
        <text
          transform={`translate(14 ${(M.top + H - M.bottom) / 2}) rotate(-90)`}
          textAnchor="middle"
          fontSize="12"
          fill="#2a2c30"
        >
          stress ({yf.multiplier}
          {stressUnit})
        </text>
        {series.map((s, k) => {
          const last = s.values[s.values.length - 1];
          return (
            <g key={s.id} data-series={s.id}>
              <path
                d={path(s.values)}
                fill="none"
                stroke={s.stroke}
                strokeWidth={1.75}
                strokeDasharray={s.dash}
              />
              <text x={W - M.right + 6} y={y(last) + (k - 1) * 4} dy="0.32em" fontSize="12" fill={s.stroke}>
                {s.label}
              </text>
            </g>
          );
        })}
      </svg>
    </div>
  );
}
