/**
 * Impossible input is refused with a RangeError (or TypeError for a wrong type) that names the field,
 * before anything is computed.
 */
import { describe, expect, it } from "vitest";
import { linearize } from "./linearize";
import { distancesTo, fieldAt, pointsAlong } from "./test-fields";

const X = distancesTo(10, 5);
const S = fieldAt(X, (x) => [1, 2 + x, 3, 0, 0, 0]);
const DIR = [1, 0, 0] as const;

describe("linearize: impossible input (our rules, stated in linearize.ts and path.ts)", () => {
  it("when fewer than 3 points or a length that is not a multiple of 6 is given, then a RangeError names stresses", () => {
    const two = new Float64Array(12);
    expect(() =>
      linearize({ stresses: two, distances: new Float64Array([0, 1]), lineDirection: DIR }),
    ).toThrow(/stresses gives 2 point\(s\); a line needs at least 3/);
    expect(() => linearize({ stresses: new Float64Array(20), distances: X, lineDirection: DIR })).toThrow(
      /stresses has 20 values, not a multiple of 6/,
    );
  });

  it("when a stress is not finite, then the RangeError names its index, point and component", () => {
    const bad = S.slice();
    bad[6 * 3 + 4] = NaN;
    expect(() => linearize({ stresses: bad, distances: X, lineDirection: DIR })).toThrow(
      /stresses\[22\] \(point 3, σyz\) must be finite/,
    );
  });

  it("when distances do not strictly increase, are not finite, or have the wrong length, then the RangeError names distances", () => {
    const same = new Float64Array([0, 1, 1, 2, 3]);
    expect(() => linearize({ stresses: S, distances: same, lineDirection: DIR })).toThrow(
      /distances\[2\]: distances along the line must strictly increase/,
    );
    const down = new Float64Array([4, 3, 2, 1, 0]);
    expect(() => linearize({ stresses: S, distances: down, lineDirection: DIR })).toThrow(/distances\[1\]/);
    const inf = new Float64Array([0, 1, Infinity, 3, 4]);
    expect(() => linearize({ stresses: S, distances: inf, lineDirection: DIR })).toThrow(
      /distances\[2\] must be finite/,
    );
    expect(() => linearize({ stresses: S, distances: new Float64Array(4), lineDirection: DIR })).toThrow(
      /distances has 4 values; the stresses give 5 points/,
    );
  });

  it("when the coordinates give zero thickness, double back, or have the wrong length, then the RangeError names coordinates", () => {
    const c = pointsAlong([0, 0, 0], [0, 0, 1], X);
    const closed = c.slice();
    closed.set([0, 0, 0], 12); // last point back on the first
    expect(() => linearize({ stresses: S, coordinates: closed })).toThrow(
      /coordinates: the first and last point coincide/,
    );
    const back = c.slice();
    back[3 * 2 + 2] = 1; // point 2 behind point 1
    expect(() => linearize({ stresses: S, coordinates: back })).toThrow(/coordinates \(point 2\)/);
    expect(() => linearize({ stresses: S, coordinates: c.subarray(3) })).toThrow(/coordinates has 12 values/);
  });

  it("when the line is not given, given twice, or the second axis lies along it, then the RangeError names the field", () => {
    expect(() => linearize({ stresses: S, distances: X })).toThrow(
      /lineDirection must be given with distances/,
    );
    expect(() => linearize({ stresses: S, distances: X, lineDirection: [0, 0, 0] })).toThrow(
      /lineDirection must be a non-zero vector/,
    );
    expect(() => linearize({ stresses: S })).toThrow(/distances or coordinates must be given/);
    expect(() =>
      linearize({
        stresses: S,
        distances: X,
        coordinates: pointsAlong([0, 0, 0], DIR, X),
        lineDirection: DIR,
      }),
    ).toThrow(/give one of them, not both/);
    expect(() =>
      linearize({ stresses: S, coordinates: pointsAlong([0, 0, 0], DIR, X), lineDirection: DIR }),
    ).toThrow(/lineDirection: give it only with distances/);
    expect(() =>
      linearize({ stresses: S, distances: X, lineDirection: DIR, secondAxis: [-2, 0, 0] }),
    ).toThrow(/secondAxis must not be parallel to the line/);
  });

  it("when an option is unknown, then the RangeError names it", () => {
    expect(() =>
      linearize({ stresses: S, distances: X, lineDirection: DIR, bending: "membrane-only" as "annex-5a" }),
    ).toThrow(/bending must be one of "annex-5a", "all-components"/);
    expect(() =>
      linearize({ stresses: S, distances: X, lineDirection: DIR, equivalent: "rankine" as "tresca" }),
    ).toThrow(/equivalent must be one of "von-mises", "tresca"/);
  });

  it("when the second axis is not quite perpendicular to the line, then its part along the line is removed and a note says so", () => {
    const r = linearize({ stresses: S, distances: X, lineDirection: DIR, secondAxis: [0.1, 1, 0] });
    expect(r.frame[1][0]).toBeCloseTo(0, 14);
    expect(r.frame[1][1]).toBeCloseTo(1, 14);
    expect(r.notes.join(" ")).toContain("off perpendicular to the line");
  });
});
