import { CALCULATORS, type CalculatorRecord } from "../../../core/constants/calculators";

/**
 * Links back from a saved state to the calculator that produced it. The calculator pages read
 * their inputs from the address (`units`, then every number and choice by name), so the stored
 * inputs written the same way reopen the page exactly as it was when the state was saved. Lives
 * in lib/ because the project pages (which show the state) and the calculators (which read the
 * address) are separate features.
 */

/** The calculator page's address with the stored inputs, numbers to 15 significant figures. */
export function calculatorLinkFor(record: CalculatorRecord): string {
  const spec = CALCULATORS[record.name].inputs;
  const q = new URLSearchParams();
  q.set("units", record.inputs.units);
  for (const key of Object.keys(spec.numbers)) {
    const n = record.inputs.numbers[key];
    if (n) q.set(key, Number(n.value.toPrecision(15)).toString());
  }
  for (const key of Object.keys(spec.choices)) {
    const c = record.inputs.choices[key];
    if (c !== undefined) q.set(key, c);
  }
  return `/calculators/${record.name}?${q.toString()}`;
}

/** The calculator's title as the pages show it, e.g. "Strain-gauge rosette". */
export const calculatorTitle = (record: CalculatorRecord) => CALCULATORS[record.name].title;

/** Every input as "key = value unit" (then each choice as "key: option"), in the calculator's order. */
export function describeCalculatorInputs(record: CalculatorRecord): string[] {
  const spec = CALCULATORS[record.name].inputs;
  const numbers = Object.keys(spec.numbers)
    .filter((key) => record.inputs.numbers[key] !== undefined)
    .map((key) => {
      const { value, unit } = record.inputs.numbers[key];
      return `${key} = ${Number(value.toPrecision(10))}${unit === "" ? "" : unit === "°" ? "°" : ` ${unit}`}`;
    });
  const choices = Object.keys(spec.choices)
    .filter((key) => record.inputs.choices[key] !== undefined)
    .map((key) => `${key}: ${record.inputs.choices[key]}`);
  return [...numbers, ...choices];
}
