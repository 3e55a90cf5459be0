import { scaleLinear } from "d3";
import { useEffect, useRef, useState } from "react";
import { axisTickFormat } from "../lib/number-format";

/** Drawn at the width it is shown (so its labels keep their size on a phone), never narrower than this. */
const MIN_WIDTH = 300;

export type PlotMargins = { left: number; right: number; top: number; bottom: number };

/**
 * The scales of a plot through a wall (position across, stress up, zero always in view), sized to
 * the box it is drawn in: the calculators' Lamé profiles and the linearization's distributions draw
 * on it, so both keep one idea of ticks, formats and width. d3 only scales.
 * @param xs the positions across the wall, in order
 * @param values every stress the plot draws (for the vertical extent)
 */
export function useThroughWallScales(
  xs: readonly number[],
  values: readonly number[],
  height: number,
  margins: PlotMargins,
) {
  const box = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(560);
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const observer = new ResizeObserver(([entry]) =>
      setWidth(Math.max(MIN_WIDTH, Math.round(entry.contentRect.width))),
    );
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  const lo = Math.min(0, ...values);
  const hi = Math.max(0, ...values);
  const x = scaleLinear()
    .domain([xs[0], xs[xs.length - 1]])
    .range([margins.left, width - margins.right]);
  const y = scaleLinear()
    .domain([lo, hi === lo ? lo + 1 : hi])
    .nice()
    .range([height - margins.bottom, margins.top]);
  const xTicks = x.ticks(width < 450 ? 4 : 6);
  const yTicks = y.ticks(6);
  /** An SVG path through the values at `xs`. */
  const path = (series: readonly number[]) =>
    series.map((v, i) => `${i === 0 ? "M" : "L"}${x(xs[i]).toFixed(2)},${y(v).toFixed(2)}`).join("");
  return {
    box,
    width,
    x,
    y,
    xTicks,
    yTicks,
    xFormat: axisTickFormat(xTicks),
    yFormat: axisTickFormat(yTicks),
    path,
  };
}
