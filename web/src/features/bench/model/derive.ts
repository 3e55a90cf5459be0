// Long because it is the bench's one place for what the panels show from the state: the
// criteria's results, principal naming and axes, all plain functions tested together.
/**
 * Everything the bench shows, derived from its state by asking core. Pure functions; the hooks
 * memoise them so that a drag (which changes only the rotation) recomputes only what depends on it.
 */
import {
  CRITERIA,
  angleAboutZ,
  axisAngleFromRotation,
  convertStress,
  envelopeHit,
  envelopeInPlane,
  eulerFromRotation,
  maxShear,
  mohrCircles,
  planePrincipal,
  planeStress,
  principalStresses,
  probeEnvelopes,
  rotateTensor,
  evaluateState,
  publishedMaterial,
  tractionOnPlane,
  tresca,
  vonMises,
  type CheckRequirement,
  type Criterion,
  type Mat3,
  type Material,
  type MohrCircle,
  type PlanePrincipal,
  type PrincipalIndex,
  type StressTensor,
  type StrengthKey,
  type StressUnit,
  type Vec3,
  type Verdict,
} from "../../../../../core";
import type {
  BehaviourChoice,
  BenchState,
  EulerSequence,
  MaterialChoice,
  ProjectRequirements,
} from "./bench-state";

/** Display names of the criteria, typeset. */
export const CRITERION_LABEL: Readonly<Record<Criterion, string>> = {
  "von-mises": "von Mises",
  tresca: "Tresca",
  "max-principal": "Maximum principal",
  "mohr-coulomb": "Mohr–Coulomb",
  "modified-mohr": "Modified Mohr",
};

/** A verdict: the safety factor against the required one (core's rule, shared with the comparison). */
export type VerdictKind = Verdict;

/** Why a criterion has no factor on the bench. */
export type NotRatedKind = "missing" | "not-applicable" | "not-checked" | "refused";

/** One row of the criteria panel, read from core's evaluation (nothing is rated here). */
export type CriterionResult =
  | {
      criterion: Criterion;
      available: true;
      /** equivalent stress S/n in the bench unit: the uniaxial tensile stress the criterion rates equal */
      equivalent: number;
      /** which strength it is compared with (Sy or Sut) */
      reference: string;
      n: number;
      requiredFactor: number;
      /** the load-case category whose factor was required, or null (project default or the bench's own) */
      category: string | null;
      /** required factor / n (≤ 1 is acceptable) */
      utilisation: number;
      verdict: VerdictKind;
      /** core's governing check for the state (highest utilisation) */
      governs: boolean;
      /** why the criterion does not suit the material when it was rated on request, else null */
      unsuited: string | null;
    }
  | {
      criterion: Criterion;
      available: false;
      kind: NotRatedKind;
      /** the whole reason, as core gives it */
      reason: string;
      /** the reason in a few words, for a table cell (the whole one goes in its tooltip) */
      brief: string;
      requiredFactor: number | null;
    };

const SYMBOL: Readonly<Record<StrengthKey, string>> = {
  yield: "Sy",
  ultimateTension: "Sut",
  ultimateCompression: "Suc",
};

/**
 * The strengths a core Material needs, from the bench's choice (all MPa), with the material's
 * behaviour: as chosen, else a built-in grade's own flag, else left to core (a yield strength
 * means ductile).
 */
export function materialForCore(m: MaterialChoice, behaviour: BehaviourChoice = "from-data"): Material {
  const out: Material = {};
  if (m.yield !== null) out.yield = m.yield;
  if (m.ultimateTension !== null) out.ultimateTension = m.ultimateTension;
  if (m.ultimateCompression !== null) out.ultimateCompression = m.ultimateCompression;
  const preset = m.presetId ? publishedMaterial(m.presetId) : null;
  if (behaviour !== "from-data") out.behaviour = behaviour;
  else if (preset) out.behaviour = preset.brittle ? "brittle" : "ductile";
  return out;
}

