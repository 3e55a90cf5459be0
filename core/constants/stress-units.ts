/**
 * The stress units core converts between and the API accepts, declared once for the engine
 * (core/units) and the wire schemas (core/contract). Imports nothing.
 */

/** Every accepted stress unit, in display order. */
export const STRESS_UNITS = ["Pa", "kPa", "MPa", "GPa", "psi", "ksi"] as const;

/** A stress unit accepted at the API. */
export type StressUnit = (typeof STRESS_UNITS)[number];
