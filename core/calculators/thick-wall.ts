/**
 * Thick-walled cylinder and sphere under internal and external pressure: the Lamé solution of linear
 * elasticity, exact for a long, straight, homogeneous, isotropic wall far from its ends and openings.
 *
 * Formulas (recalled from memory; they are the Lamé solution as given in Timoshenko & Goodier,
 * Theory of Elasticity, "thick-walled cylinder" and "spherical container under pressure", and in
 * Roark's Formulas for Stress and Strain, thick-walled cylinders and spheres). With ri, ro the inner
 * and outer radius and pi, po the inner and outer pressure:
 * - cylinder: σr = A − B/r², σθ = A + B/r², with A = (pi·ri² − po·ro²)/(ro² − ri²) and
 *   B = (pi − po)·ri²·ro²/(ro² − ri²); the axial stress σz is
 *   closed ends: A (the end caps' net force spread over the wall; valid away from the caps);
 *   open ends: 0 (the pressure's end force is carried elsewhere, e.g. by a piston or a press frame);
 *   plane strain: ν(σr + σθ) = 2νA (a wall held at constant length, εz = 0);
 * - sphere: σr = A − B/r³, σθ = σφ = A + B/(2r³), with A = (pi·ri³ − po·ro³)/(ro³ − ri³) and
 *   B = (pi − po)·ri³·ro³/(ro³ − ri³).
 * They satisfy σr(ri) = −pi, σr(ro) = −po and radial equilibrium dσr/dr = (σθ − σr)/r (cylinder),
 * dσr/dr = 2(σθ − σr)/r (sphere); the tests check both numerically.
 *
 * Conventions: tension positive; a pressure is positive when it pushes on the wall (so it gives
 * σr = −p on that face), and may be negative (vacuum on that side). One consistent unit per call:
 * pressures in any stress unit, radii in any length unit; the stresses come back in the pressures'
 * unit. Differences of squares and cubes are factored, (ro − ri)(ro + ri), so that a wall very thin
 * beside its radius keeps its accuracy.
 */
import type { StressTensor } from "../tensor/types";
import { assertFinite } from "../tensor/validate";

/** How the cylinder's ends carry the pressure's axial force. */
export type CylinderEnds = "closed" | "open" | "plane-strain";

/** A thick-walled cylinder and its load. */
export type ThickCylinderInput = {
  /** inner (bore) radius ri, any length unit, > 0 */
  innerRadius: number;
  /** outer radius ro, same length unit, > ri */
  outerRadius: number;
  /** pressure pi on the bore, any stress unit (negative for vacuum) */
  innerPressure: number;
  /** pressure po on the outside, same stress unit; default 0 */
  outerPressure?: number;
  /** end condition: "closed" (end caps), "open" (σz = 0) or "plane-strain" (εz = 0, needs ν) */
  ends: CylinderEnds;
  /** Poisson's ratio ν, −1 < ν ≤ 0.5; required for "plane-strain", checked but unused otherwise */
  poissonRatio?: number;
};

/** A thick-walled sphere and its load. */
export type ThickSphereInput = {
  /** inner radius ri, any length unit, > 0 */
  innerRadius: number;
  /** outer radius ro, same length unit, > ri */
  outerRadius: number;
  /** pressure pi on the inside, any stress unit (negative for vacuum) */
  innerPressure: number;
  /** pressure po on the outside, same stress unit; default 0 */
  outerPressure?: number;
};

/** Stresses in a thick-walled cylinder at one radius, in the pressures' unit. */
export type ThickCylinderStresses = {
  /** the radius r where the stresses act, ri ≤ r ≤ ro (length unit of the input) */
  radius: number;
  /** radial stress σr = A − B/r²; −pi at the bore, −po at the outside */
  radial: number;
  /** circumferential (hoop) stress σθ = A + B/r² */
  hoop: number;
  /** axial stress σz: A (closed ends), 0 (open ends) or 2νA (plane strain); the same at every radius */
  axial: number;
  /** the tensor in x = axial, y = hoop, z = radial (principal axes: every shear is zero) */
  tensor: StressTensor;
  /** Lamé constant A = (pi·ri² − po·ro²)/(ro² − ri²), stress unit: the mean of σr and σθ */
  lameA: number;
  /** Lamé constant B = (pi − po)·ri²·ro²/(ro² − ri²), stress × length²: half of σθ − σr is B/r² */
  lameB: number;
};

