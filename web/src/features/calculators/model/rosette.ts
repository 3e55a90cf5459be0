/**
 * The strain-gauge rosette calculator: rectangular (0°/45°/90°), delta (0°/60°/120°) or three gauges
 * at any angles; readings in microstrain, optionally corrected for the gauge factor; principal strains
 * and the plane-stress state by Hooke's law.
 */
import {
  convertStress,
  correctForGaugeFactor,
  deltaRosette,
  microstrain,
  principalStrains,
  rectangularRosette,
  stressFromStrain,
  threeGaugeRosette,
  toMicrostrain,
  type PlaneStrain,
  type PrincipalStrains,
  type StressFromStrain,
} from "../../../../../core";
import { ROSETTE_INPUTS } from "../../../../../core/constants/calculators";
import type { InputValues } from "./inputs";
import { attempt, refuse, type Outcome } from "./outcome";
import { UNITS_OF, stressUnitOf } from "./units";

export { ROSETTE_INPUTS };

export type RosetteValues = InputValues<typeof ROSETTE_INPUTS>;

/** The gauge angles of each layout (degrees from x); "any" takes the typed ones. */
export function gaugeAngles(v: RosetteValues): [number, number, number] {
  if (v.choices.layout === "rectangular") return [0, 45, 90];
  if (v.choices.layout === "delta") return [0, 60, 120];
  return [v.numbers.a1, v.numbers.a2, v.numbers.a3];
}

export type RosetteResult = {
  angles: [number, number, number];
  /** the three readings used, µε (after the gauge-factor correction when it is asked for) */
  readings: [number, number, number];
  /** εx, εy, γxy as plain strains */
  strains: PlaneStrain;
  principal: PrincipalStrains;
  /** plane stress in the set's stress unit, in the gauges' x y frame, z normal to the surface */
  stress: StressFromStrain;
};

/** Strains and plane stress from the readings; stresses in the unit set's stress unit. */
export function computeRosette(v: RosetteValues): Outcome<RosetteResult> {
  return attempt(() => {
    const n = v.numbers;
    if (!(n.E > 0)) refuse("Young's modulus E", "must be positive");
    if (!(n.nu > -1 && n.nu < 0.5)) refuse("Poisson's ratio ν", "must lie in (−1, 0.5)");
    const corrected = v.choices.gf === "corrected";
    if (corrected && !(n.gfSet > 0)) refuse("Instrument gauge factor", "must be positive");
    if (corrected && !(n.gfGauge > 0)) refuse("Gauge factor of the gauges", "must be positive");
    // Readings taken with the instrument set to another gauge factor than the gauges' are scaled back.
    const reading = (e: number) =>
      corrected ? correctForGaugeFactor(microstrain(e), n.gfSet, n.gfGauge) : microstrain(e);
    const [g1, g2, g3] = [reading(n.e1), reading(n.e2), reading(n.e3)];
    const angles = gaugeAngles(v);
    let strains: PlaneStrain;
    if (v.choices.layout === "rectangular") strains = rectangularRosette(g1, g2, g3);
    else if (v.choices.layout === "delta") strains = deltaRosette(g1, g2, g3);
    else {
      try {
        strains = threeGaugeRosette([
          { angle: angles[0], strain: g1 },
          { angle: angles[1], strain: g2 },
          { angle: angles[2], strain: g3 },
        ]);
      } catch (error) {
        if (error instanceof RangeError) refuse("Gauge angles", "must differ from one another modulo 180°");
        throw error;
      }
    }
    // E in the stress unit the results are written in, so Hooke's law gives them directly.
    const E = convertStress(n.E, UNITS_OF[v.units].modulus, stressUnitOf(v.units));
    return {
      angles,
      readings: [toMicrostrain(g1), toMicrostrain(g2), toMicrostrain(g3)],
      strains,
      principal: principalStrains(strains),
      stress: stressFromStrain(strains, { E, nu: n.nu }),
    };
  });
}
