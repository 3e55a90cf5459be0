import { CRITERIA, type Criterion } from "../constants/criteria";
import { principalValues } from "../tensor/principal";
import { vonMisesOf } from "../eigen/sym3";
import type { StressTensor } from "../tensor/types";
import { assertTensor } from "../tensor/validate";

export { CRITERIA, type Criterion };

/** How a material fails: by yielding (ductile) or by fracture without much yielding (brittle). */
export type MaterialBehaviour = "ductile" | "brittle";

/**
 * Material strengths, in the same stress unit as the tensor, all positive (a compressive strength is
 * given as a positive magnitude), and optionally whether the material is ductile or brittle (stated
 * by the data or chosen by the user; see `materialBehaviour` in checks for the rule when absent).
 */
export type Material = {
  yield?: number;
  ultimateTension?: number;
  ultimateCompression?: number;
  behaviour?: MaterialBehaviour;
};

/** The strengths of a material (every key of `Material` but its behaviour). */
export type StrengthKey = "yield" | "ultimateTension" | "ultimateCompression";

function strength(material: Material, key: StrengthKey, criterion: Criterion): number {
  const v = material[key];
  if (v === undefined) throw new RangeError(`criterion "${criterion}" needs material.${key}`);
  if (typeof v !== "number" || !Number.isFinite(v) || v <= 0) {
    throw new RangeError(
      `material.${key} must be a positive finite number (same unit as the stress), got ${v}`,
    );
  }
  return v;
}

/**
 * Safety factor: the factor n by which the whole stress state may be scaled (σ → nσ) before it
 * reaches the criterion's surface. Infinity for a zero state (and for states the criterion never
 * fails, e.g. hydrostatic stress under von Mises or Tresca). With σ1 ≥ σ2 ≥ σ3 (all three, so a
 * plane-stress state counts its zero out-of-plane stress):
 * - "von-mises": n = Sy / σvm (needs `yield`);
 * - "tresca": n = Sy / (σ1 − σ3) (needs `yield`);
 * - "max-principal" (Rankine): 1/n = max(σ1⁺/St, (−σ3)⁺/Sc) (needs `ultimateTension` St;
 *   `ultimateCompression` Sc defaults to St);
 * - "mohr-coulomb": 1/n = σ1⁺/St − σ3⁻/Sc, with x⁺ = max(x, 0), x⁻ = min(x, 0) (needs
 *   `ultimateTension` St and `ultimateCompression` Sc; pass yield strengths Syt, Syc there for the
 *   ductile Coulomb–Mohr form);
 * - "modified-mohr": n = St/σ1 when σ3 ≥ −σ1 (and σ1 > 0); when σ1 ≥ 0 ≥ σ3 and −σ3 > σ1,
 *   1/n = (Sc − St)σ1/(Sc·St) − σ3/Sc; n = Sc/(−σ3) when σ1 ≤ 0 (needs St and Sc, with Sc ≥ St:
 *   the criterion is built for materials stronger in compression, and with Sc < St its second
 *   branch would rate a state safe that already reaches Sc, so such a material is refused).
 * @param s stress tensor (same unit as the strengths)
 * @param criterion one of {@link CRITERIA}
 * @param material strengths, positive, same unit as `s`
 * @returns n > 0, dimensionless (Infinity when the state never reaches the surface)
 * @throws RangeError for an unknown criterion, a missing or invalid strength the criterion needs, or
 *   a material modified Mohr does not apply to (Suc < Sut)
 */
export function safetyFactor(s: StressTensor, criterion: Criterion, material: Material): number {
  if (criterion === "von-mises") {
    assertTensor(s);
    const sy = strengthsFor(criterion, material).yield!;
    return sy / vonMisesOf(s.xx, s.yy, s.zz, s.xy, s.yz, s.zx);
  }
  // principalValues validates the tensor (once) and solves it (once).
  const [s1, , s3] = principalValues(s);
  return factorFromPrincipals(criterion, material, s1, s3, NaN);
}

