import { describe, expect, it } from "vitest";
import { benchLinkForState, parseBenchSource } from "./bench-link";

const ids = {
  workspaceId: "11111111-1111-4111-8111-111111111111",
  projectId: "22222222-2222-4222-8222-222222222222",
  loadCaseId: "33333333-3333-4333-8333-333333333333",
  locationId: "44444444-4444-4444-8444-444444444444",
};

describe("bench links", () => {
  it("when a saved state's link is made and read back, then the same four ids come out and the numbers are in s and u", () => {
    const link = benchLinkForState(ids, { xx: 67.5, yy: 33.75, zz: 0, xy: 0, yz: 0, zx: 0 }, "MPa");
    const search = link.slice(link.indexOf("?"));
    expect(parseBenchSource(search)).toEqual(ids);
    expect(new URLSearchParams(search).get("s")).toBe("67.5,33.75,0,0,0,0");
    expect(new URLSearchParams(search).get("u")).toBe("MPa");
  });

  it("when the source is missing or not four ids, then it is null", () => {
    expect(parseBenchSource("?s=1,2,3,4,5,6")).toBeNull();
    expect(parseBenchSource("?source=a/b/c/d")).toBeNull();
    expect(parseBenchSource(`?source=${ids.workspaceId}/${ids.projectId}`)).toBeNull();
  });
});
