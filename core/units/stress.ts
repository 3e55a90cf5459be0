/** Stress units and exact conversions between them. */
import { STRESS_UNITS, type StressUnit } from "../constants/stress-units";

export { STRESS_UNITS, type StressUnit };

/** 1 lbf in newtons, exact by definition (1 lb = 0.45359237 kg, g₀ = 9.80665 m/s²). */
export const NEWTONS_PER_POUND_FORCE = 4.4482216152605;
/** 1 in in metres, exact by definition. */
export const METRES_PER_INCH = 0.0254;
/** 1 psi in pascals: 1 lbf / (1 in)² ≈ 6894.757293168 Pa. */
export const PASCALS_PER_PSI = NEWTONS_PER_POUND_FORCE / (METRES_PER_INCH * METRES_PER_INCH);

const PASCALS_PER: Readonly<Record<StressUnit, number>> = {
  Pa: 1,
  kPa: 1e3,
  MPa: 1e6,
  GPa: 1e9,
  psi: PASCALS_PER_PSI,
  ksi: 1e3 * PASCALS_PER_PSI,
};

/** True when `unit` is one of {@link STRESS_UNITS}. @param unit candidate unit name (case-sensitive) */
export function isStressUnit(unit: unknown): unit is StressUnit {
  return typeof unit === "string" && Object.prototype.hasOwnProperty.call(PASCALS_PER, unit);
}

/** How many pascals one `unit` is. @param unit a stress unit */
export function pascalsPer(unit: StressUnit): number {
  if (!isStressUnit(unit)) {
    throw new RangeError(
      `unknown stress unit ${JSON.stringify(unit)}; expected one of ${STRESS_UNITS.join(", ")}`,
    );
  }
  return PASCALS_PER[unit];
}

/**
 * Converts a stress value between units.
 * @param value stress, in unit `from`; ±Infinity (a quantity that is unbounded, such as the stress
 *   at which a state never reaches a criterion's surface) converts to itself
 * @param from unit of `value`
 * @param to unit of the result
 * @returns the same stress in unit `to`
 * @throws TypeError if `value` is not a number; RangeError for an unknown unit, for NaN, and for a
 *   finite value whose converted result would overflow to ±Infinity (above about 1.8e308)
 */
export function convertStress(value: number, from: StressUnit, to: StressUnit): number {
  if (typeof value !== "number") throw new TypeError(`value must be a number, got ${typeof value}`);
  if (Number.isNaN(value))
    throw new RangeError(`cannot convert NaN from ${from} to ${to}: the value is not a number`);
  const f = pascalsPer(from);
  const t = pascalsPer(to);
  if (f === t) return value;
  const result = (value * f) / t;
  if (Number.isFinite(result) || !Number.isFinite(value)) return result;
  // value·f overflowed although the true result may fit: divide first before giving up.
  const late = value * (f / t);
  if (Number.isFinite(late)) return late;
  throw new RangeError(
    `${value} ${from} is too large to express in ${to}: the result exceeds the largest number (about 1.8e308)`,
  );
}
