/**
 * Every reference case in ../shared/reference-cases/cases.json whose `calc` core covers, loaded at
 * test time. Each test title names the case's source, place in the source and status as the file
 * gives them ("common_practice" = a fact of the trade with no source; "memory" = recalled, not read).
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { safetyFactor, type Material } from "./criteria/safety-factor";
import { principalStresses } from "./eigen/principal";
import { planeStress, transformPlaneStress } from "./plane/plane-stress";
import { invariants, maxShear, octahedral, vonMises } from "./tensor/invariants";
import { rotateTensor, rotationFromAxisAngle } from "./tensor/rotate";
import { tractionOnPlane } from "./tensor/traction";
import type { StressTensor, Vec3 } from "./tensor/types";

type Tol = { abs?: number; rel?: number };
type Value = number | number[];
type Case = {
  id: string;
  calc: string;
  source: string;
  source_location: string;
  expected_status: string;
  from_memory?: boolean;
  inputs: Record<string, unknown>;
  expected: Record<string, Value>;
  corrected_expected?: Record<string, Value>;
  tolerance: { default: Tol; per_key?: Record<string, Tol> };
  compare?: Record<string, { mod?: number; vector_up_to_sign?: boolean }>;
};

const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const casesFile = path.resolve(repoRoot, "../shared/reference-cases/cases.json");
const cases = JSON.parse(readFileSync(casesFile, "utf8")) as Case[];

/** calc kinds core computes, and those that belong to later work (strain gauges, vessels, shafts). */
const COVERED = [
  "plane_transform",
  "plane_principal",
  "principal_3d",
  "traction",
  "failure",
  "fact",
] as const;
const NOT_COVERED = ["rosette", "strain_transform", "thin_vessel", "asme_ug27", "lame", "shaft"];
/** Facts core can state; the others are facts about vessel and gauge formulas core does not have yet. */
const FACTS_COVERED = [
  "pure_shear_yield",
  "uniaxial",
  "hydrostatic",
  "equibiaxial",
  "invariance_rotation",
  "octahedral",
] as const;
const FACTS_NOT_COVERED = ["thin_cyl_vm", "lame_thin_limit", "rosette_invariance"];

const exercised = new Map<string, number>();
const count = (key: string): void => void exercised.set(key, (exercised.get(key) ?? 0) + 1);

const num = (c: Case, key: string): number => {
  const v = c.inputs[key];
  if (typeof v !== "number") throw new Error(`case ${c.id}: input ${key} is missing or not a number`);
  return v;
};
const has = (c: Case, key: string): boolean => typeof c.inputs[key] === "number";
const tensorOf = (m: unknown): StressTensor => {
  const t = m as number[][];
  return { xx: t[0][0], yy: t[1][1], zz: t[2][2], xy: t[0][1], yz: t[1][2], zx: t[2][0] };
};
const plane = (sx: number, sy: number, txy: number): StressTensor => ({
  xx: sx,
  yy: sy,
  zz: 0,
  xy: txy,
  yz: 0,
  zx: 0,
});

/** Reduces an angle in degrees into (−90°, 90°], the range of a calculator's atan. */
const toAtanRange = (a: number): number => {
  let r = a % 180;
  if (r <= -90) r += 180;
  if (r > 90) r -= 180;
  return r;
};

/** What core computes for each key a case may expect, evaluated lazily so a missing input fails loudly. */
type Actuals = Record<string, () => Value>;

