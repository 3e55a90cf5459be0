import { describe, expect, it } from "vitest";
import { probeAfterKey, probeStart } from "./envelope-probe";

describe("the envelope plot's keyboard probe", () => {
  it("when an arrow is pressed, then the probe moves one twentieth of the half-width that way from the origin or where it was, five times as far with Shift", () => {
    expect(probeAfterKey(null, "ArrowRight", false, 200, null)).toEqual([10, 0]);
    expect(probeAfterKey([10, 0], "ArrowUp", false, 200, null)).toEqual([10, 10]);
    expect(probeAfterKey([10, 10], "ArrowLeft", true, 200, null)).toEqual([-40, 10]);
    expect(probeAfterKey([10, 10], "ArrowDown", true, 200, null)).toEqual([10, -40]);
  });

  it("when an arrow would carry the probe past the plot's edge, then it stops on the edge", () => {
    expect(probeAfterKey([195, -198], "ArrowRight", true, 200, null)).toEqual([200, -198]);
    expect(probeAfterKey([195, -198], "ArrowDown", false, 200, null)).toEqual([195, -200]);
  });

  it("when Home or Escape is pressed, then the probe goes to the state (the origin without one) or away; other keys are left alone", () => {
    expect(probeAfterKey([1, 2], "Home", false, 200, [150, -4])).toEqual([150, -4]);
    expect(probeAfterKey([1, 2], "Home", false, 200, null)).toEqual([0, 0]);
    expect(probeAfterKey([1, 2], "Escape", false, 200, [150, -4])).toBeNull();
    expect(probeAfterKey([1, 2], "a", false, 200, null)).toBeUndefined();
    expect(probeStart([3, 4])).toEqual([3, 4]);
  });
});
