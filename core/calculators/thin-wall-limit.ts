/**
 * Whether thin-wall (membrane) theory suits a vessel, and how far its hoop stress falls short of the
 * Lamé (thick-wall) stress at the bore.
 *
 * The limit t/r ≤ 0.1 is the usual one for membrane formulas (common practice, no source). Beyond it the
 * ratio below tells how much larger the exact elastic stress at the inside face is. With k = t/r and
 * the inside-radius thin-wall form (σθ = p·r/t for a cylinder, p·r/(2t) for a sphere), the ratios follow
 * from the Lamé formulas (see thick-wall.ts):
 * - cylinder: (2 + 2k + k²)/(2 + k) — 1.109 at k = 0.2 and 1.300 at k = 0.5;
 * - sphere: k(2 + (1 + k)³)/((1 + k)³ − 1) — 1.024 at k = 0.2 and 1.132 at k = 0.5.
 * The mean-diameter form of the thin-wall formulas is closer (cylinder: 1.008 at 0.2, 1.040 at 0.5).
 * The helper computes the ratio by calling both calculators, so it follows whatever they compute.
 */
import { thickCylinder, thickSphere } from "./thick-wall";
import { thinCylinder, thinSphere, type ThinWallForm } from "./thin-wall";
import { assertFinite } from "../tensor/validate";

/** The largest wall-to-radius ratio t/r for which membrane formulas are taken as adequate. */
export const THIN_WALL_LIMIT = 0.1;

/** Vessel shapes the thin-wall formulas cover. */
export type VesselShape = "cylinder" | "sphere";

/** How well thin-wall theory suits a wall, compared with the Lamé solution. */
export type ThinWallAdequacy = {
  /** wall over inside radius, t/r (dimensionless) */
  wallOverRadius: number;
  /** true when t/r ≤ {@link THIN_WALL_LIMIT} (0.1) */
  thinWallAdequate: boolean;
  /** Lamé hoop (tangential) stress at the inside face, per unit internal pressure (no outside pressure) */
  lameBoreHoopPerPressure: number;
  /** the thin-wall hoop stress of the chosen form, per unit internal pressure */
  thinWallHoopPerPressure: number;
  /**
   * Lamé bore hoop stress over the thin-wall hoop stress: above 1, thin-wall theory underestimates the
   * largest hoop stress by (ratio − 1) × 100 %
   */
  lameOverThinWall: number;
  /**
   * A sentence for the user when t/r > 0.1 (thin-wall theory outside its range, by how much it falls
   * short at the bore, and that the thick-wall calculator applies); undefined when the wall is thin
   */
  warning: string | undefined;
};

const SHAPES: readonly VesselShape[] = ["cylinder", "sphere"];

/**
 * Compares thin-wall theory with the Lamé solution for a vessel under internal pressure only (both
 * are linear in p, so the ratio does not depend on p).
 * @param shape "cylinder" or "sphere"
 * @param insideRadius inside radius r (any length unit, > 0)
 * @param wall wall thickness t (same length unit, > 0)
 * @param form the thin-wall formula compared: "inside-radius" (default) or "mean-diameter"
 * @returns t/r, whether it is within 0.1, both hoop stresses per unit pressure, their ratio and a
 *   warning when the wall is thick
 * @throws TypeError/RangeError naming the argument when it is not finite, a size is not positive or
 *   the shape or form is unknown
 */
export function thinWallAdequacy(
  shape: VesselShape,
  insideRadius: number,
  wall: number,
  form: ThinWallForm = "inside-radius",
): ThinWallAdequacy {
  if (!SHAPES.includes(shape)) {
    throw new RangeError(`shape must be one of ${SHAPES.join(", ")}, got ${JSON.stringify(shape)}`);
  }
  assertFinite(insideRadius, "insideRadius");
  assertFinite(wall, "wall");
  const thin = shape === "cylinder" ? thinCylinder : thinSphere;
  // Checks the radius, the wall and the form, with the thin-wall calculators' own messages.
  const thinHoop = thin(1, insideRadius, wall, { form }).hoop;
  const wallGeometry = { innerRadius: insideRadius, outerRadius: insideRadius + wall, innerPressure: 1 };
  const lameHoop =
    shape === "cylinder"
      ? thickCylinder({ ...wallGeometry, ends: "closed" }).hoop
      : thickSphere(wallGeometry).hoop;
  const k = wall / insideRadius;
  const ratio = lameHoop / thinHoop;
  const adequate = k <= THIN_WALL_LIMIT;
  const percent = Math.abs(ratio - 1) * 100;
  const how = ratio >= 1 ? "higher" : "lower";
  const warning = adequate
    ? undefined
    : `t/r = ${k.toPrecision(3)} is above ${THIN_WALL_LIMIT}: thin-wall theory is outside its range ` +
      `and ${ratio >= 1 ? "underestimates" : "misstates"} the hoop stress; the Lamé stress at the ` +
      `inside face is ${percent.toFixed(1)} % ${how} than the thin-wall value. Use the thick-walled ` +
      `${shape} calculator.`;
  return {
    wallOverRadius: k,
    thinWallAdequate: adequate,
    lameBoreHoopPerPressure: lameHoop,
    thinWallHoopPerPressure: thinHoop,
    lameOverThinWall: ratio,
    warning,
  };
}
