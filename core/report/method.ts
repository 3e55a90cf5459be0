import type { CriterionName } from "../contract/projects";

/**
 * What the method section prints about each criterion: its formula as the engine computes it
 * (core/criteria/safety-factor.ts is the implementation; this text restates it for a reader), what
 * it needs of the material, and where the formula comes from. Written with the characters the
 * report's embedded fonts carry (½, ², σ, τ; "sqrt" for the root sign).
 */
export type CriterionMethod = {
  criterion: CriterionName;
  /** The equivalent stress or the rule, then the safety factor n. */
  formulas: string[];
  needs: string;
  source: string;
};

export const CRITERION_METHODS: Readonly<Record<CriterionName, CriterionMethod>> = {
  "von-mises": {
    criterion: "von-mises",
    formulas: ["σvm = sqrt(½[(σ1 − σ2)² + (σ2 − σ3)² + (σ3 − σ1)²])", "n = Sy / σvm"],
    needs: "the yield strength Sy (ductile materials)",
    source:
      "distortion-energy (von Mises) criterion as written in machine-design handbooks; recalled from memory",
  },
  tresca: {
    criterion: "tresca",
    formulas: ["σTresca = σ1 − σ3 = 2·τmax", "n = Sy / (σ1 − σ3)"],
    needs: "the yield strength Sy (ductile materials)",
    source: "maximum-shear-stress (Tresca) criterion; recalled from memory",
  },
  "max-principal": {
    criterion: "max-principal",
    formulas: ["1/n = max(max(σ1, 0) / Sut, max(−σ3, 0) / Suc)"],
    needs: "the ultimate tensile strength Sut (Suc taken equal to Sut when not given)",
    source: "maximum-normal-stress (Rankine) criterion for brittle materials; recalled from memory",
  },
  "mohr-coulomb": {
    criterion: "mohr-coulomb",
    formulas: ["1/n = max(σ1, 0) / Sut − min(σ3, 0) / Suc"],
    needs: "the ultimate tensile and compressive strengths Sut and Suc",
    source: "Coulomb–Mohr (brittle) criterion as written in machine-design handbooks; recalled from memory",
  },
  "modified-mohr": {
    criterion: "modified-mohr",
    formulas: [
      "n = Sut / σ1 when σ1 > 0 and σ3 ≥ −σ1",
      "1/n = (Suc − Sut)·σ1 / (Suc·Sut) − σ3 / Suc when σ1 ≥ 0 ≥ σ3 and −σ3 > σ1",
      "n = Suc / (−σ3) when σ1 ≤ 0",
    ],
    needs: "Sut and Suc with Suc at least Sut",
    source:
      "modified Mohr criterion for brittle materials as written in machine-design handbooks; recalled from memory",
  },
};

/** The conventions a reader needs to read the numbers, in the order a checker asks about them. */
export const SIGN_CONVENTIONS: readonly string[] = [
  "Tension is positive, compression negative.",
  "Shear components are tensor components (σxy = σyx), not engineering strains.",
  "Principal stresses are ordered σ1 ≥ σ2 ≥ σ3 (a plane-stress state counts its zero out-of-plane stress).",
  "A principal direction is a unit vector (direction cosines on x, y, z); it and its opposite name the same axis.",
  "The safety factor n is the factor by which the whole state may be scaled before it reaches the criterion's surface; utilisation u = n required / n, and a check fails when u > 1.",
  "A passing check is marked close when n is less than 10 % above the required factor.",
  "Combinations are linear superpositions of load-case states, which assumes linear-elastic behaviour and small strains.",
];