function actualsFor(c: Case): Actuals {
  switch (c.calc) {
    case "plane_transform": {
      const r = () => transformPlaneStress(num(c, "sx"), num(c, "sy"), num(c, "txy"), num(c, "theta_deg"));
      return { sx1: () => r().sx, sy1: () => r().sy, tx1y1: () => r().txy };
    }
    case "plane_principal": {
      const p = () => planeStress(num(c, "sx"), num(c, "sy"), num(c, "txy"));
      return {
        s1: () => p().s1,
        s2: () => p().s2,
        theta_sigma1_deg: () => p().thetaP,
        // σ2 acts at right angles to σ1 (compared modulo 180°)
        theta_sigma2_deg: () => p().thetaP + 90,
        theta_s_deg: () => p().thetaS,
        tau_max_inplane: () => p().tauMaxInPlane,
        sigma_avg: () => p().center,
        center: () => p().center,
        R: () => p().radius,
        // 3D maximum shear, counting σ3 = 0
        tau_abs_max: () => maxShear(plane(num(c, "sx"), num(c, "sy"), num(c, "txy"))),
        // the calculator's atan(2τ/(σx − σy)) is core's 2θp reduced into (−90°, 90°]
        two_theta_p_atan_deg: () => toAtanRange(2 * p().thetaP),
      };
    }
    case "principal_3d": {
      const s = () => tensorOf(c.inputs.tensor);
      const p = () => principalStresses(s());
      return {
        s1: () => p().values[0],
        s2: () => p().values[1],
        s3: () => p().values[2],
        v1: () => [...p().directions[0]],
        v2: () => [...p().directions[1]],
        v3: () => [...p().directions[2]],
        I1: () => invariants(s()).i1,
        I2: () => invariants(s()).i2,
        I3: () => invariants(s()).i3,
      };
    }
    case "traction": {
      const r = () => tractionOnPlane(tensorOf(c.inputs.tensor), c.inputs.n as unknown as Vec3);
      return { t: () => [...r().traction], sigma_n: () => r().normal, tau_n: () => r().shear };
    }
    case "failure": {
      const s = (): StressTensor => {
        if (has(c, "sx")) return plane(num(c, "sx"), num(c, "sy"), num(c, "txy"));
        if (has(c, "sA")) return plane(num(c, "sA"), num(c, "sB"), 0);
        return { xx: num(c, "s1"), yy: num(c, "s2"), zz: num(c, "s3"), xy: 0, yz: 0, zx: 0 };
      };
      const brittle = (): Material => ({
        ultimateTension: num(c, "Sut"),
        ultimateCompression: num(c, "Suc"),
      });
      return {
        n_DE: () => safetyFactor(s(), "von-mises", { yield: num(c, "Sy") }),
        n_MSS: () => safetyFactor(s(), "tresca", { yield: num(c, "Sy") }),
        // ductile Coulomb–Mohr: the Mohr–Coulomb criterion with the yield strengths in tension and compression
        n_DCM: () =>
          safetyFactor(s(), "mohr-coulomb", {
            ultimateTension: num(c, "Syt"),
            ultimateCompression: num(c, "Syc"),
          }),
        n_BCM: () => safetyFactor(s(), "mohr-coulomb", brittle()),
        n_MM: () => safetyFactor(s(), "modified-mohr", brittle()),
        n_Rankine: () => safetyFactor(s(), "max-principal", brittle()),
        sigma_vm: () => vonMises(s()),
        sA: () => planeStress(num(c, "sx"), num(c, "sy"), num(c, "txy")).s1,
        sB: () => planeStress(num(c, "sx"), num(c, "sy"), num(c, "txy")).s2,
      };
    }
    case "fact":
      return factActuals(c);
    default:
      throw new Error(`calc ${c.calc} is not covered`);
  }
}

function factActuals(c: Case): Actuals {
  const which = c.inputs.which;
  switch (which) {
    case "pure_shear_yield": {
      const shear = plane(0, 0, 1); // τ = 1: the factor is the yield shear stress
      const tr = () => safetyFactor(shear, "tresca", { yield: num(c, "Sy") });
      const vm = () => safetyFactor(shear, "von-mises", { yield: num(c, "Sy") });
      return { tau_yield_tresca: tr, tau_yield_vm: vm, ratio_vm_over_tresca: () => vm() / tr() };
    }
    case "uniaxial":
    case "equibiaxial": {
      const s = () => plane(num(c, "s"), which === "equibiaxial" ? num(c, "s") : 0, 0);
      return {
        sigma_vm: () => vonMises(s()),
        n_DE: () => safetyFactor(s(), "von-mises", { yield: num(c, "Sy") }),
        n_MSS: () => safetyFactor(s(), "tresca", { yield: num(c, "Sy") }),
      };
    }
    case "hydrostatic": {
      const s = () => ({ xx: num(c, "s"), yy: num(c, "s"), zz: num(c, "s"), xy: 0, yz: 0, zx: 0 });
      return { sigma_vm: () => vonMises(s()), tau_abs_max: () => maxShear(s()) };
    }
    case "invariance_rotation": {
      // rotate about z by theta (the plain reading) and about a skew axis; report the larger change
      const s = () => tensorOf(c.inputs.tensor);
      const d = (key: "i1" | "i2" | "i3") => () => {
        const a = invariants(s())[key];
        return Math.max(
          ...[
            rotationFromAxisAngle([0, 0, 1], num(c, "theta_deg")),
            rotationFromAxisAngle([1, 2, 3], num(c, "theta_deg")),
          ].map((r) => Math.abs(invariants(rotateTensor(s(), r))[key] - a)),
        );
      };
      return { dI1: d("i1"), dI2: d("i2"), dI3: d("i3") };
    }
    case "octahedral": {
      const s = () => tensorOf(c.inputs.tensor);
      return { tau_oct_over_vm: () => octahedral(s()).shear / vonMises(s()) };
    }
    default:
      throw new Error(`fact ${String(which)} is not covered`);
  }
}

