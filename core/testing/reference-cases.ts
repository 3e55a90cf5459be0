// Long because it is a table: every reference case with its source, basis and tolerance in one
// list, so a reviewer reads all the outside references the tests hold in one place.
/**
 * Check values for core's computations, kept inside the repository so that `npm test` on a fresh
 * clone needs nothing beside it. Each case names where its numbers come from, by `basis`:
 * - "published": a worked example of the named book, read there;
 * - "recalled-from-memory": a published example whose numbers were recalled, not read;
 * - "formula": the named closed-form result (the source is the formula itself); every such value was
 *   recomputed in double precision with numpy, outside this project, before it was written here;
 * - "common-practice": a fact of the trade, no source.
 * Where a book prints a value with a last-digit slip, `expected` holds the exact recomputation and
 * `note` says so. Tolerances reflect the precision each value was printed with.
 *
 * Keys by `calc` (what the test computes with core for each):
 * - plane_transform: sx, sy, txy rotated by theta_deg (counter-clockwise) → sx1, sy1, tx1y1
 * - plane_principal: sx, sy, txy → s1, s2, theta_sigma1_deg, theta_sigma2_deg, theta_s_deg (plane of
 *   +τmax), tau_max_inplane, sigma_avg/center, R, tau_abs_max (σ3 = 0 counted), two_theta_p_atan_deg
 *   (a calculator's bare atan(2τ/(σx − σy)), which can point at σ2)
 * - principal_3d: tensor → s1 ≥ s2 ≥ s3, directions v1..v3 (compared up to sign), I1, I2, I3
 * - traction: tensor, normal n (normalised first) → t, sigma_n, tau_n
 * - failure: a state (sx, sy, txy | sA, sB | s1, s2, s3) and strengths → n_DE (von Mises), n_MSS
 *   (Tresca), n_DCM (ductile Coulomb–Mohr), n_BCM (brittle Coulomb–Mohr), n_MM (modified Mohr),
 *   n_Rankine (maximum principal), sigma_vm
 * - rosette: gauge readings (µε) at angles_deg or ex, ey, gxy, with E, nu → strains and stresses
 * - strain_transform: ex, ey, gxy (engineering shear, µε) rotated by theta_deg → en
 * - thin_vessel: p, r (or d_i), t, shape → hoop, axial, allowable pressures, factors
 * - lame: thick-walled cylinder pi, ri, ro, closed_end (and Sy, n_design) → hoop st_inner/st_outer, radial
 *   sr_inner/sr_outer, axial sl (also per unit pi), allowable pi by Tresca (p_allow_MSS) and von Mises
 *   (p_allow_DE)
 * - asme_ug27: a kind core has no calculator for (its tests are listed as skipped)
 * - shaft: solid shaft d, M, T, P at the point of maximum bending → sigma, tau, s1, s2, sigma_vm, n_DE
 * - fact: rules of the trade, `which` names the rule
 * Conventions: tension positive; τxy positive when it acts in +y on the +x face; angles
 * counter-clockwise from x; principal angles compared modulo 180°.
 */

export type ReferenceBasis = "published" | "recalled-from-memory" | "formula" | "common-practice";

/** The words a test title carries for each basis. */
export const BASIS_WORDS: Record<ReferenceBasis, string> = {
  published: "published",
  "recalled-from-memory": "recalled from memory",
  formula: "formula, recomputed independently",
  "common-practice": "common practice, no source",
};

export type ReferenceTolerance = { abs?: number; rel?: number };
export type ReferenceValue = number | number[];

export type ReferenceCase = {
  id: string;
  calc: string;
  basis: ReferenceBasis;
  /** A published book or standard with the place in it, or the formula the values follow from. */
  source: string;
  note?: string;
  units: string;
  inputs: Record<string, number | string | boolean | number[] | number[][]>;
  expected: Record<string, ReferenceValue>;
  tolerance: { default: ReferenceTolerance; per_key?: Record<string, ReferenceTolerance> };
  compare?: Record<string, { mod?: number; vector_up_to_sign?: boolean }>;
};

