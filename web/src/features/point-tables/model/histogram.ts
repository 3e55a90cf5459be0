/**
 * The utilisation histogram's geometry: one bar per bin of core's UtilisationHistogram (the last
 * one open: every u at or above its start), the axes' scales and ticks, in plain numbers so the
 * component only draws.
 */
import { scaleLinear } from "d3";
import { verdictForUtilisation, type UtilisationHistogram, type Verdict } from "../../../../../core";
import type { Tick } from "../../../../../core/diagrams";

export type HistogramBar = {
  from: number;
  /** null for the last, open bin */
  to: number | null;
  count: number;
  x: number;
  width: number;
  y: number;
  height: number;
  /** the verdict at the bin's middle (the open last bin: at its start), for the bar's tooltip */
  verdict: Verdict;
};

export type HistogramGeometry = {
  bars: HistogramBar[];
  xTicks: Tick[];
  yTicks: Tick[];
  /** where u = 1 (the required factor) falls on the x axis */
  requiredAt: number;
};

/** Lays the bins out in a plot of `width` × `height` px (the axes' margins are the caller's). */
export function histogramGeometry(h: UtilisationHistogram, width: number, height: number): HistogramGeometry {
  const bins = h.counts.length;
  const top = h.max + h.binWidth;
  const x = scaleLinear().domain([0, top]).range([0, width]);
  const highest = Math.max(1, ...h.counts);
  const y = scaleLinear().domain([0, highest]).nice(4).range([height, 0]);
  const bars = h.counts.map((count, k) => {
    const from = k * h.binWidth;
    const to = k === bins - 1 ? null : (k + 1) * h.binWidth;
    const x0 = x(from);
    return {
      from: Number(from.toFixed(10)),
      to: to === null ? null : Number(to.toFixed(10)),
      count,
      x: x0,
      width: Math.max(0, x(from + h.binWidth) - x0 - 1),
      y: y(count),
      height: height - y(count),
      verdict: verdictForUtilisation(to === null ? from : from + h.binWidth / 2),
    };
  });
  return {
    bars,
    xTicks: x
      .ticks(6)
      .filter((v) => v <= h.max)
      .map((value) => ({ value, at: x(value), label: value.toFixed(2) })),
    yTicks: y
      .ticks(4)
      .filter((v) => Number.isInteger(v))
      .map((value) => ({ value, at: y(value), label: value.toLocaleString("en-US") })),
    requiredAt: x(1),
  };
}
