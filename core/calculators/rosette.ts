/**
 * Strain-gauge rosettes and plane strain at a free surface: reduce three gauge readings to εx, εy,
 * γxy, find the principal strains, and turn strains into plane stress by Hooke's law.
 *
 * Conventions:
 * - strains are plain (dimensionless, m/m) values of type {@link Strain}; micro-strain readings are
 *   converted explicitly with {@link microstrain} (µε × 10⁻⁶) and back with {@link toMicrostrain};
 * - γxy is the engineering shear strain (γxy = 2εxy), positive when the right angle between +x and +y
 *   closes;
 * - gauge angles in degrees, counter-clockwise from x; the normal strain along θ is
 *   εθ = εx cos²θ + εy sin²θ + γxy sin θ cos θ (strain transformation, any strength-of-materials text);
 * - stresses: tension positive, τxy positive when it acts in +y on the +x face, in the unit of E.
 */
import type { StressTensor } from "../tensor/types";
import { assertFinite } from "../tensor/validate";
import { cosSinDeg, deg, radToDeg, type Degrees } from "../units/angles";

declare const strainBrand: unique symbol;

/** A strain as a plain dimensionless number (m/m), not micro-strain. */
export type Strain = number & { readonly [strainBrand]: true };

/** One micro-strain (µε) as a plain strain. */
export const MICROSTRAIN = 1e-6;

/** Marks a plain dimensionless number as a strain. @param value strain, m/m */
export function strain(value: number): Strain {
  return value as Strain;
}

/** Converts a micro-strain reading to a plain strain. @param value strain, µε (10⁻⁶ m/m) */
export function microstrain(value: number): Strain {
  return (value * MICROSTRAIN) as Strain;
}

/** Converts a plain strain to micro-strain. @param value strain, m/m @returns strain, µε */
export function toMicrostrain(value: Strain | number): number {
  return value / MICROSTRAIN;
}

/**
 * A reading corrected for a gauge factor other than the one the instrument was set to. A gauge's
 * gauge factor is GF = (ΔR/R)/ε; the instrument turns ΔR/R into strain with the factor it is set
 * to, so the strain it shows is ε_read = (ΔR/R)/GF_set and the strain on the surface is
 * ε = ε_read · GF_set / GF_gauge (from that definition; recalled from memory). Transverse
 * sensitivity is not corrected here.
 * @param reading the strain the instrument showed, m/m
 * @param instrumentFactor the gauge factor the instrument was set to (> 0)
 * @param gaugeFactor the gauge factor of the gauge, from its data sheet (> 0)
 * @returns the corrected strain, m/m
 * @throws TypeError/RangeError naming the argument when it is not finite, or a factor not positive
 */
export function correctForGaugeFactor(
  reading: Strain,
  instrumentFactor: number,
  gaugeFactor: number,
): Strain {
  checkStrain(reading, "reading");
  assertFinite(instrumentFactor, "instrumentFactor");
  assertFinite(gaugeFactor, "gaugeFactor");
  if (instrumentFactor <= 0)
    throw new RangeError(`instrumentFactor must be positive, got ${instrumentFactor}`);
  if (gaugeFactor <= 0) throw new RangeError(`gaugeFactor must be positive, got ${gaugeFactor}`);
  return strain((reading * instrumentFactor) / gaugeFactor);
}

/** In-plane strain state at a point: normal strains and the engineering shear strain. */
export type PlaneStrain = {
  /** normal strain along x, m/m */
  ex: Strain;
  /** normal strain along y, m/m */
  ey: Strain;
  /** engineering shear strain γxy = 2εxy, rad (m/m) */
  gxy: Strain;
};

/** One gauge of a rosette: its direction and its reading. */
export type GaugeReading = {
  /** gauge direction, degrees counter-clockwise from x */
  angle: Degrees | number;
  /** reading, plain strain (m/m) */
  strain: Strain;
};

/** Principal strains of an in-plane strain state. */
export type PrincipalStrains = {
  /** larger in-plane principal strain, m/m */
  e1: Strain;
  /** smaller in-plane principal strain, m/m */
  e2: Strain;
  /** angle from the x axis to the ε1 direction, counter-clockwise positive, in (−90°, 90°] */
  thetaE1: Degrees;
  /** maximum in-plane engineering shear strain γmax = ε1 − ε2, m/m */
  gammaMaxInPlane: Strain;
};

/** Elastic constants of an isotropic material. */
export type ElasticConstants = {
  /** Young's modulus E, any stress unit (> 0); the stresses come back in this unit */
  E: number;
  /** Poisson's ratio ν, dimensionless, −1 < ν < 0.5 */
  nu: number;
};

