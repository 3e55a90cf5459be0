/**
 * The unit sets a calculator's inputs are typed in, and the exact conversions between them. A
 * calculator names each input's dimension; changing the unit set converts every dimensional input so
 * the same physical quantity stays entered (1 in = 25.4 mm and 1 lbf = 4.4482216152605 N, both exact
 * by definition; stresses through core's convertStress).
 */
import { METRES_PER_INCH, NEWTONS_PER_POUND_FORCE, convertStress } from "../../../../../core";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { UNITS_OF, type Dimension, type UnitSet } from "../../../../../core/constants/calculators";

// The unit sets and each dimension's unit are shared with the wire schema that checks stored inputs.
export {
  UNIT_SETS,
  UNITS_OF,
  unitFor,
  type Dimension,
  type UnitSet,
} from "../../../../../core/constants/calculators";

/** How the unit sets read in the picker. */
export const UNIT_SET_LABEL: Readonly<Record<UnitSet, string>> = {
  si: "SI — mm, N, N·m, MPa",
  "us-psi": "US customary — in, lbf, lbf·in, psi",
  "us-ksi": "US customary — in, lbf, lbf·in, ksi",
};

const MM_PER_INCH = METRES_PER_INCH * 1000;
const MM_PER: Readonly<Record<string, number>> = { mm: 1, in: MM_PER_INCH };
const N_PER: Readonly<Record<string, number>> = { N: 1, lbf: NEWTONS_PER_POUND_FORCE };
const NMM_PER: Readonly<Record<string, number>> = {
  "N·m": 1000,
  "lbf·in": NEWTONS_PER_POUND_FORCE * MM_PER_INCH,
};

/**
 * The value in the calculators' working units: mm, N, N·mm and MPa (so stresses from forces and
 * lengths come out in MPa). Angles, ratios and microstrain pass unchanged.
 */
export function toWorking(value: number, dimension: Dimension, set: UnitSet): number {
  const u = UNITS_OF[set];
  switch (dimension) {
    case "length":
      return value * MM_PER[u.length];
    case "force":
      return value * N_PER[u.force];
    case "moment":
      return value * NMM_PER[u.moment];
    case "stress":
      return convertStress(value, u.stress, "MPa");
    case "modulus":
      return convertStress(value, u.modulus, "MPa");
    default:
      return value;
  }
}

/** The inverse of {@link toWorking}: a working-unit value in the set's unit. */
export function fromWorking(value: number, dimension: Dimension, set: UnitSet): number {
  const u = UNITS_OF[set];
  switch (dimension) {
    case "length":
      return value / MM_PER[u.length];
    case "force":
      return value / N_PER[u.force];
    case "moment":
      return value / NMM_PER[u.moment];
    case "stress":
      return convertStress(value, "MPa", u.stress);
    case "modulus":
      return convertStress(value, "MPa", u.modulus);
    default:
      return value;
  }
}

/**
 * An entered value carried to another unit set: the same physical quantity, to 15 significant
 * figures (what the address keeps). There and back it returns the typed number to about 1e-14
 * relative, which the fields (10 significant figures) show as the number typed.
 */
export function convertInput(value: number, dimension: Dimension, from: UnitSet, to: UnitSet): number {
  if (from === to) return value;
  return Number(fromWorking(toWorking(value, dimension, from), dimension, to).toPrecision(15));
}

/** The stress unit results are written in under a unit set. */
export const stressUnitOf = (set: UnitSet): StressUnitName => UNITS_OF[set].stress;
