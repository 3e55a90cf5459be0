import { PlotGridTicks } from "../../../components/PlotGridTicks";
import { useThroughWallScales } from "../../../components/use-through-wall-scales";

/** One line of the plot: its name (as typeset on the page), its stroke and its values by radius. */
export type PlotSeries = {
  id: string;
  label: string;
  stroke: string;
  dash?: string;
  values: readonly number[];
};

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
  } = useThroughWallScales(
    radii,
    series.flatMap((s) => s.values),
    H,
    M,
  );
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
