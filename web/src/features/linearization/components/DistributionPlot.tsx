import { scaleLinear } from "d3";
import { useEffect, useRef, useState } from "react";
import type { Distribution } from "../model/distribution";
import { PlotGridTicks } from "../../../components/PlotGridTicks";
import { axisTickFormat } from "../../../lib/number-format";

/** Drawn at the width it is shown (so its labels keep their size on a phone), never narrower than this. */
const MIN_WIDTH = 300;
const H = 260;
const M = { left: 58, right: 16, top: 12, bottom: 42 };

const SERIES = [
  { key: "total", label: "total", stroke: "#2a2c30", dash: undefined },
  { key: "membrane", label: "membrane", stroke: "#1d5a55", dash: "6 4" },
  { key: "membranePlusBending", label: "membrane + bending", stroke: "#a4502a", dash: "2 3" },
] as const;

/**
 * One local component through the wall: distance from the first point across, stress up, the
 * total at the points (dots joined), the membrane and membrane + bending lines; a legend names
 * each line. d3 only scales: the numbers are the server's.
 */
export function DistributionPlot({
  distribution,
  symbol,
  lengthUnit,
  stressUnit,
}: {
  distribution: Distribution;
  symbol: string;
  lengthUnit: string;
  stressUnit: string;
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
  const { x: xs } = distribution;
  const all = [...distribution.total, ...distribution.membrane, ...distribution.membranePlusBending];
  const lo = Math.min(0, ...all);
  const hi = Math.max(0, ...all);
  const x = scaleLinear()
    .domain([xs[0], xs[xs.length - 1]])
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
    values.map((v, i) => `${i === 0 ? "M" : "L"}${x(xs[i]).toFixed(2)},${y(v).toFixed(2)}`).join("");
  return (
    <div ref={box} className="w-full">
      <ul className="flex flex-wrap gap-x-4 gap-y-1 px-3 pt-2 text-[13px]" aria-hidden="true">
        {SERIES.map((s) => (
          <li key={s.key} className="inline-flex items-center gap-1.5">
            <svg width="22" height="8">
              <line x1="0" x2="22" y1="4" y2="4" stroke={s.stroke} strokeWidth="2" strokeDasharray={s.dash} />
            </svg>
            {s.label}
          </li>
        ))}
      </ul>
      <svg
        viewBox={`0 0 ${W} ${H}`}
        className="h-auto w-full bg-grid bg-[length:16px_16px]"
        role="img"
        aria-label={`${symbol} through the wall in ${stressUnit} against the distance from the first point in ${lengthUnit}: total, membrane and membrane + bending`}
        data-testid="distribution-plot"
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
        <text x={(M.left + W - M.right) / 2} y={H - 6} textAnchor="middle" fontSize="12" fill="#2a2c30">
          distance from the first point x ({xf.multiplier}
          {lengthUnit})
        </text>
        <text
          transform={`translate(14 ${(M.top + H - M.bottom) / 2}) rotate(-90)`}
          textAnchor="middle"
          fontSize="12"
          fill="#2a2c30"
        >
          {symbol} ({yf.multiplier}
          {stressUnit})
        </text>
        {SERIES.map((s) => (
          <path
            key={s.key}
            data-series={s.key}
            d={path(distribution[s.key])}
            fill="none"
            stroke={s.stroke}
            strokeWidth={1.75}
            strokeDasharray={s.dash}
          />
        ))}
        {distribution.total.map((v, i) => (
          <circle key={i} cx={x(xs[i])} cy={y(v)} r={2.5} fill="#2a2c30" />
        ))}
      </svg>
    </div>
  );
}
