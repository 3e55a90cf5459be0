/**
 * Every reference case in core/testing/reference-cases.ts (the repository's own fixture) whose `calc`
 * core covers. Each test title names the case's source (a published book with the place in it, or the
 * formula) and its basis ("published", "recalled from memory", "formula, recomputed independently",
 * "common practice, no source").
 * Strain-gauge, vessel (thin and Lamé thick-walled, UG-27 required thickness) and shaft cases run
 * through core/calculators/; cases whose expected values core does not compute would be listed as
 * skipped with the reason.
 */
import { describe, expect, it } from "vitest";
import {
  deltaRosette,
  microstrain,
  principalStrains,
  rectangularRosette,
  stressFromStrain,
  threeGaugeRosette,
  toMicrostrain,
  transformStrain,
  type PlaneStrain,
} from "./calculators/rosette";
import { solidShaftStress } from "./calculators/shaft";
import { ug27RequiredThickness, type Ug27Shape } from "./calculators/asme-ug27";
import { thickCylinder } from "./calculators/thick-wall";
import { thinCylinder, thinSphere, type ThinWallOptions } from "./calculators/thin-wall";
import { safetyFactor, type Material } from "./criteria/safety-factor";
import { principalStresses } from "./tensor/principal";
import {
  BASIS_WORDS,
  REFERENCE_CASES,
  type ReferenceCase,
  type ReferenceValue,
} from "./testing/reference-cases";
import { planeStress, transformPlaneStress } from "./plane/plane-stress";
import { invariants, maxShear, octahedral, vonMises } from "./tensor/invariants";
import { rotateTensor, rotationFromAxisAngle } from "./tensor/rotate";
import { tractionOnPlane } from "./tensor/traction";
import type { StressTensor, Vec3 } from "./tensor/types";
import { degToRad } from "./units/angles";

type Value = ReferenceValue;
type Case = ReferenceCase;

const cases = REFERENCE_CASES;

/** calc kinds core computes (the last five through core/calculators/). */
const COVERED = [
  "plane_transform",
  "plane_principal",
  "principal_3d",
  "traction",
  "failure",
  "fact",
  "rosette",
  "strain_transform",
  "thin_vessel",
  "shaft",
  "lame",
  "asme_ug27",
] as const;
/** calc kinds whose expected values core does not compute, with the reason shown on the skipped test. */
const NOT_COVERED: Record<string, string> = {};
/** Facts core can state; the others are facts about formulas core does not have. */
const FACTS_COVERED = [
  "pure_shear_yield",
  "uniaxial",
  "hydrostatic",
  "equibiaxial",
  "invariance_rotation",
  "octahedral",
  "thin_cyl_vm",
  "rosette_invariance",
  "lame_thin_limit",
] as const;
const FACTS_NOT_COVERED: Record<string, string> = {};

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
    case "rosette":
      return rosetteActuals(c);
    case "strain_transform":
      // the cases give micro-strain; core's strains are plain, so scale on the way in and out
      return {
        en: () =>
          toMicrostrain(
            transformStrain(
              microstrain(num(c, "ex")),
              microstrain(num(c, "ey")),
              microstrain(num(c, "gxy")),
              num(c, "theta_deg"),
            ),
          ),
      };
    case "thin_vessel":
      return thinVesselActuals(c);
    case "shaft":
      return shaftActuals(c);
    case "asme_ug27":
      return ug27Actuals(c);
    case "lame":
      return lameActuals(c);
    case "fact":
      return factActuals(c);
    default:
      throw new Error(`calc ${c.calc} is not covered`);
  }
}

const sameAngles = (a: readonly number[], b: readonly number[]): boolean =>
  a.length === b.length && a.every((x, i) => x === b[i]);

/** The strain field of a rosette case: gauge readings (micro-strain) reduced by core, or given ex, ey, gxy. */
function rosetteField(c: Case): PlaneStrain {
  const readings = c.inputs.strains_ue;
  if (readings === undefined) {
    return { ex: microstrain(num(c, "ex")), ey: microstrain(num(c, "ey")), gxy: microstrain(num(c, "gxy")) };
  }
  const angles = c.inputs.angles_deg as number[];
  const g = (readings as number[]).map(microstrain);
  if (g.length !== 3 || angles.length !== 3) throw new Error(`case ${c.id}: a rosette has three gauges`);
  if (sameAngles(angles, [0, 45, 90])) return rectangularRosette(g[0], g[1], g[2]);
  if (sameAngles(angles, [0, 60, 120])) return deltaRosette(g[0], g[1], g[2]);
  return threeGaugeRosette([
    { angle: angles[0], strain: g[0] },
    { angle: angles[1], strain: g[1] },
    { angle: angles[2], strain: g[2] },
  ]);
}

