import { fixed } from "../diagrams";
import { convertStress, type StressUnit } from "../units/stress";

/** The stress unit a project's numbers are shown in: MPa for SI, ksi for US (the screens' rule). */
export function reportUnit(system: "SI" | "US"): StressUnit {
  return system === "US" ? "ksi" : "MPa";
}

/** Decimals for a value to about four significant figures: 0 from 1000, 1 from 100, 2 from 10, else 3. */
function sheetDecimals(abs: number): number {
  return abs >= 1000 ? 0 : abs >= 100 ? 1 : abs >= 10 ? 2 : 3;
}

/**
 * A stress in Pa written in `unit` to about four significant figures, as a calculation sheet writes
 * it, with a true minus sign and no negative zero. `alignWith` (the other values of its column, in
 * Pa) gives every value of a column the same decimals, so they line up on the decimal point.
 */
export function stressText(pa: number, unit: StressUnit, alignWith: readonly number[] = [pa]): string {
  const largest = Math.max(...alignWith.map((v) => Math.abs(convertStress(v, "Pa", unit))));
  return fixed(convertStress(pa, "Pa", unit), sheetDecimals(largest));
}

/** A nullable strength in Pa, or an em dash when the material has none. */
export function strengthText(pa: number | null, unit: StressUnit): string {
  return pa === null ? "—" : stressText(pa, unit);
}

/** "2026-12-03 13:45 UTC": an ISO date-time written the same in every locale and time zone. */
export function dateText(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return `${d.toISOString().slice(0, 16).replace("T", " ")} UTC`;
}

/** A direction cosine with three decimals. */
export function cosineText(v: number): string {
  return fixed(v, 3);
}

/** A utilisation as a percentage with one decimal. */
export function percentText(u: number): string {
  return `${fixed(u * 100, 1)} %`;
}
