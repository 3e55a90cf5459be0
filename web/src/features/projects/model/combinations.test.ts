import { describe, expect, it } from "vitest";
import {
  createCombinationBodySchema,
  updateCombinationBodySchema,
  type Combination,
} from "../../../../../core/contract/combinations";
import { draftOf, newTerm, patchTerm, termError, termsBody, type DraftTerm } from "./combinations";

// Product rules of the combination forms; the server's shared schema is the judge of what they send.

const caseA = "00000000-0000-4000-8000-00000000000a";
const caseB = "00000000-0000-4000-8000-00000000000b";

const stored: Combination = {
  id: "00000000-0000-4000-8000-000000000001",
  projectId: "00000000-0000-4000-8000-000000000002",
  name: "Operating + upset",
  description: "peak of the two",
  terms: [
    { loadCaseId: caseA, loadCaseName: "Operating", factor: 1 },
    { loadCaseId: caseB, loadCaseName: "Upset", factor: -0.35 },
  ],
  version: 4,
  createdAt: "2026-12-01T10:00:00.000Z",
  updatedAt: "2026-12-01T10:00:00.000Z",
  updatedBy: null,
};

describe("combination drafts", () => {
  it("when a stored combination is opened, then its name, description and terms are the draft, factors as text", () => {
    expect(draftOf(stored)).toEqual({
      name: "Operating + upset",
      description: "peak of the two",
      terms: [
        { loadCaseId: caseA, factor: "1" },
        { loadCaseId: caseB, factor: "-0.35" },
      ],
    });
  });

  it("when a term is added, then it has no load case and factor 1.0, and each call gives a fresh row", () => {
    expect(newTerm()).toEqual({ loadCaseId: "", factor: "1.0" });
    expect(newTerm()).not.toBe(newTerm());
  });

  it("when one term is patched, then only that term changes and the list given is left as it was", () => {
    const terms: DraftTerm[] = [newTerm(), newTerm()];
    const patched = patchTerm(terms, 1, { loadCaseId: caseB });
    expect(patched).toEqual([newTerm(), { loadCaseId: caseB, factor: "1.0" }]);
    expect(patched[0]).toBe(terms[0]);
    expect(terms[1].loadCaseId).toBe("");
  });
});

describe("terms sent", () => {
  it("when a row has no load case chosen, then it is left out and the rest keep their order", () => {
    const sent = termsBody(
      [
        { loadCaseId: caseB, factor: "1.2" },
        { loadCaseId: "", factor: "5" },
        { loadCaseId: caseA, factor: " -0.5 " },
      ],
      NaN,
    );
    expect(sent).toEqual([
      { loadCaseId: caseB, factor: 1.2 },
      { loadCaseId: caseA, factor: -0.5 },
    ]);
    expect(createCombinationBodySchema.safeParse({ name: "x", terms: sent }).success).toBe(true);
  });

  it("when the editor's factor box is empty, then NaN is sent and the shared schema refuses it beside that term", () => {
    const sent = termsBody([{ loadCaseId: caseA, factor: "  " }], NaN);
    expect(Number.isNaN(sent[0].factor)).toBe(true);
    const checked = updateCombinationBodySchema.safeParse({ version: 1, terms: sent });
    expect(checked.success).toBe(false);
    expect(checked.error?.issues[0].path).toEqual(["terms", 0, "factor"]);
  });

  it("when the new-combination form's factor box is empty, then 0 is sent, as Number('') always gave, and refused as zero", () => {
    const sent = termsBody([{ loadCaseId: caseA, factor: "" }], 0);
    expect(sent).toEqual([{ loadCaseId: caseA, factor: 0 }]);
    const checked = createCombinationBodySchema.safeParse({ name: "x", terms: sent });
    expect(checked.error?.issues[0].message).toMatch(/must not be zero/);
  });

  it("when a factor is not a number, then NaN is sent whatever the blank rule", () => {
    expect(Number.isNaN(termsBody([{ loadCaseId: caseA, factor: "1.2.3" }], 0)[0].factor)).toBe(true);
  });
});

describe("term errors", () => {
  it("when the server names a term's factor and its load case, then the factor's message is shown", () => {
    const errors = { "terms.1.factor": "must not be zero", "terms.1.loadCaseId": "listed twice" };
    expect(termError(errors, 1)).toBe("must not be zero");
  });

  it("when only the load case is named, then its message is shown; another term's errors are not", () => {
    const errors = { "terms.0.loadCaseId": "this load case is listed twice", "terms.2.factor": "x" };
    expect(termError(errors, 0)).toBe("this load case is listed twice");
    expect(termError(errors, 1)).toBeUndefined();
  });
});
