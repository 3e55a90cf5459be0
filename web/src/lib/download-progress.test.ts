import { describe, expect, it } from "vitest";
import { fileNameFrom, progressText } from "./download-progress";

describe("progressText", () => {
  it("when nothing has arrived yet, then it says the server is still building the file", () => {
    expect(progressText({ received: 0, total: null })).toBe("waiting for the server…");
  });

  it("when the total is known, then it gives both sizes and the share received, rounded down", () => {
    expect(progressText({ received: 1_250_000, total: 3_400_000 })).toBe("1.3 MB of 3.4 MB (36 %)");
    expect(progressText({ received: 3_400_000, total: 3_400_000 })).toBe("3.4 MB of 3.4 MB (100 %)");
  });

  it("when the server sent no length, then it gives the bytes received only", () => {
    expect(progressText({ received: 640_000, total: null })).toBe("640 kB");
    expect(progressText({ received: 200, total: null })).toBe("1 kB");
  });
});

describe("fileNameFrom", () => {
  it("when the header names a file, then that name is used", () => {
    expect(fileNameFrom('attachment; filename="vessel-draft-report.pdf"', "report.pdf")).toBe(
      "vessel-draft-report.pdf",
    );
  });

  it("when the header is missing or names a path, then the fallback is used", () => {
    expect(fileNameFrom(null, "report.pdf")).toBe("report.pdf");
    expect(fileNameFrom('attachment; filename="../etc/passwd"', "report.pdf")).toBe("report.pdf");
  });
});
