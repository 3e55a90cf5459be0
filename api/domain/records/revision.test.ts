import { describe, expect, it } from "vitest";
import { nextRevisionLetter, revisionOfNextRecord } from "./revision";

describe("revision letters (common practice for calculation revisions, no source)", () => {
  it("when a letter is followed, then A gives B, Y gives Z, Z gives AA and AZ gives BA", () => {
    expect(nextRevisionLetter("A")).toBe("B");
    expect(nextRevisionLetter("Y")).toBe("Z");
    expect(nextRevisionLetter("Z")).toBe("AA");
    expect(nextRevisionLetter("AZ")).toBe("BA");
    expect(nextRevisionLetter("ZZ")).toBe("AAA");
  });

  it("when a project has no record, then its first record is revision A", () => {
    expect(revisionOfNextRecord(null)).toBe("A");
  });

  it("when the latest record was returned, then the resubmission keeps its letter", () => {
    expect(revisionOfNextRecord({ status: "returned", revision: "C" })).toBe("C");
  });

  it("when the latest record was approved, then the next submission starts the next letter", () => {
    expect(revisionOfNextRecord({ status: "approved", revision: "C" })).toBe("D");
  });
});
