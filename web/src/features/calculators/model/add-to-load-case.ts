/**
 * The rules of "add to load case": where a calculated state may go, what the save sends, and what
 * the page says once it is saved. Plain functions; the component only draws them.
 */
import type { StressTensor } from "../../../../../core";
import type { CalculatorRecord } from "../../../../../core/contract/calculator-inputs";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { roleAtLeast, type Role } from "../../../../../core/contract/workspaces";

/** The workspaces a state may be saved in: those where the signed-in person may change inputs. */
export function editableWorkspaces<W extends { role: Role }>(workspaces: readonly W[]): W[] {
  return workspaces.filter((w) => roleAtLeast(w.role, "editor"));
}

/** What the save sends: the state in the calculator's stress unit, source "calculator", and every input. */
export function stateToSave(v: {
  caseId: string;
  locationId: string;
  version: number;
  tensor: StressTensor;
  unit: StressUnitName;
  record: CalculatorRecord;
  note: string;
}) {
  const { xx, yy, zz, xy, yz, zx } = v.tensor;
  return {
    caseId: v.caseId,
    locationId: v.locationId,
    version: v.version,
    stress: { unit: v.unit, components: { xx, yy, zz, xy, yz, zx } },
    source: "calculator" as const,
    note: v.note.trim(),
    calculator: v.record,
  };
}

/** The sentence shown once saved, e.g. `Saved as revision 2 of "Design" at "bore".` */
export function savedWords(revision: number, caseName: string, locationName: string): string {
  return `Saved as revision ${revision} of "${caseName}" at "${locationName}".`;
}
