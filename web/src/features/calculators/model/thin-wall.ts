/**
 * The thin-walled vessel calculator: a closed-end cylinder or a sphere under internal pressure, with
 * the radius stated as inner, mean or outer, and the check of whether membrane theory suits the wall.
 */
import {
  thinCylinder,
  thinSphere,
  thinWallAdequacy,
  type StressTensor,
  type ThinWallAdequacy,
  type ThinWallForm,
  type ThinWallRadial,
  type VesselShape,
} from "../../../../../core";
import { THIN_WALL_INPUTS } from "../../../../../core/constants/calculators";
import { encodeInputs, initialValues, type InputSpec, type InputValues } from "./inputs";
import { attempt, refuse, type Outcome } from "./outcome";
import { unitFor, type UnitSet } from "./units";

export { THIN_WALL_INPUTS };

export type ThinWallValues = InputValues<typeof THIN_WALL_INPUTS>;

export type ThinWallResult = {
  shape: VesselShape;
  /** inside radius the formulas use, in the set's length unit */
  insideRadius: number;
  hoop: number;
  axial: number;
  radial: number;
  /** x = axial (or a tangent), y = hoop (or the other tangent), z = radial; in the set's stress unit */
  tensor: StressTensor;
  adequacy: ThinWallAdequacy;
  /** the thick-walled calculator's address with the same vessel and pressure, when the wall is thick */
  thickLink: string | undefined;
  /**
   * When the wall is thick: core's warning (t/r, the Lamé-to-thin-wall ratio for these inputs and the
   * formula it belongs to), then which radius the ratio used and how it came from the radius given
   */
  warning: string[] | undefined;
};

/** The inside radius from the radius as stated: r (inner), r − t/2 (mean) or r − t (outer). */
export function insideRadiusOf(given: string, r: number, t: number): number {
  return given === "mean" ? r - t / 2 : given === "outer" ? r - t : r;
}

/** Membrane stresses and the thin-wall check, in the unit set's stress unit (p's unit). */
export function computeThinWall(v: ThinWallValues): Outcome<ThinWallResult> {
  return attempt(() => {
    const { p, r, t } = v.numbers;
    if (!(t > 0)) refuse("Wall thickness t", "must be positive");
    if (!(r > 0)) refuse("Radius r", "must be positive");
    const ri = insideRadiusOf(v.choices.given, r, t);
    if (!(ri > 0)) refuse(`Radius r (${v.choices.given})`, "must be larger than the wall it includes");
    const shape = v.choices.shape as VesselShape;
    const options = { form: v.choices.form as ThinWallForm, radial: v.choices.radial as ThinWallRadial };
    const s = shape === "cylinder" ? thinCylinder(p, ri, t, options) : thinSphere(p, ri, t, options);
    const adequacy = thinWallAdequacy(shape, ri, t, options.form);
    return {
      shape,
      insideRadius: ri,
      hoop: s.hoop,
      axial: s.axial,
      radial: s.radial,
      tensor: s.tensor,
      adequacy,
      thickLink: adequacy.thinWallAdequate ? undefined : thickLinkFor(shape, v.units, ri, t, p),
      warning:
        adequacy.warning === undefined
          ? undefined
          : [adequacy.warning, radiusConvention(v.choices.given, r, t, ri, unitFor("length", v.units))],
    };
  });
}

/** A length as the sentences show it: up to 6 significant figures and its unit. */
const lengthText = (v: number, unit: string) => `${Number(v.toPrecision(6))} ${unit}`;

/**
 * Which radius the thin-wall check used and how it came from the radius as given: the check and
 * the thick-walled calculator take the inside radius; a mean or outer radius given is turned into
 * it, and t over the radius as given is shown too, since texts state the 0.1 limit with either.
 */
export function radiusConvention(given: string, r: number, t: number, ri: number, unit: string): string {
  if (given === "inner") {
    return `Radius convention: r = ${lengthText(r, unit)} was given as the inside radius, and t/r uses it.`;
  }
  const how = given === "mean" ? "r − t/2" : "r − t";
  return (
    `Radius convention: r = ${lengthText(r, unit)} was given as the ${given} radius; t/r and the ` +
    `ratio use the inside radius rᵢ = ${how} = ${lengthText(ri, unit)} (t over the ${given} radius is ` +
    `${(t / r).toPrecision(3)}).`
  );
}

/** The thick-walled calculator with the same inside radius, wall and internal pressure. */
export function thickLinkFor(shape: VesselShape, units: UnitSet, ri: number, t: number, p: number): string {
  const values = {
    ...initialValues(THICK_LINK_SPEC, units),
    numbers: { ri, ro: ri + t, pi: p, po: 0, r: ri },
  };
  return `/calculators/thick-${shape}?${encodeInputs(THICK_LINK_SPEC, values)}`;
}

/** The inputs the thick-walled calculators share (each adds its own choices with starting values). */
const THICK_LINK_SPEC = {
  numbers: {
    ri: { dimension: "length", initial: 0 },
    ro: { dimension: "length", initial: 0 },
    pi: { dimension: "stress", initial: 0 },
    po: { dimension: "stress", initial: 0 },
    r: { dimension: "length", initial: 0 },
  },
  choices: {},
} as const satisfies InputSpec;
