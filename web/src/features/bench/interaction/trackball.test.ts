import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { IDENTITY_ROTATION, rotateTensor, type Mat3 } from "../../../../../core";
import { KEY_STEP, keyTurn } from "./keyboard";
import { beginTrackball, liftToBall, trackballRotation, trackballTurn } from "./trackball";

const FRONT: Mat3 = IDENTITY_ROTATION; // screen right = x, up = y, towards viewer = z
const coord = fc.double({ min: -0.95, max: 0.95, noNaN: true });

describe("trackball and keyboard turning", () => {
  it("when the pointer drags right across the centre of a front view, then the element turns about +y (the screen's vertical), right way round", () => {
    const t = trackballTurn(beginTrackball([0, 0], FRONT, FRONT), [0.3, 0]);
    expect(t!.axis[0]).toBeCloseTo(0, 12);
    expect(t!.axis[1]).toBeGreaterThan(0);
    expect(t!.axis[2]).toBeCloseTo(0, 12);
    // The front face's normal z′ swings towards +x, i.e. the face follows the pointer to the right.
    const r = trackballRotation(beginTrackball([0, 0], FRONT, FRONT), [0.3, 0])!;
    expect(r[2][0]).toBeGreaterThan(0);
  });

  it("when any drag is made, then the frame stays a proper rotation and the readout keeps core's invariants (seeded property)", () => {
    const s = { xx: 80, yy: -40, zz: 10, xy: 30, yz: -15, zx: 5 };
    fc.assert(
      fc.property(coord, coord, coord, coord, (x0, y0, x1, y1) => {
        const r = trackballRotation(beginTrackball([x0, y0], FRONT, FRONT), [x1, y1])!;
        const det =
          r[0][0] * (r[1][1] * r[2][2] - r[1][2] * r[2][1]) -
          r[0][1] * (r[1][0] * r[2][2] - r[1][2] * r[2][0]) +
          r[0][2] * (r[1][0] * r[2][1] - r[1][1] * r[2][0]);
        expect(det).toBeCloseTo(1, 12);
        const t = rotateTensor(s, r);
        expect(t.xx + t.yy + t.zz).toBeCloseTo(50, 9);
      }),
      { seed: 9, numRuns: 200 },
    );
  });

  it("when the pointer lifts onto the ball, then the point has unit length and sits in front", () => {
    for (const p of [
      [0, 0],
      [0.5, 0.5],
      [0.9, -0.9],
    ] as const) {
      const b = liftToBall(p);
      expect(Math.hypot(...b)).toBeCloseTo(1, 14);
      expect(b[2]).toBeGreaterThan(0);
    }
  });

  it("when arrow keys are pressed, then the step is 5°, 15° with Shift and 1° with Alt, about the matching view axis", () => {
    expect(keyTurn("ArrowRight", { shiftKey: false, altKey: false })).toEqual({
      viewAxis: 1,
      angleDeg: KEY_STEP.normal,
    });
    expect(keyTurn("ArrowLeft", { shiftKey: true, altKey: false })).toEqual({ viewAxis: 1, angleDeg: -15 });
    expect(keyTurn("ArrowUp", { shiftKey: false, altKey: true })).toEqual({ viewAxis: 0, angleDeg: -1 });
    expect(keyTurn("PageUp", { shiftKey: false, altKey: false })).toEqual({ viewAxis: 2, angleDeg: 5 });
    expect(keyTurn("a", { shiftKey: false, altKey: false })).toBeNull();
  });
});
