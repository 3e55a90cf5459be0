import { describe, expect, it } from "vitest";
import { LOAD_CASE_CATEGORY_SUGGESTIONS } from "../../../../../core/contract/load-cases";
import { allowablesNote, categorySuggestions, cellTitle, isOpenCell, toggleCell } from "./load-cases";

// Product rules of the load-case table (which factors a case uses, what the pickers offer); no outside source.

describe("which factors a load case is checked with", () => {
  it("when the case's category has factors of its own, then the note names that category", () => {
    expect(allowablesNote("test", ["operating", "test"])).toBe("checked with the “test” factors");
  });

  it("when the category matches one with factors only ignoring case and spaces, then it still uses that category's factors", () => {
    expect(allowablesNote("Test ", [" TEST"])).toBe("checked with the “Test ” factors");
  });

  it("when the case has no category, or one without factors of its own, then it uses the project default", () => {
    expect(allowablesNote("", ["test", ""])).toBe("checked with the project default factors");
    expect(allowablesNote("transport", ["test"])).toBe("checked with the project default factors");
  });
});

describe("category suggestions", () => {
  it("when the project gives factors to categories of its own, then they follow the usual suggestions, trimmed, each once", () => {
    const usual = LOAD_CASE_CATEGORY_SUGGESTIONS[0];
    const offered = categorySuggestions([` ${usual}`, " blast door ", "blast door"]);
    expect(offered).toEqual([...new Set(LOAD_CASE_CATEGORY_SUGGESTIONS), "blast door"]);
    expect(offered.filter((s) => s === usual)).toHaveLength(1);
  });

  it("when the project has no categories of its own, then exactly the usual suggestions are offered", () => {
    expect(categorySuggestions([])).toEqual([...new Set(LOAD_CASE_CATEGORY_SUGGESTIONS)]);
  });
});

describe("the open revisions cell", () => {
  const a = { caseId: "c1", locationId: "l1" };
  const sameAsA = { caseId: "c1", locationId: "l1" };
  const otherLocation = { caseId: "c1", locationId: "l2" };
  const otherCase = { caseId: "c2", locationId: "l1" };

  it("when nothing is open, then History opens the cell", () => {
    expect(toggleCell(null, a)).toEqual(a);
  });

  it("when the same cell is open, then History closes it", () => {
    expect(toggleCell(a, sameAsA)).toBeNull();
  });

  it("when another cell of the same case or location is open, then History switches to the one asked for", () => {
    expect(toggleCell(a, otherLocation)).toEqual(otherLocation);
    expect(toggleCell(a, otherCase)).toEqual(otherCase);
  });

  it("when asked whether a cell is open, then only the same case and location count", () => {
    expect(isOpenCell(a, sameAsA)).toBe(true);
    expect(isOpenCell(a, otherLocation)).toBe(false);
    expect(isOpenCell(a, otherCase)).toBe(false);
    expect(isOpenCell(null, a)).toBe(false);
  });
});

describe("cell titles", () => {
  const cases = [{ id: "c1", name: "Hydrostatic test" }];
  const locations = [{ id: "l1", name: "head junction" }];

  it("when the case and location exist, then the title reads 'case at location'", () => {
    expect(cellTitle({ caseId: "c1", locationId: "l1" }, cases, locations)).toBe(
      "Hydrostatic test at head junction",
    );
  });

  it("when the location is gone, then it reads 'a location'", () => {
    expect(cellTitle({ caseId: "c1", locationId: "gone" }, cases, locations)).toBe(
      "Hydrostatic test at a location",
    );
  });

  it("when the case is gone, then there is no title (the revisions close)", () => {
    expect(cellTitle({ caseId: "gone", locationId: "l1" }, cases, locations)).toBeNull();
  });
});
