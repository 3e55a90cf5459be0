import { describe, expect, it } from "vitest";
import { CALCULATORS, CALCULATOR_NAMES, UNIT_SETS } from "../../../../../core/constants/calculators";
import { calculatorRecordSchema } from "../../../../../core/contract/calculator-inputs";
import { seededRandom } from "../../../../../core/testing/fixtures";
import { calculatorLinkFor, describeCalculatorInputs } from "../../../lib/calculator-link";
import { calculatorRecordOf, decodeInputs, type InputSpec, type InputValues } from "./inputs";

// A saved state's calculator record (product rules, no source needed): what the page sends must
// pass the server's schema, and "reopen in calculator" must give the page back the same inputs.

function randomValues(spec: InputSpec, next: () => number): InputValues<InputSpec> {
  return {
    units: UNIT_SETS[Math.floor(next() * UNIT_SETS.length)],
    numbers: Object.fromEntries(
      Object.keys(spec.numbers).map((k) => [k, (next() - 0.3) * 10 ** (5 * next())]),
    ),
    choices: Object.fromEntries(
      Object.entries(spec.choices).map(([k, c]) => [k, c.options[Math.floor(next() * c.options.length)]]),
    ),
  };
}

describe("calculator records of saved states", () => {
  for (const name of CALCULATOR_NAMES) {
    it(`when ${name} inputs (200 seeded cases) become a record, then the server's schema accepts it and its reopen link gives the page back the same inputs`, () => {
      const spec: InputSpec = CALCULATORS[name].inputs;
      const next = seededRandom(name.length * 131 + 7);
      for (let i = 0; i < 200; i++) {
        const values = randomValues(spec, next);
        const record = calculatorRecordOf(name, values as never);
        const parsed = calculatorRecordSchema.safeParse(record);
        expect(parsed.success, JSON.stringify(parsed.error?.issues)).toBe(true);
        expect(record.version).toBe(CALCULATORS[name].version);
        const link = calculatorLinkFor(record);
        expect(link.startsWith(`/calculators/${name}?`)).toBe(true);
        const back = decodeInputs(spec, link.slice(link.indexOf("?")));
        expect(back.units).toBe(values.units);
        expect(back.choices).toEqual(values.choices);
        for (const [k, v] of Object.entries(values.numbers)) {
          expect(back.numbers[k]).toBe(Number(v.toPrecision(15)));
        }
      }
    });
  }

  it("when a thin-wall record in US units is described, then each number carries its unit and each choice its option", () => {
    const record = calculatorRecordOf("thin-wall", {
      units: "us-psi",
      numbers: { p: 150, r: 24, t: 0.5 },
      choices: { shape: "sphere", given: "mean", form: "inside-radius", radial: "membrane" },
    });
    expect(record.inputs.numbers).toEqual({
      p: { value: 150, unit: "psi" },
      r: { value: 24, unit: "in" },
      t: { value: 0.5, unit: "in" },
    });
    expect(describeCalculatorInputs(record)).toEqual([
      "p = 150 psi",
      "r = 24 in",
      "t = 0.5 in",
      "shape: sphere",
      "given: mean",
      "form: inside-radius",
      "radial: membrane",
    ]);
  });
});
