/**
 * An SVG chart axis drawn by React from ticks computed in core/diagrams: the same elements and
 * attributes d3-axis writes (a domain line without outer ticks, a 6-unit tick mark and the label
 * 9 units out), so the diagrams look as they did when d3 drew their axes into the DOM.
 */
import type { Tick } from "../../../core/diagrams";

/** d3-axis's half-pixel shift that keeps 1-unit lines crisp on screens with one device pixel per unit. */
function crispOffset(): number {
  return typeof window !== "undefined" && window.devicePixelRatio > 1 ? 0 : 0.5;
}

const TICK_SIZE = 6;
const TICK_PADDING = 3;

/**
 * @param orient "bottom": a horizontal axis with labels below; "left": vertical, labels to the left
 * @param ticks positions along the axis (SVG units) and labels
 * @param range the axis's drawing interval (where its line starts and ends)
 * @param transform where the axis sits (e.g. translate(0 210))
 */
export function SvgAxis({
  orient,
  ticks,
  range,
  transform,
  className,
}: {
  orient: "bottom" | "left";
  ticks: readonly Tick[];
  range: readonly [number, number];
  transform: string;
  className?: string;
}) {
  const o = crispOffset();
  const bottom = orient === "bottom";
  const spacing = TICK_SIZE + TICK_PADDING;
  return (
    <g
      transform={transform}
      className={className}
      aria-hidden="true"
      fill="none"
      fontSize={10}
      fontFamily="sans-serif"
      textAnchor={bottom ? "middle" : "end"}
    >
      <path
        className="domain"
        stroke="currentColor"
        d={bottom ? `M${range[0] + o},${o}H${range[1] + o}` : `M${o},${range[0] + o}V${range[1] + o}`}
      />
      {ticks.map((t) => (
        <g
          key={t.value}
          className="tick"
          opacity={1}
          transform={bottom ? `translate(${t.at + o},0)` : `translate(0,${t.at + o})`}
        >
          {bottom ? (
            <line stroke="currentColor" y2={TICK_SIZE} />
          ) : (
            <line stroke="currentColor" x2={-TICK_SIZE} />
          )}
          {bottom ? (
            <text fill="currentColor" y={spacing} dy="0.71em">
              {t.label}
            </text>
          ) : (
            <text fill="currentColor" x={-spacing} dy="0.32em">
              {t.label}
            </text>
          )}
        </g>
      ))}
    </g>
  );
}
