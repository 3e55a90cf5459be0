import { describe, expect, it } from "vitest";
import type { MaterialList } from "../../../../../core/contract/materials";
import { materialName, refFromValue, refValue } from "./material-refs";

const libraryId = "00000000-0000-4000-8000-000000000001";
const list = {
  materials: [{ id: libraryId, name: "Plate, cert. 4471" }],
  published: [{ id: "s355", name: "S355", standard: "EN 10025-2" }],
} as unknown as MaterialList;

describe("material references in a select", () => {
  it("when no material is chosen, then the select carries the empty value, and the empty value is no material", () => {
    expect(refValue(null)).toBe("");
    expect(refFromValue("")).toBeNull();
  });

  it("when a reference goes into a select value and back, then it is the same reference", () => {
    for (const ref of [
      { kind: "workspace" as const, id: libraryId },
      { kind: "published" as const, id: "s355" },
    ]) {
      expect(refFromValue(refValue(ref))).toEqual(ref);
    }
  });

  it("when an id holds a colon, then only the first colon separates the kind", () => {
    expect(refFromValue("published:grade:2")).toEqual({ kind: "published", id: "grade:2" });
  });
});

describe("material names", () => {
  it("when a published grade is chosen, then its name carries its standard", () => {
    expect(materialName({ kind: "published", id: "s355" }, list)).toBe("S355 (EN 10025-2)");
  });

  it("when a published id is not in the list, then the id itself is shown", () => {
    expect(materialName({ kind: "published", id: "retired-grade" }, list)).toBe("retired-grade");
  });

  it("when a library material is chosen, then its name is shown; a deleted one says so", () => {
    expect(materialName({ kind: "workspace", id: libraryId }, list)).toBe("Plate, cert. 4471");
    expect(materialName({ kind: "workspace", id: "00000000-0000-4000-8000-000000000009" }, list)).toBe(
      "(deleted material)",
    );
  });

  it("when nothing is chosen or the list is not loaded yet, then there is no name", () => {
    expect(materialName(null, list)).toBeNull();
    expect(materialName({ kind: "published", id: "s355" }, undefined)).toBeNull();
  });
});
