import { describe, expect, it } from "vitest";
import { ct7Projects } from "../../../../../core/demo-data/ct7-scenario";
import { EXAMPLE_STATES } from "./examples";

describe("the bench's example states", () => {
  it("when the examples are built, then each is one of the scenario's states converted from Pa to MPa, with its note, under a unique id", () => {
    const states = ct7Projects().flatMap((p) => p.cases.flatMap((c) => c.states));
    expect(new Set(EXAMPLE_STATES.map((e) => e.id)).size).toBe(EXAMPLE_STATES.length);
    for (const e of EXAMPLE_STATES) {
      expect(e.unit).toBe("MPa");
      const source = states.find(
        (s) => s.note === e.detail && Math.abs(s.tensor.xx / 1e6 - e.tensor.xx) < 1e-9,
      );
      expect(source, e.id).toBeDefined();
      for (const c of ["xx", "yy", "zz", "xy", "yz", "zx"] as const)
        expect(e.tensor[c]).toBeCloseTo(source!.tensor[c] / 1e6, 12);
    }
  });

  it("when the junction is at the hydrostatic test, then σx = pr/2t + 133·p = 43.875 + 155.61 MPa on the axial x axis (membrane plus the scenario's invented bending)", () => {
    const j = EXAMPLE_STATES.find((e) => e.id === "junction-hydrotest")!;
    expect(j.tensor.xx).toBeCloseTo(199.485, 9);
    expect(j.tensor.yy).toBeCloseTo(87.75, 9);
    expect(j.title).toMatch(/Hydrostatic test 1\.17 MPa/);
    expect(EXAMPLE_STATES.find((e) => e.id === "shell-vacuum")!.title).toMatch(/−0\.1 MPa/);
  });
});
