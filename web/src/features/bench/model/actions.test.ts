import { describe, expect, it } from "vitest";
import {
  angleAboutZ,
  PASCALS_PER_PSI,
  principalValues,
  rotateTensor,
  rotationFromAxisAngle,
  transformPlaneStress,
  type Mat3,
} from "../../../../../core";
import * as act from "./actions";
import { initialBenchState, type BenchState } from "./bench-state";
import { EXAMPLE_STATES } from "./examples";

const base = (): BenchState => ({
  ...initialBenchState(),
  tensor: { xx: 80, yy: -40, zz: 10, xy: 30, yz: -15, zx: 5 },
});
const maxDiff = (a: Mat3, b: Mat3) =>
  Math.max(...a.flatMap((r, i) => r.map((v, j) => Math.abs(v - b[i][j]))));

describe("bench actions", () => {
  it("when σxy is edited in cell (0,1), then the cell (1,0) shows the same value: the grid is symmetric by construction", () => {
    const s = act.setComponent(base(), act.componentAt(0, 1), 42);
    expect(s.tensor.xy).toBe(42);
    expect(act.componentAt(1, 0)).toBe("xy");
    expect(s.tensor[act.componentAt(1, 0)]).toBe(42);
    expect(act.componentAt(2, 1)).toBe("yz");
    expect(act.componentAt(0, 2)).toBe("zx");
    expect(act.setComponent(base(), "xx", Number.NaN)).toEqual(base());
  });

  it("when the unit is converted from MPa to psi, then the numbers scale by 10⁶/6894.757 Pa (1 psi = 1 lbf/in², NIST SP 811)", () => {
    const s = act.changeUnit(base(), "psi", "convert");
    expect(s.unit).toBe("psi");
    expect(s.tensor.xx).toBeCloseTo((80 * 1e6) / PASCALS_PER_PSI, 8);
    expect(s.tensor.xx).toBeCloseTo(11603.02, 1);
    expect(s.tensor.yz).toBeCloseTo((-15 * 1e6) / PASCALS_PER_PSI, 8);
  });

  it("when the unit is reinterpreted, then the numbers stay and only the unit changes; undo gives back the old unit", () => {
    const s = act.changeUnit(base(), "ksi", "reinterpret");
    expect(s.unit).toBe("ksi");
    expect(s.tensor).toEqual(base().tensor);
    const back = act.undo(s);
    expect(back.unit).toBe("MPa");
    expect(act.redo(back).unit).toBe("ksi");
  });

  it("when edits are undone and redone, then each step returns the state before and after it", () => {
    const a = act.setComponent(base(), "xx", 1);
    const b = act.setComponent(a, "yy", 2);
    expect(act.undo(b).tensor).toEqual(a.tensor);
    expect(act.undo(act.undo(b)).tensor).toEqual(base().tensor);
    expect(act.redo(act.undo(b)).tensor).toEqual(b.tensor);
    // A new edit after an undo drops the redo branch.
    expect(act.setComponent(act.undo(b), "zz", 3).history.future).toEqual([]);
  });

  it("when two turns are composed about axes fixed in x y z, then the frame is R₀·R(a₁)·R(a₂) and the readout equals core.rotateTensor with it", () => {
    let s = act.turnElement(base(), [0, 0, 1], 90);
    s = act.turnElement(s, [1, 0, 0], 90);
    // Turned 90° about z, x′ lies along y; then 90° about the fixed x axis carries y onto z.
    expect(
      maxDiff(
        [s.rotation[0], s.rotation[0], s.rotation[0]],
        [
          [0, 0, 1],
          [0, 0, 1],
          [0, 0, 1],
        ],
      ),
    ).toBeLessThan(1e-12);
    const expected = rotateTensor(base().tensor, s.rotation);
    const twoStep = rotateTensor(base().tensor, [
      rotationFromAxisAngle([0, 0, 1], 90)[0],
      rotationFromAxisAngle([0, 0, 1], 90)[1],
      rotationFromAxisAngle([0, 0, 1], 90)[2],
    ]);
    expect(expected.xx).toBeCloseTo(base().tensor.zz, 10);
    expect(twoStep.xx).toBeCloseTo(base().tensor.yy, 10);
  });

  it("when turns about z add up, then the readout matches transformPlaneStress at the summed angle (Gere & Goodno, Mechanics of Materials, transformation equations)", () => {
    const plane: BenchState = { ...base(), tensor: { xx: 80, yy: -40, zz: 0, xy: 30, yz: 0, zx: 0 } };
    const s = act.turnElement(act.turnElement(plane, [0, 0, 1], 12.5), [0, 0, 1], 20);
    const r = rotateTensor(s.tensor, s.rotation);
    const p = transformPlaneStress(80, -40, 30, 32.5);
    expect(r.xx).toBeCloseTo(p.sx, 10);
    expect(r.yy).toBeCloseTo(p.sy, 10);
    expect(r.xy).toBeCloseTo(p.txy, 10);
  });

  it("when the element snaps to the principal frame, then the readout is diagonal with core's principal values", () => {
    const s = act.snapToPrincipal(base());
    const r = rotateTensor(s.tensor, s.rotation);
    const [s1, s2, s3] = principalValues(s.tensor);
    expect(r.xx).toBeCloseTo(s1, 10);
    expect(r.yy).toBeCloseTo(s2, 10);
    expect(r.zz).toBeCloseTo(s3, 10);
    expect(Math.abs(r.xy) + Math.abs(r.yz) + Math.abs(r.zx)).toBeLessThan(1e-10);
    expect(act.resetRotation(s).rotation).toEqual([
      [1, 0, 0],
      [0, 1, 0],
      [0, 0, 1],
    ]);
  });

  it("when a plane state σx = 150, σy = 0, τxy = 25 snaps to principal and then to max shear, then the element turns about z only, by θp = ½·atan(2τxy/(σx − σy)) and by θp − 45° (Hibbeler, Mechanics of Materials, stress transformation; recalled from memory)", () => {
    const plane: BenchState = { ...base(), tensor: { xx: 150, yy: 0, zz: 0, xy: 25, yz: 0, zx: 0 } };
    const thetaP = (Math.atan(50 / 150) * 90) / Math.PI;
    const p = act.snapToPrincipal(plane);
    expect(angleAboutZ(p.rotation)).toBeCloseTo(thetaP, 10);
    const r = rotateTensor(p.tensor, p.rotation);
    expect(r.xx).toBeCloseTo(75 + Math.hypot(75, 25), 10);
    expect(r.yy).toBeCloseTo(75 - Math.hypot(75, 25), 10);
    expect(r.zz).toBe(0);
    expect(angleAboutZ(act.snapToMaxShear(plane).rotation)).toBeCloseTo(thetaP - 45, 10);
  });

  it("when the element snaps to the maximum-shear frame, then σ′xy = τmax = (σ1 − σ3)/2", () => {
    const s = act.snapToMaxShear(base());
    const [s1, , s3] = principalValues(s.tensor);
    expect(rotateTensor(s.tensor, s.rotation).xy).toBeCloseTo((s1 - s3) / 2, 10);
  });

  it("when a bad tensor is pasted, then the error names the place and the old values stay", () => {
    const before = base();
    const s = act.applyPaste(before, "80 30 5\n30 -40 -15\n5 abc 10");
    expect(s.tensor).toEqual(before.tensor);
    expect(s.pasteError).toMatch(/line 3, column 3/);
    expect(s.history).toEqual(before.history);
  });

  it("when a good matrix with a unit is pasted, then it replaces the tensor in that unit and can be undone", () => {
    const s = act.applyPaste(base(), "[10 2 0; 2 -5 0; 0 0 1] ksi");
    expect(s.unit).toBe("ksi");
    expect(s.tensor).toEqual({ xx: 10, yy: -5, zz: 1, xy: 2, yz: 0, zx: 0 });
    expect(s.pasteNote).toMatch(/3×3 matrix, in ksi/);
    expect(act.undo(s).tensor).toEqual(base().tensor);
  });

  it("when a strength is typed in psi, then it is stored in MPa and the material becomes custom", () => {
    const s = act.setStrength(act.changeUnit(base(), "psi", "reinterpret"), "yield", 50000);
    expect(s.material.yield).toBeCloseTo((50000 * PASCALS_PER_PSI) / 1e6, 9);
    expect(s.material.presetId).toBeNull();
    expect(act.setStrength(s, "yield", -1).material.yield).toBeNull();
    expect(act.setRequiredFactor(s, 0.5).requiredFactor).toBe(s.requiredFactor);
  });

  it("when the mid-shell design example is loaded, then σx = pr/2t = 33.75 MPa (x axial) and σθ = pr/t = 67.5 MPa (y hoop) (thin-wall cylinder, any strength-of-materials text)", () => {
    const s = act.loadExample(base(), "shell-design");
    expect(s.tensor.xx).toBeCloseTo(33.75, 12);
    expect(s.tensor.yy).toBeCloseTo(67.5, 12);
    const shaft = EXAMPLE_STATES.find((e) => e.id === "shaft-steady")!.tensor;
    // τ = 16T/(πd³) = 16·850e3/(π·45³) ≈ 47.51 MPa (torsion of a solid round shaft).
    expect(shaft.xy).toBeCloseTo(47.51, 2);
  });
});