/** Plane stress found from a plane strain state with Hooke's law. */
export type StressFromStrain = {
  /** σx, unit of E */
  sx: number;
  /** σy, unit of E */
  sy: number;
  /** τxy, unit of E */
  txy: number;
  /** larger in-plane principal stress, unit of E */
  s1: number;
  /** smaller in-plane principal stress, unit of E */
  s2: number;
  /** angle from x to σ1, degrees, in (−90°, 90°] (the same as to ε1 for an isotropic material) */
  thetaP: Degrees;
  /** shear modulus G = E/(2(1 + ν)), unit of E */
  G: number;
  /** the plane-stress tensor in the gauges' x y frame (σz = τyz = τzx = 0), unit of E */
  tensor: StressTensor;
};

function checkStrain(value: unknown, name: string): asserts value is Strain {
  assertFinite(value, name);
}

function checkPlaneStrain(s: unknown, name: string): asserts s is PlaneStrain {
  if (typeof s !== "object" || s === null) throw new TypeError(`${name} must be a PlaneStrain object`);
  const rec = s as Record<string, unknown>;
  for (const key of ["ex", "ey", "gxy"]) checkStrain(rec[key], `${name}.${key}`);
}

/**
 * Rectangular (0°/45°/90°) rosette: εx = ε0, εy = ε90, γxy = 2ε45 − ε0 − ε90 (from the strain
 * transformation at 0°, 45° and 90°).
 * @param e0 reading of the gauge along x, plain strain (m/m)
 * @param e45 reading of the gauge at 45° counter-clockwise from x, m/m
 * @param e90 reading of the gauge along y, m/m
 * @returns εx, εy, γxy, m/m
 * @throws TypeError/RangeError naming the reading when it is not a finite number
 */
export function rectangularRosette(e0: Strain, e45: Strain, e90: Strain): PlaneStrain {
  checkStrain(e0, "e0");
  checkStrain(e45, "e45");
  checkStrain(e90, "e90");
  return { ex: e0, ey: e90, gxy: strain(2 * e45 - e0 - e90) };
}

/**
 * Delta (0°/60°/120°) rosette: εx = ε0, εy = (2ε60 + 2ε120 − ε0)/3, γxy = 2(ε60 − ε120)/√3 (from
 * the strain transformation at 0°, 60° and 120°).
 * @param e0 reading of the gauge along x, plain strain (m/m)
 * @param e60 reading of the gauge at 60° counter-clockwise from x, m/m
 * @param e120 reading of the gauge at 120° counter-clockwise from x, m/m
 * @returns εx, εy, γxy, m/m
 * @throws TypeError/RangeError naming the reading when it is not a finite number
 */
export function deltaRosette(e0: Strain, e60: Strain, e120: Strain): PlaneStrain {
  checkStrain(e0, "e0");
  checkStrain(e60, "e60");
  checkStrain(e120, "e120");
  return {
    ex: e0,
    ey: strain((2 * e60 + 2 * e120 - e0) / 3),
    gxy: strain((2 * (e60 - e120)) / Math.sqrt(3)),
  };
}

/** Relative size below which the three-gauge system counts as singular (two gauges parallel). */
const SINGULAR_REL = 1e-9;

/**
 * Any three-gauge rosette: solves εθᵢ = εx cos²θᵢ + εy sin²θᵢ + γxy sin θᵢ cos θᵢ (i = 1, 2, 3) for
 * εx, εy, γxy by Cramer's rule. The three directions must differ modulo 180° (a gauge and one turned by
 * 180° read the same strain).
 * @param gauges three gauges: angle (degrees, counter-clockwise from x) and reading (plain strain, m/m)
 * @returns εx, εy, γxy, m/m
 * @throws TypeError when `gauges` is not three readings; RangeError naming the gauge when an angle or
 *   reading is not finite, or when two directions coincide modulo 180°
 */
export function threeGaugeRosette(gauges: readonly [GaugeReading, GaugeReading, GaugeReading]): PlaneStrain {
  if (!Array.isArray(gauges) || gauges.length !== 3) {
    throw new TypeError("gauges must be an array of exactly three readings");
  }
  const rows = gauges.map((g: unknown, i) => {
    if (typeof g !== "object" || g === null) throw new TypeError(`gauges[${i}] must be a GaugeReading`);
    const { angle, strain: reading } = g as Record<string, unknown>;
    assertFinite(angle, `gauges[${i}].angle`);
    checkStrain(reading, `gauges[${i}].strain`);
    const [c, s] = cosSinDeg(angle);
    return [c * c, s * s, s * c, reading] as const;
  });
  const det3 = (m: readonly (readonly number[])[]): number =>
    m[0][0] * (m[1][1] * m[2][2] - m[1][2] * m[2][1]) -
    m[0][1] * (m[1][0] * m[2][2] - m[1][2] * m[2][0]) +
    m[0][2] * (m[1][0] * m[2][1] - m[1][1] * m[2][0]);
  const a = rows.map((r) => [r[0], r[1], r[2]]);
  const b = rows.map((r) => r[3]);
  const d = det3(a);
  // Each coefficient row has length ≤ 1, so |det| ≤ 1; a tiny det means two parallel gauges.
  if (Math.abs(d) < SINGULAR_REL) {
    throw new RangeError(
      `gauges angles must differ modulo 180°, got ${gauges.map((g) => g.angle).join("°, ")}°`,
    );
  }
  const withColumn = (k: number) => a.map((row, i) => row.map((v, j) => (j === k ? b[i] : v)));
  return {
    ex: strain(det3(withColumn(0)) / d),
    ey: strain(det3(withColumn(1)) / d),
    gxy: strain(det3(withColumn(2)) / d),
  };
}

