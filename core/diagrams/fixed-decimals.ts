/**
 * The one writer of numbers shown on a sheet or a diagram: fixed decimals so columns align on the
 * decimal point, a true minus sign, and never a negative zero. A value that rounds to zero at the
 * shown precision (−0.0004 at three decimals, or −1e-15 left over from a rotation) shows as 0.000:
 * the sign of something too small to show is noise, and "−0.000" reads as a compressive stress.
 * It lives in core so the browser and a printed report write the same text.
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