describe("bench store and typed rotations", () => {
  it("when actions are called through the store, then they apply the same pure functions to its state", async () => {
    const { createBenchStore } = await import("./store");
    const store = createBenchStore(base());
    store.getState().act.setComponent("xy", 12);
    expect(store.getState().tensor.xy).toBe(12);
    store.getState().act.changeUnit("kPa", "convert");
    expect(store.getState().tensor.xy).toBeCloseTo(12000, 9);
    store.getState().act.undo();
    expect(store.getState().unit).toBe("MPa");
    store.getState().act.snapToPrincipal();
    const r = rotateTensor(store.getState().tensor, store.getState().rotation);
    expect(Math.abs(r.xy) + Math.abs(r.yz) + Math.abs(r.zx)).toBeLessThan(1e-10);
  });

  it("when Euler angles are typed, then the frame is core's rotationFromEuler and reads back the same angles", async () => {
    const { rotationFromEuler } = await import("../../../../../core");
    const { rotationDescription } = await import("./derive");
    const s = act.setEuler(base(), "ZXZ", [30, 40, -20]);
    expect(maxDiff(s.rotation, rotationFromEuler("ZXZ", [30, 40, -20]))).toBeLessThan(1e-14);
    const back = rotationDescription(s.rotation, "ZXZ").euler;
    expect(back[0]).toBeCloseTo(30, 10);
    expect(back[1]).toBeCloseTo(40, 10);
    expect(back[2]).toBeCloseTo(-20, 10);
    const a = act.setAxisAngle(base(), [0, 0, 2], 35);
    expect(rotationDescription(a.rotation, "ZYX").aboutZ).toBeCloseTo(35, 12);
    expect(act.setAxisAngle(base(), [0, 0, 0], 35)).toEqual(base());
  });
});

