/**
 * The calculators' pure parts against core: whatever units the user types in, the state each page
 * shows and sends to the bench is core's own result for the same physical inputs.
 */
import { describe, expect, it } from "vitest";
import {
  convertStress,
  hollowShaftStress,
  microstrain,
  rectangularRosette,
  stressFromStrain,
  thickCylinder,
  thickSphere,
  thinCylinder,
  thinSphere,
  threeGaugeRosette,
  type StressTensor,
} from "../../../../../core";
import { seededRandom } from "../../../../../core/testing/fixtures";
import { readStressParam } from "../../../lib/bench-link";
import { calculatorBenchLink } from "./bench-link";
import { decodeInputs, initialValues } from "./inputs";
import { ROSETTE_INPUTS, computeRosette } from "./rosette";
import { SHAFT_INPUTS, computeShaft } from "./shaft";
import {
  THICK_CYLINDER_INPUTS,
  THICK_SPHERE_INPUTS,
  computeThickCylinder,
  computeThickSphere,
} from "./thick-wall";
import { THIN_WALL_INPUTS, computeThinWall } from "./thin-wall";
import type { UnitSet } from "./units";

const COMPONENT_KEYS = ["xx", "yy", "zz", "xy", "yz", "zx"] as const;

/** The tensor and unit a bench link carries. */
function benchState(link: string): { tensor: StressTensor; unit: string | null } {
  const q = new URLSearchParams(link.slice(link.indexOf("?")));
  return { tensor: readStressParam(q.get("s"))!, unit: q.get("u") };
}

function expectSameTensor(a: StressTensor, b: StressTensor, rel = 1e-13) {
  const scale = Math.max(1e-300, ...COMPONENT_KEYS.map((k) => Math.abs(b[k])));
  for (const k of COMPONENT_KEYS) expect(Math.abs(a[k] - b[k])).toBeLessThanOrEqual(rel * scale);
}

function ok<T>(o: { ok: true; result: T } | { ok: false; error: string }): T {
  if (!o.ok) throw new Error(`expected a result, got: ${o.error}`);
  return o.result;
}

