import { verdictForUtilisation } from "../checks/verdict";
import { PL_SOURCE, PM_SOURCE, SPS_SOURCE } from "./sources";
import type {
  LineClassification,
  LinearizationAllowables,
  LinearizationCheck,
  LinearizationCheckId,
  ScalarAtEnds,
} from "./types";

/**
 * The design-by-analysis category checks of a linearized line: the engineer classifies the line and
 * gives the allowables; this picks the checks that classification calls for and compares the
 * equivalent stresses of the linearized tensors with their limits.
 */

/** Sy/Su above which SPS is limited to 3S (recalled from memory; see SPS_SOURCE). */
export const SPS_YIELD_TO_ULTIMATE_LIMIT = 0.7;

function positive(value: unknown, name: string): number {
  if (typeof value !== "number" || !Number.isFinite(value) || !(value > 0)) {
    throw new RangeError(`${name} must be a finite number greater than 0, got ${String(value)}`);
  }
  return value;
}

/**
 * Checks the classification and allowables; RangeError naming the field for anything impossible.
 * @param classification the engineer's classification of the line
 * @param allowables S (and Sy, Su) in the stresses' unit
 */
export function assertCheckInputs(
  classification: LineClassification,
  allowables: LinearizationAllowables,
): void {
  if (typeof classification !== "object" || classification === null) {
    throw new RangeError("classification must be an object { membrane, stresses }");
  }
  if (classification.membrane !== "general" && classification.membrane !== "local") {
    throw new RangeError(
      `classification.membrane must be "general" or "local", got ${JSON.stringify(classification.membrane)}`,
    );
  }
  if (classification.stresses !== "primary" && classification.stresses !== "primary-plus-secondary") {
    throw new RangeError(
      `classification.stresses must be "primary" or "primary-plus-secondary", got ${JSON.stringify(classification.stresses)}`,
    );
  }
  if (typeof allowables !== "object" || allowables === null) {
    throw new RangeError("allowables must be an object { S, Sy?, Su?, timeDependent? }");
  }
  positive(allowables.S, "allowables.S");
  if (allowables.Sy !== undefined) positive(allowables.Sy, "allowables.Sy");
  if (allowables.Su !== undefined) positive(allowables.Su, "allowables.Su");
  if (allowables.timeDependent !== undefined && typeof allowables.timeDependent !== "boolean") {
    throw new RangeError("allowables.timeDependent must be true or false");
  }
}

/**
 * SPS, the limit on the primary plus secondary equivalent stress range, and how it was found.
 * max(3S, 2Sy), except 3S when Sy/Su > 0.7 or S is time-dependent (recalled from memory, see
 * SPS_SOURCE). Without Sy, or without Su to confirm the ratio, 3S: the safe side of the rule.
 */
export function spsLimit(a: LinearizationAllowables): { limit: number; note: string } {
  const three = 3 * a.S;
  const fmt = (v: number) => String(Number(v.toPrecision(6)));
  if (a.Sy === undefined) return { limit: three, note: `SPS = 3S = ${fmt(three)} (Sy not given)` };
  if (a.timeDependent === true) {
    return { limit: three, note: `SPS = 3S = ${fmt(three)} (S is governed by time-dependent properties)` };
  }
  if (a.Su === undefined) {
    return {
      limit: three,
      note: `SPS = 3S = ${fmt(three)} (Su not given, so Sy/Su ≤ ${SPS_YIELD_TO_ULTIMATE_LIMIT} cannot be confirmed)`,
    };
  }
  const ratio = a.Sy / a.Su;
  if (ratio > SPS_YIELD_TO_ULTIMATE_LIMIT) {
    return {
      limit: three,
      note: `SPS = 3S = ${fmt(three)} (Sy/Su = ${fmt(ratio)} > ${SPS_YIELD_TO_ULTIMATE_LIMIT})`,
    };
  }
  const two = 2 * a.Sy;
  return two > three
    ? { limit: two, note: `SPS = max(3S, 2Sy) = 2Sy = ${fmt(two)}` }
    : { limit: three, note: `SPS = max(3S, 2Sy) = 3S = ${fmt(three)}` };
}

function check(
  id: LinearizationCheckId,
  rule: string,
  value: number,
  at: LinearizationCheck["at"],
  limit: number,
  limitNote: string,
  source: string,
): LinearizationCheck {
  const ratio = value / limit;
  return { id, rule, value, at, limit, limitNote, ratio, verdict: verdictForUtilisation(ratio), source };
}

/** The larger of the two ends' values, and which end it is. */
function governingEnd(v: ScalarAtEnds): { value: number; at: "start" | "end" } {
  return v.end > v.start ? { value: v.end, at: "end" } : { value: v.start, at: "start" };
}

/**
 * The checks a classification calls for.
 * - primary, general membrane: Pm ≤ S on the membrane; Pm + Pb ≤ 1.5S at the worse end;
 * - primary, local membrane: PL ≤ 1.5S on the membrane; PL + Pb ≤ 1.5S at the worse end;
 * - primary plus secondary (either membrane kind): PL + Pb + Q ≤ SPS at the worse end only, since
 *   primary limits are checked on a linearization of the primary loads alone.
 * @param classification the engineer's classification (already checked)
 * @param allowables S, Sy, Su (already checked)
 * @param membrane equivalent stress of the membrane tensor
 * @param membranePlusBending equivalent stress of membrane + bending at each end
 */
export function categoryChecks(
  classification: LineClassification,
  allowables: LinearizationAllowables,
  membrane: number,
  membranePlusBending: ScalarAtEnds,
): { checks: LinearizationCheck[]; checksNote: string } {
  const S = allowables.S;
  const fmt = (v: number) => String(Number(v.toPrecision(6)));
  const mb = governingEnd(membranePlusBending);
  if (classification.stresses === "primary-plus-secondary") {
    const sps = spsLimit(allowables);
    return {
      checks: [check("PL+Pb+Q", "PL + Pb + Q ≤ SPS", mb.value, mb.at, sps.limit, sps.note, SPS_SOURCE)],
      checksNote:
        "Primary plus secondary: the membrane + bending equivalent stress at the worse end is checked " +
        "against SPS. It is taken as the range from zero to this state; for a range between two load " +
        "states, linearize the difference of their stress fields (linearization is linear). Primary " +
        "limits (Pm, PL, PL + Pb) are checked on a linearization of the primary loads alone.",
    };
  }
  const onePointFive = 1.5 * S;
  const splNote = `1.5S = ${fmt(onePointFive)}`;
  if (classification.membrane === "general") {
    return {
      checks: [
        check("Pm", "Pm ≤ S", membrane, "membrane", S, `S = ${fmt(S)}`, PM_SOURCE),
        check("PL+Pb", "Pm + Pb ≤ 1.5S", mb.value, mb.at, onePointFive, splNote, PL_SOURCE),
      ],
      checksNote:
        "Primary, general membrane: the membrane equivalent stress against S, and membrane + bending " +
        "at the worse end against 1.5S.",
    };
  }
  return {
    checks: [
      check("PL", "PL ≤ 1.5S", membrane, "membrane", onePointFive, splNote, PL_SOURCE),
      check("PL+Pb", "PL + Pb ≤ 1.5S", mb.value, mb.at, onePointFive, splNote, PL_SOURCE),
    ],
    checksNote:
      "Primary, local membrane: the membrane equivalent stress against 1.5S, and membrane + bending at " +
      "the worse end against 1.5S.",
  };
}
