/**
 * Required wall thickness of a cylindrical or spherical shell under internal pressure, by the
 * formulas of ASME BPVC Section VIII Division 1, UG-27 (recalled from memory: verify them, their
 * limits and the meaning of every symbol against the code edition you work to):
 * - cylinder, circumferential stress (longitudinal joints), UG-27(c)(1): t = P·R/(S·E − 0.6P),
 *   within t ≤ R/2 and P ≤ 0.385·S·E;
 * - cylinder, longitudinal stress (circumferential joints), UG-27(c)(2): t = P·R/(2S·E + 0.4P),
 *   within t ≤ R/2 and P ≤ 1.25·S·E;
 * - sphere, UG-27(d): t = P·R/(2S·E − 0.2P), within t ≤ 0.356R and P ≤ 0.665·S·E.
 * Each pair of limits marks nearly the same boundary (put t = R/2 into (c)(1): P = S·E/2.6 =
 * 0.3846·S·E; into (c)(2): P = 1.25·S·E; t = 0.356R into (d): P = 0.6647·S·E), and the code's rounded
 * factors make them differ only in the last figure; a formula is taken as applicable when both hold.
 * P is the internal design pressure, R the inside radius in the corroded condition, S the allowable
 * stress at the design temperature, E the joint efficiency (or the ligament efficiency); the
 * corrosion allowance is added to the thickness found. Beyond the limits the code sends the designer
 * to the thick-shell formulas of its Mandatory Appendix 1 (not computed here); the result says when.
 *
 * This calculator takes one joint efficiency for both cylinder formulas: the code uses the
 * longitudinal joints' E in (c)(1) and the circumferential joints' in (c)(2), so give the lower of the
 * two (on the safe side) or check each formula with its own E.
 *
 * Units: P and S in any one stress unit, R and the corrosion allowance in any one length unit; the
 * thicknesses come back in that length unit.
 */
import { assertFinite } from "../tensor/validate";

/** The shell shapes UG-27 covers here. */
export type Ug27Shape = "cylinder" | "sphere";

/** Inputs of {@link ug27RequiredThickness}. */
export type Ug27Input = {
  /** internal design pressure P (> 0, stress unit) */
  pressure: number;
  /** inside radius R in the corroded condition (> 0, length unit) */
  insideRadius: number;
  /** allowable stress S at the design temperature (> 0, the pressure's unit) */
  allowableStress: number;
  /** joint efficiency E, 0 < E ≤ 1 */
  jointEfficiency: number;
  /** corrosion allowance added to the thickness (≥ 0, the radius' unit); default 0 */
  corrosionAllowance?: number;
};

/** One UG-27 formula's answer and whether its applicability limits hold. */
export type Ug27Formula = {
  /** the formula, e.g. "t = P·R/(S·E − 0.6P)" */
  formula: string;
  /** its paragraph, e.g. "UG-27(c)(1)" */
  paragraph: string;
  /** the thickness it requires (length unit), without the corrosion allowance */
  thickness: number;
  /** the pressure limit of the formula, as a multiple of S·E (0.385, 1.25 or 0.665) times S·E */
  pressureLimit: number;
  /** the thickness limit of the formula: R/2, or 0.356R for a sphere */
  thicknessLimit: number;
  /** true when the thickness is within its limit and the pressure within its limit */
  applicable: boolean;
};

/** The result of {@link ug27RequiredThickness}. */
export type Ug27Result = {
  shape: Ug27Shape;
  /** every formula that applies to the shape: the two cylinder formulas, or the sphere one */
  formulas: Ug27Formula[];
  /** the largest thickness the formulas require, without the corrosion allowance */
  required: number;
  /** the formula that gives `required` */
  governing: Ug27Formula;
  /** `required` plus the corrosion allowance: the least thickness to order before mill tolerance */
  requiredWithCorrosion: number;
  /** the corrosion allowance used */
  corrosionAllowance: number;
  /** true when every formula is within its applicability limits */
  applicable: boolean;
};

const SHAPES: readonly Ug27Shape[] = ["cylinder", "sphere"];

/**
 * The least wall thickness UG-27 asks of a cylinder or sphere under internal pressure (see the file
 * comment for the formulas, their limits and their source, recalled from memory).
 * @param shape "cylinder" or "sphere"
 * @param input P, R (corroded), S, E and the corrosion allowance
 * @returns each formula's thickness and limits, the governing thickness, and it with the corrosion
 *   allowance
 * @throws TypeError/RangeError naming the field when a value is not finite, P, R or S is not
 *   positive, E is outside (0, 1], the corrosion allowance is negative, the shape is unknown, or the
 *   pressure is so high that a formula's denominator is not positive
 */
export function ug27RequiredThickness(shape: Ug27Shape, input: Ug27Input): Ug27Result {
  if (!SHAPES.includes(shape)) {
    throw new RangeError(`shape must be one of ${SHAPES.join(", ")}, got ${JSON.stringify(shape)}`);
  }
  if (typeof input !== "object" || input === null) {
    throw new TypeError(
      "input must be an object with pressure, insideRadius, allowableStress, jointEfficiency",
    );
  }
  const { pressure: P, insideRadius: R, allowableStress: S, jointEfficiency: E } = input;
  const CA = input.corrosionAllowance ?? 0;
  assertFinite(P, "input.pressure");
  assertFinite(R, "input.insideRadius");
  assertFinite(S, "input.allowableStress");
  assertFinite(E, "input.jointEfficiency");
  assertFinite(CA, "input.corrosionAllowance");
  if (P <= 0) throw new RangeError(`input.pressure must be positive (internal pressure), got ${P}`);
  if (R <= 0) throw new RangeError(`input.insideRadius must be positive, got ${R}`);
  if (S <= 0) throw new RangeError(`input.allowableStress must be positive, got ${S}`);
  if (!(E > 0 && E <= 1)) throw new RangeError(`input.jointEfficiency must lie in (0, 1], got ${E}`);
  if (CA < 0) throw new RangeError(`input.corrosionAllowance must not be negative, got ${CA}`);

  const SE = S * E;
  const formula = (
    paragraph: string,
    text: string,
    denominator: number,
    pressureFactor: number,
    thicknessLimit: number,
  ): Ug27Formula => {
    if (!(denominator > 0)) {
      throw new RangeError(
        `input.pressure ${P} is too high for ${paragraph} (${text}): its denominator is not positive`,
      );
    }
    const thickness = (P * R) / denominator;
    const pressureLimit = pressureFactor * SE;
    return {
      formula: text,
      paragraph,
      thickness,
      pressureLimit,
      thicknessLimit,
      applicable: thickness <= thicknessLimit && P <= pressureLimit,
    };
  };
  const formulas =
    shape === "cylinder"
      ? [
          formula("UG-27(c)(1)", "t = P·R/(S·E − 0.6P)", SE - 0.6 * P, 0.385, R / 2),
          formula("UG-27(c)(2)", "t = P·R/(2S·E + 0.4P)", 2 * SE + 0.4 * P, 1.25, R / 2),
        ]
      : [formula("UG-27(d)", "t = P·R/(2S·E − 0.2P)", 2 * SE - 0.2 * P, 0.665, 0.356 * R)];
  const governing = formulas.reduce((a, b) => (b.thickness > a.thickness ? b : a));
  return {
    shape,
    formulas,
    required: governing.thickness,
    governing,
    requiredWithCorrosion: governing.thickness + CA,
    corrosionAllowance: CA,
    applicable: formulas.every((f) => f.applicable),
  };
}