describe("thin-walled vessel calculator", () => {
  it("when a cylinder's inner radius is given, then the bench receives core's thinCylinder tensor (x axial, y hoop, z radial) in MPa", () => {
    const v = {
      ...initialValues(THIN_WALL_INPUTS),
      choices: { ...initialValues(THIN_WALL_INPUTS).choices, radial: "inner-surface" },
    };
    const r = ok(computeThinWall(v));
    const core = thinCylinder(2, 500, 10, { radial: "inner-surface" });
    expect(r.tensor).toEqual(core.tensor);
    const sent = benchState(calculatorBenchLink(r.tensor, v.units));
    expect(sent.unit).toBe("MPa");
    expectSameTensor(sent.tensor, core.tensor);
    // p·r/t = 2·500/10 = 100 MPa hoop, 50 axial, −2 radial (formula)
    expect([r.hoop, r.axial, r.radial]).toEqual([100, 50, -2]);
  });

  it("when the mean radius is given with the mean-diameter form, then the hoop stress is p·rm/t and the axial p·rᵢ/(2t) (Shigley's thin-walled vessel formulas, recalled from memory)", () => {
    const v = decodeInputs(THIN_WALL_INPUTS, "?p=2&r=505&t=10&given=mean&form=mean-diameter");
    const r = ok(computeThinWall(v));
    expect(r.insideRadius).toBe(500);
    expect(r.hoop).toBeCloseTo((2 * 505) / 10, 12);
    expect(r.axial).toBeCloseTo((2 * 500) / 20, 12);
    expect(r.tensor).toEqual(thinCylinder(2, 500, 10, { form: "mean-diameter" }).tensor);
  });

  it("when a sphere's outer radius is given in US units, then core's thinSphere runs on rᵢ = r − t and the bench receives psi", () => {
    const v = decodeInputs(THIN_WALL_INPUTS, "?units=us-psi&p=300&r=20&t=0.5&shape=sphere&given=outer");
    const r = ok(computeThinWall(v));
    expect(r.tensor).toEqual(thinSphere(300, 19.5, 0.5).tensor);
    const sent = benchState(calculatorBenchLink(r.tensor, v.units));
    expect(sent.unit).toBe("psi");
    expectSameTensor(sent.tensor, r.tensor);
  });

  it("when t/r = 0.2, then the warning says the Lamé bore stress is about 10.9 % higher and the thick-walled link carries rᵢ, rₒ = rᵢ + t and p (ratio (2 + 2k + k²)/(2 + k) from the Lamé formulas)", () => {
    const v = decodeInputs(THIN_WALL_INPUTS, "?p=5&r=50&t=10");
    const r = ok(computeThinWall(v));
    expect(r.adequacy.thinWallAdequate).toBe(false);
    expect(r.adequacy.warning).toMatch(/10\.9 %/);
    expect(r.thickLink).toBeDefined();
    const link = r.thickLink!;
    expect(link.startsWith("/calculators/thick-cylinder?")).toBe(true);
    const thick = decodeInputs(THICK_CYLINDER_INPUTS, link.slice(link.indexOf("?")));
    expect(thick.numbers).toMatchObject({ ri: 50, ro: 60, pi: 5, po: 0, r: 50 });
    expect(thick.choices.ends).toBe("closed");
    // The thick calculator at the bore is about 10.9 % above p·r/t = 25.
    expect(ok(computeThickCylinder(thick)).hoop / r.hoop).toBeCloseTo((2 + 0.4 + 0.04) / 2.2, 12);
  });

  it("when a thick wall is given by its mean radius in US units (p = 500 psi, r = 5 in, t = 1 in), then the warning states rᵢ = r − t/2 = 4.5 in, t over the mean radius 0.200, the ratio 1.122 = Lamé (5.5² + 4.5²)/(5.5² − 4.5²) = 5.05 over p·rᵢ/t = 4.5 (Lamé and thin-wall formulas, hand arithmetic), and the thick-walled link gives that Lamé bore stress in psi", () => {
    const v = decodeInputs(THIN_WALL_INPUTS, "?units=us-psi&p=500&r=5&t=1&given=mean");
    const r = ok(computeThinWall(v));
    expect(r.warning).toHaveLength(2);
    const [ratio, radius] = r.warning!;
    expect(ratio).toContain("t/r = 0.222 (wall over inside radius)");
    expect(ratio).toContain("1.122 × the thin-wall value of the inside-radius formula σθ = p·r/t");
    expect(radius).toContain("was given as the mean radius");
    expect(radius).toContain("rᵢ = r − t/2 = 4.5 in");
    expect(radius).toContain("t over the mean radius is 0.200");
    const link = r.thickLink!;
    expect(link.startsWith("/calculators/thick-cylinder?")).toBe(true);
    const thick = decodeInputs(THICK_CYLINDER_INPUTS, link.slice(link.indexOf("?")));
    expect(thick.units).toBe("us-psi");
    expect(thick.numbers).toMatchObject({ ri: 4.5, ro: 5.5, pi: 500, po: 0, r: 4.5 });
    const bore = ok(computeThickCylinder(thick)).hoop;
    expect(bore).toBeCloseTo(500 * 5.05, 9);
    expect(bore / r.hoop).toBeCloseTo(5.05 / 4.5, 12);
  });

  it("when a thick cylinder is given by its outer radius (r = 130 mm, t = 30 mm), then the warning says rᵢ = r − t = 100 mm and t over the outer radius 0.231, and the ratio is that of t/rᵢ = 0.3 (Lamé (1.3² + 1)/(1.3² − 1) = 3.8986 over rᵢ/t = 3.3333: 1.170; hand arithmetic)", () => {
    const r = ok(computeThinWall(decodeInputs(THIN_WALL_INPUTS, "?p=10&r=130&t=30&given=outer")));
    expect(r.warning![0]).toContain("t/r = 0.300 (wall over inside radius)");
    expect(r.warning![0]).toContain("1.170 × the thin-wall value");
    expect(r.warning![1]).toContain("rᵢ = r − t = 100 mm");
    expect(r.warning![1]).toContain("t over the outer radius is 0.231");
  });

  it("when a thick sphere's inner radius is given, then the warning says t/r uses it as given and the link opens the thick-walled sphere", () => {
    const r = ok(computeThinWall(decodeInputs(THIN_WALL_INPUTS, "?p=4&r=100&t=25&shape=sphere")));
    expect(r.warning![1]).toBe(
      "Radius convention: r = 100 mm was given as the inside radius, and t/r uses it.",
    );
    expect(r.thickLink!.startsWith("/calculators/thick-sphere?")).toBe(true);
  });

  it("when the wall is thin (t/r = 0.02), then there is no warning and no thick-walled link", () => {
    const r = ok(computeThinWall(initialValues(THIN_WALL_INPUTS)));
    expect(r.adequacy.warning).toBeUndefined();
    expect(r.warning).toBeUndefined();
    expect(r.thickLink).toBeUndefined();
  });

  it("when the wall is zero or the stated outer radius is inside the wall, then the refusal names the field", () => {
    const zero = computeThinWall(decodeInputs(THIN_WALL_INPUTS, "?t=0"));
    expect(zero.ok ? "" : zero.error).toMatch(/Wall thickness t/);
    const outer = computeThinWall(decodeInputs(THIN_WALL_INPUTS, "?r=5&t=10&given=outer"));
    expect(outer.ok ? "" : outer.error).toMatch(/Radius r/);
  });
});

