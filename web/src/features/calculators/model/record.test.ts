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

/** Random inputs a calculator can compute from (the server refuses the others, naming them). */
function computableValues(spec: InputSpec, next: () => number): InputValues<InputSpec> {
  const v = randomValues(spec, next);
  const n = v.numbers as Record<string, number>;
  for (const k of Object.keys(n)) n[k] = 1 + next() * 1e4;
  if ("ro" in n) {
    n.ro = n.ri * (1.01 + next());
    n.r = n.ri + next() * (n.ro - n.ri);
  }
  if ("d" in n) n.d = n.D * next() * 0.99;
  if ("nu" in n) n.nu = next() * 0.49;
  return v;
}

describe("calculator records of saved states", () => {
  for (const name of CALCULATOR_NAMES) {
    it(`when ${name} inputs (200 seeded cases) become a record, then the server's schema accepts computable ones and the reopen link gives the page back any inputs`, () => {
      const spec: InputSpec = CALCULATORS[name].inputs;
      const next = seededRandom(name.length * 131 + 7);
      for (let i = 0; i < 200; i++) {
        const computable = calculatorRecordOf(name, computableValues(spec, next) as never);
        const parsed = calculatorRecordSchema.safeParse(computable);
        expect(parsed.success, JSON.stringify(parsed.error?.issues)).toBe(true);
        // Any finite inputs, negative ones too, go to the address and back.
        const values = randomValues(spec, next);
        const record = calculatorRecordOf(name, values as never);
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

  it("when the inputs are ones no calculator can compute from, then the schema refuses them naming the input (the pages' own refusals)", () => {
    const paths = (record: unknown) =>
      (calculatorRecordSchema.safeParse(record).error?.issues ?? []).map((i) => i.path.join("."));
    const thin = calculatorRecordOf("thin-wall", {
      units: "si",
      numbers: { p: 1, r: 100, t: 0 },
      choices: { shape: "cylinder", given: "inner", form: "inside-radius", radial: "membrane" },
    });
    expect(paths(thin)).toEqual(["inputs.numbers.t.value"]);
    const thick = calculatorRecordOf("thick-sphere", {
      units: "si",
      numbers: { ri: 50, ro: 40, pi: 1, po: 0, r: 45 },
      choices: {},
    });
    expect(paths(thick)).toContain("inputs.numbers.ro.value");
    const rosette = calculatorRecordOf("rosette", {
      units: "si",
      numbers: { e1: 1, e2: 2, e3: 3, a1: 0, a2: 45, a3: 90, E: 200, nu: 0.5, gfSet: 0, gfGauge: 2 },
      choices: { layout: "rectangular", gf: "corrected" },
    });
    expect(paths(rosette)).toEqual(["inputs.numbers.nu.value", "inputs.numbers.gfSet.value"]);
    const shaft = calculatorRecordOf("shaft", {
      ...computableValues(CALCULATORS.shaft.inputs, seededRandom(5)),
      choices: { section: "hollow", moments: "components", surface: "outer" },
    } as never);
    shaft.inputs.numbers.d.value = shaft.inputs.numbers.D.value;
    shaft.inputs.numbers.ktt.value = 0.9;
    expect(paths(shaft)).toEqual(["inputs.numbers.d.value", "inputs.numbers.ktt.value"]);
  });
});
