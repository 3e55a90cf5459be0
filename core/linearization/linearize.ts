import { assertCheckInputs, categoryChecks } from "./category-checks";
import { EQUIVALENT_LABEL, equivalentOf } from "./equivalent";
import { membraneAndBending } from "./integrate";
import { localFrame, toLocalFrame } from "./local-frame";
import { MIN_POINTS, linePath } from "./path";
import { ANNEX_5A_NOTE, BEND_ALL_NOTE, EQUIVALENT_SOURCE, METHOD_SOURCE } from "./sources";
import type {
  AtEnds,
  BendingRule,
  EquivalentCriterion,
  LinearizationInput,
  LinearizationResult,
  ScalarAtEnds,
} from "./types";

/** Local components Annex 5-A bends: σyy and σzz, the normal stresses perpendicular to the line. */
export const ANNEX_5A_BENT_COMPONENTS: readonly number[] = [1, 2];
/** All six components, for the "bend every component" option. */
export const ALL_COMPONENTS: readonly number[] = [0, 1, 2, 3, 4, 5];

const COMPONENT_NAMES = ["xx", "yy", "zz", "xy", "yz", "zx"];

function assertStresses(stresses: unknown): number {
  if (!(stresses instanceof Float64Array)) throw new TypeError("stresses must be a Float64Array");
  if (stresses.length % 6 !== 0) {
    throw new RangeError(
      `stresses has ${stresses.length} values, not a multiple of 6 (xx yy zz xy yz zx per point)`,
    );
  }
  const n = stresses.length / 6;
  if (n < MIN_POINTS) {
    throw new RangeError(`stresses gives ${n} point(s); a line needs at least ${MIN_POINTS}`);
  }
  for (let i = 0; i < stresses.length; i++) {
    if (!Number.isFinite(stresses[i])) {
      throw new RangeError(
        `stresses[${i}] (point ${Math.floor(i / 6)}, σ${COMPONENT_NAMES[i % 6]}) must be finite, got ${stresses[i]}`,
      );
    }
  }
  return n;
}

function optionOf<T extends string>(
  value: T | undefined,
  allowed: readonly T[],
  fallback: T,
  name: string,
): T {
  if (value === undefined) return fallback;
  if (!allowed.includes(value)) {
    throw new RangeError(
      `${name} must be one of ${allowed.map((a) => `"${a}"`).join(", ")}, got ${JSON.stringify(value)}`,
    );
  }
  return value;
}

function scalarsAtEnds(v: AtEnds, criterion: EquivalentCriterion): ScalarAtEnds {
  return { start: equivalentOf(v.start, criterion), end: equivalentOf(v.end, criterion) };
}

/**
 * Stress linearization along a stress classification line (SCL): membrane, bending and peak parts
 * of the stress tensor through a wall, their equivalent stresses, and (given a classification and
 * allowables) the design-by-analysis category checks.
 *
 * Method (ASME BPVC Section VIII Division 2, Annex 5-A, recalled from memory — see `source`):
 * 1. every tensor is turned into the line's local frame (x along the line; layout in ./types.ts);
 * 2. membrane σm = (1/t)∫σ dx for all six components;
 * 3. bending σb = (6/t²)∫σ(t/2 − x)dx for σyy and σzz only (the normal components perpendicular to
 *    the line), or for all six with `bending: "all-components"`; +σb at the first point, −σb at the
 *    last;
 * 4. peak F = σ − (σm + σb) at each end, component by component;
 * 5. equivalent stresses (von Mises by default, or Tresca σ1 − σ3) of each of these TENSORS.
 * Integration assumes σ linear between neighbouring points (see ./integrate.ts). Reversing the order
 * of the points leaves the membrane unchanged and swaps the ends (so the bending changes sign).
 * Units are the caller's and nothing is converted: one stress unit for the stresses and allowables,
 * one length unit for distances or coordinates. At least RECOMMENDED_MIN_POINTS (11, path.ts) points are
 * recommended; fewer give a warning.
 *
 * @param input stresses (6N), distances (N, with lineDirection) or coordinates (3N), options
 * @returns the parts, their equivalent stresses, the checks, and notes/warnings (see LinearizationResult)
 * @throws RangeError naming the field: fewer than 3 points, a length that does not match, a value
 *   that is not finite, distances that do not strictly increase, zero thickness, a second axis along
 *   the line, an unknown option, a classification without allowables (or the reverse), S ≤ 0
 */
