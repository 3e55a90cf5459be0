import { describe, expect, it } from "vitest";
import { calculatorRecordOf, initialValues } from "./inputs";
import { editableWorkspaces, savedWords, stateToSave } from "./add-to-load-case";
import { THIN_WALL_INPUTS } from "./thin-wall";

// Product rules of "add to load case" (common practice in this product, no outside source).

describe("adding a calculated state to a load case", () => {
  it("when the person is a viewer or reviewer somewhere, then only the workspaces where they edit are offered", () => {
    const list = [
      { id: "a", role: "viewer" as const },
      { id: "b", role: "editor" as const },
      { id: "c", role: "reviewer" as const },
      { id: "d", role: "owner" as const },
    ];
    expect(editableWorkspaces(list).map((w) => w.id)).toEqual(["b", "d"]);
  });

  it("when the state is saved, then it goes with source calculator, the stress unit of the unit set, all six components and the record", () => {
    const record = calculatorRecordOf("thin-wall", initialValues(THIN_WALL_INPUTS));
    const body = stateToSave({
      caseId: "c",
      locationId: "l",
      version: 4,
      tensor: { xx: 50, yy: 100, zz: 0, xy: 0, yz: 0, zx: 0 },
      unit: "MPa",
      record,
      note: "  from the thin-wall calculator ",
    });
    expect(body).toEqual({
      caseId: "c",
      locationId: "l",
      version: 4,
      stress: { unit: "MPa", components: { xx: 50, yy: 100, zz: 0, xy: 0, yz: 0, zx: 0 } },
      source: "calculator",
      note: "from the thin-wall calculator",
      calculator: record,
    });
  });

  it("when it is saved, then the page names the revision, the case and the location", () => {
    expect(savedWords(3, "Design", "bore")).toBe('Saved as revision 3 of "Design" at "bore".');
  });
});
