/**
 * The required-thickness check of the thin-walled calculator: ASME BPVC Section VIII Division 1
 * UG-27 (core's ug27RequiredThickness, formulas recalled from memory) for the vessel, pressure and
 * wall typed above it, with the allowable stress, joint efficiency and corrosion allowance of its
 * own. Its inputs live in the same address as the calculator's but are not part of the stress
 * state a load case keeps: they check the wall, they do not change the stresses.
 */
import { ug27RequiredThickness, type Ug27Result, type Ug27Shape } from "../../../../../core";
import type { InputSpec, InputValues } from "./inputs";
import { attempt, refuse, type Outcome } from "./outcome";
import type { ThinWallResult, ThinWallValues } from "./thin-wall";

/** The check's own inputs: S (the set's stress unit), E, and the corrosion allowance (length). */
export const UG27_INPUTS = {
  numbers: {
    S: { dimension: "stress", initial: 138 },
    E: { dimension: "ratio", initial: 1 },
    CA: { dimension: "length", initial: 0 },
  },
  choices: {},
} as const satisfies InputSpec;

export type Ug27Values = InputValues<typeof UG27_INPUTS>;

/** What the page shows: core's result, the radius it used, and the wall typed against it. */
export type Ug27Check = {
  result: Ug27Result;
  /** R = rᵢ + CA: the inside radius in the corroded condition (set's length unit) */
  corrodedRadius: number;
  /** the wall typed in the calculator (set's length unit) */
  wall: number;
  /** true when the wall typed is at least the required thickness plus the corrosion allowance */
  wallEnough: boolean;
};

/**
 * UG-27 for the thin-walled calculator's vessel: R = rᵢ + CA (the inside radius grows by the
 * corrosion allowance), P = the internal pressure, the wall typed compared with t + CA.
 */
export function computeUg27(thin: ThinWallValues, wall: ThinWallResult, v: Ug27Values): Outcome<Ug27Check> {
  return attempt(() => {
    const { S, E, CA } = v.numbers;
    const p = thin.numbers.p;
    if (!(p > 0)) refuse("Internal pressure p", "must be positive for UG-27 (internal pressure only)");
    if (!(S > 0)) refuse("Allowable stress S", "must be positive");
    if (!(E > 0 && E <= 1)) refuse("Joint efficiency E", "must lie in (0, 1]");
    if (!(CA >= 0)) refuse("Corrosion allowance", "must not be negative");
    // Past these the formulas' denominators S·E − 0.6P and 2S·E − 0.2P are no longer positive.
    const highest = wall.shape === "cylinder" ? (S * E) / 0.6 : (2 * S * E) / 0.2;
    if (!(p < highest)) {
      refuse(
        "Internal pressure p",
        `is beyond any UG-27 formula (it must stay below ${Number(highest.toPrecision(4))})`,
      );
    }
    const corrodedRadius = wall.insideRadius + CA;
    const result = ug27RequiredThickness(wall.shape as Ug27Shape, {
      pressure: p,
      insideRadius: corrodedRadius,
      allowableStress: S,
      jointEfficiency: E,
      corrosionAllowance: CA,
    });
    const t = thin.numbers.t;
    return { result, corrodedRadius, wall: t, wallEnough: t >= result.requiredWithCorrosion };
  });
}
