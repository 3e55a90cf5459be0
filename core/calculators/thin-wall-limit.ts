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
 * Said the other way round, the inside-radius thin-wall value of a cylinder falls short of the Lamé
 * value by 1 − 1/ratio: 9.8 % at k = 0.2 and 23.1 % at k = 0.5 (the "about 10 % and 23 %" often
 * quoted), while the Lamé value is 10.9 % and 30.0 % above it. The warning states both, and which
 * radius and which thin-wall formula the ratio belongs to.
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
   * A sentence for the user when t/r > 0.1 (thin-wall theory outside its range; the ratio of the Lamé
   * bore hoop stress to the thin-wall value for these inputs, with the radius (inside) and the
   * thin-wall formula it belongs to, as a shortfall of the Lamé value and as an excess over the
   * thin-wall value; and that the thick-wall calculator applies); undefined when the wall is thin
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
  const warning = adequate ? undefined : thickWallWarning(shape, form, k, ratio);
  return {
    wallOverRadius: k,
    thinWallAdequate: adequate,
    lameBoreHoopPerPressure: lameHoop,
    thinWallHoopPerPressure: thinHoop,
    lameOverThinWall: ratio,
    warning,
  };
}

/** The thin-wall hoop formula of each shape and form, as the warning names it. */
const HOOP_FORMULA: Record<VesselShape, Record<ThinWallForm, string>> = {
  cylinder: { "inside-radius": "σθ = p·r/t", "mean-diameter": "σθ = p(dᵢ + t)/(2t)" },
  sphere: { "inside-radius": "σ = p·r/(2t)", "mean-diameter": "σ = p(dᵢ + t)/(4t)" },
};

/**
 * The warning for a thick wall: t/r with the radius it uses, the ratio of the Lamé bore hoop stress
 * to the thin-wall value of the chosen formula, how far the thin-wall value is from the Lamé one
 * (as a share of the Lamé value) and the Lamé value from it (as a share of the thin-wall value).
 */
function thickWallWarning(shape: VesselShape, form: ThinWallForm, k: number, ratio: number): string {
  const formName = `${form} formula ${HOOP_FORMULA[shape][form]}`;
  const shortfall = Math.abs(1 - 1 / ratio) * 100;
  const excess = Math.abs(ratio - 1) * 100;
  const comparison =
    ratio >= 1
      ? `thin-wall theory underestimates the hoop stress there: its value is ${shortfall.toFixed(1)} % ` +
        `below the Lamé value (the Lamé value is ${excess.toFixed(1)} % higher)`
      : `the thin-wall value is ${shortfall.toFixed(1)} % above the Lamé value (the Lamé value is ` +
        `${excess.toFixed(1)} % lower)`;
  return (
    `t/r = ${k.toPrecision(3)} (wall over inside radius) is above ${THIN_WALL_LIMIT}: thin-wall theory is ` +
    `outside its range. For these inputs the Lamé hoop stress at the inside face is ` +
    `${ratio.toFixed(3)} × the thin-wall value of the ${formName}; ${comparison}. Use the thick-walled ` +
    `${shape} calculator.`
  );
}
