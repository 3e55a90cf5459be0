/**
 * A calculator's inputs as a plain description — each number with its dimension and starting value
 * (in SI), each choice with its options — and the pure operations every calculator page shares:
 * reading them from the address, writing them back, and carrying them to another unit set.
 * The address holds every input by name (`units`, then the numbers and choices), so a copied link
 * reproduces the page; an unknown or malformed parameter falls back to the starting value, never fatal.
 */
import {
  CALCULATORS,
  type CalculatorName,
  type CalculatorRecord,
  type InputSpec,
} from "../../../../../core/constants/calculators";
import { UNIT_SETS, convertInput, unitFor, type UnitSet } from "./units";

// The input descriptions are shared with the wire schema that checks a saved state's inputs.
export type { ChoiceInput, InputSpec, NumberInput } from "../../../../../core/constants/calculators";

/** The values of a calculator's inputs: the unit set, each number (in that set's units) and each choice. */
export type InputValues<S extends InputSpec> = {
  units: UnitSet;
  numbers: { [K in keyof S["numbers"]]: number };
  choices: { [K in keyof S["choices"]]: string };
};

/** 15 significant figures: the link gives back the very number typed. */
const text = (v: number) => Number(v.toPrecision(15)).toString();

/** The starting values, with the numbers carried to `units` (they are declared in SI). */
export function initialValues<S extends InputSpec>(spec: S, units: UnitSet = "si"): InputValues<S> {
  const numbers = Object.fromEntries(
    Object.entries(spec.numbers).map(([k, n]) => [k, convertInput(n.initial, n.dimension, "si", units)]),
  );
  const choices = Object.fromEntries(Object.entries(spec.choices).map(([k, c]) => [k, c.initial]));
  return { units, numbers, choices } as InputValues<S>;
}

/** Every input as a query string (without "?"), in a fixed order. */
export function encodeInputs<S extends InputSpec>(spec: S, values: InputValues<S>): string {
  const q = new URLSearchParams();
  q.set("units", values.units);
  for (const key of Object.keys(spec.numbers))
    q.set(key, text((values.numbers as Record<string, number>)[key]));
  for (const key of Object.keys(spec.choices)) q.set(key, (values.choices as Record<string, string>)[key]);
  return q.toString();
}

/**
 * Reads the inputs back from a query string (with or without "?"). Numbers keep any finite value —
 * whether it suits the formula (a negative wall, say) is for the calculator to say, naming the field.
 */
export function decodeInputs<S extends InputSpec>(spec: S, search: string): InputValues<S> {
  const q = new URLSearchParams(search);
  const u = q.get("units");
  const units: UnitSet = u !== null && (UNIT_SETS as readonly string[]).includes(u) ? (u as UnitSet) : "si";
  const out = initialValues(spec, units);
  const numbers = out.numbers as Record<string, number>;
  const choices = out.choices as Record<string, string>;
  for (const key of Object.keys(spec.numbers)) {
    const raw = q.get(key);
    const v = raw === null || raw.trim() === "" ? Number.NaN : Number(raw);
    if (Number.isFinite(v)) numbers[key] = v;
  }
  for (const [key, c] of Object.entries(spec.choices)) {
    const raw = q.get(key);
    if (raw !== null && c.options.includes(raw)) choices[key] = raw;
  }
  return out;
}

/** The same inputs in another unit set: every dimensional number converted, choices kept. */
export function withUnits<S extends InputSpec>(
  spec: S,
  values: InputValues<S>,
  units: UnitSet,
): InputValues<S> {
  const numbers = Object.fromEntries(
    Object.entries(spec.numbers).map(([k, n]) => [
      k,
      convertInput((values.numbers as Record<string, number>)[k], n.dimension, values.units, units),
    ]),
  );
  return { units, numbers, choices: { ...values.choices } } as InputValues<S>;
}

/**
 * What a saved state keeps of this calculator: its name and version and every input as typed, each
 * number with the unit its unit set types it in (the server checks the same list and units).
 */
export function calculatorRecordOf<N extends CalculatorName>(
  name: N,
  values: InputValues<(typeof CALCULATORS)[N]["inputs"]>,
): CalculatorRecord {
  const spec: InputSpec = CALCULATORS[name].inputs;
  const typed = values as InputValues<InputSpec>;
  return {
    name,
    version: CALCULATORS[name].version,
    inputs: {
      units: typed.units,
      numbers: Object.fromEntries(
        Object.entries(spec.numbers).map(([key, n]) => [
          key,
          { value: typed.numbers[key], unit: unitFor(n.dimension, typed.units) },
        ]),
      ),
      choices: Object.fromEntries(Object.keys(spec.choices).map((key) => [key, typed.choices[key]])),
    },
  };
}
