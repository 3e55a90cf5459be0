import { describe, expect, it } from "vitest";
import { ALLOWABLE_CATEGORY_SUGGESTIONS, CRITERION_NAMES } from "../../../../../core/contract/projects";
import {
  canAddCategory,
  categoryBox,
  categoryRequirementsFromDrafts,
  emptyCategory,
  isRemovableCategory,
  requirementsFromDraft,
  setCategoryFactor,
  toCategoryDrafts,
  toDraft,
  unitSystemLabel,
  type FactorDraft,
} from "./requirements";

// Product rules of the checks panel (how the form reads and writes factors); no outside source.

/** A draft with the given boxes filled and every other one empty. */
const draftWith = (filled: Partial<FactorDraft>): FactorDraft => ({
  ...emptyCategory("x").factors,
  ...filled,
});

describe("default requirements draft", () => {
  it("when the project checks von Mises at 1.5 and Tresca at 2, then those boxes hold the factors and every other box is empty", () => {
    const draft = toDraft([
      { criterion: "von-mises", requiredFactor: 1.5 },
      { criterion: "tresca", requiredFactor: 2 },
    ]);
    expect(Object.keys(draft).sort()).toEqual([...CRITERION_NAMES].sort());
    expect(draft["von-mises"]).toBe("1.5");
    expect(draft.tresca).toBe("2");
    const others = CRITERION_NAMES.filter((c) => c !== "von-mises" && c !== "tresca");
    expect(others.length).toBeGreaterThan(0);
    for (const c of others) expect(draft[c]).toBe("");
  });

  it("when a draft is read back, then only the filled boxes become requirements, in the criteria's order, as numbers", () => {
    const draft = draftWith({ tresca: " 2.5 ", "von-mises": "1.5", [CRITERION_NAMES.at(-1)!]: "   " });
    const requirements = requirementsFromDraft(draft);
    expect(requirements.map((r) => r.criterion)).toEqual(
      CRITERION_NAMES.filter((c) => c === "tresca" || c === "von-mises"),
    );
    expect(requirements.find((r) => r.criterion === "tresca")?.requiredFactor).toBe(2.5);
    expect(requirements.find((r) => r.criterion === "von-mises")?.requiredFactor).toBe(1.5);
  });

  it("when stored requirements go through the draft and back, then they come out the same", () => {
    const stored = CRITERION_NAMES.map((criterion, i) => ({ criterion, requiredFactor: 1 + i / 4 }));
    expect(requirementsFromDraft(toDraft(stored))).toEqual(stored);
  });
});

describe("category drafts", () => {
  it("when nothing is stored, then the usual four categories are offered with empty boxes", () => {
    const drafts = toCategoryDrafts([]);
    expect(drafts.map((d) => d.category)).toEqual([...ALLOWABLE_CATEGORY_SUGGESTIONS]);
    for (const d of drafts) expect(Object.values(d.factors).every((v) => v === "")).toBe(true);
  });

  it("when a stored category matches a suggested one ignoring case and spaces, then its factors fill that row instead of adding one", () => {
    const suggested = ALLOWABLE_CATEGORY_SUGGESTIONS[2];
    const drafts = toCategoryDrafts([
      { category: `  ${suggested.toUpperCase()} `, factors: { "von-mises": 1.1 } },
    ]);
    expect(drafts).toHaveLength(ALLOWABLE_CATEGORY_SUGGESTIONS.length);
    expect(drafts[2].category).toBe(suggested);
    expect(drafts[2].factors["von-mises"]).toBe("1.1");
    expect(drafts[0].factors["von-mises"]).toBe("");
  });

  it("when a stored category is not one of the suggestions, then it is added after them with its factors", () => {
    const drafts = toCategoryDrafts([{ category: "transport", factors: { tresca: 1.25 } }]);
    expect(drafts.map((d) => d.category)).toEqual([...ALLOWABLE_CATEGORY_SUGGESTIONS, "transport"]);
    expect(drafts.at(-1)!.factors.tresca).toBe("1.25");
    expect(drafts.at(-1)!.factors["von-mises"]).toBe("");
  });

  it("when drafts are built twice, then the second does not share rows with the first", () => {
    const first = toCategoryDrafts([]);
    first[0].factors["von-mises"] = "9";
    expect(toCategoryDrafts([])[0].factors["von-mises"]).toBe("");
  });
});

