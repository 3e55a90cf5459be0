import { describe, expect, it } from "vitest";
import { zoomAt, ZOOM_LIMITS } from "./zoom";

describe("diagram zoom", () => {
  it("when zooming about a focus point, then that point keeps its place on screen (offset from centre scales by 1/k)", () => {
    const v = zoomAt(null, 2, [10, 5], [0, 0])!;
    expect(v.k).toBe(2);
    // Screen offset of the focus before: (10 − 0)·1; after: (10 − cx)·2 — equal.
    expect((10 - v.cx) * 2).toBeCloseTo(10, 12);
    expect((5 - v.cy) * 2).toBeCloseTo(5, 12);
  });

  it("when zoomed far, then the factor stops at the limits", () => {
    let v = zoomAt(null, 1000, [0, 0], [0, 0]);
    expect(v!.k).toBe(ZOOM_LIMITS.max);
    v = zoomAt(v, 1e-6, [0, 0], [0, 0]);
    expect(v!.k).toBe(ZOOM_LIMITS.min);
  });
});