/**
 * Normal strain along a direction θ from x: εθ = εx cos²θ + εy sin²θ + γxy sin θ cos θ.
 * @param ex normal strain εx, m/m
 * @param ey normal strain εy, m/m
 * @param gxy engineering shear strain γxy, m/m
 * @param thetaDeg direction, degrees counter-clockwise from x
 * @returns εθ, m/m
 * @throws TypeError/RangeError naming the argument when it is not a finite number
 */
export function transformStrain(ex: Strain, ey: Strain, gxy: Strain, thetaDeg: Degrees | number): Strain {
  checkStrain(ex, "ex");
  checkStrain(ey, "ey");
  checkStrain(gxy, "gxy");
  assertFinite(thetaDeg, "thetaDeg");
  const [c, s] = cosSinDeg(thetaDeg);
  return strain(ex * c * c + ey * s * s + gxy * s * c);
}

/**
 * In-plane principal strains: ε1,2 = (εx + εy)/2 ± √(((εx − εy)/2)² + (γxy/2)²), with
 * tan 2θ = γxy/(εx − εy) resolved so θ points at ε1. An in-plane isotropic strain gives θ = 0.
 * @param s the strain state, m/m (γxy engineering)
 * @returns ε1 ≥ ε2 (m/m), the angle from x to ε1 (degrees, in (−90°, 90°]) and γmax = ε1 − ε2
 * @throws TypeError/RangeError naming the component when it is not a finite number
 */
export function principalStrains(s: PlaneStrain): PrincipalStrains {
  checkPlaneStrain(s, "strain");
  const center = s.ex / 2 + s.ey / 2;
  const half = s.ex / 2 - s.ey / 2;
  const radius = Math.hypot(half, s.gxy / 2);
  let theta = radToDeg(Math.atan2(s.gxy / 2, half)) / 2;
  if (theta <= -90) theta += 180;
  return {
    e1: strain(center + radius),
    e2: strain(center - radius),
    thetaE1: deg(theta === 0 ? 0 : theta),
    gammaMaxInPlane: strain(2 * radius),
  };
}

/**
 * Plane stress (σz = 0, a free surface) from the in-plane strains by Hooke's law for an isotropic
 * material: σx = E(εx + νεy)/(1 − ν²), σy = E(εy + νεx)/(1 − ν²), τxy = G·γxy with G = E/(2(1 + ν));
 * principal stresses σ1,2 = E(ε1,2 + ν ε2,1)/(1 − ν²) at the angle of ε1.
 * @param s the strain state, m/m (γxy engineering)
 * @param material Young's modulus E (any stress unit, > 0) and Poisson's ratio ν (−1 < ν < 0.5)
 * @returns σx, σy, τxy, σ1 ≥ σ2, θp (degrees) and G in the unit of E, and the plane-stress tensor
 * @throws TypeError/RangeError naming the component or constant that is missing, not finite or out of range
 */
export function stressFromStrain(s: PlaneStrain, material: ElasticConstants): StressFromStrain {
  checkPlaneStrain(s, "strain");
  if (typeof material !== "object" || material === null) {
    throw new TypeError("material must be an object with E and nu");
  }
  const { E, nu } = material;
  assertFinite(E, "material.E");
  assertFinite(nu, "material.nu");
  if (E <= 0) throw new RangeError(`material.E must be positive, got ${E}`);
  if (!(nu > -1 && nu < 0.5)) throw new RangeError(`material.nu must lie in (−1, 0.5), got ${nu}`);
  const k = E / (1 - nu * nu);
  const G = E / (2 * (1 + nu));
  const sx = k * (s.ex + nu * s.ey);
  const sy = k * (s.ey + nu * s.ex);
  const txy = G * s.gxy;
  const p = principalStrains(s);
  return {
    sx,
    sy,
    txy,
    s1: k * (p.e1 + nu * p.e2),
    s2: k * (p.e2 + nu * p.e1),
    thetaP: p.thetaE1,
    G,
    tensor: { xx: sx, yy: sy, zz: 0, xy: txy, yz: 0, zx: 0 },
  };
}