/** The message with which modified Mohr refuses a material weaker in compression than in tension. */
export function modifiedMohrRefusal(st: number, sc: number): string {
  return (
    `modified Mohr assumes a compressive strength at least equal to the tensile one ` +
    `(Suc ≥ Sut); this material has Suc ${sc} < Sut ${st}, where the criterion would overrate ` +
    `the margin — use Mohr–Coulomb or maximum principal for it`
  );
}

/**
 * The strengths `criterion` uses, checked (positive, finite, and Suc ≥ Sut for modified Mohr).
 * @throws RangeError naming the strength that is missing or invalid, or the modified-Mohr refusal
 */
export function strengthsFor(
  criterion: Criterion,
  material: Material,
): Required<Omit<Material, "behaviour">> {
  if (typeof material !== "object" || material === null) throw new TypeError("material must be an object");
  switch (criterion) {
    case "von-mises":
    case "tresca":
      return {
        yield: strength(material, "yield", criterion),
        ultimateTension: NaN,
        ultimateCompression: NaN,
      };
    case "max-principal": {
      const st = strength(material, "ultimateTension", criterion);
      const sc =
        material.ultimateCompression === undefined
          ? st
          : strength(material, "ultimateCompression", criterion);
      return { yield: NaN, ultimateTension: st, ultimateCompression: sc };
    }
    case "mohr-coulomb":
    case "modified-mohr": {
      const st = strength(material, "ultimateTension", criterion);
      const sc = strength(material, "ultimateCompression", criterion);
      if (criterion === "modified-mohr" && sc < st) throw new RangeError(modifiedMohrRefusal(st, sc));
      return { yield: NaN, ultimateTension: st, ultimateCompression: sc };
    }
    default:
      throw new RangeError(
        `unknown criterion ${JSON.stringify(criterion)}; expected one of ${CRITERIA.join(", ")}`,
      );
  }
}

/**
 * The safety factor of {@link safetyFactor} from values already computed (so a batch kernel's
 * principal stresses and von Mises stresses can be rated without a second eigen-solve).
 * @param criterion one of {@link CRITERIA}
 * @param material strengths, same unit as the stresses
 * @param s1 largest principal stress σ1
 * @param s3 smallest principal stress σ3
 * @param vonMises von Mises stress of the state (used by "von-mises" only)
 * @throws RangeError as {@link strengthsFor}
 */
export function factorFromPrincipals(
  criterion: Criterion,
  material: Material,
  s1: number,
  s3: number,
  vonMises: number,
): number {
  return factorFromStrengths(criterion, strengthsFor(criterion, material), s1, s3, vonMises);
}

/**
 * The criteria's formulas, from strengths already checked by {@link strengthsFor}: the one
 * place they are written. A batch that rates many states against one material checks the
 * strengths once and calls this per state (checking them per state was more than half of
 * rating a million finite-element points, scripts/bench/point-tables.ts).
 * @param strengths what {@link strengthsFor} returned for `criterion`
 */
export function factorFromStrengths(
  criterion: Criterion,
  strengths: ReturnType<typeof strengthsFor>,
  s1: number,
  s3: number,
  vonMises: number,
): number {
  const { yield: sy, ultimateTension: st, ultimateCompression: sc } = strengths;
  switch (criterion) {
    case "von-mises":
      return sy / vonMises;
    case "tresca":
      return sy / (s1 - s3);
    case "max-principal":
      return 1 / Math.max(Math.max(s1, 0) / st, Math.max(-s3, 0) / sc);
    case "mohr-coulomb":
      return 1 / (Math.max(s1, 0) / st - Math.min(s3, 0) / sc);
    case "modified-mohr":
      if (s1 <= 0) return sc / Math.max(-s3, 0);
      if (s3 >= -s1) return st / s1;
      return 1 / (((sc - st) * s1) / (sc * st) - s3 / sc);
  }
}
