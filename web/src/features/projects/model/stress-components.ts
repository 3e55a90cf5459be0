import { COMPONENT_KEYS } from "../../../../../core/contract/load-cases";

/** One of the six stress components, in the order every table and form lists them. */
export type StressKey = (typeof COMPONENT_KEYS)[number];

/** The six components in order: normal stresses, then the shears. */
export const STRESS_KEYS: readonly StressKey[] = COMPONENT_KEYS;

/** The symbol a sheet writes for each component: σ for normal stresses, τ for shears. */
export const STRESS_LABELS: Readonly<Record<StressKey, string>> = {
  xx: "σxx",
  yy: "σyy",
  zz: "σzz",
  xy: "τxy",
  yz: "τyz",
  zx: "τzx",
};

/**
 * The components a load-case cell shows: only the non-zero ones, in the usual order (an empty list
 * is a zero state).
 */
export function nonZeroComponents(
  componentsPa: Readonly<Record<StressKey, number>>,
): { key: StressKey; label: string; pa: number }[] {
  return STRESS_KEYS.filter((k) => componentsPa[k] !== 0).map((key) => ({
    key,
    label: STRESS_LABELS[key],
    pa: componentsPa[key],
  }));
}
