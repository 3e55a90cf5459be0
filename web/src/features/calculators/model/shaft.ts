/**
 * The shaft calculator: a solid or hollow circular shaft under bending about two axes (or one moment
 * and the fibre it stretches), torque, axial force and transverse shear, with Kt for bending, torsion
 * and axial load; the state at a surface point and the critical point.
 */
import {
  bendingTowards,
  convertStress,
  hollowShaftStress,
  type CombinedShaftStress,
  type ShaftPointStress,
  type ShaftSurface,
} from "../../../../../core";
import { SHAFT_INPUTS } from "../../../../../core/constants/calculators";
import type { InputValues } from "./inputs";
import { attempt, refuse, type Outcome } from "./outcome";
import { stressUnitOf, toWorking } from "./units";

export { SHAFT_INPUTS };

export type ShaftValues = InputValues<typeof SHAFT_INPUTS>;

/** The result with every stress in the unit set's stress unit (lengths stay in working mm inside `raw`). */
export type ShaftResult = {
  /** the state at the point asked for */
  point: ShaftPointStress;
  /** the largest von Mises point over the outer (and inner) face */
  critical: ShaftPointStress;
  nominal: CombinedShaftStress["nominal"];
  kt: CombinedShaftStress["kt"];
  /** the moment components used, N·mm */
  momentY: number;
  momentZ: number;
};

const STRESS_KEYS = [
  "bending",
  "axial",
  "sigma",
  "torsion",
  "transverseShear",
  "tau",
  "vonMises",
  "maxShear",
] as const;

function pointIn(p: ShaftPointStress, f: (v: number) => number): ShaftPointStress {
  const out = { ...p };
  for (const k of STRESS_KEYS) out[k] = f(p[k]);
  out.tensor = { xx: f(p.tensor.xx), yy: 0, zz: 0, xy: f(p.tensor.xy), yz: 0, zx: 0 };
  return out;
}

/** Stresses of the shaft, in the set's stress unit, from inputs in the set's units. */
export function computeShaft(v: ShaftValues): Outcome<ShaftResult> {
  return attempt(() => {
    const n = v.numbers;
    const w = (key: keyof ShaftValues["numbers"]) =>
      toWorking(n[key], SHAFT_INPUTS.numbers[key].dimension, v.units);
    const hollow = v.choices.section === "hollow";
    if (!(n.D > 0)) refuse("Outer diameter D", "must be positive");
    if (hollow && !(n.d > 0 && n.d < n.D)) refuse("Bore diameter d", "must be positive and smaller than D");
    for (const [key, label] of [
      ["ktb", "Kt for bending"],
      ["ktt", "Kt for torsion"],
      ["kta", "Kt for axial load"],
    ] as const) {
      if (!(n[key] >= 1)) refuse(label, "must be at least 1");
    }
    const surface = (hollow ? v.choices.surface : "outer") as ShaftSurface;
    const moments =
      v.choices.moments === "direction"
        ? bendingTowards(w("M"), n.phi)
        : { momentY: w("My"), momentZ: w("Mz") };
    const r = hollowShaftStress(
      { outerDiameter: w("D"), innerDiameter: hollow ? w("d") : 0 },
      { ...moments, torque: w("T"), axialForce: w("P"), shearY: w("Vy"), shearZ: w("Vz") },
      { kt: { bending: n.ktb, torsion: n.ktt, axial: n.kta }, point: { surface, angle: n.angle } },
    );
    const unit = stressUnitOf(v.units);
    const f = (mpa: number) => convertStress(mpa, "MPa", unit);
    return {
      point: pointIn(r.point!, f),
      critical: pointIn(r.critical, f),
      nominal: {
        bending: f(r.nominal.bending),
        axial: f(r.nominal.axial),
        torsion: f(r.nominal.torsion),
        transverseShear: f(r.nominal.transverseShear),
      },
      kt: r.kt,
      momentY: moments.momentY,
      momentZ: moments.momentZ,
    };
  });
}

/**
 * The angle as the page keeps it for a point it is told to use: 10 significant figures, what the
 * angle field shows, so the number stored with a saved state is the very number on screen and a
 * reopened link computes the same state. The critical angle is a maximum of σvM, so rounding it
 * there moves σvM only in the second order (by far less than rounding), and σx, τxy by about
 * 1e-9 of themselves.
 */
export function keptAngle(angle: number): number {
  const kept = Number(angle.toPrecision(10));
  // 359.99999999999° keeps as 360°, which the calculator reads as 0°: say 0° at once.
  return kept >= 360 ? kept - 360 : kept;
}

/**
 * The inputs with the point moved to the critical one: its surface (a solid shaft has only the
 * outer one, and its surface choice is left as it was) and its angle as the page keeps it. Every
 * other input stays, so "Add to load case" and "Send to bench" then carry the critical state, and
 * the saved inputs reproduce it.
 */
export function atCriticalPoint(v: ShaftValues, critical: ShaftPointStress): ShaftValues {
  const hollow = v.choices.section === "hollow";
  return {
    ...v,
    numbers: { ...v.numbers, angle: keptAngle(critical.angle) },
    choices: hollow ? { ...v.choices, surface: critical.surface } : v.choices,
  };
}

/** Whether the point asked for is already the critical point (same surface, same kept angle). */
export function isCriticalPoint(result: ShaftResult): boolean {
  return (
    result.point.surface === result.critical.surface &&
    keptAngle(result.point.angle) === keptAngle(result.critical.angle)
  );
}
