import { describe, expect, it } from "vitest";
import { scopeCoverageSentence } from "../../../../../core/report";
import {
  frozenResultsSubtitle,
  LOAD_CASES_NONE,
  LOCATIONS_NONE,
  loadCaseOptions,
  locationOptions,
  namesAFormField,
  readScope,
  scopeCountLine,
  scopeServerErrors,
  scopeWords,
  setScopeList,
  setScopeMode,
  tickScopeItem,
  WHOLE_PROJECT,
  type RecordScope,
} from "./scope";

const id = (n: number) => `5c0e0000-0000-4000-8000-${String(n).padStart(12, "0")}`;

const SUBSET: RecordScope = {
  loadCases: [
    { id: id(1), name: "Operating" },
    { id: id(2), name: "Design" },
  ],
  locations: [{ id: id(11), name: "mid-shell" }],
  projectLoadCases: 4,
  projectLocations: 3,
};

const OPTIONS = {
  loadCases: loadCaseOptions([
    { id: id(1), name: "Operating", category: "design" },
    { id: id(2), name: "Design", category: "design" },
    { id: id(3), name: "Hydrostatic test", category: "test" },
    { id: id(4), name: "Wind", category: "" },
  ]),
  locations: locationOptions([
    { id: id(11), name: "mid-shell" },
    { id: id(12), name: "nozzle N1" },
    { id: id(13), name: "skirt" },
  ]),
};

describe("scope in words", () => {
  it("when a record covers the whole project (scope null or absent), then the table says 'whole project' and the page says so in a sentence", () => {
    expect(scopeWords(null)).toBe("whole project");
    expect(scopeWords(undefined)).toBe("whole project");
    expect(scopeCoverageSentence(null, { loadCases: 4, locations: 1 }, "record")).toBe(
      "This record covers the whole project: 4 load cases and 1 location.",
    );
    expect(frozenResultsSubtitle(null)).toMatch(/^every case and combination at every location/);
  });

  it("when a record covers 2 of 4 load cases and 1 of 3 locations, then the table counts them and the page names them in the project's order", () => {
    expect(scopeWords(SUBSET)).toBe("2 of 4 load cases, 1 of 3 locations");
    expect(scopeCoverageSentence(SUBSET, { loadCases: 2, locations: 1 }, "record")).toBe(
      "This record covers 2 of 4 load cases (Operating, Design) and 1 of 3 locations (mid-shell); " +
        "results outside it are not part of this record.",
    );
    expect(frozenResultsSubtitle(SUBSET)).not.toMatch(/every/);
  });

  it("when the project had a single load case and a single location, then the nouns are singular", () => {
    const single: RecordScope = {
      loadCases: [{ id: id(1), name: "Operating" }],
      locations: [{ id: id(11), name: "mid-shell" }],
      projectLoadCases: 1,
      projectLocations: 1,
    };
    expect(scopeWords(single)).toBe("1 of 1 load case, 1 of 1 location");
  });
});