export function linearize(input: LinearizationInput): LinearizationResult {
  if (typeof input !== "object" || input === null) throw new TypeError("input must be an object");
  const n = assertStresses(input.stresses);
  const bendingRule = optionOf<BendingRule>(
    input.bending,
    ["annex-5a", "all-components"],
    "annex-5a",
    "bending",
  );
  const criterion = optionOf<EquivalentCriterion>(
    input.equivalent,
    ["von-mises", "tresca"],
    "von-mises",
    "equivalent",
  );
  if ((input.classification === undefined) !== (input.allowables === undefined)) {
    throw new RangeError(
      input.classification === undefined
        ? "classification must be given with allowables (the checks depend on how the line is classified)"
        : "allowables must be given with classification (at least S, in the stresses' unit)",
    );
  }
  if (input.classification !== undefined) assertCheckInputs(input.classification, input.allowables!);

  const path = linePath(n, input.distances, input.coordinates, input.lineDirection);
  const frame = localFrame(path.direction, input.secondAxis);
  const local = toLocalFrame(input.stresses, frame.frame);

  const membrane = new Float64Array(6);
  const rawBending = new Float64Array(6);
  membraneAndBending(path.x, local, membrane, rawBending);
  const bent = bendingRule === "annex-5a" ? ANNEX_5A_BENT_COMPONENTS : ALL_COMPONENTS;

  const bending: AtEnds = { start: new Float64Array(6), end: new Float64Array(6) };
  const membranePlusBending: AtEnds = { start: new Float64Array(6), end: new Float64Array(6) };
  const peak: AtEnds = { start: new Float64Array(6), end: new Float64Array(6) };
  const total: AtEnds = { start: local.slice(0, 6), end: local.slice(6 * (n - 1)) };
  for (const c of bent) {
    bending.start[c] = rawBending[c];
    bending.end[c] = -rawBending[c];
  }
  for (let c = 0; c < 6; c++) {
    membranePlusBending.start[c] = membrane[c] + bending.start[c];
    membranePlusBending.end[c] = membrane[c] + bending.end[c];
    peak.start[c] = total.start[c] - membranePlusBending.start[c];
    peak.end[c] = total.end[c] - membranePlusBending.end[c];
  }

  const eqMembrane = equivalentOf(membrane, criterion);
  const eqMembranePlusBending = scalarsAtEnds(membranePlusBending, criterion);

  const notes = [
    "Integration: σ taken to vary linearly between neighbouring points (the trapezoidal rule's " +
      "assumption); the bending integral of that piecewise-linear σ is exact, so a linear distribution " +
      "is reproduced exactly.",
    ...path.notes,
    ...frame.notes,
  ];
  notes.push(bendingRule === "all-components" ? BEND_ALL_NOTE : ANNEX_5A_NOTE);
  notes.push(`Equivalent stresses: ${EQUIVALENT_SOURCE[criterion]}.`);

  let checks: LinearizationResult["checks"] = [];
  let checksNote =
    "No category checks: give classification (general or local membrane; primary or primary plus " +
    "secondary) and allowables to have them.";
  if (input.classification !== undefined) {
    ({ checks, checksNote } = categoryChecks(
      input.classification,
      input.allowables!,
      eqMembrane,
      eqMembranePlusBending,
    ));
  }

  return {
    pointCount: n,
    thickness: path.thickness,
    x: path.x,
    frame: frame.frame,
    frameNote: frame.frameNote,
    local,
    bendingRule,
    bentComponents: bent,
    membrane,
    bending,
    membranePlusBending,
    peak,
    total,
    equivalent: {
      criterion,
      label: EQUIVALENT_LABEL[criterion],
      membrane: eqMembrane,
      bending: scalarsAtEnds(bending, criterion),
      membranePlusBending: eqMembranePlusBending,
      peak: scalarsAtEnds(peak, criterion),
      total: scalarsAtEnds(total, criterion),
    },
    checks,
    checksNote,
    notes,
    warnings: path.warnings,
    source: METHOD_SOURCE,
  };
}
