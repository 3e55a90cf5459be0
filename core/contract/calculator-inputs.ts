import { z } from "zod";
import {
  CALCULATORS,
  CALCULATOR_NAMES,
  UNIT_SETS,
  unitFor,
  type CalculatorName,
} from "../constants/calculators";

/**
 * What a saved state keeps of the calculator that produced it: the calculator's name, the version
 * of its inputs and formulas, and every input as typed with its unit, so a checker can retrace
 * the state and reopen the calculator with the same inputs. The same schema checks the API's
 * saves and the project import. Imports only zod and core/constants.
 */

/** Largest magnitude an input may have: far beyond any real pressure, length or load, and finite. */
const MAX_INPUT = 1e15;

const storedNumberSchema = z.object(
  {
    value: z
      .number({ error: "must be a number" })
      .refine(Number.isFinite, "must be a finite number")
      .refine((v) => Math.abs(v) <= MAX_INPUT, `must be at most ${MAX_INPUT} in magnitude`),
    unit: z.string({ error: "must be the unit the value was typed in (text)" }).max(16),
  },
  { error: "must be { value, unit }" },
);

type Numbers = Record<string, { value: number } | undefined>;
type Choices = Record<string, string | undefined>;

/**
 * Inputs no calculator can compute from, per calculator: the same refusals its page makes (a wall
 * of no thickness, an outer radius inside the inner one, ν outside (−1, 0.5)), so a state cannot
 * be stored with inputs that could never have produced it. Each rule names the input at fault.
 */
const IMPOSSIBLE: Record<
  CalculatorName,
  (n: (key: string) => number, c: Choices) => { key: string; message: string }[]
> = {
  "thin-wall": (n) => [
    ...(n("t") > 0 ? [] : [{ key: "t", message: "the wall thickness must be positive" }]),
    ...(n("r") > 0 ? [] : [{ key: "r", message: "the radius must be positive" }]),
  ],
  "thick-cylinder": (n, c) => [
    ...thickWallRules(n),
    ...(c.ends === "plane-strain" && !(n("nu") > -1 && n("nu") <= 0.5)
      ? [{ key: "nu", message: "Poisson's ratio must lie in (−1, 0.5]" }]
      : []),
  ],
  "thick-sphere": (n) => thickWallRules(n),
  shaft: (n, c) => [
    ...(n("D") > 0 ? [] : [{ key: "D", message: "the outer diameter must be positive" }]),
    ...(c.section === "hollow" && !(n("d") > 0 && n("d") < n("D"))
      ? [{ key: "d", message: "the bore must be positive and smaller than D" }]
      : []),
    ...["ktb", "ktt", "kta"].flatMap((key) =>
      n(key) >= 1 ? [] : [{ key, message: "a stress-concentration factor must be at least 1" }],
    ),
  ],
  rosette: (n, c) => [
    ...(n("E") > 0 ? [] : [{ key: "E", message: "Young's modulus must be positive" }]),
    ...(n("nu") > -1 && n("nu") < 0.5
      ? []
      : [{ key: "nu", message: "Poisson's ratio must lie in (−1, 0.5)" }]),
    ...(c.gf === "corrected"
      ? ["gfSet", "gfGauge"].flatMap((key) =>
          n(key) > 0 ? [] : [{ key, message: "a gauge factor must be positive" }],
        )
      : []),
  ],
};

function thickWallRules(n: (key: string) => number) {
  return [
    ...(n("ri") > 0 ? [] : [{ key: "ri", message: "the inner radius must be positive" }]),
    ...(n("ro") > n("ri") ? [] : [{ key: "ro", message: "the outer radius must be larger than the inner" }]),
    ...(n("r") >= n("ri") && n("r") <= n("ro")
      ? []
      : [{ key: "r", message: "the radius of the point must lie in the wall" }]),
  ];
}

const recordShape = z.object(
  {
    name: z.enum(CALCULATOR_NAMES as [CalculatorName, ...CalculatorName[]], {
      error: `must be one of ${CALCULATOR_NAMES.join(", ")}`,
    }),
    version: z.int({ error: "must be a whole number" }).min(1, "must be at least 1"),
    inputs: z.object(
      {
        units: z.enum(UNIT_SETS, { error: `must be one of ${UNIT_SETS.join(", ")}` }),
        numbers: z.record(z.string(), storedNumberSchema, { error: "must be an object of { value, unit }" }),
        choices: z.record(z.string(), z.string({ error: "must be text" }), {
          error: "must be an object of texts",
        }),
      },
      { error: "must be { units, numbers, choices }" },
    ),
  },
  { error: "must be { name, version, inputs } or null" },
);

/**
 * The calculator record of a state. Beyond the shape it asks what the calculator itself would:
 * a version this Sigmacube knows (no later than the calculator's own), exactly the calculator's
 * inputs, each number in the unit its unit set types it in, each choice one of its options.
 */
export const calculatorRecordSchema = recordShape.superRefine((record, ctx) => {
  const calculator = CALCULATORS[record.name];
  if (record.version > calculator.version) {
    ctx.addIssue({
      code: "custom",
      path: ["version"],
      message: `${record.name} is at version ${calculator.version}; this Sigmacube cannot read version ${record.version}`,
    });
  }
  const { units, numbers, choices } = record.inputs;
  const specNumbers: Record<string, { dimension: Parameters<typeof unitFor>[0] }> = calculator.inputs.numbers;
  const specChoices: Record<string, { options: readonly string[] }> = calculator.inputs.choices;
  for (const [key, spec] of Object.entries(specNumbers)) {
    const given = numbers[key];
    if (!given) {
      ctx.addIssue({ code: "custom", path: ["inputs", "numbers", key], message: "is missing" });
      continue;
    }
    const unit = unitFor(spec.dimension, units);
    if (given.unit !== unit) {
      ctx.addIssue({
        code: "custom",
        path: ["inputs", "numbers", key, "unit"],
        message: `must be "${unit}" (the ${units} unit set's unit for this input), got "${given.unit}"`,
      });
    }
  }
  for (const key of Object.keys(numbers)) {
    if (!(key in specNumbers)) {
      ctx.addIssue({
        code: "custom",
        path: ["inputs", "numbers", key],
        message: `is not an input of ${record.name}`,
      });
    }
  }
  for (const [key, spec] of Object.entries(specChoices)) {
    const given = choices[key];
    if (given === undefined) {
      ctx.addIssue({ code: "custom", path: ["inputs", "choices", key], message: "is missing" });
    } else if (!spec.options.includes(given)) {
      ctx.addIssue({
        code: "custom",
        path: ["inputs", "choices", key],
        message: `must be one of ${spec.options.join(", ")}`,
      });
    }
  }
  // Only when every number is there: a missing one has been reported above.
  const numbersGiven = numbers as Numbers;
  if (Object.keys(specNumbers).every((key) => numbersGiven[key] !== undefined)) {
    const n = (key: string) => numbersGiven[key]!.value;
    for (const problem of IMPOSSIBLE[record.name](n, choices)) {
      ctx.addIssue({
        code: "custom",
        path: ["inputs", "numbers", problem.key, "value"],
        message: problem.message,
      });
    }
  }
  for (const key of Object.keys(choices)) {
    if (!(key in specChoices)) {
      ctx.addIssue({
        code: "custom",
        path: ["inputs", "choices", key],
        message: `is not a choice of ${record.name}`,
      });
    }
  }
});

export type { CalculatorRecord } from "../constants/calculators";

/** A record as the server sends it back (it was checked when it came in). */
export const calculatorRecordOutSchema = recordShape;
