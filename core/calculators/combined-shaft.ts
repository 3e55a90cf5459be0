// Long because one calculator's parts belong together: section properties, nominal stresses
// with Kt, the state at a surface point and the search for the critical point share their types.
/**
 * Solid or hollow circular shaft under combined load: bending about two axes, torque, axial force and
 * transverse shear. Gives the full stress state at any point of the outer (and, for a hollow shaft,
 * inner) surface, and finds the point of largest von Mises stress.
 *
 * Handbook formulas (recalled from memory: Roark's Formulas for Stress and Strain, and Shigley's
 * Mechanical Engineering Design, shafts; any strength-of-materials text), with ro, ri the outer and
 * inner radius (ri = 0 for a solid shaft), A = π(ro² − ri²), I = π(ro⁴ − ri⁴)/4, J = 2I:
 * - bending: σ = M·c/I at distance c from the neutral axis; with moment components My, Mz the normal
 *   stress at (y, z) is σx = (My·z − Mz·y)/I;
 * - axial: σ = P/A;
 * - torsion: τ = T·ρ/J at radius ρ;
 * - transverse shear: the average shear stress over the radial line through the point, from the shear
 *   formula τ = V·Q/(I·b) applied to the annular sector cut off by radial lines:
 *   τ = (4/(3A))·k·(V·t̂), k = (ro² + ro·ri + ri²)/(ro² + ri²), t̂ the surface tangent at the point.
 *   Its largest value, on the neutral axis, is the handbook maximum 4V/(3A)·k (Gere & Goodno, Mechanics
 *   of Materials, shear stresses in beams of circular cross-section; recalled from memory): 4V/(3A)
 *   for a solid shaft and 2V/A as the wall becomes thin (k → 3/2). The value is the same at the outer
 *   and inner face of the point's radial line. The exact elastic solution of a solid circular section
 *   (Timoshenko & Goodier, Theory of Elasticity, bending of a circular cantilever; recalled from
 *   memory) gives (1 + 2ν)/(1 + ν)·V/A at the surface on the neutral axis, 1.23 V/A for ν = 0.3, so
 *   4V/(3A) = 1.33 V/A is on the safe side there.
 *
 * All stresses are nominal (no stress concentration) until multiplied by the stress-concentration
 * factors given: Kt for bending multiplies the bending stress, Kt for torsion the torsional shear, Kt
 * for axial load the axial stress. Transverse shear stays nominal: it peaks on the neutral axis, where
 * bending does not, and handbooks give no separate Kt for it (common practice, no source).
 *
 * Geometry and signs: x along the shaft axis, y and z across the section, right-handed. A surface
 * point is given by its angle θ from +y towards +z: it sits at (y, z) = ρ(cos θ, sin θ). Loads act on
 * the cut face whose outward normal is +x: My, Mz, T are the components of its moment vector (right-hand
 * rule), Vy, Vz of its shear force, P its axial force (tension positive). {@link bendingTowards} turns
 * one moment and the angle of the fibre it stretches into My, Mz. The frame at the point, as in
 * shaft.ts: x along the shaft, y tangential (t̂ = (−sin θ, cos θ), the way the point moves under a
 * positive rotation about +x), z radial, pointing inward. In that frame only σx and τxy are non-zero.
 * The point at θ = 90° under My = M is the fibre shaft.ts stretches with M, and there the two functions
 * agree. Units: any consistent set — N and mm give MPa; N and m give Pa.
 *
 * The critical point: σx(θ) and τxy(θ) are each a constant plus a first harmonic of θ, so σvm(θ)² is a
 * trigonometric polynomial of second degree with at most two maxima per surface. It is sampled at every
 * 0.5°, and each sampled local maximum is refined by bisection on the analytic slope dσvm²/dθ to an
 * angle within 1e-12° (golden-section search on the value where the slope does not change sign across
 * the bracket), which leaves the von Mises stress exact to rounding. A numerical search, not a closed
 * form: were two maxima less than 1° apart, the lower could be reported, short of the higher by no
 * more than σvm varies over 1°.
 */
import type { StressTensor } from "../tensor/types";
import { assertFinite } from "../tensor/validate";
import { cosSinDeg } from "../units/angles";

/** The circular section: a solid shaft has no inner diameter (or 0). */
export type ShaftSection = {
  /** outer diameter D, any length unit, > 0 */
  outerDiameter: number;
  /** inner (bore) diameter d, same length unit, 0 ≤ d < D; omitted or 0 for a solid shaft */
  innerDiameter?: number;
};

