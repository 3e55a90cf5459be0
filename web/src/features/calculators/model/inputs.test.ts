import { describe, expect, it } from "vitest";
import { seededRandom } from "../../../../../core/testing/fixtures";
import {
  decodeInputs,
  encodeInputs,
  initialValues,
  withUnits,
  type InputSpec,
  type InputValues,
} from "./inputs";
import { ROSETTE_INPUTS } from "./rosette";
import { SHAFT_INPUTS } from "./shaft";
import { THICK_CYLINDER_INPUTS, THICK_SPHERE_INPUTS } from "./thick-wall";
import { THIN_WALL_INPUTS } from "./thin-wall";
import { UNIT_SETS } from "./units";

const SPECS: Record<string, InputSpec> = {
  "thin wall": THIN_WALL_INPUTS,
  "thick cylinder": THICK_CYLINDER_INPUTS,
  "thick sphere": THICK_SPHERE_INPUTS,
  shaft: SHAFT_INPUTS,
  rosette: ROSETTE_INPUTS,
};

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

describe("calculator inputs in the address", () => {
  for (const [name, spec] of Object.entries(SPECS)) {
    it(`when the ${name} inputs are written to the address and read back (300 seeded cases), then every number (to 15 significant figures), choice and unit set returns`, () => {
      const next = seededRandom(name.length * 977);
      for (let i = 0; i < 300; i++) {
        const values = randomValues(spec, next);
        const back = decodeInputs(spec, `?${encodeInputs(spec, values)}`);
        expect(back.units).toBe(values.units);
        expect(back.choices).toEqual(values.choices);
        for (const [k, v] of Object.entries(values.numbers)) {
          expect(back.numbers[k]).toBe(Number(v.toPrecision(15)));
        }
      }
    });
  }

  it("when the address is empty, then the starting values come back in SI", () => {
    expect(decodeInputs(THIN_WALL_INPUTS, "")).toEqual(initialValues(THIN_WALL_INPUTS));
    expect(decodeInputs(THIN_WALL_INPUTS, "").numbers).toEqual({ p: 2, r: 500, t: 10 });
  });

  it("when a parameter is malformed or unknown, then that input keeps its starting value and the others are read", () => {
    const v = decodeInputs(THIN_WALL_INPUTS, "?units=cgs&p=abc&r=&t=12&shape=cone&given=mean&extra=1");
    expect(v.units).toBe("si");
    expect(v.numbers).toEqual({ p: 2, r: 500, t: 12 });
    expect(v.choices.shape).toBe("cylinder");
    expect(v.choices.given).toBe("mean");
  });

  it("when a negative or zero size is in the address, then it is kept for the calculator to refuse by name (not silently replaced)", () => {
    expect(decodeInputs(THIN_WALL_INPUTS, "?t=-3").numbers.t).toBe(-3);
  });

  it("when the unit set changes, then the dimensional inputs are converted (1 in = 25.4 mm, definition) and the choices stay; changing back gives the typed numbers to 1e-13 (shown to 10 figures, the same text)", () => {
    const si = {
      ...initialValues(SHAFT_INPUTS),
      choices: { section: "hollow", moments: "direction", surface: "inner" },
    };
    const us = withUnits(SHAFT_INPUTS, si, "us-ksi");
    expect(us.units).toBe("us-ksi");
    expect(us.numbers.D).toBeCloseTo(60 / 25.4, 10);
    expect(us.numbers.T).toBeCloseTo(900_000 / 112.98482902, 5);
    expect(us.numbers.ktb).toBe(1);
    expect(us.numbers.angle).toBe(90);
    expect(us.choices).toEqual(si.choices);
    const back = withUnits(SHAFT_INPUTS, us, "si").numbers as Record<string, number>;
    for (const [k, v] of Object.entries(si.numbers)) {
      expect(Math.abs(back[k] - v)).toBeLessThanOrEqual(1e-13 * Math.abs(v));
      expect(Number(back[k].toPrecision(10))).toBe(v);
    }
  });
});
