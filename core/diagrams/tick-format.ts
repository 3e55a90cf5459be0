import { fixed } from "./fixed-decimals";
import type { LinearScale } from "./linear-scale";

const SUPERSCRIPT: Readonly<Record<string, string>> = {
  "-": "⁻",
  "0": "⁰",
  "1": "¹",
  "2": "²",
  "3": "³",
  "4": "⁴",
  "5": "⁵",
  "6": "⁶",
  "7": "⁷",
  "8": "⁸",
  "9": "⁹",
};

/** How the ticks of one axis are written. */
export type TickFormat = {
  /** A tick value as its label: decimals from the tick step, in the power of ten below, no negative zero. */
  format: (v: number) => string;
  /** "" or "×10⁶ ": written once before the unit in the axis title. */
  multiplier: string;
  /** The power of ten itself (1 when none). */
  scale: number;
};

/**
 * Tick labels for a chart axis that stay short whatever the unit: from 1000 up (and below 0.01)
 * the ticks are written in a power of ten that is a multiple of 3, named once beside the unit
 * ("×10⁶ Pa"), so 150 000 000 Pa reads 150 and the labels never run into each other.
 * @param ticks the tick values the axis will draw, in order
 */
export function axisTickFormat(ticks: readonly number[]): TickFormat {
  const finite = ticks.filter(Number.isFinite);
  const maxAbs = Math.max(0, ...finite.map(Math.abs));
  const power = maxAbs >= 1000 || (maxAbs > 0 && maxAbs < 0.01) ? 3 * Math.floor(Math.log10(maxAbs) / 3) : 0;
  const scale = 10 ** power;
  const step = finite.length > 1 ? Math.abs(finite[1] - finite[0]) / scale : 1;
  // Enough decimals to tell neighbouring ticks apart (ticks are 1, 2 or 5 × 10ⁿ apart).
  const decimals = step > 0 ? Math.min(6, Math.max(0, Math.ceil(-Math.log10(step) - 1e-9))) : 0;
  const multiplier =
    power === 0
      ? ""
      : `×10${String(power)
          .split("")
          .map((c) => SUPERSCRIPT[c])
          .join("")} `;
  return { format: (v: number) => fixed(v / scale, decimals), multiplier, scale };
}

/** One tick of an axis: its value, where it sits along the axis (SVG units) and its label. */
export type Tick = { value: number; at: number; label: string };

/** The ticks an axis draws, with the power of ten its title names. */
export type AxisTicks = { ticks: Tick[]; multiplier: string; scale: number };

/**
 * About `count` round ticks of `scale`, placed and labelled.
 * @param scale the axis's scale
 * @param count how many ticks to aim for
 */
export function axisTicks(scale: LinearScale, count: number): AxisTicks {
  const values = scale.ticks(count);
  const f = axisTickFormat(values);
  return {
    ticks: values.map((value) => ({ value, at: scale.map(value), label: f.format(value) })),
    multiplier: f.multiplier,
    scale: f.scale,
  };
}
