/** Number formatting for the sheet: fixed decimals per column so values align on the decimal point. */

/**
 * Decimals that show four significant figures of the largest value in a column.
 * @param maxAbs largest absolute value in the column
 */
export function decimalsFor(maxAbs: number): number {
  if (!(maxAbs > 0) || !Number.isFinite(maxAbs)) return 2;
  return Math.min(6, Math.max(0, 3 - Math.floor(Math.log10(maxAbs))));
}

/** A value with fixed decimals, a true minus sign and no negative zero. */
export function fixed(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return value > 0 ? "∞" : value < 0 ? "−∞" : "—";
  const text = value.toFixed(decimals);
  if (/^-0(\.0+)?$/.test(text)) return text.slice(1);
  return text.replace("-", "−");
}

/** A safety factor: two decimals, ∞ when the state never reaches the surface. */
export function factor(n: number): string {
  if (n === Infinity) return "∞";
  return n >= 100 ? n.toFixed(0) : n.toFixed(2);
}

/** An angle in degrees with two decimals. */
export function angle(value: number): string {
  return fixed(value, 2);
}

/** A number for an input box: up to 6 significant figures, plain ASCII. */
export function editable(value: number): string {
  if (value === 0) return "0";
  const text = Number(value.toPrecision(6)).toString();
  return text;
}