/**
 * Loads on the cut face with outward normal +x (each optional, default 0; force and force × length in
 * the same units as the section).
 */
export type CombinedShaftLoads = {
  /** bending-moment component about y, My (right-hand rule); stretches the fibres at +z */
  momentY?: number;
  /** bending-moment component about z, Mz (right-hand rule); stretches the fibres at −y */
  momentZ?: number;
  /** torque T about the shaft axis x (right-hand rule) */
  torque?: number;
  /** axial force P, tension positive */
  axialForce?: number;
  /** transverse shear force component along y, Vy */
  shearY?: number;
  /** transverse shear force component along z, Vz */
  shearZ?: number;
};

/** Stress-concentration factors, each ≥ 1 (default 1: nominal stresses). */
export type ShaftKt = {
  /** Kt for bending, multiplies the bending stress */
  bending?: number;
  /** Kt for torsion, multiplies the torsional shear stress */
  torsion?: number;
  /** Kt for axial load, multiplies the axial stress */
  axial?: number;
};

/** Which face of the shaft a point lies on. */
export type ShaftSurface = "outer" | "inner";

/** A point on a surface of the shaft. */
export type ShaftSurfacePoint = {
  /** "outer", or "inner" (hollow shafts only) */
  surface: ShaftSurface;
  /** angle θ from +y towards +z, degrees */
  angle: number;
};

/** The stress state at a surface point, in force / length² of the inputs. */
export type ShaftPointStress = {
  /** the face the point lies on */
  surface: ShaftSurface;
  /** angle θ from +y towards +z, degrees, in [0, 360) */
  angle: number;
  /** radius of the point: ro on the outer face, ri on the inner (length unit) */
  radius: number;
  /** bending stress Kt,b·(My·z − Mz·y)/I at the point */
  bending: number;
  /** axial stress Kt,a·P/A */
  axial: number;
  /** normal stress along the shaft σx = bending + axial */
  sigma: number;
  /** torsional shear stress Kt,t·T·ρ/J, along the tangent t̂ */
  torsion: number;
  /** transverse-shear stress along t̂ (nominal; the radial-line average, see the file comment) */
  transverseShear: number;
  /** shear stress τxy = torsion + transverseShear */
  tau: number;
  /** the tensor in x = along the shaft, y = tangential, z = radial (inward): σx and τxy only */
  tensor: StressTensor;
  /** von Mises stress √(σx² + 3τxy²) */
  vonMises: number;
  /** largest shear stress √((σx/2)² + τxy²) (Tresca's τmax, with the third principal stress 0) */
  maxShear: number;
};

/** Section properties, in the length unit of the inputs. */
export type ShaftSectionProperties = {
  /** outer radius ro = D/2 */
  outerRadius: number;
  /** inner radius ri = d/2 (0 for a solid shaft) */
  innerRadius: number;
  /** area A = π(ro² − ri²), length² */
  area: number;
  /** second moment of area about any diameter I = π(ro⁴ − ri⁴)/4, length⁴ */
  secondMoment: number;
  /** polar second moment J = 2I, length⁴ */
  polarMoment: number;
};

/** Nominal (no stress concentration) largest stresses of each kind, on the outer face. */
export type ShaftNominalStresses = {
  /** bending M·ro/I with M = √(My² + Mz²), in magnitude */
  bending: number;
  /** axial P/A, signed (tension positive) */
  axial: number;
  /** torsion T·ro/J, signed like T */
  torsion: number;
  /** transverse shear 4V/(3A)·k on the neutral axis, V = √(Vy² + Vz²), in magnitude */
  transverseShear: number;
};

/** The result of {@link hollowShaftStress}. */
export type CombinedShaftStress = {
  /** section properties */
  section: ShaftSectionProperties;
  /** nominal largest stresses of each load, before any Kt */
  nominal: ShaftNominalStresses;
  /** the Kt factors applied (1 where none was given) */
  kt: Required<ShaftKt>;
  /** the state at the point asked for in `options.point`; undefined when none was asked for */
  point: ShaftPointStress | undefined;
  /**
   * The point of largest von Mises stress over the outer face and, for a hollow shaft, the inner
   * face (Kt included). When several points tie (an axial force or torque alone), the outer face and
   * the smallest angle are reported.
   */
  critical: ShaftPointStress;
};