describe("thick-walled calculators", () => {
  it("when rᵢ = 1, rₒ = 2, pᵢ = 100 with closed ends, then σr = −100, σθ = 166.67 at the bore and 66.67 outside, σz = 33.33 (Lamé solution, Timoshenko & Goodier, recalled from memory; worked by hand: A = 100/3, B = 400/3)", () => {
    const bore = ok(computeThickCylinder(decodeInputs(THICK_CYLINDER_INPUTS, "?ri=1&ro=2&pi=100&po=0&r=1")));
    expect(bore.radial).toBe(-100);
    expect(bore.hoop).toBeCloseTo(500 / 3, 10);
    expect(bore.axial).toBeCloseTo(100 / 3, 10);
    const outside = ok(
      computeThickCylinder(decodeInputs(THICK_CYLINDER_INPUTS, "?ri=1&ro=2&pi=100&po=0&r=2")),
    );
    expect(outside.hoop).toBeCloseTo(200 / 3, 10);
    expect(bore.profile[0].hoop).toBeCloseTo(500 / 3, 10);
    expect(bore.profile[bore.profile.length - 1].hoop).toBeCloseTo(200 / 3, 10);
  });

  it("when random walls and loads are typed in any unit set (200 seeded cases), then the bench receives core's thickCylinder tensor at the chosen radius for every end condition", () => {
    const next = seededRandom(4242);
    const ends = ["closed", "open", "plane-strain"] as const;
    const sets: UnitSet[] = ["si", "us-psi", "us-ksi"];
    for (let i = 0; i < 200; i++) {
      const ri = 1 + 100 * next();
      const ro = ri * (1.01 + 2 * next());
      const rr = ri + (ro - ri) * next();
      const pi = (next() - 0.3) * 300;
      const po = (next() - 0.5) * 50;
      const e = ends[i % 3];
      const units = sets[Math.floor(next() * 3)];
      const v = decodeInputs(
        THICK_CYLINDER_INPUTS,
        `?units=${units}&ri=${ri}&ro=${ro}&pi=${pi}&po=${po}&r=${rr}&nu=0.28&ends=${e}`,
      );
      const r = ok(computeThickCylinder(v));
      const n = v.numbers;
      const core = thickCylinder(
        {
          innerRadius: n.ri,
          outerRadius: n.ro,
          innerPressure: n.pi,
          outerPressure: n.po,
          ends: e,
          poissonRatio: e === "plane-strain" ? 0.28 : undefined,
        },
        n.r,
      );
      expectSameTensor(r.tensor, core.tensor, 0);
      expectSameTensor(benchState(calculatorBenchLink(r.tensor, units)).tensor, core.tensor);
    }
  });

  it("when a sphere is calculated, then the bench receives core's thickSphere tensor (x, y tangential, z radial) and σθ = σφ", () => {
    const v = decodeInputs(THICK_SPHERE_INPUTS, "?units=us-ksi&ri=10&ro=14&pi=6&po=1&r=12");
    const r = ok(computeThickSphere(v));
    const core = thickSphere({ innerRadius: 10, outerRadius: 14, innerPressure: 6, outerPressure: 1 }, 12);
    expect(r.tensor).toEqual(core.tensor);
    expect(r.tensor.xx).toBe(r.tensor.yy);
    const sent = benchState(calculatorBenchLink(r.tensor, v.units));
    expect(sent.unit).toBe("ksi");
    expectSameTensor(sent.tensor, core.tensor);
  });

  it("when the radius lies outside the wall or rₒ ≤ rᵢ, then the refusal names the field", () => {
    const out = computeThickSphere(decodeInputs(THICK_SPHERE_INPUTS, "?ri=1&ro=2&r=3"));
    expect(out.ok ? "" : out.error).toMatch(/^Radius r/);
    const flat = computeThickCylinder(decodeInputs(THICK_CYLINDER_INPUTS, "?ri=2&ro=2&r=2"));
    expect(flat.ok ? "" : flat.error).toMatch(/^Outer radius/);
  });
});

