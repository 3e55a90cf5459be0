import { useCallback, useMemo } from "react";
import { useSearchParams } from "react-router-dom";
import { decodeInputs, encodeInputs, withUnits, type InputSpec, type InputValues } from "../model/inputs";
import type { UnitSet } from "../model/units";

/**
 * A calculator's inputs, kept in the address: read from it on every render, written back with
 * `replace` on each change so a copied link reproduces the page without flooding the history.
 * Several groups of inputs may share one page's address, each under its own names.
 */
export function useInputs<S extends InputSpec>(spec: S) {
  const [params, setParams] = useSearchParams();
  const search = params.toString();
  const values = useMemo(() => decodeInputs(spec, search), [spec, search]);
  // Parameters of another group of inputs on the same page (the thin-walled calculator's UG-27
  // check) are kept: each group writes only its own.
  const write = useCallback(
    (next: InputValues<S>) =>
      setParams(
        (current) => {
          const merged = new URLSearchParams(current);
          for (const [key, value] of new URLSearchParams(encodeInputs(spec, next))) merged.set(key, value);
          return merged;
        },
        { replace: true },
      ),
    [spec, setParams],
  );
  const setNumber = (key: keyof S["numbers"] & string, value: number) =>
    write({ ...values, numbers: { ...values.numbers, [key]: value } });
  /** Several numbers at once (a material fills E and ν together). */
  const setNumbers = (next: Partial<Record<keyof S["numbers"] & string, number>>) =>
    write({ ...values, numbers: { ...values.numbers, ...next } });
  const setChoice = (key: keyof S["choices"] & string, value: string) =>
    write({ ...values, choices: { ...values.choices, [key]: value } });
  const setUnits = (units: UnitSet) => write(withUnits(spec, values, units));
  /** Every input at once (a point moved to another face and angle in one step, one address). */
  const setValues = (next: InputValues<S>) => write(next);
  return { values, setNumber, setNumbers, setChoice, setUnits, setValues };
}
