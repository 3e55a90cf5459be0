import { stressInputProblem, type Component, type ParseTensorResult } from "../../../../../core";
import type { StateSource, StressState } from "../../../../../core/contract/load-cases";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { readNumberText } from "../../../lib/number-text";
import { COMPONENT_SYMBOLS, STRESS_COMPONENTS } from "../../../lib/stress";

/** The six boxes of the state form, as typed. */
export type StateFields = Record<Component, string>;

/**
 * The boxes a form opens with: a saved state's values in its own unit, cut to ten significant
 * figures so a value stored as 67.49999999999999 reads 67.5; zeros for a new state.
 */
export function initialFields(initial?: StressState): StateFields {
  return Object.fromEntries(
    STRESS_COMPONENTS.map((k) => [k, initial ? String(Number(initial.components[k].toPrecision(10))) : "0"]),
  ) as StateFields;
}

/** A saved state measured on the part stays "measured" when edited; anything else is now typed. */
export const initialSource = (initial?: StressState): StateSource =>
  initial?.source === "measured" ? "measured" : "typed";

/**
 * The six boxes read as numbers, or the first box's problem in words (its symbol first): refused
 * text (an ambiguous comma), an empty box or text that is not a number, or a value no real stress
 * reaches.
 */
export function readStateFields(
  fields: StateFields,
): { ok: true; components: Record<Component, number> } | { ok: false; message: string } {
  const parsed: Partial<Record<Component, number>> = {};
  for (const k of STRESS_COMPONENTS) {
    const read = readNumberText(fields[k]);
    if ("refused" in read) return { ok: false, message: `${COMPONENT_SYMBOLS[k].tensor}: ${read.refused}.` };
    if (fields[k].trim() === "" || !Number.isFinite(read.value))
      return { ok: false, message: `${COMPONENT_SYMBOLS[k].tensor} must be a number.` };
    const problem = stressInputProblem(read.value);
    if (problem !== undefined) return { ok: false, message: `${COMPONENT_SYMBOLS[k].tensor} ${problem}.` };
    parsed[k] = read.value;
  }
  return { ok: true, components: parsed as Record<Component, number> };
}

/** A paste core could read. */
type ReadTensor = Extract<ParseTensorResult, { ok: true }>;

/** The six boxes filled from a pasted tensor. */
export const fieldsFromTensor = (result: ReadTensor): StateFields =>
  Object.fromEntries(STRESS_COMPONENTS.map((k) => [k, String(result.tensor[k])])) as StateFields;

/** Where pasted numbers came from: a finite-element listing row, or a plain paste. */
export const pastedSource = (result: ReadTensor): StateSource =>
  result.point ? "finite-element point" : "pasted";

/**
 * What the form says it read from a paste: the shape, the node or element of a listing row, and
 * the unit written in the text (or the form's unit, said to be assumed).
 */
export function describePaste(result: ReadTensor, formUnit: StressUnitName): string {
  const shape =
    result.form === "matrix"
      ? "a 3×3 matrix"
      : result.form === "plane"
        ? "plane stress σx σy τxy"
        : "six components";
  return (
    `Read ${shape}` +
    `${result.point ? ` of ${result.point.kind} ${result.point.number}` : ""}` +
    `${result.unit ? `, in ${result.unit}` : ` (no unit written: ${formUnit})`}.`
  );
}
