/**
 * How web names and writes stresses, in one place: the six components (core's order) with their
 * symbols, the display unit of a project, and the one formatter for a stress value on screen.
 */
import { COMPONENTS, convertStress, type Component } from "../../../core";
import type { StressUnitName } from "../../../core/contract/materials";
import type { UnitSystem } from "../../../core/contract/projects";
import { sheetValue } from "./number-format";

/** The six independent components in core's order: xx yy zz xy yz zx. */
export const STRESS_COMPONENTS: readonly Component[] = COMPONENTS;

/**
 * Symbols of each component. `tensor` is the index form of a state table (σxx … τzx); `short`
 * is the input form's (σx … τzx); `order` names a column order of pasted values, where the last
 * shear is written τxz as result files commonly write it (common practice, no source).
 */
export const COMPONENT_SYMBOLS: Readonly<
  Record<Component, { tensor: string; short: string; order: string }>
> = {
  xx: { tensor: "σxx", short: "σx", order: "σx" },
  yy: { tensor: "σyy", short: "σy", order: "σy" },
  zz: { tensor: "σzz", short: "σz", order: "σz" },
  xy: { tensor: "τxy", short: "τxy", order: "τxy" },
  yz: { tensor: "τyz", short: "τyz", order: "τyz" },
  zx: { tensor: "τzx", short: "τzx", order: "τxz" },
};

/** A component order in σ/τ symbols: "σx σy σz τxy τyz τxz". */
export const orderInSymbols = (order: readonly Component[]) =>
  order.map((c) => COMPONENT_SYMBOLS[c].order).join(" ");

/** The stress unit a project shows values in. */
export const displayUnit = (system: UnitSystem): StressUnitName => (system === "US" ? "ksi" : "MPa");

/** A Pa value in `unit` (core's exact conversion). */
export const stressInUnit = (pa: number, unit: StressUnitName) => convertStress(pa, "Pa", unit);

/** A Pa value in `unit` to 12 significant figures: what a form field or a bench link carries. */
export const editableStress = (pa: number, unit: StressUnitName) =>
  Number(stressInUnit(pa, unit).toPrecision(12));

/**
 * A stored stress (in Pa) for a table or a cell, in `unit`: about four significant figures as a
 * calculation sheet writes it (see sheetValue), the ASCII minus so a copied cell pastes as a
 * number, never "-0.000"; an exact zero reads "0" and a missing value "—".
 */
export function formatStress(pa: number | null, unit: StressUnitName): string {
  if (pa === null) return "—";
  const value = stressInUnit(pa, unit);
  if (value === 0) return "0";
  return sheetValue(value, "-");
}
