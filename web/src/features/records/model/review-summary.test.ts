import { describe, expect, it } from "vitest";
import type { Review } from "../../../entities/record/api-types";
import { IDS, recordSummary } from "./record-fixture";
import { DIFFERS_SENTENCE, reviewSummary, submitBlockedReason } from "./review-summary";

const review = (over: Partial<Review> = {}): Review => ({
  status: "in-work",
  requiredApprovals: 1,
  revision: "A",
  latestRecord: null,
  lastApproved: null,
  currentDiffersFromApproved: null,
  ...over,
});

describe("review summary", () => {
  it("when nothing was submitted yet, then it says work in progress, revision A and no record", () => {
    const s = reviewSummary(review());
    expect(s.name).toBe("Work in progress");
    expect(s.revision).toBe("Revision A · no record submitted yet");
    expect(s.differs).toBeNull();
    expect(s.approved).toBeNull();
  });

  it("when the inputs changed after an approval, then it names the revision being worked on and warns that the results differ", () => {
    const approved = recordSummary({ number: 2, revision: "A", status: "approved" });
    const s = reviewSummary(
      review({
        status: "approved",
        revision: "B",
        latestRecord: approved,
        lastApproved: approved,
        currentDiffersFromApproved: true,
      }),
    );
    expect(s.revision).toBe("Revision B · latest record 2 (revision A)");
    expect(s.differs).toBe(DIFFERS_SENTENCE);
    expect(s.differs).toBe("The results shown differ from the last approved record.");
    expect(s.approved).toBe("Last approved: record 2, revision A.");
  });

  it("when the last approved record covers chosen load cases and locations, then the line says which part it covers", () => {
    const approved = recordSummary({
      status: "approved",
      scope: {
        loadCases: [{ id: IDS.hydro, name: "Hydrostatic test" }],
        locations: [{ id: IDS.location, name: "mid-shell" }],
        projectLoadCases: 3,
        projectLocations: 2,
      },
    });
    expect(reviewSummary(review({ status: "approved", lastApproved: approved })).approved).toBe(
      "Last approved: record 1, revision A. It covers 1 of 3 load cases, 1 of 2 locations.",
    );
  });

  it("when the results are the approved ones, then no warning is given", () => {
    const approved = recordSummary({ status: "approved" });
    expect(
      reviewSummary(review({ status: "approved", lastApproved: approved, currentDiffersFromApproved: false }))
        .differs,
    ).toBeNull();
  });

  it("when a record waits for its check, then submitting again is blocked with the reason; otherwise not", () => {
    expect(submitBlockedReason(review({ status: "submitted" }))).toMatch(/already submitted for check/);
    expect(submitBlockedReason(review({ status: "returned" }))).toBeNull();
    expect(submitBlockedReason(review({ status: "approved" }))).toBeNull();
  });
});