function rosetteActuals(c: Case): Actuals {
  // Strains in the cases are micro-strain (µε, µrad for γ); E is in the stress unit the case expects.
  const f = () => rosetteField(c);
  const p = () => principalStrains(f());
  const s = () => stressFromStrain(f(), { E: num(c, "E"), nu: num(c, "nu") });
  return {
    ex: () => toMicrostrain(f().ex),
    ey: () => toMicrostrain(f().ey),
    gxy: () => toMicrostrain(f().gxy),
    e1: () => toMicrostrain(p().e1),
    e2: () => toMicrostrain(p().e2),
    theta_e1_deg: () => p().thetaE1,
    // tan 2θp = γxy/(εx − εy); tan has period 180°, so it is the same at ε1 and ε2
    tan_2theta_p: () => Math.tan(degToRad(2 * p().thetaE1)),
    // plane-stress Hooke's law: σy = E(εy + νεx)/(1 − ν²)
    sx: () => s().sx,
    sy: () => s().sy,
    txy: () => s().txy,
    s1: () => s().s1,
    s2: () => s().s2,
    G: () => s().G,
  };
}

function thinVesselActuals(c: Case): Actuals {
  const shape = c.inputs.shape;
  const calculator = shape === "cylinder" ? thinCylinder : shape === "sphere" ? thinSphere : undefined;
  // `mean_diameter_form`: σt = p(dᵢ + t)/(2t); otherwise σθ = p·r/t with the inside radius.
  // `radial`: σr = −p at the inner surface; otherwise the membrane value 0.
  const options: ThinWallOptions = {
    form: c.inputs.mean_diameter_form === true ? "mean-diameter" : "inside-radius",
    radial: c.inputs.radial === true ? "inner-surface" : "membrane",
  };
  const insideRadius = () => (has(c, "r") ? num(c, "r") : num(c, "d_i") / 2);
  const v = () => {
    if (!calculator) throw new Error(`case ${c.id}: unknown shape ${String(shape)}`);
    return calculator(num(c, "p"), insideRadius(), num(c, "t"), options);
  };
  // Every membrane stress is proportional to p, so an allowable pressure is p times a factor.
  const vonMisesFactor = (strength: number) => safetyFactor(v().tensor, "von-mises", { yield: strength });
  return {
    hoop: () => v().hoop,
    axial: () => v().axial,
    tau_max_inplane: () => planeStress(v().tensor.xx, v().tensor.yy, v().tensor.xy).tauMaxInPlane,
    // allowable pressure: the largest membrane stress reaches σallow
    p_allow: () => (num(c, "p") * num(c, "sigma_allow")) / Math.max(v().hoop, v().axial),
    vm_per_unit_p: () => vonMises(v().tensor) / num(c, "p"),
    p_yield_DE: () => num(c, "p") * vonMisesFactor(num(c, "Sy")),
    // burst estimated by the same distortion-energy rule with the ultimate strength
    p_burst_DE: () => num(c, "p") * vonMisesFactor(num(c, "Su")),
    n_DE: () => vonMisesFactor(num(c, "Sy")),
  };
}

/** UG-27 required thickness: P, R (corroded), S, E, the corrosion allowance CA and the part. */
function ug27Actuals(c: Case): Actuals {
  const r = () =>
    ug27RequiredThickness(c.inputs.part as Ug27Shape, {
      pressure: num(c, "P"),
      insideRadius: num(c, "R"),
      allowableStress: num(c, "S"),
      jointEfficiency: num(c, "E"),
      corrosionAllowance: has(c, "CA") ? num(c, "CA") : 0,
    });
  return { t_req: () => r().required, t_with_CA: () => r().requiredWithCorrosion };
}

function shaftActuals(c: Case): Actuals {
  if (c.inputs.point !== "max_bending" || c.inputs.V !== undefined) {
    throw new Error(
      `case ${c.id}: core's shaft calculator gives the point of maximum bending, without transverse shear`,
    );
  }
  const s = () =>
    solidShaftStress(num(c, "d"), {
      bendingMoment: num(c, "M"),
      torque: num(c, "T"),
      axialForce: has(c, "P") ? num(c, "P") : 0,
    });
  const p = () => planeStress(s().tensor.xx, s().tensor.yy, s().tensor.xy);
  return {
    sigma: () => s().sigma,
    tau: () => s().tau,
    s1: () => p().s1,
    s2: () => p().s2,
    tau_max_inplane: () => p().tauMaxInPlane,
    sigma_vm: () => vonMises(s().tensor),
    n_DE: () => safetyFactor(s().tensor, "von-mises", { yield: num(c, "Sy") }),
  };
}

