import { describe, expect, it } from "vitest";
import { verdictForFactor } from "../checks/verdict";
import { safetyFactor } from "../criteria/safety-factor";
import { publishedMaterial } from "../materials/published";
import {
  CT7_JUNCTION_BENDING_PER_PRESSURE,
  CT7_SHAFT_BAR,
  CT7_SHELL_LOAD_CASES,
  ct7JunctionState,
  ct7LugLoad,
  ct7Projects,
  ct7RosetteState,
  ct7ShaftState,
  ct7ShellMembrane,
  ct7StartUpTorque,
  ct7State,
} from "./ct7-scenario";

const MPA = 1e6;
/** |got − want| ≤ 1e-12·|want|: the scenario's states against hand arithmetic of the same formula. */
const near = (got: number, want: number) =>
  expect(Math.abs(got - want), `got ${got}, want ${want}`).toBeLessThanOrEqual(1e-12 * Math.abs(want));

describe("the CT-7 demo scenario (invented; states in Pa)", () => {
  it("when the shell is at design pressure, then σθ = pr/t = 0.9·600/8 = 67.5 MPa on y and σx = pr/2t = 33.75 MPa on x (thin-wall cylinder, any strength-of-materials text)", () => {
    const s = ct7ShellMembrane(0.9);
    near(s.yy, 67.5 * MPA);
    near(s.xx, 33.75 * MPA);
    expect([s.zz, s.xy, s.yz, s.zx]).toEqual([0, 0, 0, 0]);
  });

  it("when the junction is at the hydrostatic test, then σx = 43.875 + 133·1.17 = 199.485 MPa, σθ = 87.75 MPa (membrane plus the scenario's invented bending)", () => {
    expect(CT7_JUNCTION_BENDING_PER_PRESSURE).toBe(133);
    const s = ct7JunctionState(1.17);
    near(s.xx, 199.485 * MPA);
    near(s.yy, 87.75 * MPA);
  });

  it("when every shell state is checked against SA-516 70 at the required 1.5, then only the hydrostatic test at the junction fails, by Tresca (n ≈ 1.30), so the demo shows one failure", () => {
    const project = ct7Projects()[0];
    const sa516 = publishedMaterial("sa516-70")!;
    expect(project.material).toEqual({ publishedId: sa516.id });
    const failing: string[] = [];
    for (const c of project.cases)
      for (const s of c.states)
        for (const r of project.requirements) {
          const n = safetyFactor(s.tensor, r.criterion, { yield: sa516.yield! * MPA });
          if (verdictForFactor(n, r.requiredFactor) === "fail")
            failing.push(`${c.name} / ${s.location} / ${r.criterion}`);
        }
    expect(failing).toEqual(["Hydrostatic test / head-to-shell junction / tresca"]);
    // Tresca n = Sy/(σ1 − σ3) = 260/199.485 (hand arithmetic with the recalled SA-516 70 yield)
    expect(safetyFactor(ct7JunctionState(1.17), "tresca", { yield: 260 * MPA })).toBeCloseTo(1.3034, 4);
  });

  it("when the rosette reads 420/150/−90 µε, then σx = E(εx + νεy)/(1 − ν²), σy = E(εy + νεx)/(1 − ν²), τ = G(2ε45 − ε0 − ε90) with E = 210 GPa, ν = 0.3 (rectangular rosette, plane-stress Hooke's law)", () => {
    const s = ct7RosetteState();
    const k = 210e9 / (1 - 0.09);
    near(s.xx, k * (420e-6 + 0.3 * -90e-6));
    near(s.yy, k * (-90e-6 + 0.3 * 420e-6));
    near(s.xy, (210e9 / 2.6) * (300e-6 - 420e-6 + 90e-6));
    expect(s.zz).toBe(0);
  });

  it("when the shaft starts up, then T = 1.8·850 = 1530 N·m, τ = 16T/(πd³), σ = 32M/(πd³) + 4P/(πd²) with the thrust tensile (solid shaft, any machine-design text)", () => {
    expect(ct7StartUpTorque()).toBeCloseTo(1530, 9);
    const s = ct7ShaftState(ct7StartUpTorque());
    const d = 0.045;
    near(s.xy, (16 * 1530) / (Math.PI * d ** 3));
    near(s.xx, (32 * 420) / (Math.PI * d ** 3) + (4 * 3000) / (Math.PI * d ** 2));
    // against the shaft bar (460 MPa) the start-up state keeps the required 2 (von Mises, n = Sy/σvm)
    const n = safetyFactor(s, "von-mises", { yield: CT7_SHAFT_BAR.yieldPa });
    expect(n).toBeGreaterThan(2);
    expect(n).toBeLessThan(4);
  });

  it("when the lug is lifted, then the load is 2400 kg · 9.80665 m/s² · 1.5 and the weld toe sees F/(b·t) (plain tension)", () => {
    near(ct7LugLoad(), 2400 * 9.80665 * 1.5);
    const vertical = ct7State("CT-7 lifting lug", "Vertical lift", "lug weld toe").tensor;
    near(vertical.xx, ct7LugLoad() / (0.08 * 0.012));
    const tilted = ct7State("CT-7 lifting lug", "Tilted lift at 30°", "pin hole net section").tensor;
    near(tilted.xy, (ct7LugLoad() * 0.5) / (0.05 * 0.012));
  });

  it("when the projects are listed, then every state sits at a listed location, names its formula, and every combination names a case", () => {
    const projects = ct7Projects();
    expect(projects.map((p) => p.name)).toEqual([
      "CT-7 shell and heads",
      "CT-7 lifting lug",
      "CT-7 agitator shaft",
      "CT-7 nozzle N2 (FE points)",
    ]);
    expect(projects[0].cases.map((c) => c.name)).toEqual(CT7_SHELL_LOAD_CASES.map((c) => c.name));
    for (const p of projects) {
      for (const c of p.cases)
        for (const s of c.states) {
          expect(p.locations).toContain(s.location);
          expect(s.note).toMatch(/σ|ε/);
        }
      for (const combo of p.combinations)
        for (const term of combo.terms) expect(p.cases.map((c) => c.name)).toContain(term.caseName);
    }
    // fresh objects each call, so a caller cannot change the scenario
    expect(ct7Projects()[0].cases[0].states[0].tensor).not.toBe(projects[0].cases[0].states[0].tensor);
  });

  it("when a state is asked for by a name that matches nothing, then the error names the argument", () => {
    expect(() => ct7State("CT-7 boiler", "Design", "mid-shell")).toThrow(/projectName/);
    expect(() => ct7State("CT-7 shell and heads", "Flood", "mid-shell")).toThrow(/caseName/);
    expect(() => ct7State("CT-7 shell and heads", "Design", "nozzle")).toThrow(/location/);
  });
});
