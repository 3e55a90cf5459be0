import type { Verdict } from "../checks/verdict";
import type { Mat3, Vec3 } from "../tensor/types";

/**
 * Types of stress linearization along a stress classification line (SCL).
 *
 * Layout of every six-component block (input and output): stride 6, in core's batch order
 * xx yy zz xy yz zx, tensor shear components (σxy, not engineering γ). Input stresses are in the
 * caller's (global) frame; every returned tensor is in the line's LOCAL frame, whose axes are
 *   x = along the line, from the first point to the last (through-thickness; the "normal" axis),
 *   y = the second axis (the caller's `secondAxis`, e.g. hoop; or the default stated in
 *       `LinearizationResult.frameNote`),
 *   z = x × y (e.g. meridional/axial).
 * So in a returned block: [0] σxx through-thickness normal stress, [1] σyy and [2] σzz the two normal
 * stresses perpendicular to the line (the ones Annex 5-A bends), [3] σxy and [5] σzx the transverse
 * shears, [4] σyz the in-plane shear.
 *
 * Units are the caller's: one stress unit for `stresses` and the allowables, one length unit for
 * distances/coordinates, in one call. Nothing is converted.
 */

/** How bending is taken: only the two normal components perpendicular to the line, or all six. */
export type BendingRule = "annex-5a" | "all-components";

/** The equivalent stress computed from each linearized tensor. */
export type EquivalentCriterion = "von-mises" | "tresca";

/**
 * The engineer's classification of the line, which decides the checks:
 * - `membrane`: "general" (general primary membrane Pm, away from discontinuities) or "local" (local
 *   primary membrane PL, near a discontinuity);
 * - `stresses`: "primary" (the linearized stresses come from primary loads only) or
 *   "primary-plus-secondary" (they include secondary stresses, e.g. from a discontinuity or thermal
 *   gradient; only the primary-plus-secondary range check applies then).
 */
export type LineClassification = {
  membrane: "general" | "local";
  stresses: "primary" | "primary-plus-secondary";
};

/**
 * Allowables in the same stress unit as `stresses`.
 * - `S`: allowable stress (design stress intensity) at the design temperature, > 0;
 * - `Sy`: yield strength, > 0 (optional; without it SPS = 3S);
 * - `Su`: ultimate tensile strength, > 0 (optional; needed to confirm Sy/Su ≤ 0.7 before 2Sy may set
 *   SPS; without it SPS = 3S);
 * - `timeDependent`: true when S is governed by time-dependent (creep) properties; then SPS = 3S.
 * For the SPS check the code takes S and Sy as averages over the highest and lowest temperature of the
 * operating cycle; that averaging is the caller's.
 */
export type LinearizationAllowables = {
  S: number;
  Sy?: number;
  Su?: number;
  timeDependent?: boolean;
};

/** Input of {@link linearize}. Give `distances` (with `lineDirection`) or `coordinates`, not both. */
export type LinearizationInput = {
  /** 6N stress components, stride 6 (xx yy zz xy yz zx), in the caller's frame, one stress unit. */
  stresses: Float64Array;
  /**
   * N distances along the line, strictly increasing from one surface to the other (any origin: the
   * first is taken as x = 0). Needs `lineDirection` to turn the tensors into the local frame.
   */
  distances?: Float64Array;
  /**
   * 3N coordinates (x y z per point, stride 3) in the stresses' frame. The line runs from the first
   * point to the last; every point is projected onto it (and a warning given if one lies off it).
   */
  coordinates?: Float64Array;
  /** With `distances`: the line's direction in the stresses' frame, from the first point to the last. */
  lineDirection?: Vec3;
  /**
   * The second local axis (e.g. hoop) in the stresses' frame; its part along the line is removed.
   * Default: see {@link LinearizationResult.frameNote}.
   */
  secondAxis?: Vec3;
  /** Default "annex-5a". */
  bending?: BendingRule;
  /** Default "von-mises". */
  equivalent?: EquivalentCriterion;
  /** Needed (with `allowables`) for the category checks; omit both for a linearization alone. */
  classification?: LineClassification;
  allowables?: LinearizationAllowables;
};

/** A six-component tensor (stride-6 layout, local frame) at the line's first and last point. */
export type AtEnds = {
  /** at the first point (x = 0) */
  start: Float64Array;
  /** at the last point (x = t) */
  end: Float64Array;
};

/** An equivalent stress at the line's first and last point. */
export type ScalarAtEnds = { start: number; end: number };

/** Which rule a check is. */
export type LinearizationCheckId = "Pm" | "PL" | "PL+Pb" | "PL+Pb+Q";

/** One category check, value ≤ limit. */
export type LinearizationCheck = {
  id: LinearizationCheckId;
  /** The rule as written, e.g. "PL + Pb ≤ 1.5S". */
  rule: string;
  /** The equivalent stress checked (stress unit). For membrane + bending, the larger of the two ends. */
  value: number;
  /** Where `value` was taken: the membrane (the whole line) or the end that governs. */
  at: "membrane" | "start" | "end";
  /** The limit (stress unit). */
  limit: number;
  /** How the limit was found, e.g. "SPS = max(3S, 2Sy) = 2Sy = 500". */
  limitNote: string;
  /** value / limit (dimensionless; the utilisation). */
  ratio: number;
  /** pass / close / fail, by the product's rule (core/checks/verdict.ts). */
  verdict: Verdict;
  /** Where the rule and limit come from, or "recalled from memory, verify against …". */
  source: string;
};

/** Result of {@link linearize}. Every tensor is in the local frame (see the layout above). */
export type LinearizationResult = {
  /** N, the number of points. */
  pointCount: number;
  /** Thickness t, the length of the line (length unit). */
  thickness: number;
  /** N distances from the first point (length unit; 0 … t). */
  x: Float64Array;
  /** The local frame: rows = local x (along the line), y, z written in the stresses' frame. */
  frame: Mat3;
  /** How the second axis was chosen (the caller's, or the stated default). */
  frameNote: string;
  /** 6N stresses at the points, in the local frame. */
  local: Float64Array;
  /** Which bending rule was used, and the component indices it bent. */
  bendingRule: BendingRule;
  bentComponents: readonly number[];
  /** Membrane stress σm = (1/t)∫σ dx, all six components. */
  membrane: Float64Array;
  /** Bending stress at each end (start = +σb, end = −σb; zero for the components not bent). */
  bending: AtEnds;
  /** Membrane + bending at each end. */
  membranePlusBending: AtEnds;
  /** Peak F = σ − (σm + σb) at each end, component by component. */
  peak: AtEnds;
  /** The total stress at each end (the first and last point's local tensor). */
  total: AtEnds;
  /** Equivalent stresses, each from the linearized TENSOR (never a linearized scalar). */
  equivalent: {
    criterion: EquivalentCriterion;
    /** "von Mises" or "Tresca stress intensity σ1 − σ3". */
    label: string;
    membrane: number;
    bending: ScalarAtEnds;
    membranePlusBending: ScalarAtEnds;
    peak: ScalarAtEnds;
    total: ScalarAtEnds;
  };
  /** The category checks that apply to the classification (empty without classification). */
  checks: LinearizationCheck[];
  /** Which checks apply to the classification and why, or why none were made. */
  checksNote: string;
  /** What was assumed (integration rule, spacing, frame, bending rule). */
  notes: string[];
  /** What may make the answer untrustworthy (too few points, points off the line). */
  warnings: string[];
  /** Where the method comes from. */
  source: string;
};