const LOAD_KEYS = ["momentY", "momentZ", "torque", "axialForce", "shearY", "shearZ"] as const;
const KT_KEYS = ["bending", "torsion", "axial"] as const;
const SAMPLES = 720;
const GOLDEN = (Math.sqrt(5) - 1) / 2;
const ANGLE_TOLERANCE = 1e-12;

type Loads = Record<(typeof LOAD_KEYS)[number], number>;

function checkSection(section: unknown): ShaftSectionProperties {
  if (typeof section !== "object" || section === null) {
    throw new TypeError(
      "section must be an object with outerDiameter (and innerDiameter for a hollow shaft)",
    );
  }
  const s = section as Record<string, unknown>;
  assertFinite(s.outerDiameter, "section.outerDiameter");
  const inner = s.innerDiameter ?? 0;
  assertFinite(inner, "section.innerDiameter");
  const D = s.outerDiameter;
  if (D <= 0) throw new RangeError(`section.outerDiameter must be positive, got ${D}`);
  if (inner < 0) throw new RangeError(`section.innerDiameter must not be negative, got ${inner}`);
  if (inner >= D) {
    throw new RangeError(`section.innerDiameter must be smaller than outerDiameter (${D}), got ${inner}`);
  }
  const ro = D / 2;
  const ri = inner / 2;
  const ro2 = ro * ro;
  const ri2 = ri * ri;
  const area = Math.PI * (ro - ri) * (ro + ri);
  const secondMoment = (Math.PI * (ro - ri) * (ro + ri) * (ro2 + ri2)) / 4;
  return { outerRadius: ro, innerRadius: ri, area, secondMoment, polarMoment: 2 * secondMoment };
}

function checkLoads(loads: unknown): Loads {
  if (typeof loads !== "object" || loads === null) {
    throw new TypeError(`loads must be an object with any of ${LOAD_KEYS.join(", ")}`);
  }
  const l = loads as Record<string, unknown>;
  for (const key of Object.keys(l)) {
    if (!(LOAD_KEYS as readonly string[]).includes(key)) {
      throw new RangeError(`loads.${key} is not a load this calculator knows (${LOAD_KEYS.join(", ")})`);
    }
  }
  const out = {} as Loads;
  for (const key of LOAD_KEYS) {
    const v = l[key] ?? 0;
    assertFinite(v, `loads.${key}`);
    out[key] = v;
  }
  return out;
}

function checkKt(kt: unknown): Required<ShaftKt> {
  if (kt === undefined) return { bending: 1, torsion: 1, axial: 1 };
  if (typeof kt !== "object" || kt === null) throw new TypeError("options.kt must be an object when given");
  const k = kt as Record<string, unknown>;
  const out = { bending: 1, torsion: 1, axial: 1 };
  for (const key of KT_KEYS) {
    const v = k[key] ?? 1;
    assertFinite(v, `options.kt.${key}`);
    if (v < 1) throw new RangeError(`options.kt.${key} must be at least 1, got ${v}`);
    out[key] = v;
  }
  return out;
}

function checkPoint(point: unknown, hollow: boolean): ShaftSurfacePoint {
  if (typeof point !== "object" || point === null) {
    throw new TypeError("options.point must be an object with surface and angle");
  }
  const p = point as Record<string, unknown>;
  if (p.surface !== "outer" && p.surface !== "inner") {
    throw new RangeError(
      `options.point.surface must be "outer" or "inner", got ${JSON.stringify(p.surface)}`,
    );
  }
  if (p.surface === "inner" && !hollow) {
    throw new RangeError('options.point.surface "inner" needs a hollow shaft (innerDiameter > 0)');
  }
  assertFinite(p.angle, "options.point.angle");
  return { surface: p.surface, angle: p.angle };
}

/** The parts of the state that do not depend on the angle, for one face. */
type Face = {
  surface: ShaftSurface;
  radius: number;
  axial: number;
  torsion: number;
  /** bending σ = bendCos·cos θ + bendSin·sin θ */
  bendCos: number;
  bendSin: number;
  /** transverse shear τ = shearCos·cos θ + shearSin·sin θ */
  shearCos: number;
  shearSin: number;
};

