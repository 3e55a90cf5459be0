/**
 * The one number formatter for values on screen: fixed decimals so columns align on the decimal
 * point, a true minus sign, and never a negative zero. A value that rounds to zero at the shown
 * precision (−0.0004 at three decimals, or −1e-15 left over from a rotation) shows as 0.000: the
 * sign of something too small to show is noise, and "−0.000" reads as a compressive stress.
 */

/** The minus sign: the typographic one on the sheet, ASCII where a cell may be copied into a program. */
export type MinusSign = "−" | "-";

/**
 * A value with a fixed number of decimals, no negative zero.
 * @param value any number; ±∞ shows as ∞ / −∞ and NaN as —
 * @param decimals digits after the point (0–20)
 * @param minus the sign written for negative values
 */
export function fixed(value: number, decimals: number, minus: MinusSign = "−"): string {
  if (Number.isNaN(value)) return "—";
  if (!Number.isFinite(value)) return value > 0 ? "∞" : `${minus}∞`;
  const text = value.toFixed(decimals);
  if (!text.startsWith("-")) return text;
  // Rounded to zero at this precision: drop the sign ("-0.000" → "0.000").
  if (/^-0(\.0*)?$/.test(text)) return text.slice(1);
  return minus + text.slice(1);
}

/**
 * Decimals that show four significant figures of the largest value in a column.
 * @param maxAbs largest absolute value in the column
 */
export function decimalsFor(maxAbs: number): number {
  if (!(maxAbs > 0) || !Number.isFinite(maxAbs)) return 2;
  return Math.min(6, Math.max(0, 3 - Math.floor(Math.log10(maxAbs))));
}

/**
 * A value alone (not in a column) to about four significant figures, as a calculation sheet writes
 * it: 0 decimals from 1000, 1 from 100, 2 from 10, else 3. No negative zero.
 * @param value the number
 * @param minus the sign written for negative values
 */
export function sheetValue(value: number, minus: MinusSign = "−"): string {
  const abs = Math.abs(value);
  return fixed(value, abs >= 1000 ? 0 : abs >= 100 ? 1 : abs >= 10 ? 2 : 3, minus);
}

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

/**
 * Tick labels for a chart axis that stay short whatever the unit: from 1000 up (and below 0.01)
 * the ticks are written in a power of ten that is a multiple of 3, named once beside the unit
 * ("×10⁶ Pa"), so 150 000 000 Pa reads 150 and the labels never run into each other.
 * @param ticks the tick values the axis will draw, in order
 * @returns `format` for the ticks (decimals from the tick step, no negative zero), `multiplier`,
 * "" or "×10⁶ " to write before the unit, and `scale`, the power of ten itself (1 when none)
 */
export function axisTickFormat(ticks: readonly number[]): {
  format: (v: number) => string;
  multiplier: string;
  scale: number;
} {
  const finite = ticks.filter(Number.isFinite);
  const maxAbs = Math.max(0, ...finite.map(Math.abs));
  const power = maxAbs >= 1000 || (maxAbs > 0 && maxAbs < 0.01) ? 3 * Math.floor(Math.log10(maxAbs) / 3) : 0;
  const scale = 10 ** power;
  const step = finite.length > 1 ? Math.abs(finite[1] - finite[0]) / scale : 1;
  // Enough decimals to tell neighbouring ticks apart (d3 ticks are 1, 2 or 5 × 10ⁿ).
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
