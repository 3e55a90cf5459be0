import { describe, expect, it } from "vitest";
import { benchLinkForState, parseBenchSource, readStressParam, stressParam } from "./bench-link";

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

  it("when six components are written as the s parameter and read back, then the same numbers come out in core's order; a malformed one is null", () => {
    const tensor = { xx: 1 / 3, yy: -87.75, zz: 0, xy: 12.5, yz: -1e-7, zx: 2e8 };
    const text = stressParam(tensor);
    expect(text.split(",")).toHaveLength(6);
    expect(readStressParam(text)).toEqual({ ...tensor, xx: Number((1 / 3).toPrecision(15)) });
    expect(readStressParam("1,2,3,4,5")).toBeNull();
    expect(readStressParam("1,2,3,4,5,x")).toBeNull();
    expect(readStressParam(null)).toBeNull();
  });
});
