import { describe, expect, it } from "vitest";
import { principalFrame, rotationFromAxisAngle, safetyFactor } from "../../../../../core";
import {
  PRINCIPAL_NAMING_RULE,
  criteriaResults,
  envelopeProbe,
  governing,
  namedPrincipal,
  planePairNames,
  principalAxisNames,
  principalName,
  rotatedView,
} from "./derive";
import { projectRequirementsFor } from "./project-requirements";

const state = { xx: 120, yy: 40, zz: 0, xy: 30, yz: 0, zx: 0 };

describe("criteriaResults", () => {
  it("when a typed strength is zero or negative, then that criterion says what it needs instead of failing to compute", () => {
    const results = criteriaResults(
      state,
      "MPa",
      { presetId: null, yield: 0, ultimateTension: -5, ultimateCompression: null },
      1.5,
    );
    for (const r of results) expect(r.available).toBe(false);
    expect(results.find((r) => r.criterion === "von-mises")).toMatchObject({
      reason: "needs the yield strength Sy",
    });
    expect(results.find((r) => r.criterion === "mohr-coulomb")).toMatchObject({
      reason: "needs the tensile strength Sut and compressive strength Suc",
    });
  });

  it("when the state is in kPa, then factors equal core's safetyFactor on the state in MPa", () => {
    const kpa = { xx: 120e3, yy: 40e3, zz: 0, xy: 30e3, yz: 0, zx: 0 };
    const [vm] = criteriaResults(
      kpa,
      "kPa",
      { presetId: null, yield: 355, ultimateTension: 470, ultimateCompression: 470 },
      1.5,
    );
    if (!vm.available) throw new Error("von Mises must be available");
    expect(vm.n).toBeCloseTo(safetyFactor(state, "von-mises", { yield: 355 }), 12);
    expect(vm.utilisation).toBeCloseTo(1.5 / vm.n, 14);
  });
});

describe("envelopeProbe", () => {
  it("when the plot is in kPa, then the point is read in MPa against MPa strengths and the hit comes back in kPa (uniaxial yield at σ = Sy; common practice, no source)", () => {
    const material = { presetId: null, yield: 250, ultimateTension: null, ultimateCompression: null };
    const probe = envelopeProbe(100_000, 0, "kPa", ["von-mises"], material);
    expect(probe.nearest?.criterion).toBe("von-mises");
    expect(probe.nearest?.n).toBeCloseTo(2.5, 12);
    expect(probe.nearest?.point[0]).toBeCloseTo(250_000, 6);
    expect(probe.nearest?.point[1]).toBe(0);
    expect(probe.nearest?.distance).toBeCloseTo(150_000, 6);
  });
});

describe("one naming of principal stresses on every panel", () => {
  // σx = 150, σy = 0, τxy = 25 MPa: σ = 75 ± √(75² + 25²) = 154.06 and −4.06 (plane-stress handbook
  // formula, e.g. Hibbeler, Mechanics of Materials; recalled from memory), σz = 0 between them.
  const plane = { xx: 150, yy: 0, zz: 0, xy: 25, yz: 0, zx: 0 };

  it("when the state is plane stress σx = 150, σy = 0, τxy = 25, then the table's σ1, σ2, σ3 are 154.06, 0 (out of plane), −4.06", () => {
    const p = namedPrincipal(plane);
    expect(p.values[0]).toBeCloseTo(75 + Math.hypot(75, 25), 12);
    expect(p.values[1]).toBe(0);
    expect(p.values[2]).toBeCloseTo(75 - Math.hypot(75, 25), 12);
    expect(p.plane && principalName(p.plane.outOfPlane)).toBe("σ2");
    expect(p.plane && principalName(p.plane.inPlaneMinor)).toBe("σ3");
    expect(PRINCIPAL_NAMING_RULE).toMatch(/σ1 ≥ σ2 ≥ σ3/);
  });

  it("when the element snaps to principal on that state, then the readout's axes are named x′ σ1, y′ σ3, z′ σ2, the same names as the table", () => {
    const rotation = principalFrame(plane);
    const { rotated } = rotatedView(plane, rotation);
    expect(principalAxisNames(rotation, rotated, namedPrincipal(plane))).toEqual([0, 2, 1]);
    expect(rotated.yy).toBeCloseTo(75 - Math.hypot(75, 25), 10);
  });

  it("when the element is not on principal axes, then no axis is named; for a 3D state on its principal frame, x′ y′ z′ are σ1 σ2 σ3", () => {
    expect(
      principalAxisNames(
        rotationFromAxisAngle([0, 0, 1], 5),
        rotatedView(plane, rotationFromAxisAngle([0, 0, 1], 5)).rotated,
        namedPrincipal(plane),
      ),
    ).toBeNull();
    const s = { xx: 80, yy: -40, zz: 10, xy: 30, yz: -15, zx: 5 };
    const r = principalFrame(s);
    expect(principalAxisNames(r, rotatedView(s, r).rotated, namedPrincipal(s))).toEqual([0, 1, 2]);
  });

  it("when the principal values repeat (uniaxial σx = 100), then each axis still gets its own name", () => {
    const s = { xx: 100, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 };
    const r = principalFrame(s);
    expect(principalAxisNames(r, rotatedView(s, r).rotated, namedPrincipal(s))).toEqual([0, 1, 2]);
  });
});

