import { convertStress } from "../../../../../core";
import { sheetValue } from "../../../lib/number-format";
import type { StressUnitName } from "../../../../../core/contract/materials";
import type { UnitSystem } from "../../../../../core/contract/projects";

/** The stress unit a project shows values in. */
export const displayUnit = (system: UnitSystem): StressUnitName => (system === "US" ? "ksi" : "MPa");

/** A Pa value in `unit` (core's exact conversion). */
export const fromPa = (pa: number, unit: StressUnitName) => convertStress(pa, "Pa", unit);

/** A stress for a table: four significant figures or so, as a calculation sheet writes it. */
export function formatStress(pa: number | null, unit: StressUnitName): string {
  if (pa === null) return "—";
  const v = fromPa(pa, unit);
  if (v === 0) return "0";
  return sheetValue(v, "-"); // the shared formatter: never "-0.000"
}
