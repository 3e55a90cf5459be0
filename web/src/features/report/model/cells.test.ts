import { describe, expect, it } from "vitest";
import { pageRuleCss, verdictOfCell } from "./cells";

describe("verdictOfCell", () => {
  it("when a cell states a verdict with its word and mark, then that verdict is read from it", () => {
    expect(verdictOfCell("✓ passes")).toBe("pass");
    expect(verdictOfCell("≈ close")).toBe("close");
    expect(verdictOfCell("✗ fails (rated though unsuited: brittle)")).toBe("fail");
    expect(verdictOfCell("1.26 ✗")).toBe("fail");
  });

  it("when a cell holds anything else, then it has no verdict", () => {
    expect(verdictOfCell("von Mises")).toBeNull();
    expect(verdictOfCell("1.26")).toBeNull();
    expect(verdictOfCell("not evaluated: needs yield")).toBeNull();
  });
});

describe("pageRuleCss", () => {
  it("when built, then each printed page's margin names the identifier and counts page n of m", () => {
    const css = pageRuleCss("Record CR-1 rev. A · 5f0c");
    expect(css).toContain('@bottom-left { content: "Record CR-1 rev. A · 5f0c"');
    expect(css).toContain('content: "page " counter(page) " of " counter(pages)');
  });

  it("when the identifier holds quotes or backslashes, then they are escaped and cannot end the CSS string", () => {
    const css = pageRuleCss('DRAFT of "Tank" \\ 7');
    expect(css).toContain('content: "DRAFT of \\"Tank\\" \\\\ 7"');
  });
});