describe("planePairNames", () => {
  it("when σ2 is the zero principal stress, then the envelope plot's σA and σB are named σ1 and σ3; when σ3 is zero, σ1 and σ2", () => {
    expect(planePairNames([154.06, 0, -4.06])).toEqual(["σ1", "σ3"]);
    expect(planePairNames([100, 50, 0])).toEqual(["σ1", "σ2"]);
    expect(planePairNames([0, -50, -100])).toEqual(["σ2", "σ3"]);
    expect(planePairNames([3, 2, 1])).toBeNull();
  });
});

describe("the bench's criteria come from core's evaluator with the project's factors", () => {
  const s355 = { presetId: "s355", yield: 355, ultimateTension: 470, ultimateCompression: 470 };
  const project = {
    name: "Vessel",
    requirements: [
      { criterion: "von-mises" as const, requiredFactor: 1.5 },
      { criterion: "tresca" as const, requiredFactor: 2 },
    ],
    categoryRequirements: [{ category: "test", factors: { tresca: 1.25 } }],
  };

  it("when a project requires von Mises 1.5 and Tresca 2 and both factors are about 1.5, then Tresca fails and governs (highest utilisation, not the smallest factor)", () => {
    // Uniaxial 236.67 MPa against Sy 355: n = 355/236.67 = 1.5 for both (common practice, no source).
    const { requirements } = projectRequirementsFor(project, "design");
    const results = criteriaResults(
      { xx: 355 / 1.5, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 },
      "MPa",
      s355,
      requirements,
    );
    const vm = results.find((r) => r.criterion === "von-mises")!;
    const tr = results.find((r) => r.criterion === "tresca")!;
    expect(vm).toMatchObject({ available: true, requiredFactor: 1.5, verdict: "close", governs: false });
    expect(tr).toMatchObject({ available: true, requiredFactor: 2, verdict: "fail", governs: true });
    expect(governing(results)?.criterion).toBe("tresca");
    expect(results.find((r) => r.criterion === "max-principal")).toMatchObject({
      available: false,
      kind: "not-checked",
    });
  });

  it("when the case's category has its own factors, then they are used and the source says so; otherwise the default, said so", () => {
    const test = projectRequirementsFor(project, "Test");
    expect(test.requirements).toEqual([
      { criterion: "von-mises", requiredFactor: 1.5, category: null },
      { criterion: "tresca", requiredFactor: 1.25, category: "test" },
    ]);
    expect(test.source).toBe(
      "Vessel, load case category “Test”: the “test” factors (the rest from the project default)",
    );
    expect(projectRequirementsFor(project, "upset").source).toBe(
      "Vessel, load case category “upset”: the project default (no factors given for “upset”)",
    );
    expect(projectRequirementsFor(project, "").source).toBe(
      "Vessel: the project default (the load case has no category)",
    );
  });

  it("when S355 (a ductile steel) is checked with every criterion, then the fracture criteria say not applicable with the reason unless the user asks for them", () => {
    const shear = { xx: 0, yy: 0, zz: 0, xy: 250, yz: 0, zx: 0 };
    const plain = criteriaResults(shear, "MPa", s355, 1.5);
    for (const c of ["max-principal", "mohr-coulomb", "modified-mohr"] as const) {
      const r = plain.find((x) => x.criterion === c)!;
      expect(r).toMatchObject({ available: false, kind: "not-applicable" });
      if (!r.available)
        expect(r.reason).toMatch(/^not applicable to this material: the material is set as ductile/);
    }
    const asked = criteriaResults(shear, "MPa", s355, 1.5, { includeUnsuited: true });
    const mp = asked.find((x) => x.criterion === "max-principal")!;
    if (!mp.available) throw new Error("asked for, so rated");
    expect(mp.n).toBeCloseTo(470 / 250, 12); // Sut/σ1 with σ1 = τ in pure shear (common practice, no source)
    expect(mp.unsuited).toMatch(/ductile/);
    const brittle = criteriaResults(shear, "MPa", s355, 1.5, { behaviour: "brittle" });
    expect(brittle.find((x) => x.criterion === "von-mises")).toMatchObject({ kind: "not-applicable" });
  });
});