describe("the submit form's scope choice", () => {
  it("when load cases are listed, then each checkbox reads the name with its category in brackets, and a case without a category reads its name only", () => {
    expect(OPTIONS.loadCases.map((o) => o.label)).toEqual([
      "Operating (design)",
      "Design (design)",
      "Hydrostatic test (test)",
      "Wind",
    ]);
  });

  it("when the form is left on the whole project, then it sends scope null, even with boxes ticked earlier", () => {
    const ticked = tickScopeItem(setScopeMode(WHOLE_PROJECT, "chosen"), "loadCases", id(1), true);
    expect(readScope(WHOLE_PROJECT, OPTIONS)).toEqual({ ok: true, value: null });
    expect(readScope(setScopeMode(ticked, "whole"), OPTIONS)).toEqual({ ok: true, value: null });
  });

  it("when boxes are ticked out of order, then the ids are sent in the project's order and the count line counts them", () => {
    let choice = setScopeMode(WHOLE_PROJECT, "chosen");
    choice = tickScopeItem(choice, "loadCases", id(3), true);
    choice = tickScopeItem(choice, "loadCases", id(1), true);
    choice = tickScopeItem(choice, "locations", id(13), true);
    expect(readScope(choice, OPTIONS)).toEqual({
      ok: true,
      value: { loadCaseIds: [id(1), id(3)], locationIds: [id(13)] },
    });
    expect(scopeCountLine(choice, OPTIONS)).toBe("2 of 4 load cases, 1 of 3 locations");
  });

  it("when a box is ticked and then unticked, then it is no longer sent", () => {
    let choice = setScopeMode(WHOLE_PROJECT, "chosen");
    choice = tickScopeItem(choice, "locations", id(11), true);
    choice = tickScopeItem(choice, "locations", id(12), true);
    choice = tickScopeItem(choice, "locations", id(11), false);
    choice = tickScopeItem(choice, "loadCases", id(2), true);
    expect(readScope(choice, OPTIONS)).toEqual({
      ok: true,
      value: { loadCaseIds: [id(2)], locationIds: [id(12)] },
    });
  });

  it("when nothing is ticked in one list, then the form refuses with a message naming that list only", () => {
    const noLocations = setScopeList(
      setScopeMode(WHOLE_PROJECT, "chosen"),
      "loadCases",
      OPTIONS.loadCases.map((o) => o.id),
    );
    expect(readScope(noLocations, OPTIONS)).toEqual({ ok: false, errors: { locations: LOCATIONS_NONE } });
    expect(LOCATIONS_NONE).toMatch(/^Locations: /);
    const nothing = setScopeMode(WHOLE_PROJECT, "chosen");
    expect(readScope(nothing, OPTIONS)).toEqual({
      ok: false,
      errors: { loadCases: LOAD_CASES_NONE, locations: LOCATIONS_NONE },
    });
    expect(LOAD_CASES_NONE).toMatch(/^Load cases: /);
  });

  it("when 'Select all' and then 'Select none' are pressed on a list, then every box of it is ticked and then none", () => {
    const all = setScopeList(
      setScopeMode(WHOLE_PROJECT, "chosen"),
      "locations",
      OPTIONS.locations.map((o) => o.id),
    );
    expect(all.locationIds).toEqual([id(11), id(12), id(13)]);
    expect(setScopeList(all, "locations", []).locationIds).toEqual([]);
    // The other list is left as it was.
    expect(all.loadCaseIds).toEqual([]);
  });

  it("when a ticked load case was deleted meanwhile, then it is neither counted nor sent", () => {
    let choice = setScopeMode(WHOLE_PROJECT, "chosen");
    choice = tickScopeItem(choice, "loadCases", id(99), true);
    choice = tickScopeItem(choice, "locations", id(11), true);
    expect(scopeCountLine(choice, OPTIONS)).toBe("0 of 4 load cases, 1 of 3 locations");
    expect(readScope(choice, OPTIONS)).toEqual({ ok: false, errors: { loadCases: LOAD_CASES_NONE } });
  });

  it("when every load case and every location is ticked, then the count line says the record covers the whole project", () => {
    let choice = setScopeMode(WHOLE_PROJECT, "chosen");
    choice = setScopeList(choice, "loadCases", [id(4), id(3), id(2), id(1)]);
    choice = setScopeList(choice, "locations", [id(11), id(12), id(13)]);
    expect(scopeCountLine(choice, OPTIONS)).toBe(
      "4 of 4 load cases, 3 of 3 locations: every one of both, so the record covers the whole project",
    );
  });
});

describe("the API's scope errors beside the lists", () => {
  it("when the API names scope.loadCaseIds.1, then the message sits beside the load cases and names the case sent at that place", () => {
    const sent = { loadCaseIds: [id(1), id(3)], locationIds: [id(11)] };
    const errors = scopeServerErrors(
      { "scope.loadCaseIds.1": "is not a load case of this project", reason: "unrelated" },
      sent,
      OPTIONS,
    );
    expect(errors).toEqual({
      loadCases: "Load cases: Hydrostatic test (test): is not a load case of this project",
    });
  });

  it("when the API names scope.locationIds as a whole, then the message sits beside the locations", () => {
    expect(
      scopeServerErrors({ "scope.locationIds": "Choose at least one location." }, null, OPTIONS),
    ).toEqual({ locations: "Locations: Choose at least one location." });
  });

  it("when the id at the named place is no longer listed, then the message says which place it was", () => {
    const sent = { loadCaseIds: [id(1)], locationIds: [id(11), id(77)] };
    expect(scopeServerErrors({ "scope.locationIds.1": "is gone" }, sent, OPTIONS)).toEqual({
      locations: "Locations: location no. 2 of those sent: is gone",
    });
  });

  it("when the API's errors name no scope field, then nothing is put beside the lists", () => {
    expect(scopeServerErrors({ reason: "Say what changed and why." }, null, OPTIONS)).toEqual({});
  });

  it("when the API's 400 names the reason or a scope field, then the form needs no general message; otherwise it does", () => {
    expect(namesAFormField({ reason: "Say what changed and why." })).toBe(true);
    expect(namesAFormField({ "scope.locationIds.0": "is gone" })).toBe(true);
    expect(namesAFormField({ scope: "must be an object or null" })).toBe(true);
    expect(namesAFormField({ scopeNote: "unknown" })).toBe(false);
    expect(namesAFormField({})).toBe(false);
  });
});
