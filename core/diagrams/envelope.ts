/**
 * Geometry of the failure-envelope plot in the σA–σB plane (plane stress), without React or a DOM,
 * so the bench and a printed report draw the same picture: a square plot symmetric about the origin
 * that holds every envelope and the state, its ticks, the closed envelope outlines, the state and
 * the ray from the origin through it to the first envelope.
 */
import { decimalsFor } from "./fixed-decimals";
import { plotArea, type Frame } from "./frame";
import { linearScale, type LinearScale } from "./linear-scale";
import { polylinePath } from "./polyline";
import { axisTicks, type AxisTicks } from "./tick-format";

/** The bench's envelope plot frame (viewBox 300 × 270). */
export const ENVELOPE_FRAME: Frame = {
  width: 300,
  height: 270,
  margin: { left: 46, right: 10, top: 10, bottom: 34 },
};

/** Ticks asked of each axis. */
const TICKS = 5;

/** Margin beyond the farthest envelope point or state, as a fraction of it. */
export const ENVELOPE_MARGIN = 0.08;

export type EnvelopeInput<K extends string = string> = {
  /** closed outlines, one per criterion, points (σA, σB) in the plot's unit */
  curves: readonly { key: K; points: readonly (readonly [number, number])[] }[];
  /** the state (σA, σB) in the plot's unit, or null when it is not plane stress */
  state: readonly [number, number] | null;
  /** where the ray from the origin through the state meets the first envelope, plot's unit */
  rayEnd: readonly [number, number] | null;
  frame?: Frame;
};

export type EnvelopeGeometry<K extends string = string> = {
  frame: Frame;
  /** the square plot area */
  plot: { x: number; y: number; width: number; height: number };
  /** the plot spans −extent … extent on both axes */
  extent: number;
  x: LinearScale;
  y: LinearScale;
  xTicks: AxisTicks;
  yTicks: AxisTicks;
  decimals: number;
  axisLines: { a: { x1: number; x2: number; y: number }; b: { x: number; y1: number; y2: number } };
  curves: { key: K; d: string }[];
  state: { cx: number; cy: number } | null;
  ray: { x1: number; y1: number; x2: number; y2: number } | null;
  /** where the axis titles go: σA under the plot at its right end, σB turned up beside its middle */
  titles: { a: { x: number; y: number }; b: { x: number; y: number } };
};

/** The half-width of the plot: the farthest envelope point or state coordinate, plus the margin (1 when there is nothing). */
export function envelopeExtent(
  curves: EnvelopeInput["curves"],
  state: readonly [number, number] | null,
): number {
  let m = 0;
  for (const c of curves) for (const [a, b] of c.points) m = Math.max(m, Math.abs(a), Math.abs(b));
  if (state) m = Math.max(m, Math.abs(state[0]), Math.abs(state[1]));
  return m > 0 ? m * (1 + ENVELOPE_MARGIN) : 1;
}

/** The whole plot's geometry. */
export function envelopeGeometry<K extends string>(input: EnvelopeInput<K>): EnvelopeGeometry<K> {
  const frame = input.frame ?? ENVELOPE_FRAME;
  const area = plotArea(frame);
  const size = Math.min(area.width, area.height);
  const plot = { x: area.x, y: area.y, width: size, height: size };
  const extent = envelopeExtent(input.curves, input.state);
  const x = linearScale([-extent, extent], [plot.x, plot.x + size]);
  const y = linearScale([-extent, extent], [plot.y + size, plot.y]);
  const { state, rayEnd } = input;
  return {
    frame,
    plot,
    extent,
    x,
    y,
    xTicks: axisTicks(x, TICKS),
    yTicks: axisTicks(y, TICKS),
    decimals: decimalsFor(extent),
    axisLines: {
      a: { x1: x.map(-extent), x2: x.map(extent), y: y.map(0) },
      b: { x: x.map(0), y1: y.map(-extent), y2: y.map(extent) },
    },
    curves: input.curves.map((c) => ({ key: c.key, d: polylinePath(c.points, x.map, y.map, true) })),
    state: state && { cx: x.map(state[0]), cy: y.map(state[1]) },
    ray: state && rayEnd && { x1: x.map(0), y1: y.map(0), x2: x.map(rayEnd[0]), y2: y.map(rayEnd[1]) },
    titles: { a: { x: plot.x + size, y: frame.height - 1 }, b: { x: 11, y: plot.y + size / 2 } },
  };
}

/** True when the drawing point (px, py) lies on the plot (edges included). */
export function onEnvelopePlot(g: Pick<EnvelopeGeometry, "plot">, px: number, py: number): boolean {
  const p = g.plot;
  return px >= p.x && px <= p.x + p.width && py >= p.y && py <= p.y + p.height;
}
