import { describe, expect, it } from "vitest";
import { IDS, person, recordSummary } from "./record-fixture";
import { revisionRows } from "./revision-table";
import { formatDateTime } from "./dates";

describe("revision table", () => {
  it("when records were returned, resubmitted and approved, then each line reads number, revision, status, reason, people and approvals", () => {
    const checker = person(IDS.checker, "Rui Tanager");
    const rows = revisionRows([
      recordSummary({
        id: "r2",
        number: 2,
        status: "approved",
        reason: "Test pressure corrected",
        requiredApprovals: 2,
        approvals: [
          { by: checker, at: "2026-12-02T09:00:00.000Z", comment: "" },
          { by: person(IDS.editor, "Vesna Holt"), at: "2026-12-02T10:00:00.000Z", comment: "ok" },
        ],
      }),
      recordSummary({
        id: "r1",
        status: "superseded",
        returned: { by: checker, at: "2026-12-01T12:00:00.000Z", comment: "Check the test state" },
      }),
    ]);
    expect(
      rows.map((r) => [r.number, r.revision, r.statusName, r.reason, r.submittedBy, r.approvals]),
    ).toEqual([
      [2, "A", "Approved", "Test pressure corrected", "Ona Ferreby", "2 of 2 (Rui Tanager, Vesna Holt)"],
      [1, "A", "Superseded", "First issue for check", "Ona Ferreby", "0 of 1"],
    ]);
    expect(rows[0].decided).toBe(`approved ${formatDateTime("2026-12-02T10:00:00.000Z")}`);
    expect(rows[1].decided).toBe(`returned ${formatDateTime("2026-12-01T12:00:00.000Z")} by Rui Tanager`);
  });

  it("when one record covers the whole project and the next a chosen subset, then the table says 'whole project' and counts the subset", () => {
    const rows = revisionRows([
      recordSummary({
        id: "r2",
        number: 2,
        scope: {
          loadCases: [{ id: IDS.hydro, name: "Hydrostatic test" }],
          locations: [{ id: IDS.location, name: "mid-shell" }],
          projectLoadCases: 2,
          projectLocations: 3,
        },
      }),
      recordSummary({ id: "r1", scope: null }),
    ]);
    expect(rows.map((r) => r.scope)).toEqual(["1 of 2 load cases, 1 of 3 locations", "whole project"]);
  });

  it("when a record waits for its check, then it has no decision yet", () => {
    expect(revisionRows([recordSummary()])[0].decided).toBe("—");
  });
});