/** Stresses in a thick-walled sphere at one radius, in the pressures' unit. */
export type ThickSphereStresses = {
  /** the radius r where the stresses act, ri ≤ r ≤ ro (length unit of the input) */
  radius: number;
  /** radial stress σr = A − B/r³; −pi at the inside, −po at the outside */
  radial: number;
  /** tangential stress σθ = σφ = A + B/(2r³), the same in every direction tangent to the sphere */
  hoop: number;
  /** the tensor in x, y = two orthogonal tangents, z = radial (principal axes: every shear is zero) */
  tensor: StressTensor;
  /** Lamé constant A = (pi·ri³ − po·ro³)/(ro³ − ri³), stress unit */
  lameA: number;
  /** Lamé constant B = (pi − po)·ri³·ro³/(ro³ − ri³), stress × length³: σθ − σr = 3B/(2r³) */
  lameB: number;
};

const ENDS: readonly CylinderEnds[] = ["closed", "open", "plane-strain"];

/** The default number of radii a through-wall profile samples (bore and outside included). */
export const DEFAULT_PROFILE_POINTS = 41;

type Checked = { ri: number; ro: number; pi: number; po: number };

function checkWall(input: unknown, what: string): Checked {
  if (typeof input !== "object" || input === null) {
    throw new TypeError(`${what} must be an object with innerRadius, outerRadius and innerPressure`);
  }
  const i = input as Record<string, unknown>;
  assertFinite(i.innerRadius, "innerRadius");
  assertFinite(i.outerRadius, "outerRadius");
  assertFinite(i.innerPressure, "innerPressure");
  const po = i.outerPressure ?? 0;
  assertFinite(po, "outerPressure");
  const ri = i.innerRadius;
  const ro = i.outerRadius;
  // A solid body (ri = 0) has no bore; Lamé's B/r² term would be infinite there.
  if (ri <= 0) throw new RangeError(`innerRadius must be positive, got ${ri}`);
  if (ro <= ri) {
    throw new RangeError(`outerRadius must be larger than innerRadius (${ri}), got ${ro}`);
  }
  return { ri, ro, pi: i.innerPressure, po };
}

function checkRadius(radius: unknown, ri: number, ro: number): number {
  assertFinite(radius, "radius");
  if (radius < ri || radius > ro) {
    throw new RangeError(`radius must lie in the wall, from ${ri} to ${ro}, got ${radius}`);
  }
  return radius;
}

function checkPoints(points: unknown): number {
  assertFinite(points, "points");
  if (!Number.isInteger(points) || points < 2) {
    throw new RangeError(`points must be a whole number of at least 2, got ${points}`);
  }
  return points;
}

/** `points` radii from ri to ro, evenly spaced, with both faces exactly at ri and ro. */
function radiiThroughWall(ri: number, ro: number, points: number): number[] {
  const out: number[] = [];
  for (let k = 0; k < points; k++) {
    out.push(k === points - 1 ? ro : ri + ((ro - ri) * k) / (points - 1));
  }
  return out;
}

function checkCylinder(input: ThickCylinderInput): Checked & { ends: CylinderEnds; nu: number } {
  const c = checkWall(input, "input");
  const ends = input.ends;
  if (!ENDS.includes(ends)) {
    throw new RangeError(`ends must be one of ${ENDS.join(", ")}, got ${JSON.stringify(ends)}`);
  }
  let nu = Number.NaN;
  if (input.poissonRatio !== undefined || ends === "plane-strain") {
    if (input.poissonRatio === undefined) {
      throw new TypeError("poissonRatio is required for plane-strain ends");
    }
    assertFinite(input.poissonRatio, "poissonRatio");
    nu = input.poissonRatio;
    if (!(nu > -1 && nu <= 0.5)) throw new RangeError(`poissonRatio must lie in (−1, 0.5], got ${nu}`);
  }
  return { ...c, ends, nu };
}

function cylinderAt(c: Checked & { ends: CylinderEnds; nu: number }, r: number): ThickCylinderStresses {
  const { ri, ro, pi, po } = c;
  const span = (ro - ri) * (ro + ri); // ro² − ri², factored
  const A = (pi * ri * ri - po * ro * ro) / span;
  const B = ((pi - po) * ri * ri * ro * ro) / span;
  // B/r² written as (pi − po)·(ri/r)²·ro²/span keeps r = ri exact: −pi comes back at the bore.
  const q = r === ri ? ((pi - po) * ro * ro) / span : r === ro ? ((pi - po) * ri * ri) / span : B / (r * r);
  const radial = r === ri ? -pi : r === ro ? -po : A - q;
  const hoop = A + q;
  const axial = c.ends === "closed" ? A : c.ends === "open" ? 0 : c.nu * (radial + hoop);
  return {
    radius: r,
    radial,
    hoop,
    axial,
    tensor: { xx: axial, yy: hoop, zz: radial, xy: 0, yz: 0, zx: 0 },
    lameA: A,
    lameB: B,
  };
}