function faceOf(surface: ShaftSurface, s: ShaftSectionProperties, l: Loads, kt: Required<ShaftKt>): Face {
  const rho = surface === "outer" ? s.outerRadius : s.innerRadius;
  const { outerRadius: ro, innerRadius: ri } = s;
  const k = (ro * ro + ro * ri + ri * ri) / (ro * ro + ri * ri);
  const shearScale = (4 * k) / (3 * s.area);
  const bendScale = (kt.bending * rho) / s.secondMoment;
  return {
    surface,
    radius: rho,
    axial: (kt.axial * l.axialForce) / s.area,
    torsion: (kt.torsion * l.torque * rho) / s.polarMoment,
    // σx = (My·z − Mz·y)/I with (y, z) = ρ(cos θ, sin θ)
    bendCos: -l.momentZ * bendScale,
    bendSin: l.momentY * bendScale,
    // V·t̂ with t̂ = (−sin θ, cos θ)
    shearCos: l.shearZ * shearScale,
    shearSin: -l.shearY * shearScale,
  };
}

function stateAt(f: Face, angle: number): ShaftPointStress {
  let a = angle % 360;
  if (a < 0) a += 360;
  const [c, s] = cosSinDeg(a);
  const bending = f.bendCos * c + f.bendSin * s;
  const transverseShear = f.shearCos * c + f.shearSin * s;
  const sigma = bending + f.axial;
  const tau = f.torsion + transverseShear;
  return {
    surface: f.surface,
    angle: a,
    radius: f.radius,
    bending,
    axial: f.axial,
    sigma,
    torsion: f.torsion,
    transverseShear,
    tau,
    tensor: { xx: sigma, yy: 0, zz: 0, xy: tau, yz: 0, zx: 0 },
    vonMises: Math.sqrt(sigma * sigma + 3 * tau * tau),
    maxShear: Math.hypot(sigma / 2, tau),
  };
}

/** σvm² at an angle: the quantity maximised (its square root is monotonic). */
function vmSquared(f: Face, angle: number): number {
  const [c, s] = cosSinDeg(angle);
  const sigma = f.bendCos * c + f.bendSin * s + f.axial;
  const tau = f.torsion + f.shearCos * c + f.shearSin * s;
  return sigma * sigma + 3 * tau * tau;
}

/** dσvm²/dθ (per radian) at an angle: zero at each maximum. */
function vmSquaredSlope(f: Face, angle: number): number {
  const [c, s] = cosSinDeg(angle);
  const sigma = f.bendCos * c + f.bendSin * s + f.axial;
  const tau = f.torsion + f.shearCos * c + f.shearSin * s;
  const dSigma = -f.bendCos * s + f.bendSin * c;
  const dTau = -f.shearCos * s + f.shearSin * c;
  return 2 * sigma * dSigma + 6 * tau * dTau;
}

/**
 * The angle of the maximum of σvm² in [lo, hi] (degrees): bisection on the slope when it changes sign
 * from rise to fall across the bracket (the slope crosses zero steeply, so the angle comes out to
 * rounding), golden-section search on the value otherwise.
 */
function refineMaximum(f: Face, lo: number, hi: number): number {
  let a = lo;
  let b = hi;
  if (vmSquaredSlope(f, a) > 0 && vmSquaredSlope(f, b) < 0) {
    for (let i = 0; i < 200 && b - a > ANGLE_TOLERANCE; i++) {
      const mid = (a + b) / 2;
      if (vmSquaredSlope(f, mid) > 0) a = mid;
      else b = mid;
    }
    return (a + b) / 2;
  }
  let x1 = b - GOLDEN * (b - a);
  let x2 = a + GOLDEN * (b - a);
  let f1 = vmSquared(f, x1);
  let f2 = vmSquared(f, x2);
  for (let i = 0; i < 200 && b - a > ANGLE_TOLERANCE; i++) {
    if (f1 >= f2) {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = b - GOLDEN * (b - a);
      f1 = vmSquared(f, x1);
    } else {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = a + GOLDEN * (b - a);
      f2 = vmSquared(f, x2);
    }
  }
  return (a + b) / 2;
}

