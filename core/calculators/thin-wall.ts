/**
 * Thin-walled pressure vessels: membrane stresses of a closed-end cylinder and of a sphere under a
 * uniform pressure difference p (inside minus outside).
 *
 * Handbook formulas (any strength-of-materials text; e.g. the open textbook "Strength of Materials",
 * EngineeringMechanicsOER, chapter 13, and Shigley's Mechanical Engineering Design, thin-walled vessels):
 * - inside-radius form (default): cylinder σθ = p·r/t (hoop), σx = p·r/(2t) (axial, closed ends);
 *   sphere σ = p·r/(2t) in every tangential direction; r is the inside radius;
 * - mean-diameter form (Shigley): cylinder σt = p(dᵢ + t)/(2t) (hoop), σl = p·dᵢ/(4t) (axial);
 *   sphere σ = p(dᵢ + t)/(4t); dᵢ = 2r is the inside diameter. It gives a hoop stress larger by the
 *   factor (1 + t/dᵢ) than the inside-radius form — a convention difference, not an error.
 * - radial stress: 0 (the membrane value, the usual thin-wall assumption) or −p (the inner surface,
 *   where the pressure acts on the wall).
 *
 * Conventions: tension positive; p > 0 is internal pressure, p < 0 (vacuum, external pressure) is
 * allowed and gives the same formulas with the signs reversed. Units: p in any one stress unit, the
 * radius and the wall in any one length unit; the stresses come back in p's unit.
 */
import type { StressTensor } from "../tensor/types";
import { assertFinite } from "../tensor/validate";

/** Which thin-wall formula to use: inside radius (σθ = p·r/t) or mean diameter (σt = p(dᵢ + t)/(2t)). */
export type ThinWallForm = "inside-radius" | "mean-diameter";

/** Which radial stress to put in the tensor: 0 (membrane) or −p (the inner surface). */
export type ThinWallRadial = "membrane" | "inner-surface";

/** Options of the thin-wall calculators. */
export type ThinWallOptions = {
  /** formula convention; default "inside-radius" */
  form?: ThinWallForm;
  /** radial stress taken as 0 ("membrane", default) or −p ("inner-surface") */
  radial?: ThinWallRadial;
};

/** Stresses of a thin-walled vessel, in the pressure's unit. */
export type ThinWallStresses = {
  /** circumferential (hoop) stress σθ; for a sphere, the tangential stress (the same in every direction) */
  hoop: number;
  /** axial (longitudinal) stress σx; for a sphere, equal to `hoop` */
  axial: number;
  /** radial stress σr: 0 or −p, as chosen */
  radial: number;
  /**
   * The stress tensor in the frame x = axial, y = hoop, z = radial (for a sphere: x and y two
   * orthogonal tangents, z radial). All shears are zero: these are principal axes.
   */
  tensor: StressTensor;
  /**
   * Inside radius over wall, r/t. The membrane formulas are commonly taken as good to about 5 % for
   * r/t ≥ 10 (common practice, no source); below that a thick-wall (Lamé) analysis is needed.
   */
  radiusOverWall: number;
};

const FORMS: readonly ThinWallForm[] = ["inside-radius", "mean-diameter"];
const RADIALS: readonly ThinWallRadial[] = ["membrane", "inner-surface"];

function checkInputs(
  pressure: number,
  insideRadius: number,
  wall: number,
  options: ThinWallOptions | undefined,
): { form: ThinWallForm; radial: ThinWallRadial } {
  assertFinite(pressure, "pressure");
  assertFinite(insideRadius, "insideRadius");
  assertFinite(wall, "wall");
  if (insideRadius <= 0) throw new RangeError(`insideRadius must be positive, got ${insideRadius}`);
  if (wall <= 0) throw new RangeError(`wall must be positive, got ${wall}`);
  if (options !== undefined && (typeof options !== "object" || options === null)) {
    throw new TypeError("options must be an object when given");
  }
  const form = options?.form ?? "inside-radius";
  const radial = options?.radial ?? "membrane";
  if (!FORMS.includes(form)) {
    throw new RangeError(`options.form must be one of ${FORMS.join(", ")}, got ${JSON.stringify(form)}`);
  }
  if (!RADIALS.includes(radial)) {
    throw new RangeError(
      `options.radial must be one of ${RADIALS.join(", ")}, got ${JSON.stringify(radial)}`,
    );
  }
  return { form, radial };
}

function result(
  hoop: number,
  axial: number,
  pressure: number,
  radial: ThinWallRadial,
  r: number,
  t: number,
): ThinWallStresses {
  // −p of a zero pressure would be −0, which prints as "−0"; keep it a plain zero.
  const sr = radial === "inner-surface" && pressure !== 0 ? -pressure : 0;
  return {
    hoop,
    axial,
    radial: sr,
    tensor: { xx: axial, yy: hoop, zz: sr, xy: 0, yz: 0, zx: 0 },
    radiusOverWall: r / t,
  };
}

/**
 * Membrane stresses of a thin-walled closed-end cylinder under pressure (see the file comment for the
 * formulas). Under external pressure (p < 0) this membrane state is rarely what governs: buckling of
 * the shell usually does, and it is not checked here.
 * @param pressure pressure difference p, inside minus outside (any stress unit; negative for vacuum)
 * @param insideRadius inside radius r = dᵢ/2 (any length unit, > 0)
 * @param wall wall thickness t (same length unit, > 0)
 * @param options formula form (default "inside-radius") and radial stress (default "membrane", 0)
 * @returns hoop, axial and radial stress (p's unit), the tensor in x = axial, y = hoop, z = radial,
 *   and r/t
 * @throws TypeError/RangeError naming the argument when an input is not finite, a size is not
 *   positive or an option is unknown
 */
export function thinCylinder(
  pressure: number,
  insideRadius: number,
  wall: number,
  options?: ThinWallOptions,
): ThinWallStresses {
  const { form, radial } = checkInputs(pressure, insideRadius, wall, options);
  const p = pressure;
  const t = wall;
  if (form === "mean-diameter") {
    const di = 2 * insideRadius;
    return result((p * (di + t)) / (2 * t), (p * di) / (4 * t), p, radial, insideRadius, t);
  }
  const hoop = (p * insideRadius) / t;
  return result(hoop, hoop / 2, p, radial, insideRadius, t);
}

/**
 * Membrane stresses of a thin-walled sphere under pressure: the same tangential stress in every
 * direction (see the file comment for the formulas). Under external pressure (p < 0) buckling, not
 * this membrane state, usually governs; it is not checked here.
 * @param pressure pressure difference p, inside minus outside (any stress unit; negative for vacuum)
 * @param insideRadius inside radius r = dᵢ/2 (any length unit, > 0)
 * @param wall wall thickness t (same length unit, > 0)
 * @param options formula form (default "inside-radius") and radial stress (default "membrane", 0)
 * @returns tangential stress as both `hoop` and `axial` (p's unit), radial stress, the tensor
 *   (x, y tangential, z radial) and r/t
 * @throws TypeError/RangeError naming the argument when an input is not finite, a size is not
 *   positive or an option is unknown
 */
export function thinSphere(
  pressure: number,
  insideRadius: number,
  wall: number,
  options?: ThinWallOptions,
): ThinWallStresses {
  const { form, radial } = checkInputs(pressure, insideRadius, wall, options);
  const p = pressure;
  const t = wall;
  const tangential =
    form === "mean-diameter" ? (p * (2 * insideRadius + t)) / (4 * t) : (p * insideRadius) / (2 * t);
  return result(tangential, tangential, p, radial, insideRadius, t);
}
