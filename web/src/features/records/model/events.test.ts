import { describe, expect, it } from "vitest";
import { eventLines } from "./events";
import { IDS, person } from "./record-fixture";

describe("record events", () => {
  it("when a record was submitted, returned and approved, then the events read oldest first with who and the note", () => {
    const lines = eventLines([
      {
        status: "approved",
        action: "approve",
        by: person(IDS.checker, "Rui Tanager"),
        at: "2026-12-02T09:00:00.000Z",
        note: "",
      },
      {
        status: "submitted",
        action: "submit",
        by: person(IDS.originator, "Ona Ferreby"),
        at: "2026-12-01T09:00:00.000Z",
        note: "First issue",
      },
    ]);
    expect(lines.map((l) => [l.text, l.note])).toEqual([
      ["Submitted for check — Ona Ferreby", "First issue"],
      ["Approved (record approved) — Rui Tanager", null],
    ]);
  });

  it("when the first of two approvals is given, then the event says approved though the record still waits", () => {
    const lines = eventLines([
      {
        status: "submitted",
        action: "approve",
        by: person(IDS.checker, "Rui Tanager"),
        at: "2026-12-02T09:00:00.000Z",
        note: "",
      },
      {
        status: "approved",
        action: "approve",
        by: person(IDS.editor, "Sol Brannigan"),
        at: "2026-12-02T10:00:00.000Z",
        note: "",
      },
    ]);
    expect(lines.map((l) => [l.text, l.note])).toEqual([
      ["Approved (more approvals needed) — Rui Tanager", null],
      ["Approved (record approved) — Sol Brannigan", null],
    ]);
  });
});
