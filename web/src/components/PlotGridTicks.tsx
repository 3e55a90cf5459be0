/** Inner margins of a plot, in viewBox units. */
export type PlotMargins = { left: number; right: number; top: number; bottom: number };

type TickFormat = { format: (value: number) => string };

/**
 * The frame every line plot of stresses draws under its curves: one horizontal grid line per
 * stress tick (the zero line darker), the stress tick labels at the left, the distance tick labels
 * below and the left axis line. The through-wall plots of the calculators and of the
 * linearization screen share it so their grids read the same.
 */
export function PlotGridTicks({
  width,
  height,
  margins: M,
  x,
  y,
  xTicks,
  yTicks,
  xFormat,
  yFormat,
}: {
  width: number;
  height: number;
  margins: PlotMargins;
  x: (value: number) => number;
  y: (value: number) => number;
  xTicks: readonly number[];
  yTicks: readonly number[];
  xFormat: TickFormat;
  yFormat: TickFormat;
}) {
  return (
    <>
      {yTicks.map((t) => (
        <g key={`y${t}`}>
          <line
            x1={M.left}
            x2={width - M.right}
            y1={y(t)}
            y2={y(t)}
            stroke={t === 0 ? "#5b5e66" : "#d8d1c1"}
            strokeWidth={t === 0 ? 1 : 0.5}
          />
          <text
            x={M.left - 6}
            y={y(t)}
            dy="0.32em"
            textAnchor="end"
            className="num"
            fontSize="11"
            fill="#5b5e66"
          >
            {yFormat.format(t)}
          </text>
        </g>
      ))}
      {xTicks.map((t) => (
        <text
          key={`x${t}`}
          x={x(t)}
          y={height - M.bottom + 15}
          textAnchor="middle"
          className="num"
          fontSize="11"
          fill="#5b5e66"
        >
          {xFormat.format(t)}
        </text>
      ))}
      <line x1={M.left} x2={M.left} y1={M.top} y2={height - M.bottom} stroke="#5b5e66" strokeWidth={1} />
    </>
  );
}