/** The requirements the bench checks: the project's when it was opened from one, else every criterion at `required`. */
export function benchRequirements(required: number, project: ProjectRequirements | null): CheckRequirement[] {
  return project
    ? project.requirements
    : CRITERIA.map((criterion) => ({ criterion, requiredFactor: required, category: null }));
}

/** The tensor in another unit, component by component (core's convertStress). */
export function tensorIn(s: StressTensor, from: StressUnit, to: StressUnit): StressTensor {
  if (from === to) return s;
  const c = (v: number) => convertStress(v, from, to);
  return { xx: c(s.xx), yy: c(s.yy), zz: c(s.zz), xy: c(s.xy), yz: c(s.yz), zx: c(s.zx) };
}

/**
 * Every criterion's result for a state, from core's evaluator (`evaluateState`: the same one the
 * comparison uses) on the tensor in MPa against strengths in MPa: factor, utilisation, verdict and
 * the governing check; a criterion that lacks strengths, does not suit the material, refuses it,
 * or that the project does not check says why.
 * @param required the bench's own factor for every criterion, or the project's requirements
 */
export function criteriaResults(
  tensor: StressTensor,
  unit: StressUnit,
  material: MaterialChoice,
  required: number | readonly CheckRequirement[],
  options: { behaviour?: BehaviourChoice; includeUnsuited?: boolean } = {},
): CriterionResult[] {
  const requirements = typeof required === "number" ? benchRequirements(required, null) : required;
  const evaluation = evaluateState(
    tensorIn(tensor, unit, "MPa"),
    materialForCore(material, options.behaviour),
    requirements,
    { includeUnsuited: options.includeUnsuited ?? false },
  );
  return CRITERIA.map((criterion): CriterionResult => {
    const check = evaluation.checks.find((c) => c.criterion === criterion);
    if (!check) {
      return {
        criterion,
        available: false,
        kind: "not-checked",
        reason: "not checked by this project",
        brief: "not checked by this project",
        requiredFactor: null,
      };
    }
    if (check.status === "not-applicable") {
      return {
        criterion,
        available: false,
        kind: "not-applicable",
        reason: `not applicable to this material: ${check.reason}`,
        brief: `not applicable to this material (${/taken as ductile|set as ductile/.test(check.reason) ? "ductile" : "brittle"})`,
        requiredFactor: check.requiredFactor,
      };
    }
    if (check.status === "not-evaluated") {
      return {
        criterion,
        available: false,
        kind: check.missing.length > 0 ? "missing" : "refused",
        reason: check.reason,
        brief:
          check.missing.length > 0
            ? check.reason
            : /Suc ≥ Sut/.test(check.reason)
              ? "refused: it assumes Suc ≥ Sut, this material has Suc < Sut"
              : check.reason,
        requiredFactor: check.requiredFactor,
      };
    }
    return {
      criterion,
      available: true,
      equivalent: convertStress(check.equivalent, "MPa", unit),
      reference: SYMBOL[check.reference],
      n: check.factor,
      requiredFactor: check.requiredFactor,
      category: check.category,
      utilisation: check.utilisation,
      verdict: check.verdict,
      governs: evaluation.governing === check,
      unsuited: check.unsuited,
    };
  });
}

/**
 * The one naming rule for principal stresses, stated on the principal panel and used by every panel:
 * σ1 ≥ σ2 ≥ σ3 of the full 3D state, σz included (0 in plane stress); the in-plane pair is called
 * by where it falls in that order.
 */
export const PRINCIPAL_NAMING_RULE =
  "Named σ1 ≥ σ2 ≥ σ3 over all three principal stresses, the out-of-plane one included (σz = 0 in plane stress); the in-plane pair keeps these names on every panel.";

/** "σ1", "σ2" or "σ3" for an index in the 3D order. */
export const principalName = (i: PrincipalIndex) => `σ${i + 1}`;

/**
 * Principal values and directions named by the rule above. When z is already a principal direction
 * (plane stress included) they come from core's planePrincipal: the handbook's in-plane pair at θp
 * and σz, with which of σ1, σ2, σ3 is in plane; otherwise from the 3D eigen-solution.
 */
