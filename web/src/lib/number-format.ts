/**
 * The one number formatter for values on screen: fixed decimals so columns align on the decimal
 * point, a true minus sign, and never a negative zero. A value that rounds to zero at the shown
 * precision (−0.0004 at three decimals, or −1e-15 left over from a rotation) shows as 0.000: the
 * sign of something too small to show is noise, and "−0.000" reads as a compressive stress.
 */

// The writer of fixed decimals and the axis tick labels live in core so that the browser and a
// printed report write the same text; they are re-exported here for the web's one import place.
import { fixed, type MinusSign } from "../../../core/diagrams/fixed-decimals";

export { decimalsFor, fixed, type MinusSign } from "../../../core/diagrams/fixed-decimals";
export { axisTickFormat } from "../../../core/diagrams/tick-format";

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
