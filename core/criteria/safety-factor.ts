import { principalValues } from "../eigen/principal";
import { vonMisesOf } from "../eigen/sym3";
import type { StressTensor } from "../tensor/types";
import { assertTensor } from "../tensor/validate";

/** A yield or fracture criterion. */
export type Criterion = "von-mises" | "tresca" | "max-principal" | "mohr-coulomb" | "modified-mohr";

/** Every accepted criterion. */
export const CRITERIA: readonly Criterion[] = [
  "von-mises",
  "tresca",
  "max-principal",
  "mohr-coulomb",
  "modified-mohr",
];

/**
 * Material strengths, in the same stress unit as the tensor, all positive (a compressive strength is
 * given as a positive magnitude).
 */
export type Material = { yield?: number; ultimateTension?: number; ultimateCompression?: number };

function strength(material: Material, key: keyof Material, criterion: Criterion): number {
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
 *   1/n = (Sc − St)σ1/(Sc·St) − σ3/Sc; n = Sc/(−σ3) when σ1 ≤ 0 (needs St and Sc).
 * @param s stress tensor (same unit as the strengths)
 * @param criterion one of {@link CRITERIA}
 * @param material strengths, positive, same unit as `s`
 * @returns n > 0, dimensionless (Infinity when the state never reaches the surface)
 * @throws RangeError for an unknown criterion or a missing or invalid strength the criterion needs
 */
export function safetyFactor(s: StressTensor, criterion: Criterion, material: Material): number {
  assertTensor(s);
  if (typeof material !== "object" || material === null) throw new TypeError("material must be an object");
  switch (criterion) {
    case "von-mises": {
      const sy = strength(material, "yield", criterion);
      return sy / vonMisesOf(s.xx, s.yy, s.zz, s.xy, s.yz, s.zx);
    }
    case "tresca": {
      const sy = strength(material, "yield", criterion);
      const [s1, , s3] = principalValues(s);
      return sy / (s1 - s3);
    }
    case "max-principal": {
      const st = strength(material, "ultimateTension", criterion);
      const sc =
        material.ultimateCompression === undefined
          ? st
          : strength(material, "ultimateCompression", criterion);
      const [s1, , s3] = principalValues(s);
      return 1 / Math.max(Math.max(s1, 0) / st, Math.max(-s3, 0) / sc);
    }
    case "mohr-coulomb": {
      const st = strength(material, "ultimateTension", criterion);
      const sc = strength(material, "ultimateCompression", criterion);
      const [s1, , s3] = principalValues(s);
      return 1 / (Math.max(s1, 0) / st - Math.min(s3, 0) / sc);
    }
    case "modified-mohr": {
      const st = strength(material, "ultimateTension", criterion);
      const sc = strength(material, "ultimateCompression", criterion);
      const [s1, , s3] = principalValues(s);
      if (s1 <= 0) return sc / Math.max(-s3, 0);
      if (s3 >= -s1) return st / s1;
      return 1 / (((sc - st) * s1) / (sc * st) - s3 / sc);
    }
    default:
      throw new RangeError(
        `unknown criterion ${JSON.stringify(criterion)}; expected one of ${CRITERIA.join(", ")}`,
      );
  }
}