export function namedPrincipal(tensor: StressTensor): {
  values: [number, number, number];
  directions: [Vec3, Vec3, Vec3];
  plane: PlanePrincipal | null;
} {
  const plane = planePrincipal(tensor);
  if (plane) return { values: plane.values, directions: plane.directions, plane };
  return { ...principalStresses(tensor), plane: null };
}

/**
 * Which principal stress each axis of the element carries, when the element sits on principal axes
 * (σ′ diagonal): x′, y′, z′ each matched to the principal direction it lies along. Null when the
 * element is not on principal axes.
 * @param rotation the element's frame (rows x′, y′, z′)
 * @param rotated σ′ in that frame
 * @param principal the named principal values and directions
 */
export function principalAxisNames(
  rotation: Mat3,
  rotated: StressTensor,
  principal: { values: readonly number[]; directions: readonly Vec3[] },
): [PrincipalIndex, PrincipalIndex, PrincipalIndex] | null {
  const scale = Math.max(Math.abs(principal.values[0]), Math.abs(principal.values[2]), Number.MIN_VALUE);
  const off = Math.max(Math.abs(rotated.xy), Math.abs(rotated.yz), Math.abs(rotated.zx));
  if (off > 1e-9 * scale) return null;
  const diagonal = [rotated.xx, rotated.yy, rotated.zz];
  const taken = new Set<number>();
  const out: PrincipalIndex[] = [];
  for (let i = 0; i < 3; i++) {
    const axis = rotation[i];
    const along = ([0, 1, 2] as const).find((k) => {
      const d = principal.directions[k];
      return !taken.has(k) && Math.abs(axis[0] * d[0] + axis[1] * d[1] + axis[2] * d[2]) > 1 - 1e-9;
    });
    // Repeated principal values have no unique direction: then match by value.
    const k =
      along ??
      ([0, 1, 2] as const)
        .filter((j) => !taken.has(j))
        .reduce((best, j) =>
          Math.abs(principal.values[j] - diagonal[i]) < Math.abs(principal.values[best] - diagonal[i])
            ? j
            : best,
        );
    taken.add(k);
    out.push(k);
  }
  return out as [PrincipalIndex, PrincipalIndex, PrincipalIndex];
}

/** Principal stresses, maximum shear and equivalent stresses of the state (bench unit). */
export function stateSummary(tensor: StressTensor) {
  const principal = namedPrincipal(tensor);
  return {
    principal,
    tauMax: maxShear(tensor),
    vonMises: vonMises(tensor),
    tresca: tresca(tensor),
    circles: mohrCircles(tensor).circles as [MohrCircle, MohrCircle, MohrCircle],
  };
}

/** A face of the rotated element as a point on the Mohr diagram. */
export type FacePoint = { face: "x′" | "y′" | "z′"; normal: number; shear: number };

/** The rotated components σ′ = RσRᵀ and the three faces' (σn, τn) from core. */
export function rotatedView(tensor: StressTensor, rotation: Mat3) {
  const rotated = rotateTensor(tensor, rotation);
  const faces = (["x′", "y′", "z′"] as const).map((face, i): FacePoint => {
    const t = tractionOnPlane(tensor, rotation[i]);
    return { face, normal: t.normal, shear: t.shear };
  });
  return { rotated, faces };
}

/** The rotation written both ways (axis–angle and the chosen Euler sequence), plus θ about z if that is all it is. */
export function rotationDescription(rotation: Mat3, sequence: EulerSequence) {
  return {
    axisAngle: axisAngleFromRotation(rotation),
    euler: eulerFromRotation(sequence, rotation),
    aboutZ: angleAboutZ(rotation, 1e-9),
  };
}

/** True when the state is plane stress in x–y (σz = τyz = τzx = 0), the case the in-plane Mohr circle draws. */
export function isPlaneInXY(s: StressTensor): boolean {
  return s.zz === 0 && s.yz === 0 && s.zx === 0;
}

/** The in-plane circle of a plane state (core's planeStress). */
export function inPlaneCircle(s: StressTensor) {
  return planeStress(s.xx, s.yy, s.xy);
}