describe("category factors sent", () => {
  const requirements = [
    { criterion: "von-mises" as const, requiredFactor: 1.5 },
    { criterion: "tresca" as const, requiredFactor: 1.5 },
  ];

  it("when a category has no factor typed, then it is left out", () => {
    const sent = categoryRequirementsFromDrafts(
      [emptyCategory("operating"), setCategoryFactor([emptyCategory("test")], 0, "tresca", "1.1")[0]],
      requirements,
    );
    expect(sent).toEqual([{ category: "test", factors: { tresca: 1.1 } }]);
  });

  it("when a category holds a factor for a criterion the project no longer checks, then that factor is dropped, and the category with it if nothing is left", () => {
    const unchecked = CRITERION_NAMES.find((c) => c !== "von-mises" && c !== "tresca")!;
    const onlyUnchecked = { category: "upset", factors: draftWith({ [unchecked]: "2" }) };
    const mixed = { category: "design", factors: draftWith({ [unchecked]: "2", "von-mises": "1.3" }) };
    expect(categoryRequirementsFromDrafts([onlyUnchecked, mixed], requirements)).toEqual([
      { category: "design", factors: { "von-mises": 1.3 } },
    ]);
  });

  it("when a category name has spaces around it, then it is sent trimmed", () => {
    const sent = categoryRequirementsFromDrafts(
      [{ category: "  transport ", factors: draftWith({ "von-mises": "1.2" }) }],
      requirements,
    );
    expect(sent[0].category).toBe("transport");
  });
});

describe("adding, removing and editing categories", () => {
  const drafts = toCategoryDrafts([{ category: "transport", factors: {} }]);

  it("when the new name is empty or only spaces, then it cannot be added", () => {
    expect(canAddCategory(drafts, "")).toBe(false);
    expect(canAddCategory(drafts, "   ")).toBe(false);
  });

  it("when the new name is already listed in another case or with spaces, then it cannot be added", () => {
    expect(canAddCategory(drafts, " TRANSPORT ")).toBe(false);
    expect(canAddCategory(drafts, ALLOWABLE_CATEGORY_SUGGESTIONS[0].toUpperCase())).toBe(false);
  });

  it("when the new name is not listed, then it can be added", () => {
    expect(canAddCategory(drafts, "seismic")).toBe(true);
  });

  it("when a category is one of the usual four, then it cannot be removed; one the user added can", () => {
    for (const c of ALLOWABLE_CATEGORY_SUGGESTIONS) expect(isRemovableCategory(c)).toBe(false);
    expect(isRemovableCategory("transport")).toBe(true);
  });

  it("when one box of one category is changed, then only that box changes and the input is not mutated", () => {
    const before = toCategoryDrafts([]);
    const after = setCategoryFactor(before, 1, "tresca", "1.4");
    expect(after[1].factors.tresca).toBe("1.4");
    expect(after[1].factors["von-mises"]).toBe("");
    expect(after[0]).toBe(before[0]);
    expect(before[1].factors.tresca).toBe("");
  });
});

describe("category boxes", () => {
  it("when the project does not check a criterion, then its category box is disabled, says why and shows a dash", () => {
    expect(categoryBox(draftWith({}), "tresca")).toEqual({
      disabled: true,
      title: "the project does not check this criterion",
      placeholder: "—",
    });
  });

  it("when the project checks a criterion, then its category box is enabled with the default factor as placeholder", () => {
    expect(categoryBox(draftWith({ tresca: "1.5" }), "tresca")).toEqual({
      disabled: false,
      title: undefined,
      placeholder: "1.5",
    });
  });
});

describe("units line", () => {
  it("when the project uses US customary units, then stresses are said to be in ksi; SI says MPa", () => {
    expect(unitSystemLabel("US")).toBe("ksi (US customary)");
    expect(unitSystemLabel("SI")).toBe("MPa (SI)");
  });
});