/**
 * Stresses in a thick-walled cylinder (Lamé; see the file comment for the formulas, their source and
 * the conventions) at one radius.
 * @param input radii, pressures (po defaults to 0), end condition and, for plane strain, ν
 * @param radius where in the wall, ri ≤ r ≤ ro; default the bore ri, where σθ − σr = 2B/r² is largest
 *   in magnitude (so is the von Mises stress with closed ends, √3·|B|/r², and, under internal pressure
 *   alone, σθ itself; with both pressures |σθ| can be larger outside — see the profile)
 * @returns σr, σθ, σz, the tensor in x = axial, y = hoop, z = radial, and the Lamé constants
 * @throws TypeError/RangeError naming the input when it is missing or not finite, ri ≤ 0, ro ≤ ri,
 *   r outside the wall, the end condition is unknown, or ν is missing (plane strain) or out of range
 */
export function thickCylinder(input: ThickCylinderInput, radius?: number): ThickCylinderStresses {
  const c = checkCylinder(input);
  return cylinderAt(c, radius === undefined ? c.ri : checkRadius(radius, c.ri, c.ro));
}

/**
 * The through-wall distribution of a thick-walled cylinder's stresses, for a plot.
 * @param input as for {@link thickCylinder}
 * @param points how many evenly spaced radii, bore and outside included (≥ 2; default 41)
 * @returns the stresses at each radius, from ri to ro
 * @throws as {@link thickCylinder}, and RangeError when `points` is not a whole number ≥ 2
 */
export function thickCylinderProfile(
  input: ThickCylinderInput,
  points: number = DEFAULT_PROFILE_POINTS,
): ThickCylinderStresses[] {
  const c = checkCylinder(input);
  return radiiThroughWall(c.ri, c.ro, checkPoints(points)).map((r) => cylinderAt(c, r));
}

function sphereAt(c: Checked, r: number): ThickSphereStresses {
  const { ri, ro, pi, po } = c;
  const ri3 = ri * ri * ri;
  const ro3 = ro * ro * ro;
  const span = (ro - ri) * (ro * ro + ro * ri + ri * ri); // ro³ − ri³, factored
  const A = (pi * ri3 - po * ro3) / span;
  const B = ((pi - po) * ri3 * ro3) / span;
  const q = r === ri ? ((pi - po) * ro3) / span : r === ro ? ((pi - po) * ri3) / span : B / (r * r * r);
  const radial = r === ri ? -pi : r === ro ? -po : A - q;
  const hoop = A + q / 2;
  return {
    radius: r,
    radial,
    hoop,
    tensor: { xx: hoop, yy: hoop, zz: radial, xy: 0, yz: 0, zx: 0 },
    lameA: A,
    lameB: B,
  };
}

/**
 * Stresses in a thick-walled sphere (Lamé; see the file comment for the formulas, their source and the
 * conventions) at one radius.
 * @param input radii and pressures (po defaults to 0)
 * @param radius where in the wall, ri ≤ r ≤ ro; default the inside ri, where σθ − σr = 3B/(2r³) and so
 *   the von Mises stress are largest in magnitude
 * @returns σr, σθ = σφ, the tensor in x, y tangential and z radial, and the Lamé constants
 * @throws TypeError/RangeError naming the input when it is missing or not finite, ri ≤ 0, ro ≤ ri or
 *   r lies outside the wall
 */
export function thickSphere(input: ThickSphereInput, radius?: number): ThickSphereStresses {
  const c = checkWall(input, "input");
  return sphereAt(c, radius === undefined ? c.ri : checkRadius(radius, c.ri, c.ro));
}

/**
 * The through-wall distribution of a thick-walled sphere's stresses, for a plot.
 * @param input as for {@link thickSphere}
 * @param points how many evenly spaced radii, inside and outside included (≥ 2; default 41)
 * @returns the stresses at each radius, from ri to ro
 * @throws as {@link thickSphere}, and RangeError when `points` is not a whole number ≥ 2
 */
export function thickSphereProfile(
  input: ThickSphereInput,
  points: number = DEFAULT_PROFILE_POINTS,
): ThickSphereStresses[] {
  const c = checkWall(input, "input");
  return radiiThroughWall(c.ri, c.ro, checkPoints(points)).map((r) => sphereAt(c, r));
}