/** Traction on the plane of interest. */
export function planeTraction(tensor: StressTensor, normal: Vec3) {
  const len = Math.hypot(normal[0], normal[1], normal[2]);
  const unitNormal: Vec3 = [normal[0] / len, normal[1] / len, normal[2] / len];
  return { unitNormal, ...tractionOnPlane(tensor, unitNormal) };
}

/** Relative size under which a principal stress counts as zero, for "is this plane stress?" */
export const PLANE_STATE_REL = 1e-9;

/**
 * For the σA–σB envelope plot: the two non-zero principal stresses when one principal stress is
 * zero (a plane-stress state in any plane), else null.
 */
export function planePrincipals(values: readonly [number, number, number]): [number, number] | null {
  const big = Math.max(Math.abs(values[0]), Math.abs(values[2]), Number.MIN_VALUE);
  const zero = values.findIndex((v) => Math.abs(v) <= PLANE_STATE_REL * big);
  if (zero < 0) return null;
  const rest = values.filter((_, i) => i !== zero);
  return [rest[0], rest[1]];
}

/**
 * The names (by the one rule) of the two principal stresses `planePrincipals` plots as σA and σB,
 * e.g. ["σ1", "σ3"] when σ2 is the zero one; null when none is zero.
 */
export function planePairNames(values: readonly [number, number, number]): [string, string] | null {
  const big = Math.max(Math.abs(values[0]), Math.abs(values[2]), Number.MIN_VALUE);
  const zero = values.findIndex((v) => Math.abs(v) <= PLANE_STATE_REL * big);
  if (zero < 0) return null;
  const rest = ([0, 1, 2] as const).filter((i) => i !== zero);
  return [principalName(rest[0]), principalName(rest[1])];
}

/** The envelope polygons (MPa) of the chosen criteria that the material supports. */
export function envelopes(criteria: readonly Criterion[], material: MaterialChoice) {
  const m = materialForCore(material);
  const out: { criterion: Criterion; points: [number, number][] }[] = [];
  for (const criterion of criteria) {
    try {
      out.push({ criterion, points: envelopeInPlane(criterion, m, 720) });
    } catch {
      // A missing strength: the criteria table already says which one; nothing to draw.
    }
  }
  return out;
}

/** The safety-factor ray of a plane state to one envelope (MPa), or null. */
export function envelopeRay(sA: number, sB: number, criterion: Criterion, material: MaterialChoice) {
  try {
    return envelopeHit(sA, sB, criterion, materialForCore(material));
  } catch {
    return null;
  }
}

/**
 * What a point of the envelope plot means, for its hover/keyboard readout: each drawn envelope's
 * factor along the ray from the origin (core's probeEnvelopes on the point in MPa), the nearest
 * envelope, and where the ray meets it in the bench unit.
 * @param sA σA of the point, bench unit
 * @param sB σB of the point, bench unit
 */
export function envelopeProbe(
  sA: number,
  sB: number,
  unit: StressUnit,
  criteria: readonly Criterion[],
  material: MaterialChoice,
) {
  const toMpa = (v: number) => convertStress(v, unit, "MPa");
  const probe = probeEnvelopes(toMpa(sA), toMpa(sB), criteria, materialForCore(material));
  const nearest = probe.nearest && {
    ...probe.nearest,
    point: [probe.nearest.n * sA, probe.nearest.n * sB] as [number, number],
    distance: convertStress(probe.nearest.distance, "MPa", unit),
  };
  return { hits: probe.hits, nearest };
}

/** The criterion core's evaluator says governs (highest utilisation), or null when none was rated. */
export function governing(results: readonly CriterionResult[]) {
  return (
    results.find((r): r is Extract<CriterionResult, { available: true }> => r.available && r.governs) ?? null
  );
}

/** Convenience: criteria of a whole bench state. */
export function criteriaOf(state: BenchState) {
  return criteriaResults(
    state.tensor,
    state.unit,
    state.material,
    benchRequirements(state.requiredFactor, state.projectRequirements),
    { behaviour: state.behaviour, includeUnsuited: state.includeUnsuited },
  );
}
