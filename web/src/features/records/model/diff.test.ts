import { describe, expect, it } from "vitest";
import type { RecordDiff } from "../../../entities/record/api-types";
import { diffHeading, diffSections, inputChangeSentence, verdictChangeSentence } from "./diff";
import { recordSummary } from "./record-fixture";

const diff = (over: Partial<RecordDiff> = {}): RecordDiff => ({
  from: recordSummary({ id: "r1", number: 1 }),
  to: recordSummary({ id: "r2", number: 2 }),
  inputs: { added: [], changed: [], removed: [] },
  verdictChanges: [],
  ...over,
});

describe("record diff", () => {
  it("when a state changed and a verdict with it, then verdicts come first and every line says from → to with units", () => {
    const sections = diffSections(
      diff({
        inputs: {
          changed: [
            {
              kind: "state",
              label: "Hydrostatic test at mid-shell",
              field: "σx",
              from: "165 MPa",
              to: "175 MPa",
            },
          ],
          added: [{ kind: "location", label: "nozzle N1", to: "SA-516 Grade 70" }],
          removed: [{ kind: "combination", label: "Test + wind", from: "1.2 × Hydrostatic test" }],
        },
        verdictChanges: [
          {
            rowId: "a",
            caseName: "Operating",
            locationName: "mid-shell",
            criterion: "von-mises",
            from: { verdict: "pass", factor: 2.1 },
            to: { verdict: "pass", factor: 1.9 },
          },
          {
            rowId: "b",
            caseName: "Hydrostatic test",
            locationName: "mid-shell",
            criterion: "tresca",
            from: { verdict: "close", factor: 1.58 },
            to: { verdict: "fail", factor: 1.49 },
          },
        ],
      }),
    );
    expect(sections.map((s) => s.id)).toEqual(["verdicts", "changed", "added", "removed"]);
    expect(sections[0].lines[0]).toBe(
      "Hydrostatic test at mid-shell, Tresca: close (SF 1.58) → fails (SF 1.49)",
    );
    expect(sections[1].lines).toEqual(["State · Hydrostatic test at mid-shell — σx: 165 MPa → 175 MPa"]);
    expect(sections[2].lines).toEqual(["Location · nozzle N1: SA-516 Grade 70"]);
    expect(sections[3].lines).toEqual(["Combination · Test + wind: was 1.2 × Hydrostatic test"]);
  });

  it("when a row is new or gone, then its missing side reads not rated; an infinite factor reads ∞", () => {
    expect(
      verdictChangeSentence({
        rowId: "c",
        caseName: "Upset",
        locationName: "head",
        criterion: "tresca",
        from: null,
        to: { verdict: "pass", factor: null },
      }),
    ).toBe("Upset at head, Tresca: not rated → passes (SF ∞)");
    expect(inputChangeSentence({ kind: "project", label: "CT-7 shell" })).toBe("Project · CT-7 shell");
  });

  it("when the two records cover different load cases, then the scope change is its own first section, before the verdicts, and read from → to", () => {
    const sections = diffSections(
      diff({
        inputs: {
          changed: [
            {
              kind: "scope",
              label: "Scope",
              field: "load cases",
              from: "whole project",
              to: "Operating, Design",
            },
            { kind: "state", label: "Operating at mid-shell", field: "σx", from: "75 MPa", to: "80 MPa" },
          ],
          added: [],
          removed: [],
        },
        verdictChanges: [
          {
            rowId: "a",
            caseName: "Operating",
            locationName: "mid-shell",
            criterion: "tresca",
            from: { verdict: "pass", factor: 3.4 },
            to: { verdict: "pass", factor: 3.2 },
          },
        ],
      }),
    );
    expect(sections.map((s) => s.id)).toEqual(["scope", "verdicts", "changed"]);
    expect(sections[0].lines).toEqual(["Scope — load cases: whole project → Operating, Design"]);
    // The scope line is not repeated among the other inputs.
    expect(sections[2].lines).toEqual(["State · Operating at mid-shell — σx: 75 MPa → 80 MPa"]);
  });

  it("when the scope change carries a label of its own, then it is read after the kind like any other input", () => {
    expect(
      inputChangeSentence({
        kind: "scope",
        label: "Locations covered",
        from: "mid-shell",
        to: "whole project",
      }),
    ).toBe("Scope · Locations covered: mid-shell → whole project");
  });

  it("when nothing changed, then there are no sections, and the heading names both records", () => {
    expect(diffSections(diff())).toEqual([]);
    expect(diffHeading(diff())).toBe("Record 1 (revision A) → record 2 (revision A)");
  });
});
