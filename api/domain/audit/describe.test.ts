import { describe, expect, it } from "vitest";
import { describeChanges, idsNamedIn } from "./describe";

const names = {
  materials: new Map([["m-1", "Plate from heat 4711"]]),
  loadCases: new Map([
    ["c-1", "Design"],
    ["c-2", "Wind"],
  ]),
};

describe("audit changes in words", () => {
  it("when a state changes, then only the changed components are listed, in the unit it was entered in", () => {
    const lines = describeChanges(
      {
        entityType: "stress-state",
        action: "update",
        changes: {
          unit: "ksi",
          // 1 ksi = 6.894757 MPa (definition of the psi, NIST SP 811 appendix B).
          fromPa: { xx: 6.894757e6, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 },
          toPa: { xx: 2 * 6.894757e6, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 },
        },
      },
      names,
    );
    expect(lines).toEqual([{ field: "σxx", from: "1 ksi", to: "2 ksi" }]);
  });

  it("when a combination's terms change, then they read as factor × case name instead of ids", () => {
    const changes = {
      terms: {
        from: [{ loadCaseId: "c-1", factor: 1 }],
        to: [
          { loadCaseId: "c-1", factor: 1 },
          { loadCaseId: "c-2", factor: 0.6 },
        ],
      },
    };
    expect(describeChanges({ entityType: "combination", action: "update", changes }, names)).toEqual([
      { field: "Terms", from: "1 × Design", to: "1 × Design + 0.6 × Wind" },
    ]);
    expect([...idsNamedIn([{ entityType: "combination", action: "update", changes }]).loadCases]).toEqual([
      "c-1",
      "c-2",
    ]);
  });

  it("when a location's material changes from a library one to none, then the library material is named", () => {
    const changes = { material: { from: { kind: "library", id: "m-1" }, to: null } };
    expect(describeChanges({ entityType: "location", action: "update", changes }, names)).toEqual([
      { field: "Material", from: "Plate from heat 4711", to: "none" },
    ]);
  });

  it("when a material is created, then its given values are listed with units and the empty ones left out", () => {
    const changes = {
      after: { name: "Cast iron", unit: "MPa", yieldPa: null, ultimateTensionPa: 200e6, note: "" },
    };
    expect(describeChanges({ entityType: "material", action: "create", changes }, names)).toEqual([
      { field: "Name", from: null, to: "“Cast iron”" },
      { field: "Unit", from: null, to: "“MPa”" },
      { field: "Yield strength", from: null, to: "not given" },
      { field: "Ultimate tensile strength", from: null, to: "200 MPa" },
    ]);
  });

  it("when an event stored no changes, then there are no lines", () => {
    expect(describeChanges({ entityType: "project", action: "delete", changes: null }, names)).toEqual([]);
  });
});