/** The largest von Mises point on one face: sampled every 0.5°, each local maximum refined. */
function criticalOnFace(f: Face): ShaftPointStress {
  const step = 360 / SAMPLES;
  const values: number[] = [];
  for (let i = 0; i < SAMPLES; i++) values.push(vmSquared(f, i * step));
  let best = stateAt(f, 0);
  for (let i = 0; i < SAMPLES; i++) {
    const before = values[(i + SAMPLES - 1) % SAMPLES];
    const after = values[(i + 1) % SAMPLES];
    // A strict rise into the sample and no rise after it: a local maximum (a flat face has none).
    if (!(values[i] > before && values[i] >= after)) continue;
    const angle = refineMaximum(f, (i - 1) * step, (i + 1) * step);
    const candidate = stateAt(f, angle);
    if (candidate.vonMises > best.vonMises) best = candidate;
  }
  return best;
}

/**
 * Stresses of a solid or hollow circular shaft under bending about two axes, torque, axial force and
 * transverse shear (see the file comment for formulas, sources, frame, signs and the search for the
 * critical point).
 * @param section outer diameter and, for a hollow shaft, inner diameter (any length unit)
 * @param loads moment components, torque, axial force and shear-force components (each optional,
 *   default 0; force and force × the same length unit)
 * @param options `kt`: stress-concentration factors for bending, torsion and axial load (each ≥ 1,
 *   default 1); `point`: a surface point whose state to report
 * @returns section properties, nominal stresses, the Kt applied, the state at the point asked for and
 *   the critical point (largest von Mises stress), in force / length² (e.g. MPa for N and mm)
 * @throws TypeError/RangeError naming the field when a value is not finite, a diameter is impossible
 *   (D ≤ 0, d < 0, d ≥ D), a load's name is unknown, a Kt is below 1, or the point is on an inner face a
 *   solid shaft does not have
 */
export function hollowShaftStress(
  section: ShaftSection,
  loads: CombinedShaftLoads,
  options?: { kt?: ShaftKt; point?: ShaftSurfacePoint },
): CombinedShaftStress {
  const s = checkSection(section);
  const l = checkLoads(loads);
  if (options !== undefined && (typeof options !== "object" || options === null)) {
    throw new TypeError("options must be an object when given");
  }
  const kt = checkKt(options?.kt);
  const hollow = s.innerRadius > 0;
  const point = options?.point === undefined ? undefined : checkPoint(options.point, hollow);

  const faces: Face[] = [faceOf("outer", s, l, kt)];
  if (hollow) faces.push(faceOf("inner", s, l, kt));
  let critical = criticalOnFace(faces[0]);
  if (hollow) {
    const inner = criticalOnFace(faces[1]);
    if (inner.vonMises > critical.vonMises) critical = inner;
  }

  const { outerRadius: ro, innerRadius: ri } = s;
  const k = (ro * ro + ro * ri + ri * ri) / (ro * ro + ri * ri);
  return {
    section: s,
    nominal: {
      bending: (Math.hypot(l.momentY, l.momentZ) * ro) / s.secondMoment,
      axial: l.axialForce / s.area,
      torsion: (l.torque * ro) / s.polarMoment,
      transverseShear: (4 * k * Math.hypot(l.shearY, l.shearZ)) / (3 * s.area),
    },
    kt,
    point:
      point === undefined ? undefined : stateAt(point.surface === "outer" ? faces[0] : faces[1], point.angle),
    critical,
  };
}

/**
 * One bending moment and its direction, as the two components {@link hollowShaftStress} takes: the
 * moment M stretches most the surface fibre at angle φ (from +y towards +z), where the bending stress
 * is +M·c/I, and compresses most the fibre opposite. With the sign rule of the file comment
 * (σx = (My·z − Mz·y)/I) that is My = M·sin φ, Mz = −M·cos φ, so that σx = M·ρ·cos(θ − φ)/I.
 * @param moment magnitude M of the bending moment (force × length; a negative M swaps the fibres)
 * @param tensileFibreAngle φ, degrees from +y towards +z
 * @returns `momentY` and `momentZ`, to spread into the loads
 * @throws TypeError/RangeError naming the argument when it is not a finite number
 */
export function bendingTowards(
  moment: number,
  tensileFibreAngle: number,
): Required<Pick<CombinedShaftLoads, "momentY" | "momentZ">> {
  assertFinite(moment, "moment");
  assertFinite(tensileFibreAngle, "tensileFibreAngle");
  const [c, s] = cosSinDeg(tensileFibreAngle);
  // 0 · M stays a plain zero, not −0
  return { momentY: s === 0 ? 0 : moment * s, momentZ: c === 0 ? 0 : -moment * c };
}
