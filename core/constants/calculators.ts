/**
 * The calculators' names, versions and inputs, declared once for the browser's calculator pages,
 * the wire schema that checks a saved state's calculator inputs (core/contract/calculator-inputs.ts)
 * and the demo data. Each input has a dimension and a starting value in SI; each unit set says the
 * unit every dimension is typed in, so a stored input carries its unit and can be checked against it.
 * Imports nothing outside core/constants.
 */
import type { StressUnit } from "./stress-units";

/** The unit sets a calculator's inputs are typed in: SI, and US customary with stresses in psi or ksi. */
export const UNIT_SETS = ["si", "us-psi", "us-ksi"] as const;
export type UnitSet = (typeof UNIT_SETS)[number];

/** What an input measures. `modulus` is an elastic modulus (GPa in SI, else the set's stress unit). */
export type Dimension =
  "length" | "stress" | "force" | "moment" | "modulus" | "angle" | "ratio" | "microstrain";

type UnitOfSet = {
  length: string;
  stress: StressUnit;
  force: string;
  moment: string;
  modulus: StressUnit;
};

/** The unit of each dimension in each set, as written on the page and stored beside each input. */
export const UNITS_OF: Readonly<Record<UnitSet, UnitOfSet>> = {
  si: { length: "mm", stress: "MPa", force: "N", moment: "N·m", modulus: "GPa" },
  "us-psi": { length: "in", stress: "psi", force: "lbf", moment: "lbf·in", modulus: "psi" },
  "us-ksi": { length: "in", stress: "ksi", force: "lbf", moment: "lbf·in", modulus: "ksi" },
};

/** The unit an input of this dimension is typed in under a unit set ("" for plain numbers). */
export function unitFor(dimension: Dimension, set: UnitSet): string {
  switch (dimension) {
    case "length":
    case "stress":
    case "force":
    case "moment":
    case "modulus":
      return UNITS_OF[set][dimension];
    case "angle":
      return "°";
    case "microstrain":
      return "µε";
    case "ratio":
      return "";
  }
}

/** One number input: what it measures and its starting value in SI units. */
export type NumberInput = { dimension: Dimension; initial: number };

/** One choice input: its options and the starting one. */
export type ChoiceInput = { options: readonly string[]; initial: string };

/** The inputs of one calculator. */
export type InputSpec = {
  numbers: Readonly<Record<string, NumberInput>>;
  choices: Readonly<Record<string, ChoiceInput>>;
};

export const THIN_WALL_INPUTS = {
  numbers: {
    p: { dimension: "stress", initial: 2 },
    r: { dimension: "length", initial: 500 },
    t: { dimension: "length", initial: 10 },
  },
  choices: {
    shape: { options: ["cylinder", "sphere"], initial: "cylinder" },
    given: { options: ["inner", "mean", "outer"], initial: "inner" },
    form: { options: ["inside-radius", "mean-diameter"], initial: "inside-radius" },
    radial: { options: ["membrane", "inner-surface"], initial: "membrane" },
  },
} as const satisfies InputSpec;

const WALL = {
  ri: { dimension: "length", initial: 50 },
  ro: { dimension: "length", initial: 100 },
  pi: { dimension: "stress", initial: 100 },
  po: { dimension: "stress", initial: 0 },
  r: { dimension: "length", initial: 50 },
} as const;

export const THICK_CYLINDER_INPUTS = {
  numbers: { ...WALL, nu: { dimension: "ratio", initial: 0.3 } },
  choices: { ends: { options: ["closed", "open", "plane-strain"], initial: "closed" } },
} as const satisfies InputSpec;

export const THICK_SPHERE_INPUTS = { numbers: WALL, choices: {} } as const satisfies InputSpec;

export const SHAFT_INPUTS = {
  numbers: {
    D: { dimension: "length", initial: 60 },
    d: { dimension: "length", initial: 30 },
    My: { dimension: "moment", initial: 1200 },
    Mz: { dimension: "moment", initial: 0 },
    M: { dimension: "moment", initial: 1200 },
    phi: { dimension: "angle", initial: 90 },
    T: { dimension: "moment", initial: 900 },
    P: { dimension: "force", initial: 0 },
    Vy: { dimension: "force", initial: 0 },
    Vz: { dimension: "force", initial: 0 },
    ktb: { dimension: "ratio", initial: 1 },
    ktt: { dimension: "ratio", initial: 1 },
    kta: { dimension: "ratio", initial: 1 },
    angle: { dimension: "angle", initial: 90 },
  },
  choices: {
    section: { options: ["solid", "hollow"], initial: "solid" },
    moments: { options: ["components", "direction"], initial: "components" },
    surface: { options: ["outer", "inner"], initial: "outer" },
  },
} as const satisfies InputSpec;

export const ROSETTE_INPUTS = {
  numbers: {
    e1: { dimension: "microstrain", initial: 650 },
    e2: { dimension: "microstrain", initial: 300 },
    e3: { dimension: "microstrain", initial: -200 },
    a1: { dimension: "angle", initial: 0 },
    a2: { dimension: "angle", initial: 45 },
    a3: { dimension: "angle", initial: 90 },
    E: { dimension: "modulus", initial: 200 },
    nu: { dimension: "ratio", initial: 0.3 },
    /** the gauge factor the instrument was set to when it read */
    gfSet: { dimension: "ratio", initial: 2 },
    /** the gauge factor on the gauges' data sheet */
    gfGauge: { dimension: "ratio", initial: 2 },
  },
  choices: {
    layout: { options: ["rectangular", "delta", "any"], initial: "rectangular" },
    /** "as-read": readings taken as they are; "corrected": ε = ε_read · GF_set / GF_gauge */
    gf: { options: ["as-read", "corrected"], initial: "as-read" },
  },
} as const satisfies InputSpec;

/**
 * Every calculator whose result can be saved in a load case: its name (also its page's path under
 * /calculators/), the version of its inputs and formulas (raised when either changes meaning, so a
 * stored state says which one produced it), its title and its inputs.
 */
export const CALCULATORS = {
  "thin-wall": { version: 1, title: "Thin-walled cylinder and sphere", inputs: THIN_WALL_INPUTS },
  "thick-cylinder": { version: 1, title: "Thick-walled cylinder (Lamé)", inputs: THICK_CYLINDER_INPUTS },
  "thick-sphere": { version: 1, title: "Thick-walled sphere (Lamé)", inputs: THICK_SPHERE_INPUTS },
  shaft: { version: 1, title: "Shaft under combined load", inputs: SHAFT_INPUTS },
  rosette: { version: 1, title: "Strain-gauge rosette", inputs: ROSETTE_INPUTS },
} as const satisfies Record<string, { version: number; title: string; inputs: InputSpec }>;

export type CalculatorName = keyof typeof CALCULATORS;
export const CALCULATOR_NAMES = Object.keys(CALCULATORS) as CalculatorName[];

/** One stored input number: the value as typed and the unit it was typed in ("" for plain numbers). */
export type StoredNumber = { value: number; unit: string };

/** What a saved state keeps of the calculator that produced it (the `calculator` of a state). */
export type CalculatorRecord = {
  name: CalculatorName;
  version: number;
  inputs: {
    units: UnitSet;
    numbers: Record<string, StoredNumber>;
    choices: Record<string, string>;
  };
};
