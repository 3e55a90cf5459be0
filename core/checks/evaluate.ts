import { principalBatch } from "../batch/principal-batch";
import {
  factorFromPrincipals,
  type Criterion,
  type Material,
  type StrengthKey,
} from "../criteria/safety-factor";
import type { StressTensor } from "../tensor/types";
import { assertTensor } from "../tensor/validate";
import { unsuitedReason } from "./applicability";
import { missingStrengths, type CheckRequirement } from "./requirements";
import { utilisation, verdictForFactor, type Verdict } from "./verdict";

export type { CheckRequirement } from "./requirements";

/** What every check carries: the criterion, the factor required and where that factor came from. */
type CheckBase = {
  criterion: Criterion;
  requiredFactor: number;
  /** The load-case category whose factor was used, or null for the default (see CheckRequirement). */
  category: string | null;
};

/** A check that was rated: its factor, utilisation and verdict. */
export type EvaluatedCheck = CheckBase & {
  status: "evaluated";
  /** Safety factor found (dimensionless; Infinity when the state never reaches the surface). */
  factor: number;
  /** requiredFactor / factor (dimensionless; ≤ 1 passes). */
  utilisation: number;
  verdict: Verdict;
  /** The strength the criterion rates against (Sy for yield criteria, Sut for fracture ones). */
  reference: StrengthKey;
  /** Equivalent stress S/n: the uniaxial tension the criterion rates equal to the state (stress unit). */
  equivalent: number;
  /**
   * Null when the criterion suits the material; otherwise why it does not (the check is here only
   * because the caller asked for criteria that do not suit the material).
   */
  unsuited: string | null;
};

/** The outcome of one criterion on one stress state. */
export type CriterionCheck =
  | EvaluatedCheck
  | (CheckBase & {
      /** The criterion does not suit the material (ductile vs brittle); left out of the governing search. */
      status: "not-applicable";
      reason: string;
    })
  | (CheckBase & {
      /** The criterion could not be rated: strengths are missing, the material is refused, or the state is bad. */
      status: "not-evaluated";
      /** Strengths the material lacks for this criterion (empty when the reason is something else). */
      missing: StrengthKey[];
      reason: string;
    });

/** Everything a result screen shows for one stress state. */
export type StateEvaluation = {
  /** σ1 ≥ σ2 ≥ σ3, in the unit of the tensor (NaN for a state the kernel could not read). */
  principal: [number, number, number];
  /** Von Mises equivalent stress, same unit. */
  vonMises: number;
  /** Tresca equivalent stress σ1 − σ3, same unit. */
  tresca: number;
  /** Maximum shear (σ1 − σ3)/2, same unit. */
  maxShear: number;
  checks: CriterionCheck[];
  /** The check that governs this state by {@link moreCritical}, or null when none was rated. */
  governing: EvaluatedCheck | null;
};

/** What the caller may ask of the evaluation. */
export type EvaluationOptions = {
  /**
   * Rate criteria that do not suit the material as well (they then take part in the governing
   * search, flagged by `unsuited`). Off by default: the user asks for it.
   */
  includeUnsuited?: boolean;
};

/** One state of a batch: its material and the requirements it is checked against. */
export type EvaluationSpec = { material: Material; requirements: readonly CheckRequirement[] };

/**
 * The one governing rule, used for a single state, across rows of a comparison and anywhere else:
 * a check governs over another when its utilisation u = n_required / n is higher (the smallest
 * margin against what is required, not the smallest factor, since required factors differ per
 * criterion and per category). Equal utilisations keep the one met first.
 */
export function moreCritical(
  candidate: { utilisation: number },
  current: { utilisation: number } | null,
): boolean {
  return current === null || candidate.utilisation > current.utilisation;
}

const NAMES: Record<StrengthKey, string> = {
  yield: "yield strength Sy",
  ultimateTension: "tensile strength Sut",
  ultimateCompression: "compressive strength Suc",
};

const REFERENCE: Record<Criterion, StrengthKey> = {
  "von-mises": "yield",
  tresca: "yield",
  "max-principal": "ultimateTension",
  "mohr-coulomb": "ultimateTension",
  "modified-mohr": "ultimateTension",
};

