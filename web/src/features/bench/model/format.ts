/** Number formatting for the sheet: fixed decimals per column so values align on the decimal point. */
import { fixed } from "../../../lib/number-format";

// The shared formatter (web/src/lib/number-format.ts): no negative zero anywhere on the sheet.
export { decimalsFor, fixed } from "../../../lib/number-format";

/** A safety factor: two decimals, ∞ when the state never reaches the surface. */
export function factor(n: number): string {
  if (n === Infinity) return "∞";
  return n >= 100 ? n.toFixed(0) : n.toFixed(2);
}

/** An angle in degrees with two decimals. */
export function angle(value: number): string {
  return fixed(value, 2);
}

/**
 * A number for an input box: up to 6 significant figures, plain ASCII. From a million up (stresses
 * in Pa or psi) and below 0.001 it is written with an exponent, "1.5e8", so that it fits a grid cell.
 */
export function editable(value: number): string {
  if (value === 0) return "0";
  const abs = Math.abs(value);
  if (abs >= 1e6 || abs < 1e-3) {
    const [mantissa, exponent] = value.toExponential(5).split("e");
    return `${Number(mantissa)}e${Number(exponent)}`;
  }
  return Number(value.toPrecision(6)).toString();
}
