import type { Material, StressUnitName, UpdateMaterialBody } from "../../../../../core/contract/materials";
import { editableStress } from "../../../lib/stress";

/**
 * A stored material as the edit form shows it: strengths and E back in the unit they were entered
 * in, cut to twelve significant figures (editableStress) so the Pa round trip does not show as
 * 60.699999999999996.
 */
export function materialFormValues(m: Material): UpdateMaterialBody {
  const inUnit = (pa: number | null) => (pa === null ? null : editableStress(pa, m.unit));
  return {
    version: m.version,
    name: m.name,
    unit: m.unit,
    yield: inUnit(m.yieldPa),
    ultimateTension: inUnit(m.ultimateTensionPa),
    ultimateCompression: inUnit(m.ultimateCompressionPa),
    elasticModulus: inUnit(m.elasticModulusPa),
    poissonRatio: m.poissonRatio,
    reference: m.reference,
    note: m.note,
  };
}

/** An edit-form box: empty means "not given" (null); anything else is read as a number for the schema to judge. */
export const optionalNumber = (v: unknown): number | null =>
  v === "" || v === null || v === undefined ? null : Number(v);

/** The quick "add to library" row as typed. */
export type NewMaterialForm = {
  name: string;
  unit: StressUnitName;
  yield: string;
  ultimateTension: string;
  reference: string;
};

/** The body the quick row sends: a blank strength (spaces too) is not given; other text is read as a number. */
export function newMaterialBody(form: NewMaterialForm): Omit<NewMaterialForm, "yield" | "ultimateTension"> & {
  yield: number | null;
  ultimateTension: number | null;
} {
  const num = (v: string) => (v.trim() === "" ? null : Number(v));
  return {
    name: form.name,
    unit: form.unit,
    yield: num(form.yield),
    ultimateTension: num(form.ultimateTension),
    reference: form.reference,
  };
}
