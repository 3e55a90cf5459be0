import type { Distribution } from "../model/distribution";
import { PlotGridTicks } from "../../../components/PlotGridTicks";
import { useThroughWallScales } from "../../../components/use-through-wall-scales";

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
  const { x: xs } = distribution;
  const all = [...distribution.total, ...distribution.membrane, ...distribution.membranePlusBending];
  const {
    box,
    width: W,
    x,
    y,
    xTicks,
    yTicks,
    xFormat: xf,
    yFormat: yf,
    path,
  } = useThroughWallScales(xs, all, H, M);
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