function checkOne(
  req: CheckRequirement,
  material: Material,
  s1: number,
  s3: number,
  vm: number,
  options: EvaluationOptions,
): CriterionCheck {
  // Every result is written out as one literal, the shared fields first, never as { ...base, … }:
  // with the spread, evaluateState rated 0.006 M states/s against 0.26 M without it on the same
  // machine (npm run bench -- core-evaluate, 2026-12-03).
  const { criterion, requiredFactor } = req;
  const category = req.category ?? null;
  if (!(s1 === s1 && s3 === s3 && vm === vm)) {
    return {
      criterion,
      requiredFactor,
      category,
      status: "not-evaluated",
      missing: [],
      reason: "the stress state has a component that is not a finite number",
    };
  }
  const missing = missingStrengths(criterion, material);
  if (missing.length > 0) {
    return {
      criterion,
      requiredFactor,
      category,
      status: "not-evaluated",
      missing,
      reason: `needs the ${missing.map((k) => NAMES[k]).join(" and ")}`,
    };
  }
  const unsuited = unsuitedReason(criterion, material);
  if (unsuited !== null && !options.includeUnsuited) {
    return { criterion, requiredFactor, category, status: "not-applicable", reason: unsuited };
  }
  let factor: number;
  try {
    factor = factorFromPrincipals(criterion, material, s1, s3, vm);
  } catch (e) {
    // A material the criterion refuses (modified Mohr with Suc < Sut): said, not thrown.
    return {
      criterion,
      requiredFactor,
      category,
      status: "not-evaluated",
      missing: [],
      reason: (e as Error).message,
    };
  }
  const reference = REFERENCE[criterion];
  return {
    criterion,
    requiredFactor,
    category,
    status: "evaluated",
    factor,
    utilisation: utilisation(factor, requiredFactor),
    verdict: verdictForFactor(factor, requiredFactor),
    reference,
    equivalent: (material[reference] as number) / factor,
    unsuited,
  };
}

/**
 * Evaluates N stress states given as 6N components (xx yy zz xy yz zx per state, one stress unit)
 * through the batch kernel `principalBatch` (principal stresses, von Mises and Tresca in one
 * pass: one eigen-solve per state, whatever the number of criteria; evaluate-once.test.ts counts
 * it), then rates each state against its material and requirements. The single-state
 * `evaluateState`, the comparison and finite-element point tables all come through here.
 * A state the kernel reports as unreadable (NaN outputs) has every check "not-evaluated" with the
 * reason, so one bad row never stops the others.
 * @param input 6N components (any one stress unit, the same as the strengths)
 * @param specOf the material and requirements of state k (0-based)
 * @param options see {@link EvaluationOptions}
 */
export function evaluateBatch(
  input: Float64Array,
  specOf: (k: number) => EvaluationSpec,
  options: EvaluationOptions = {},
): StateEvaluation[] {
  const n = input.length / 6;
  const values = new Float64Array(3 * n);
  const vonMises = new Float64Array(n);
  const tresca = new Float64Array(n);
  principalBatch(input, { values, vonMises, tresca });
  const out: StateEvaluation[] = new Array(n);
  for (let k = 0; k < n; k++) {
    const s1 = values[3 * k];
    const s3 = values[3 * k + 2];
    const { material, requirements } = specOf(k);
    let governing: EvaluatedCheck | null = null;
    const checks: CriterionCheck[] = [];
    for (const req of requirements) {
      const check = checkOne(req, material, s1, s3, vonMises[k], options);
      if (check.status === "evaluated" && moreCritical(check, governing)) governing = check;
      checks.push(check);
    }
    out[k] = {
      principal: [s1, values[3 * k + 1], s3],
      vonMises: vonMises[k],
      tresca: tresca[k],
      maxShear: tresca[k] / 2,
      checks,
      governing,
    };
  }
  return out;
}

/**
 * Evaluates many states, each with its own material and requirements (a comparison's rows).
 * @throws TypeError/RangeError for a tensor with a component that is not a finite number (naming it)
 */
export function evaluateStates(
  states: readonly (EvaluationSpec & { tensor: StressTensor })[],
  options: EvaluationOptions = {},
): StateEvaluation[] {
  const input = new Float64Array(6 * states.length);
  states.forEach(({ tensor: s }, k) => {
    assertTensor(s, `states[${k}].tensor`);
    input.set([s.xx, s.yy, s.zz, s.xy, s.yz, s.zx], 6 * k);
  });
  return evaluateBatch(input, (k) => states[k], options);
}

/**
 * Evaluates one stress state against a material and a list of required checks: every check,
 * its verdict, and the governing one. A criterion whose strengths the material lacks, that the
 * material does not suit, or that refuses the material is reported with the reason, not thrown.
 * @param s stress tensor, same unit as the strengths
 * @param material strengths, positive, same unit as `s`
 * @param requirements criteria with their required safety factors (dimensionless)
 * @param options see {@link EvaluationOptions}
 */
export function evaluateState(
  s: StressTensor,
  material: Material,
  requirements: readonly CheckRequirement[],
  options: EvaluationOptions = {},
): StateEvaluation {
  assertTensor(s);
  const input = Float64Array.of(s.xx, s.yy, s.zz, s.xy, s.yz, s.zx);
  return evaluateBatch(input, () => ({ material, requirements }), options)[0];
}