export const REFERENCE_CASES: readonly ReferenceCase[] = [
  {
    id: "plane-transform-spiral-weld",
    calc: "plane_transform",
    basis: "published",
    source: "Strength of Materials, open textbook (Engineering Mechanics OER, CC BY-NC-SA), Example 12.1",
    note: "τxy is negative (the arrow on the +x face points to −y); θ is −48° counter-clockwise.",
    units: "MPa, degrees",
    inputs: { sx: 128, sy: 80, txy: -75.45, theta_deg: -48 },
    expected: { sx1: 176.5, tx1y1: 31.76 },
    tolerance: { default: { abs: 0.05 }, per_key: { tx1y1: { abs: 0.01 } } },
  },
  {
    id: "plane-transform-rotated-plane-psi",
    calc: "plane_transform",
    basis: "published",
    source: "Strength of Materials, open textbook (Engineering Mechanics OER, CC BY-NC-SA), Example 12.2",
    units: "psi, degrees",
    inputs: { sx: -1700, sy: 800, txy: 790, theta_deg: 54 },
    expected: { sx1: 687.6, tx1y1: 944.7, sy1: -1588 },
    tolerance: { default: { abs: 0.05 }, per_key: { sy1: { abs: 0.5 } } },
  },
  {
    id: "plane-principal-atan-points-at-sigma2",
    calc: "plane_principal",
    basis: "published",
    source: "Strength of Materials, open textbook (Engineering Mechanics OER, CC BY-NC-SA), Example 12.3",
    note: "atan(2τ/(σx − σy)) gives 10.52°, which is the σ2 direction here. The printed 54.65/−84.65 is a last-digit slip; −15 ± √(65² + 25²) = 54.642/−84.642 is used.",
    units: "MPa, degrees",
    inputs: { sx: -80, sy: 50, txy: -25 },
    expected: {
      two_theta_p_atan_deg: 21.038,
      theta_sigma2_deg: 10.52,
      theta_sigma1_deg: 100.52,
      s1: 54.64,
      s2: -84.64,
      tau_max_inplane: 69.6,
      theta_s_deg: 55.5,
      sigma_avg: -15,
    },
    tolerance: {
      default: { abs: 0.006 },
      per_key: {
        tau_max_inplane: { abs: 0.05 },
        theta_s_deg: { abs: 0.05 },
        two_theta_p_atan_deg: { abs: 0.0006 },
      },
    },
    compare: { theta_sigma1_deg: { mod: 180 }, theta_sigma2_deg: { mod: 180 }, theta_s_deg: { mod: 180 } },
  },
  {
    id: "plane-principal-mohr-circle",
    calc: "plane_principal",
    basis: "published",
    source:
      "Strength of Materials, open textbook (Engineering Mechanics OER, CC BY-NC-SA), Example 12.4 (a)–(b)",
    note: "The printed θs 25.66° is a rounding slip; 2θs = 51.34° gives 25.67°, which is used.",
    units: "MPa, degrees",
    inputs: { sx: -60, sy: 15, txy: 30 },
    expected: {
      center: -22.5,
      R: 48.02,
      s1: 25.52,
      s2: -70.52,
      theta_sigma1_deg: 70.67,
      theta_sigma2_deg: -19.33,
      tau_max_inplane: 48,
      theta_s_deg: 25.67,
    },
    tolerance: { default: { abs: 0.006 }, per_key: { tau_max_inplane: { abs: 0.05 } } },
    compare: { theta_sigma1_deg: { mod: 180 }, theta_sigma2_deg: { mod: 180 }, theta_s_deg: { mod: 180 } },
  },
  {
    id: "plane-principal-mohr-centre-radius",
    calc: "plane_principal",
    basis: "formula",
    source:
      "Mohr's circle: C = (σx + σy)/2, R = √(((σx − σy)/2)² + τxy²), σ1,2 = C ± R, tan 2θp = 2τxy/(σx − σy)",
    units: "MPa, degrees",
    inputs: { sx: 30, sy: -60, txy: 50 },
    expected: { center: -15, R: 67.3, s1: 52.3, s2: -82.3, two_theta_p_atan_deg: 48 },
    tolerance: { default: { abs: 0.05 } },
  },
  {
    id: "plane-principal-beer-7-01",
    calc: "plane_principal",
    basis: "recalled-from-memory",
    source: "Beer, Johnston & DeWolf, Mechanics of Materials, Example 7.01",
    note: "Values recalled from memory, not read from the book; they satisfy C ± R for the inputs.",
    units: "MPa, degrees",
    inputs: { sx: 50, sy: -10, txy: 40 },
    expected: {
      s1: 70,
      s2: -30,
      theta_sigma1_deg: 26.6,
      tau_max_inplane: 50,
      sigma_avg: 20,
      theta_s_deg: -18.4,
    },
    tolerance: { default: { abs: 0.05 } },
    compare: { theta_sigma1_deg: { mod: 180 }, theta_s_deg: { mod: 180 } },
  },
  {
    id: "plane-principal-post-bending-torsion",
    calc: "plane_principal",
    basis: "published",
    source:
      "Strength of Materials, open textbook (Engineering Mechanics OER, CC BY-NC-SA), Example 14.7, point P",
    note: "The source's y–z element is mapped to x–y here.",
    units: "MPa",
    inputs: { sx: 0, sy: 36.77, txy: 6.094 },
    expected: { s1: 37.75, s2: -0.984, tau_max_inplane: 19.37 },
    tolerance: { default: { abs: 0.005 }, per_key: { s2: { abs: 0.0006 } } },
  },
  {
    id: "plane-principal-biaxial-compression",
    calc: "plane_principal",
    basis: "formula",
    source: "principal stresses of plane stress σ1,2 = (σx + σy)/2 ± √(((σx − σy)/2)² + τxy²)",
    units: "MPa",
    inputs: { sx: -50, sy: -75, txy: -50 },
    expected: { s1: -10.961179679779242, s2: -114.03882032022076 },
    tolerance: { default: { rel: 1e-12 } },
  },
  {
    id: "principal-3d-continuum-2b17",
    calc: "principal_3d",
    basis: "recalled-from-memory",
    source: "Lai, Rubin & Krempl, Introduction to Continuum Mechanics, 3rd ed., Examples 2B17.4 and 2B20.1",
    note: "The eigenvalues 2, 5, −5 and the e1 direction are published; the matrix is recalled from memory; the other directions and the invariants are derived from it.",
    units: "dimensionless tensor",
    inputs: {
      tensor: [
        [2, 0, 0],
        [0, 3, 4],
        [0, 4, -3],
      ],
    },
    expected: { s1: 5, s2: 2, s3: -5, v2: [1, 0, 0], v1: [0, 2, 1], v3: [0, 1, -2], I1: 2, I2: -25, I3: -50 },
    tolerance: { default: { abs: 1e-9 } },
    compare: {
      v1: { vector_up_to_sign: true },
      v2: { vector_up_to_sign: true },
      v3: { vector_up_to_sign: true },
    },
  },
  {
    id: "principal-3d-integer-eigenvalues",
    calc: "principal_3d",
    basis: "formula",
    source:
      "characteristic equation σ³ − I1σ² + I2σ − I3 = 0 (roots 4, 1, −2); eigenvectors from (σ − λI)v = 0",
    units: "no unit",
    inputs: {
      tensor: [
        [3, 1, 1],
        [1, 0, 2],
        [1, 2, 0],
      ],
    },
    expected: { s1: 4, s2: 1, s3: -2, I1: 3, I2: -6, I3: -8, v1: [2, 1, 1], v2: [-1, 1, 1], v3: [0, 1, -1] },
    tolerance: { default: { abs: 1e-9 } },
    compare: {
      v1: { vector_up_to_sign: true },
      v2: { vector_up_to_sign: true },
      v3: { vector_up_to_sign: true },
    },
  },
  {
    id: "principal-3d-characteristic-6-3-minus-2",
    calc: "principal_3d",
    basis: "formula",
    source:
      "characteristic equation σ³ − 7σ² + 0σ + 36 = (σ − 6)(σ − 3)(σ + 2) = 0; eigenvectors from (σ − λI)v = 0",
    units: "N/mm^2",
    inputs: {
      tensor: [
        [1, 1, 3],
        [1, 5, 1],
        [3, 1, 1],
      ],
    },
    expected: { I1: 7, I2: 0, I3: -36, s1: 6, s2: 3, s3: -2, v1: [1, 2, 1], v2: [1, -1, 1], v3: [1, 0, -1] },
    tolerance: { default: { abs: 1e-9 } },
    compare: {
      v1: { vector_up_to_sign: true },
      v2: { vector_up_to_sign: true },
      v3: { vector_up_to_sign: true },
    },
  },
  {
    id: "traction-cauchy-45-degree-plane",
    calc: "traction",
    basis: "formula",
    source: "Cauchy's formula t = σn, σn = t·n, τn = √(|t|² − σn²), n = (1, 1, 0)/√2",
    units: "MPa",
    inputs: {
      tensor: [
        [200, -200, -200],
        [-200, -100, -200],
        [-200, -200, -100],
      ],
      n: [1, 1, 0],
      normalize: true,
    },
    expected: { t: [0, -212.13203435596424, -282.84271247461896], sigma_n: -150, tau_n: 320.16 },
    tolerance: { default: { abs: 0.005 } },
  },
  {
    id: "traction-cauchy-3-4-12-plane",
    calc: "traction",
    basis: "formula",
    source: "Cauchy's formula t = σn, σn = t·n, n = (3, 4, 12)/13",
    units: "N/mm^2",
    inputs: {
      tensor: [
        [1, 1, 3],
        [1, 5, 1],
        [3, 1, 1],
      ],
      n: [0.23076923076923078, 0.3076923076923077, 0.9230769230769231],
    },
    expected: { t: [3.3076923076923075, 2.6923076923076925, 1.9230769230769231], sigma_n: 3.366863905325444 },
    tolerance: { default: { abs: 1e-9 } },
  },
  {
    id: "criteria-vm-tresca-equibiaxial",
    calc: "failure",
    basis: "formula",
    source: "von Mises n = Sy/σvM and Tresca n = Sy/(σ1 − σ3), out-of-plane σ = 0 counted",
    units: "MPa",
    inputs: { sx: 100, sy: 100, txy: 0, Sy: 350 },
    expected: { n_MSS: 3.5, n_DE: 3.5 },
    tolerance: { default: { rel: 1e-9 } },
  },
  {
    id: "criteria-vm-tresca-biaxial-tension",
    calc: "failure",
    basis: "formula",
    source: "von Mises n = Sy/σvM and Tresca n = Sy/(σ1 − σ3), out-of-plane σ = 0 counted",
    units: "MPa",
    inputs: { sx: 100, sy: 50, txy: 0, Sy: 350 },
    expected: { n_MSS: 3.5, n_DE: 4.041451884327381 },
    tolerance: { default: { rel: 1e-9 } },
  },
  {
    id: "criteria-vm-tresca-tension-shear",
    calc: "failure",
    basis: "formula",
    source: "von Mises n = Sy/σvM and Tresca n = Sy/(σ1 − σ3), out-of-plane σ = 0 counted",
    units: "MPa",
    inputs: { sx: 100, sy: 0, txy: -75, Sy: 350 },
    expected: { n_MSS: 1.941450686788302, n_DE: 2.134979984656465 },
    tolerance: { default: { rel: 1e-9 } },
  },
  {
    id: "criteria-vm-tresca-compression-shear",
    calc: "failure",
    basis: "formula",
    source: "von Mises n = Sy/σvM and Tresca n = Sy/(σ1 − σ3), out-of-plane σ = 0 counted",
    units: "MPa",
    inputs: { sx: -50, sy: -75, txy: -50, Sy: 350 },
    expected: { n_MSS: 3.069130310338188, n_DE: 3.2118202741878643 },
    tolerance: { default: { rel: 1e-9 } },
  },
  {
    id: "criteria-ductile-coulomb-mohr-both-tensile",
    calc: "failure",
    basis: "formula",
    source: "ductile Coulomb–Mohr 1/n = σ1/Syt − σ3/Syc, out-of-plane σ = 0 counted",
    units: "MPa",
    inputs: { sA: 175, sB: 105, Syt: 420, Syc: 525 },
    expected: { n_DCM: 2.4 },
    tolerance: { default: { rel: 1e-9 } },
  },
  {
    id: "criteria-ductile-coulomb-mohr-pure-shear",
    calc: "failure",
    basis: "formula",
    source: "ductile Coulomb–Mohr 1/n = σ1/Syt − σ3/Syc, out-of-plane σ = 0 counted",
    units: "MPa",
    inputs: { sA: 105, sB: -105, Syt: 420, Syc: 525 },
    expected: { n_DCM: 2.2222222222222223 },
    tolerance: { default: { rel: 1e-9 } },
  },
  {
    id: "criteria-ductile-coulomb-mohr-mixed",
    calc: "failure",
    basis: "formula",
    source: "ductile Coulomb–Mohr 1/n = σ1/Syt − σ3/Syc, out-of-plane σ = 0 counted",
    units: "MPa",
    inputs: { sx: -84, sy: 105, txy: -63, Syt: 420, Syc: 525 },
    expected: { sA: 124.07486517711567, sB: -103.07486517711567, n_DCM: 2.033556024430724 },
    tolerance: { default: { rel: 1e-9 } },
  },
  {
    id: "criteria-ductile-coulomb-mohr-both-compressive",
    calc: "failure",
    basis: "formula",
    source: "ductile Coulomb–Mohr 1/n = σ1/Syt − σ3/Syc, out-of-plane σ = 0 counted",
    units: "MPa",
    inputs: { sx: -168, sy: -168, txy: -105, Syt: 420, Syc: 525 },
    expected: { sA: -63, sB: -273, n_DCM: 1.923076923076923 },
    tolerance: { default: { rel: 1e-9 } },
  },
  {
    id: "criteria-brittle-both-tensile",
    calc: "failure",
    basis: "formula",
    source:
      "brittle Coulomb–Mohr 1/n = σ1/Sut − σ3/Suc and modified Mohr (Sut/σ1 unless σ3 < −σ1 < 0, then 1/n = (Suc − Sut)σ1/(Suc·Sut) − σ3/Suc)",
    units: "MPa",
    inputs: { sA: 175, sB: 105, Sut: 210, Suc: 630 },
    expected: { n_BCM: 1.2, n_MM: 1.2 },
    tolerance: { default: { rel: 1e-9 } },
  },
  {
    id: "criteria-brittle-pure-shear",
    calc: "failure",
    basis: "formula",
    source:
      "brittle Coulomb–Mohr 1/n = σ1/Sut − σ3/Suc and modified Mohr (Sut/σ1 unless σ3 < −σ1 < 0, then 1/n = (Suc − Sut)σ1/(Suc·Sut) − σ3/Suc)",
    units: "MPa",
    inputs: { sA: 105, sB: -105, Sut: 210, Suc: 630 },
    expected: { n_BCM: 1.5, n_MM: 2 },
    tolerance: { default: { rel: 1e-9 } },
  },
  {
    id: "criteria-brittle-tension-shear",
    calc: "failure",
    basis: "formula",
    source:
      "brittle Coulomb–Mohr 1/n = σ1/Sut − σ3/Suc and modified Mohr (Sut/σ1 unless σ3 < −σ1 < 0, then 1/n = (Suc − Sut)σ1/(Suc·Sut) − σ3/Suc)",
    units: "MPa",
    inputs: { sx: 140, sy: 0, txy: -70, Sut: 210, Suc: 630 },
    expected: { n_BCM: 1.1754174373368365, n_MM: 1.2426406871192852 },
    tolerance: { default: { rel: 1e-9 } },
  },
  {
    id: "criteria-brittle-mixed",
    calc: "failure",
    basis: "formula",
    source:
      "brittle Coulomb–Mohr 1/n = σ1/Sut − σ3/Suc and modified Mohr (Sut/σ1 unless σ3 < −σ1 < 0, then 1/n = (Suc − Sut)σ1/(Suc·Sut) − σ3/Suc)",
    units: "MPa",
    inputs: { sA: -84, sB: 105, Sut: 210, Suc: 630 },
    expected: { n_BCM: 1.5789473684210527, n_MM: 2 },
    tolerance: { default: { rel: 1e-9 } },
  },
  {
    id: "rosette-strains-to-stresses",
    calc: "rosette",
    basis: "formula",
    source:
      "ε1,2 = (εx + εy)/2 ± √(((εx − εy)/2)² + (γxy/2)²); plane-stress Hooke's law σx = E(εx + νεy)/(1 − ν²), τxy = Gγxy, G = E/(2(1 + ν))",
    note: "Rounded values; σ1, σ2 from strains rounded to 1330/−910 µε.",
    units: "micro-strain, MPa",
    inputs: { ex: 770, ey: -350, gxy: 1940, E: 70000, nu: 0.33 },
    expected: {
      e1: 1330.04,
      e2: -910.04,
      tan_2theta_p: 1.732,
      sy: -7.53,
      G: 26316,
      txy: 51.05,
      s1: 80.89,
      s2: -37.01,
    },
    tolerance: {
      default: { abs: 0.006 },
      per_key: { G: { abs: 0.5 }, tan_2theta_p: { abs: 0.0006 }, s1: { abs: 0.01 }, s2: { abs: 0.01 } },
    },
  },
  {
    id: "rosette-rectangular-reduction",
    calc: "rosette",
    basis: "formula",
    source: "rectangular (0/45/90°) rosette: εx = εa, εy = εc, γxy = 2εb − εa − εc",
    units: "micro-strain",
    inputs: { angles_deg: [0, 45, 90], strains_ue: [-215, -130, 460] },
    expected: { ex: -215, ey: 460, gxy: -505 },
    tolerance: { default: { abs: 1e-9 } },
  },
  {
    id: "strain-transform-50-degrees",
    calc: "strain_transform",
    basis: "formula",
    source: "strain transformation εn = εx cos²θ + εy sin²θ + γxy sinθ cosθ",
    units: "micro-strain, degrees",
    inputs: { ex: 900, ey: -600, gxy: -850, theta_deg: 50 },
    expected: { en: -398.78 },
    tolerance: { default: { abs: 0.006 } },
  },
  {
    id: "strain-transform-diagonal",
    calc: "strain_transform",
    basis: "formula",
    source: "strain transformation εn = εx cos²θ + εy sin²θ + γxy sinθ cosθ",
    note: "θ = −atan(1/2): cos² = 0.8, sin² = 0.2, sin·cos = −0.4, so εn = −1020 µε exactly.",
    units: "micro-strain, degrees",
    inputs: { ex: -700, ey: -500, gxy: 900, theta_deg: -26.565 },
    expected: { en: -1020 },
    tolerance: { default: { abs: 0.006 } },
  },
  {
    id: "thin-cylinder-inside-radius",
    calc: "thin_vessel",
    basis: "published",
    source: "Strength of Materials, open textbook (Engineering Mechanics OER, CC BY-NC-SA), Example 13.1",
    note: "σ = p·ri/t with the inside radius (48 − 2 in).",
    units: "psi, in (inner radius = 48 - 2 in)",
    inputs: { p: 250, r: 46, t: 2, shape: "cylinder" },
    expected: { hoop: 5750, axial: 2875, tau_max_inplane: 1438 },
    tolerance: { default: { abs: 0.5 } },
  },
  {
    id: "thin-cylinder-before-weld-transform",
    calc: "thin_vessel",
    basis: "published",
    source: "Strength of Materials, open textbook (Engineering Mechanics OER, CC BY-NC-SA), Example 13.2",
    note: "Exactly 88.75/44.375 MPa; the source rounds before transforming.",
    units: "MPa, m",
    inputs: { p: 5, r: 0.71, t: 0.04, shape: "cylinder" },
    expected: { hoop: 88.8, axial: 44.4 },
    tolerance: { default: { abs: 0.05 } },
  },
  {
    id: "plane-transform-across-weld",
    calc: "plane_transform",
    basis: "published",
    source:
      "Strength of Materials, open textbook (Engineering Mechanics OER, CC BY-NC-SA), Example 13.2 (normal stress across the weld)",
    units: "MPa, degrees",
    inputs: { sx: 44.4, sy: 88.8, txy: 0, theta_deg: -65 },
    expected: { sx1: 80.9 },
    tolerance: { default: { abs: 0.05 } },
  },
  {
    id: "thin-sphere-allowable-pressure",
    calc: "thin_vessel",
    basis: "published",
    source: "Strength of Materials, open textbook (Engineering Mechanics OER, CC BY-NC-SA), Example 13.3",
    note: "σallow = 250/2.5 MPa; p = 2tσallow/ri.",
    units: "MPa, m",
    inputs: { p: 1, r: 1.975, t: 0.025, shape: "sphere", sigma_allow: 100 },
    expected: { p_allow: 2.53 },
    tolerance: { default: { abs: 0.005 } },
  },
  {
    id: "thin-sphere-inner-surface-von-mises",
    calc: "thin_vessel",
    basis: "formula",
    source:
      "thin sphere σ1 = σ2 = pr/(2t), σ3 = −p at the inner surface; von Mises yield and burst pressures p·Sy/σvM, p·Su/σvM",
    units: "MPa, mm",
    inputs: { p: 1, r: 100, t: 1.25, shape: "sphere", radial: true, Sy: 390, Su: 470 },
    expected: { vm_per_unit_p: 41, p_yield_DE: 9.51219512195122, p_burst_DE: 11.4634146341463 },
    tolerance: { default: { rel: 1e-9 } },
  },
  {
    id: "thin-cylinder-mean-diameter-form",
    calc: "thin_vessel",
    basis: "formula",
    source: "thin cylinder, mean-diameter form σt = p(di + t)/(2t), σl = p·di/(4t), σr = −p; n = Sy/σvM",
    units: "MPa, mm",
    inputs: {
      p: 3.5,
      t: 1.55,
      d_i: 96.9,
      mean_diameter_form: true,
      radial: true,
      shape: "cylinder",
      Sy: 345,
    },
    expected: { n_DE: 3.474444051660986 },
    tolerance: { default: { rel: 1e-9 } },
  },
  {
    id: "thin-cylinder-allowable-pressure",
    calc: "thin_vessel",
    basis: "recalled-from-memory",
    source: "Hibbeler, Mechanics of Materials, 10th ed. (SI), Example 8.1 (cylinder)",
    note: "Inputs and answer recalled from memory, not read from the book; p = σallow·t/r = 2.8 MPa.",
    units: "MPa, mm",
    inputs: { p: 1, r: 600, t: 12, shape: "cylinder", sigma_allow: 140 },
    expected: { p_allow: 2.8 },
    tolerance: { default: { abs: 0.005 } },
  },
  {
    id: "thin-sphere-allowable-pressure-600",
    calc: "thin_vessel",
    basis: "recalled-from-memory",
    source: "Hibbeler, Mechanics of Materials, 10th ed. (SI), Example 8.1 (sphere)",
    note: "Recalled from memory; p = 2σallow·t/r = 5.6 MPa.",
    units: "MPa, mm",
    inputs: { p: 1, r: 600, t: 12, shape: "sphere", sigma_allow: 140 },
    expected: { p_allow: 5.6 },
    tolerance: { default: { abs: 0.005 } },
  },
  {
    id: "asme-ug27d-sphere",
    calc: "asme_ug27",
    basis: "recalled-from-memory",
    source: "ASME BPVC Section VIII Division 1, UG-27(d): t = PR/(2SE − 0.2P) for P ≤ 0.665SE",
    note: "Design data and answer recalled from memory (a pressure-vessel handbook's internal-pressure example).",
    units: "psi, in",
    inputs: { P: 100, R: 48.125, S: 17500, E: 0.85, CA: 0.125, part: "sphere" },
    expected: { t_req: 0.162, t_with_CA: 0.287 },
    tolerance: { default: { abs: 0.0006 } },
  },
  {
    id: "lame-closed-cylinder-allowable",
    calc: "lame",
    basis: "formula",
    source:
      "Lamé thick-cylinder solution, any elasticity text: σt(ri) = p(ro² + ri²)/(ro² − ri²), σl = p·ri²/(ro² − ri²), σr = −p; allowable p by Tresca and von Mises with n = 2",
    units: "MPa, mm",
    inputs: { pi: 1, ri: 21, ro: 25, closed_end: true, Sy: 490, n_design: 2 },
    expected: {
      st_inner_per_p: 5.79347826086956,
      sl_per_p: 2.39673913043478,
      p_allow_MSS: 36.064,
      p_allow_DE: 41.6431202161093,
    },
    tolerance: { default: { rel: 1e-9 } },
  },
  {
    id: "lame-closed-cylinder-b-equals-2a",
    calc: "lame",
    basis: "formula",
    source:
      "Lamé thick-cylinder solution, any elasticity text (b = 2a: σt(a) = 5p/3, σt(b) = 2p/3, σl = p/3)",
    units: "MPa, mm",
    inputs: { pi: 100, ri: 10, ro: 20, closed_end: true },
    expected: {
      st_inner: 166.66666666666666,
      st_outer: 66.66666666666667,
      sr_inner: -100,
      sr_outer: 0,
      sl: 33.333333333333336,
    },
    tolerance: { default: { abs: 1e-9 } },
  },
  {
    id: "shaft-bending-axial-torsion",
    calc: "shaft",
    basis: "formula",
    source: "solid shaft σ = 32M/(πd³) + 4P/(πd²), τ = 16T/(πd³), n = Sy/√(σ² + 3τ²)",
    units: "N, m, Pa",
    inputs: { d: 0.015, M: 55, T: 25, P: 4000, point: "max_bending", Sy: 280000000 },
    expected: { n_DE: 1.4026285488486512 },
    tolerance: { default: { rel: 1e-9 } },
  },
  {
    id: "shaft-bending-torsion",
    calc: "shaft",
    basis: "common-practice",
    source: "σ1,2 = 16/(πd³)(M ± √(M² + T²)), τmax = 16/(πd³)√(M² + T²), σvM = 32/(πd³)√(M² + 3T²/4)",
    units: "N, m, Pa",
    inputs: { d: 0.05, M: 1000, T: 800, point: "max_bending", Sy: 250000000 },
    expected: {
      s1: 92921015.76081598,
      s2: -11433684.897765582,
      tau_max_inplane: 52177350.329290785,
      sigma_vm: 99133616.57355534,
    },
    tolerance: { default: { rel: 1e-12 } },
  },
  {
    id: "fact-pure-shear-yield",
    calc: "fact",
    basis: "common-practice",
    source: "pure shear yields at τ = Sy/2 by Tresca and Sy/√3 by von Mises",
    units: "consistent units",
    inputs: { which: "pure_shear_yield", Sy: 1 },
    expected: {
      tau_yield_tresca: 0.5,
      tau_yield_vm: 0.5773502691896258,
      ratio_vm_over_tresca: 1.1547005383792517,
    },
    tolerance: { default: { abs: 1e-9 } },
  },
  {
    id: "fact-uniaxial",
    calc: "fact",
    basis: "common-practice",
    source: "uniaxial stress: σvM = σ, von Mises and Tresca agree",
    units: "consistent units",
    inputs: { which: "uniaxial", s: 100, Sy: 250 },
    expected: { sigma_vm: 100, n_DE: 2.5, n_MSS: 2.5 },
    tolerance: { default: { abs: 1e-9 } },
  },
  {
    id: "fact-hydrostatic",
    calc: "fact",
    basis: "common-practice",
    source: "hydrostatic stress has no von Mises stress and no shear",
    units: "consistent units",
    inputs: { which: "hydrostatic", s: -80, Sy: 250 },
    expected: { sigma_vm: 0, tau_abs_max: 0 },
    tolerance: { default: { abs: 1e-9 } },
  },
  {
    id: "fact-equibiaxial",
    calc: "fact",
    basis: "common-practice",
    source: "equibiaxial (σ, σ, 0): σvM = σ and Tresca uses σ1 − σ3 = σ",
    units: "consistent units",
    inputs: { which: "equibiaxial", s: 100, Sy: 250 },
    expected: { sigma_vm: 100, n_DE: 2.5, n_MSS: 2.5 },
    tolerance: { default: { abs: 1e-9 } },
  },
  {
    id: "fact-thin-cylinder-ratios",
    calc: "fact",
    basis: "common-practice",
    source: "closed thin cylinder: hoop = 2 × axial, σvM = (√3/2)·hoop",
    units: "consistent units",
    inputs: { which: "thin_cyl_vm", p: 2, r: 500, t: 10 },
    expected: { hoop_over_axial: 2, vm_over_hoop: 0.8660254037844386 },
    tolerance: { default: { abs: 1e-9 } },
  },
  {
    id: "fact-lame-thin-limit",
    calc: "fact",
    basis: "common-practice",
    source: "Lamé tends to the thin-wall p·r/t and p·r/(2t) as t/r → 0",
    units: "consistent units",
    inputs: { which: "lame_thin_limit", p: 1, ri: 1000, t: 1 },
    expected: { st_inner_over_pr_t: 1.0005, sl_over_pr_2t: 0.9995 },
    tolerance: { default: { abs: 2e-6 } },
  },
  {
    id: "fact-rosette-invariance",
    calc: "fact",
    basis: "common-practice",
    source: "a rectangular and a delta rosette on one strain field give the same principal strains",
    units: "consistent units",
    inputs: { which: "rosette_invariance", ex: 500, ey: -200, gxy: 300 },
    expected: {
      e1_rect: 530.7886552931955,
      e1_delta: 530.7886552931955,
      e2_rect: -230.7886552931954,
      e2_delta: -230.7886552931954,
    },
    tolerance: { default: { abs: 1e-7 } },
  },
  {
    id: "fact-invariants-rotation",
    calc: "fact",
    basis: "common-practice",
    source: "I1, I2, I3 do not change under a rotation of axes",
    units: "consistent units",
    inputs: {
      which: "invariance_rotation",
      tensor: [
        [50, 20, -30],
        [20, 40, 20],
        [-30, 20, 20],
      ],
      theta_deg: 33,
    },
    expected: { dI1: 0, dI2: 0, dI3: 0 },
    tolerance: { default: { abs: 1e-8 } },
  },
  {
    id: "fact-octahedral",
    calc: "fact",
    basis: "common-practice",
    source: "octahedral shear stress = (√2/3)·σvM",
    units: "consistent units",
    inputs: {
      which: "octahedral",
      tensor: [
        [50, 20, -30],
        [20, 40, 20],
        [-30, 20, 20],
      ],
    },
    expected: { tau_oct_over_vm: 0.47140452079103173 },
    tolerance: { default: { abs: 1e-9 } },
  },
  {
    id: "fact-equal-principals-abs-shear",
    calc: "plane_principal",
    basis: "common-practice",
    source:
      "equal in-plane principal stresses: the in-plane Mohr circle is a point but τmax = σ/2 counting σ3 = 0",
    units: "MPa",
    inputs: { sx: 100, sy: 100, txy: 0 },
    expected: { tau_max_inplane: 0, tau_abs_max: 50 },
    tolerance: { default: { abs: 1e-9 } },
  },
  {
    id: "fact-shear-sign-flip",
    calc: "plane_principal",
    basis: "common-practice",
    source: "reversing τxy leaves the principal stresses and mirrors the principal angle",
    units: "MPa, degrees",
    inputs: { sx: -60, sy: 15, txy: -30 },
    expected: { s1: 25.523431780746364, theta_sigma1_deg: -70.67009618, theta_s_deg: -115.67009618 },
    tolerance: { default: { abs: 1e-6 } },
    compare: { theta_sigma1_deg: { mod: 180 }, theta_s_deg: { mod: 180 } },
  },
  {
    id: "fact-bcm-equals-tresca",
    calc: "failure",
    basis: "common-practice",
    source: "brittle Coulomb–Mohr with Sut = Suc is Tresca; maximum principal is S/σ1",
    units: "MPa",
    inputs: { sx: 100, sy: -50, txy: 40, Sut: 250, Suc: 250, Sy: 250 },
    expected: { n_BCM: 1.4705882352941178, n_MSS: 1.4705882352941178, n_Rankine: 2.272727272727273 },
    tolerance: { default: { abs: 1e-9 } },
  },
];