describe("shaft calculator", () => {
  it("when US customary loads are typed, then the state equals core's hollowShaftStress on the same loads in N and mm, converted to ksi (1 lbf·in = 112.98482902 N·mm, 1 in = 25.4 mm by definition)", () => {
    const v = decodeInputs(
      SHAFT_INPUTS,
      "?units=us-ksi&section=hollow&D=2&d=1.2&My=3000&Mz=-1000&T=4000&P=-2000&Vy=500&Vz=100&ktb=1.8&ktt=1.4&kta=1.1&surface=inner&angle=200",
    );
    const r = ok(computeShaft(v));
    const lbfIn = 4.4482216152605 * 25.4;
    const core = hollowShaftStress(
      { outerDiameter: 2 * 25.4, innerDiameter: 1.2 * 25.4 },
      {
        momentY: 3000 * lbfIn,
        momentZ: -1000 * lbfIn,
        torque: 4000 * lbfIn,
        axialForce: -2000 * 4.4482216152605,
        shearY: 500 * 4.4482216152605,
        shearZ: 100 * 4.4482216152605,
      },
      { kt: { bending: 1.8, torsion: 1.4, axial: 1.1 }, point: { surface: "inner", angle: 200 } },
    );
    const ksi = (mpa: number) => convertStress(mpa, "MPa", "ksi");
    const expected = (t: StressTensor) => ({ ...t, xx: ksi(t.xx), xy: ksi(t.xy) });
    expectSameTensor(r.point.tensor, expected(core.point!.tensor), 1e-12);
    expectSameTensor(r.critical.tensor, expected(core.critical.tensor), 1e-12);
    expect(r.critical.angle).toBe(core.critical.angle);
    expect(r.critical.surface).toBe(core.critical.surface);
    const sent = benchState(calculatorBenchLink(r.critical.tensor, v.units));
    expect(sent.unit).toBe("ksi");
    expectSameTensor(sent.tensor, expected(core.critical.tensor), 1e-12);
  });

  it("when a solid shaft carries M = 1 kN·m and T = 0 at θ = 90°, then σx = 32M/(πd³) (Shigley, shafts; formula)", () => {
    const v = decodeInputs(SHAFT_INPUTS, "?D=40&My=1000&T=0&angle=90");
    const r = ok(computeShaft(v));
    expect(r.point.sigma).toBeCloseTo((32 * 1e6) / (Math.PI * 40 ** 3), 9);
    expect(r.point.tau).toBe(0);
  });

  it("when one moment and its direction are given, then the state equals two moments My = M sin φ, Mz = −M cos φ (bendingTowards' rule)", () => {
    const a = ok(computeShaft(decodeInputs(SHAFT_INPUTS, "?moments=direction&M=800&phi=30&T=100&angle=10")));
    const b = ok(
      computeShaft(
        decodeInputs(
          SHAFT_INPUTS,
          `?My=${800 * Math.sin(Math.PI / 6)}&Mz=${-800 * Math.cos(Math.PI / 6)}&T=100&angle=10`,
        ),
      ),
    );
    expectSameTensor(a.point.tensor, b.point.tensor, 1e-12);
  });

  it("when a Kt is below 1 or the bore is not smaller than D, then the refusal names the field", () => {
    const kt = computeShaft(decodeInputs(SHAFT_INPUTS, "?ktt=0.9"));
    expect(kt.ok ? "" : kt.error).toMatch(/^Kt for torsion/);
    const bore = computeShaft(decodeInputs(SHAFT_INPUTS, "?section=hollow&D=40&d=40"));
    expect(bore.ok ? "" : bore.error).toMatch(/^Bore diameter d/);
  });
});

describe("rosette calculator", () => {
  it("when a rectangular rosette reads 650, 300, −200 µε on steel (E = 200 GPa, ν = 0.3), then the bench receives core's stressFromStrain tensor in MPa", () => {
    const v = initialValues(ROSETTE_INPUTS);
    const r = ok(computeRosette(v));
    const core = stressFromStrain(rectangularRosette(microstrain(650), microstrain(300), microstrain(-200)), {
      E: 200_000,
      nu: 0.3,
    });
    expectSameTensor(r.stress.tensor, core.tensor);
    expectSameTensor(benchState(calculatorBenchLink(r.stress.tensor, v.units)).tensor, core.tensor);
  });

  it("when three gauges at any angles are read in US units (E in ksi), then the state equals core's threeGaugeRosette and stressFromStrain in ksi", () => {
    const v = decodeInputs(
      ROSETTE_INPUTS,
      "?units=us-ksi&layout=any&a1=10&a2=70&a3=130&e1=400&e2=-120&e3=250&E=29000&nu=0.29",
    );
    const r = ok(computeRosette(v));
    const strains = threeGaugeRosette([
      { angle: 10, strain: microstrain(400) },
      { angle: 70, strain: microstrain(-120) },
      { angle: 130, strain: microstrain(250) },
    ]);
    expectSameTensor(r.stress.tensor, stressFromStrain(strains, { E: 29000, nu: 0.29 }).tensor);
  });

  it("when two gauges of an arbitrary rosette are parallel, then the refusal names the gauge angles", () => {
    const o = computeRosette(decodeInputs(ROSETTE_INPUTS, "?layout=any&a1=0&a2=180&a3=90"));
    expect(o.ok ? "" : o.error).toMatch(/^Gauge angles/);
  });
});