function isCovered(c: Case): boolean {
  if (!(COVERED as readonly string[]).includes(c.calc)) return false;
  return c.calc !== "fact" || (FACTS_COVERED as readonly string[]).includes(String(c.inputs.which));
}

function title(c: Case): string {
  const status =
    c.expected_status === "common_practice"
      ? "common_practice: common practice, no source"
      : c.expected_status === "memory" || c.from_memory
        ? `${c.expected_status}: values partly recalled from memory`
        : c.expected_status;
  return `${c.id} — ${c.source}, ${c.source_location} [${status}]`;
}

function compareKey(c: Case, key: string, got: Value, want: Value): void {
  const tol = c.tolerance.per_key?.[key] ?? c.tolerance.default;
  const mode = c.compare?.[key] ?? {};
  const within = (g: number, w: number): boolean => {
    let diff = Math.abs(g - w);
    if (mode.mod !== undefined) {
      diff = (((g - w) % mode.mod) + mode.mod) % mode.mod;
      diff = Math.min(diff, mode.mod - diff);
    }
    if (tol.abs !== undefined) return diff <= tol.abs;
    if (tol.rel !== undefined) return diff <= tol.rel * Math.abs(w);
    throw new Error(`case ${c.id}: tolerance for ${key} has neither abs nor rel`);
  };
  if (Array.isArray(want)) {
    expect(Array.isArray(got), `${key} should be a vector`).toBe(true);
    const g = got as number[];
    let w = want;
    if (mode.vector_up_to_sign) {
      // expected directions are given unnormalised; core's are unit vectors
      const n = Math.hypot(...want);
      w = want.map((x) => x / n);
      if (g[0] * w[0] + g[1] * w[1] + g[2] * w[2] < 0) w = w.map((x) => -x);
    }
    w.forEach((wi, i) => {
      expect(
        within(g[i], wi),
        `${key}[${i}]: got ${g[i]}, expected ${wi} (tolerance ${JSON.stringify(tol)})`,
      ).toBe(true);
    });
  } else {
    expect(typeof got, `${key} should be a number`).toBe("number");
    const ok = within(got as number, want);
    expect(
      ok,
      `${key}: got ${String(got)}, expected ${want} (tolerance ${JSON.stringify(tol)}, compare ${JSON.stringify(mode)})`,
    ).toBe(true);
  }
}

describe(`reference cases from ${path.relative(repoRoot, casesFile)}`, () => {
  it("when the file is loaded, then every case has a known calc kind and every fact a known `which`", () => {
    expect(cases.length).toBeGreaterThan(0);
    for (const c of cases) {
      expect([...COVERED, ...NOT_COVERED], `case ${c.id}`).toContain(c.calc);
      if (c.calc === "fact")
        expect([...FACTS_COVERED, ...FACTS_NOT_COVERED], `case ${c.id}`).toContain(c.inputs.which);
    }
  });

  for (const c of cases.filter(isCovered)) {
    it(title(c), () => {
      const actual = actualsFor(c);
      const want: Record<string, Value> = { ...c.expected, ...(c.corrected_expected ?? {}) };
      const keys = Object.keys(want);
      expect(keys.length).toBeGreaterThan(0);
      for (const key of keys) {
        const get = actual[key];
        expect(get, `case ${c.id}: core has no computation for expected key ${key}`).toBeTypeOf("function");
        compareKey(c, key, get(), want[key]);
      }
      count(c.calc);
      if (c.calc === "fact") count(`fact:${String(c.inputs.which)}`);
    });
  }

  it("when every case above has run, then each covered calc kind and fact was exercised and all its cases passed", () => {
    for (const kind of COVERED) {
      const total = cases.filter((c) => c.calc === kind && isCovered(c)).length;
      expect(total, `cases of calc ${kind} in the file`).toBeGreaterThan(0);
      expect(exercised.get(kind) ?? 0, `calc ${kind} cases that passed`).toBe(total);
    }
    for (const which of FACTS_COVERED)
      expect(exercised.get(`fact:${which}`) ?? 0, `fact ${which}`).toBeGreaterThan(0);
  });
});