function lameActuals(c: Case): Actuals {
  // Every case so far has closed ends; `closed_end: false` would be open ends (σl = 0).
  const input = () => ({
    innerRadius: num(c, "ri"),
    outerRadius: num(c, "ro"),
    innerPressure: num(c, "pi"),
    outerPressure: has(c, "po") ? num(c, "po") : 0,
    ends: c.inputs.closed_end === false ? ("open" as const) : ("closed" as const),
  });
  const bore = () => thickCylinder(input());
  const outside = () => thickCylinder(input(), num(c, "ro"));
  // Both criteria's stress is largest at the bore (σθ − σr = 2B/r² falls with r), and every stress is
  // proportional to pi there, so the allowable pressure is pi times the factor over the design factor.
  const allowable = (criterion: "tresca" | "von-mises") => () =>
    (num(c, "pi") * safetyFactor(bore().tensor, criterion, { yield: num(c, "Sy") })) / num(c, "n_design");
  return {
    st_inner: () => bore().hoop,
    st_outer: () => outside().hoop,
    sr_inner: () => bore().radial,
    sr_outer: () => outside().radial,
    sl: () => bore().axial,
    st_inner_per_p: () => bore().hoop / num(c, "pi"),
    sl_per_p: () => bore().axial / num(c, "pi"),
    p_allow_MSS: allowable("tresca"),
    p_allow_DE: allowable("von-mises"),
  };
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
    case "thin_cyl_vm": {
      const v = () => thinCylinder(num(c, "p"), num(c, "r"), num(c, "t"));
      return {
        hoop_over_axial: () => v().hoop / v().axial,
        vm_over_hoop: () => vonMises(v().tensor) / v().hoop,
      };
    }
    case "lame_thin_limit": {
      // a closed Lamé cylinder of bore r = ri and wall t, over the thin-wall p·r/t and p·r/(2t)
      const ri = () => num(c, "ri");
      const lame = () =>
        thickCylinder({
          innerRadius: ri(),
          outerRadius: ri() + num(c, "t"),
          innerPressure: num(c, "p"),
          ends: "closed",
        });
      const thin = () => thinCylinder(num(c, "p"), ri(), num(c, "t"));
      return {
        st_inner_over_pr_t: () => lame().hoop / thin().hoop,
        sl_over_pr_2t: () => lame().axial / thin().axial,
      };
    }
    case "rosette_invariance": {
      // Read the field with gauges at 0/45/90 and 0/60/120, reduce each rosette, compare principal strains.
      const f = (): PlaneStrain => ({
        ex: microstrain(num(c, "ex")),
        ey: microstrain(num(c, "ey")),
        gxy: microstrain(num(c, "gxy")),
      });
      const gauge = (theta: number) => transformStrain(f().ex, f().ey, f().gxy, theta);
      const rect = () => principalStrains(rectangularRosette(gauge(0), gauge(45), gauge(90)));
      const delta = () => principalStrains(deltaRosette(gauge(0), gauge(60), gauge(120)));
      return {
        e1_rect: () => toMicrostrain(rect().e1),
        e2_rect: () => toMicrostrain(rect().e2),
        e1_delta: () => toMicrostrain(delta().e1),
        e2_delta: () => toMicrostrain(delta().e2),
      };
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
  return `${c.id} — ${c.source} [${BASIS_WORDS[c.basis]}]`;
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

describe("reference cases from core/testing/reference-cases.ts", () => {
  it("when the fixture is read, then every case has a known calc kind and every fact a known `which`", () => {
    expect(cases.length).toBeGreaterThan(0);
    for (const c of cases) {
      expect([...COVERED, ...Object.keys(NOT_COVERED)], `case ${c.id}`).toContain(c.calc);
      if (c.calc === "fact")
        expect([...FACTS_COVERED, ...Object.keys(FACTS_NOT_COVERED)], `case ${c.id}`).toContain(
          c.inputs.which,
        );
    }
  });

  it("when the fixture is read, then every case names a source and a basis", () => {
    const ids = new Set(cases.map((c) => c.id));
    expect(ids.size, "ids are unique").toBe(cases.length);
    for (const c of cases) {
      expect(c.source.trim().length, `case ${c.id} source`).toBeGreaterThan(10);
      expect(Object.keys(BASIS_WORDS), `case ${c.id} basis`).toContain(c.basis);
    }
  });

  for (const c of cases.filter(isCovered)) {
    it(title(c), () => {
      const actual = actualsFor(c);
      const want: Record<string, Value> = c.expected;
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

  for (const c of cases.filter((x) => !isCovered(x))) {
    const why = c.calc === "fact" ? FACTS_NOT_COVERED[String(c.inputs.which)] : NOT_COVERED[c.calc];
    it.skip(`${title(c)} — skipped: ${why ?? "not covered"}`, () => {});
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
