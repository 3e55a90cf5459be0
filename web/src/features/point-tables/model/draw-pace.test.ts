import { describe, expect, it } from "vitest";
import { FIRST_SLICE, MAX_SLICE, MIN_SLICE, nextSlice } from "./draw-pace";

// The bounds are this product's own choice (a long task is one over 50 ms: common practice, no source).

describe("how many points the 3D view draws per frame", () => {
  it("when a frame took 70 ms, then the next slice is half as large (35/70), and never below the least slice", () => {
    expect(nextSlice(8_000, 70)).toBe(4_000);
    expect(nextSlice(MIN_SLICE, 500)).toBe(MIN_SLICE);
  });

  it("when a frame took 40 ms, then the next slice shrinks by at least 30 %", () => {
    expect(nextSlice(10_000, 40)).toBe(7_000);
  });

  it("when a frame took 17 ms (a 60 Hz frame), then the next slice grows by a quarter, up to the largest", () => {
    expect(nextSlice(8_000, 17)).toBe(10_000);
    expect(nextSlice(MAX_SLICE, 17)).toBe(MAX_SLICE);
  });

  it("when a frame took between 22 and 35 ms, then the slice stays", () => {
    expect(nextSlice(12_345, 30)).toBe(12_345);
  });

  it("when frames keep taking 4 µs a point plus 10 ms, then the slice settles where a frame takes 22–35 ms", () => {
    let slice: number = FIRST_SLICE;
    for (let k = 0; k < 40; k++) slice = nextSlice(slice, 10 + 0.004 * slice);
    const frame = 10 + 0.004 * slice;
    expect(frame).toBeGreaterThanOrEqual(22);
    expect(frame).toBeLessThanOrEqual(35);
    // and it stays there
    expect(nextSlice(slice, frame)).toBe(slice);
  });
});
