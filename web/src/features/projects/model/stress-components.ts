import type { Component } from "../../../../../core";
import { COMPONENT_SYMBOLS, STRESS_COMPONENTS } from "../../../lib/stress";

/**
 * The components a load-case cell shows: only the non-zero ones, in core's order, with their
 * tensor symbols (an empty list is a zero state).
 */
export function nonZeroComponents(
  componentsPa: Readonly<Record<Component, number>>,
): { key: Component; label: string; pa: number }[] {
  return STRESS_COMPONENTS.filter((k) => componentsPa[k] !== 0).map((key) => ({
    key,
    label: COMPONENT_SYMBOLS[key].tensor,
    pa: componentsPa[key],
  }));
}

/**
 * How a saved state's revision reads beside it: every save of a state makes a new revision
 * (the history lists them), so the number counts saves of this one state.
 */
export const stateRevisionWords = (revision: number): string =>
  revision === 1 ? "saved once" : `saved ${revision} times (revision ${revision})`;