describe("bench paste choices and input validity (product rules)", () => {
  it("when '1,5 2 3' is pasted with the decimal mark left to ask, then it is refused as ambiguous and the text is kept for the choice; choosing the comma reads σx = 1.5", () => {
    const s = act.applyPaste(base(), "1,5 2 3");
    expect(s.tensor).toEqual(base().tensor);
    expect(s.pasteError).toMatch(/'1,5' is ambiguous/);
    expect(s.pasteProblem).toEqual({ problem: "ambiguous-comma", text: "1,5 2 3" });
    const chosen = act.applyPaste(s, s.pasteProblem!.text, { decimal: "," });
    expect(chosen.tensor).toEqual({ xx: 1.5, yy: 2, zz: 0, xy: 3, yz: 0, zx: 0 });
    expect(chosen.pasteProblem).toBeNull();
  });

  it("when the user's decimal mark is a comma, then every paste is read with it", () => {
    const s = act.applyPaste(act.setPasteDecimal(base(), ","), "12,5\t30\t4");
    expect(s.tensor).toEqual({ xx: 12.5, yy: 30, zz: 0, xy: 4, yz: 0, zx: 0 });
  });

  it("when six bare values are pasted, then the order is asked for; each common order (common practice, no source) puts the last two on the shears it names", () => {
    const s = act.applyPaste(base(), "150 20 0 25 5 -3");
    expect(s.pasteProblem?.problem).toBe("order-needed");
    const a = act.applyPaste(s, "150 20 0 25 5 -3", { order: ["xx", "yy", "zz", "xy", "yz", "zx"] });
    expect(a.tensor).toEqual({ xx: 150, yy: 20, zz: 0, xy: 25, yz: 5, zx: -3 });
    expect(a.pasteNote).toMatch(/σx σy σz τxy τyz τxz/);
    const b = act.applyPaste(s, "150 20 0 25 5 -3", { order: ["xx", "yy", "zz", "xy", "zx", "yz"] });
    expect(b.tensor).toEqual({ xx: 150, yy: 20, zz: 0, xy: 25, yz: -3, zx: 5 });
  });

  it("when a node listing row is pasted, then the note names the node", () => {
    const s = act.applyPaste(base(), "Node SX SY SZ SXY SYZ SXZ\n101 150 20 0 25 0 0");
    expect(s.tensor).toEqual({ xx: 150, yy: 20, zz: 0, xy: 25, yz: 0, zx: 0 });
    expect(s.pasteNote).toMatch(/of node 101/);
  });

  it("when a cell is marked invalid and then valid again, then the input is invalid only meanwhile", async () => {
    const { selectInputValid } = await import("./bench-state");
    const bad = act.setInputValidity(base(), "σxx", false);
    expect(selectInputValid(bad)).toBe(false);
    expect(act.setInputValidity(bad, "σxx", false)).toBe(bad);
    const two = act.setInputValidity(bad, "τxy", false);
    expect(two.invalidInputs).toEqual(["σxx", "τxy"]);
    expect(selectInputValid(act.setInputValidity(act.setInputValidity(two, "σxx", true), "τxy", true))).toBe(
      true,
    );
  });

  it("when 1e300 is set in σxx (σ² would overflow), then the tensor is left as it was; 1e12 is accepted", () => {
    expect(act.setComponent(base(), "xx", 1e300)).toEqual(base());
    expect(act.setComponent(base(), "xx", 1e12).tensor.xx).toBe(1e12);
  });
});
