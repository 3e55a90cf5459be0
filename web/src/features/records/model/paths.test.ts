import { describe, expect, it } from "vitest";
import { recordPagePath, recordPdfPath, recordPrintPath, recordsPagePath } from "./paths";

describe("review area addresses", () => {
  it("when a record's pages are linked, then the print page sits in the app and the PDF under /api", () => {
    expect(recordsPagePath("w", "p")).toBe("/workspaces/w/projects/p/records");
    expect(recordPagePath("w", "p", "r")).toBe("/workspaces/w/projects/p/records/r");
    expect(recordPrintPath("w", "p", "r")).toBe("/workspaces/w/projects/p/records/r/report");
    expect(recordPdfPath("w", "p", "r")).toBe("/api/workspaces/w/projects/p/records/r/report.pdf");
  });
});
