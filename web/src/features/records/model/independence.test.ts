import { describe, expect, it } from "vitest";
import { IDS, person, recordDetail } from "./record-fixture";
import { independenceNote } from "./independence";

// Product rule from issue 14 (design-verification practice, ISO 9001 §8.3.4 as the issue cites it):
// whoever approves is neither the submitter nor the last editor of an input in the record.

describe("independence before approving or returning", () => {
  const record = recordDetail();

  it("when the submitter opens their own record, then approving and returning are refused in words", () => {
    expect(independenceNote(record, IDS.originator, "approve")).toMatch(
      /^You submitted this record, so you cannot approve it/,
    );
    expect(independenceNote(record, IDS.originator, "return")).toMatch(
      /^You submitted this record, so you cannot return it/,
    );
  });

  it("when the person last saved a state in the record, then approving is refused naming that state, returning is not", () => {
    expect(independenceNote(record, IDS.editor, "approve")).toBe(
      "You last edited an input in this record (the state of Hydrostatic test at mid-shell), so you cannot approve it: an independent checker approves it.",
    );
    expect(independenceNote(record, IDS.editor, "return")).toBeNull();
  });

  it("when a checker already approved, then a second approval by them is refused; an independent checker is not", () => {
    const once = recordDetail({
      approvals: [{ by: person(IDS.checker, "Rui Tanager"), at: "2026-12-01T11:00:00.000Z", comment: "" }],
    });
    expect(independenceNote(once, IDS.checker, "approve")).toMatch(/already approved/);
    expect(independenceNote(record, IDS.checker, "approve")).toBeNull();
    expect(independenceNote(record, null, "approve")).toBeNull();
  });
});
