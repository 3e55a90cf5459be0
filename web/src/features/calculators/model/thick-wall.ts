/**
 * The thick-walled (Lamé) calculators: a cylinder with its end condition and a sphere, each under
 * internal and external pressure, at a chosen radius and through the wall.
 */
import {
  thickCylinder,
  thickCylinderProfile,
  thickSphere,
  thickSphereProfile,
  type CylinderEnds,
  type StressTensor,
} from "../../../../../core";
import { THICK_CYLINDER_INPUTS, THICK_SPHERE_INPUTS } from "../../../../../core/constants/calculators";
import type { InputValues } from "./inputs";
import { attempt, refuse, type Outcome } from "./outcome";

export { THICK_CYLINDER_INPUTS, THICK_SPHERE_INPUTS };

export type ThickCylinderValues = InputValues<typeof THICK_CYLINDER_INPUTS>;
export type ThickSphereValues = InputValues<typeof THICK_SPHERE_INPUTS>;

/** One radius of a through-wall profile, stresses in the set's stress unit. */
export type ProfilePoint = { radius: number; radial: number; hoop: number; axial?: number };

export type ThickResult = {
  radius: number;
  radial: number;
  hoop: number;
  /** σz for a cylinder; undefined for a sphere (σφ = σθ there) */
  axial: number | undefined;
  /** cylinder: x = axial, y = hoop, z = radial; sphere: x, y two tangents, z = radial */
  tensor: StressTensor;
  lameA: number;
  lameB: number;
  profile: ProfilePoint[];
};

function checkWall(n: { ri: number; ro: number; r: number }) {
  if (!(n.ri > 0)) refuse("Inner radius rᵢ", "must be positive");
  if (!(n.ro > n.ri)) refuse("Outer radius rₒ", "must be larger than the inner radius");
  if (!(n.r >= n.ri && n.r <= n.ro)) refuse("Radius r", `must lie in the wall, from ${n.ri} to ${n.ro}`);
}

/** Lamé stresses in a thick-walled cylinder at r, and through the wall (pressures' unit). */
export function computeThickCylinder(v: ThickCylinderValues): Outcome<ThickResult> {
  return attempt(() => {
    const n = v.numbers;
    checkWall(n);
    const ends = v.choices.ends as CylinderEnds;
    if (ends === "plane-strain" && !(n.nu > -1 && n.nu <= 0.5))
      refuse("Poisson's ratio ν", "must lie in (−1, 0.5]");
    const input = {
      innerRadius: n.ri,
      outerRadius: n.ro,
      innerPressure: n.pi,
      outerPressure: n.po,
      ends,
      ...(ends === "plane-strain" ? { poissonRatio: n.nu } : {}),
    };
    const s = thickCylinder(input, n.r);
    return {
      radius: s.radius,
      radial: s.radial,
      hoop: s.hoop,
      axial: s.axial,
      tensor: s.tensor,
      lameA: s.lameA,
      lameB: s.lameB,
      profile: thickCylinderProfile(input).map((q) => ({
        radius: q.radius,
        radial: q.radial,
        hoop: q.hoop,
        axial: q.axial,
      })),
    };
  });
}

/** Lamé stresses in a thick-walled sphere at r, and through the wall (pressures' unit). */
export function computeThickSphere(v: ThickSphereValues): Outcome<ThickResult> {
  return attempt(() => {
    const n = v.numbers;
    checkWall(n);
    const input = { innerRadius: n.ri, outerRadius: n.ro, innerPressure: n.pi, outerPressure: n.po };
    const s = thickSphere(input, n.r);
    return {
      radius: s.radius,
      radial: s.radial,
      hoop: s.hoop,
      axial: undefined,
      tensor: s.tensor,
      lameA: s.lameA,
      lameB: s.lameB,
      profile: thickSphereProfile(input).map((q) => ({ radius: q.radius, radial: q.radial, hoop: q.hoop })),
    };
  });
}
