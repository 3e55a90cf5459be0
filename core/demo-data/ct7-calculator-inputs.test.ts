import { describe, expect, it } from "vitest";
import { hollowShaftStress } from "../calculators/combined-shaft";
import { microstrain, rectangularRosette, stressFromStrain } from "../calculators/rosette";
import { thinCylinder } from "../calculators/thin-wall";
import { calculatorRecordSchema } from "../contract/calculator-inputs";
import { ct7Projects, ct7RosetteState, ct7ShellMembrane, CT7_SHELL_LOAD_CASES } from "./ct7-scenario";

// The demo states that came from a calculator keep its inputs; run through the same formulas,
// those inputs give back the stored stresses unchanged (thin-wall membrane σθ = pr/t, σx = pr/2t;
// rectangular rosette and plane-stress Hooke's law, any strength-of-materials text).

const states = () => ct7Projects().flatMap((p) => p.cases.flatMap((c) => c.states.map((s) => ({ p, c, s }))));

describe("the CT-7 demo's calculator inputs", () => {
  it("when the demo lists its states, then the four mid-shell states, the lug rosette and the two shaft states carry calculator inputs the server's schema accepts", () => {
    const withInputs = states().filter(({ s }) => s.calculator);
    expect(withInputs.map(({ c, s }) => `${c.name} @ ${s.location}`)).toEqual([
      ...CT7_SHELL_LOAD_CASES.map((c) => `${c.name} @ mid-shell`),
      "Proof load (rosette) @ lug weld toe",
      "Start-up @ shaft surface at the coupling",
      "Steady running @ shaft surface at the coupling",
    ]);
    for (const { s } of withInputs) {
      const parsed = calculatorRecordSchema.safeParse(s.calculator);
      expect(parsed.success, JSON.stringify(parsed.error?.issues)).toBe(true);
    }
  });

  it("when each mid-shell state's inputs go through the thin-wall formulas, then they give its stored tensor", () => {
    for (const c of CT7_SHELL_LOAD_CASES) {
      const state = states().find(({ c: lc, s }) => lc.name === c.name && s.location === "mid-shell")!.s;
      const n = state.calculator!.inputs.numbers;
      const MPA = 1e6;
      const MM = 1e-3;
      expect(thinCylinder(n.p.value * MPA, n.r.value * MM, n.t.value * MM).tensor).toEqual(state.tensor);
      expect(state.tensor).toEqual(ct7ShellMembrane(c.pressureMpa));
    }
  });

  it("when the rosette's stored readings, E and ν go through the rectangular reduction and Hooke's law, then they give the stress stored before the inputs were kept", () => {
    const state = states().find(({ c }) => c.name === "Proof load (rosette)")!.s;
    const n = state.calculator!.inputs.numbers;
    expect(state.calculator!.inputs.choices).toEqual({ layout: "rectangular", gf: "as-read" });
    const strains = rectangularRosette(
      microstrain(n.e1.value),
      microstrain(n.e2.value),
      microstrain(n.e3.value),
    );
    const stress = stressFromStrain(strains, { E: n.E.value * 1e9, nu: n.nu.value }).tensor;
    expect(stress).toEqual(state.tensor);
    expect(state.tensor).toEqual(ct7RosetteState());
    // σx = E(εx + νεy)/(1 − ν²) = 210 GPa·(420 − 0.3·90)·10⁻⁶/0.91 = 90.692 MPa (worked by hand).
    expect(state.tensor.xx / 1e6).toBeCloseTo(90.692, 3);
  });

  it("when each shaft state's inputs go through the combined-shaft formulas (N, mm, MPa), then they give its stored tensor in Pa to 1e-12", () => {
    for (const { s } of states().filter(({ s }) => s.calculator?.name === "shaft")) {
      const n = s.calculator!.inputs.numbers;
      const r = hollowShaftStress(
        { outerDiameter: n.D.value, innerDiameter: 0 },
        {
          momentY: n.My.value * 1e3,
          momentZ: n.Mz.value * 1e3,
          torque: n.T.value * 1e3,
          axialForce: n.P.value,
          shearY: n.Vy.value,
          shearZ: n.Vz.value,
        },
        { kt: { bending: 1, torsion: 1, axial: 1 }, point: { surface: "outer", angle: n.angle.value } },
      );
      for (const k of ["xx", "yy", "zz", "xy", "yz", "zx"] as const) {
        expect(Math.abs(r.point!.tensor[k] * 1e6 - s.tensor[k])).toBeLessThanOrEqual(
          1e-12 * Math.abs(s.tensor.xx),
        );
      }
    }
  });
});
