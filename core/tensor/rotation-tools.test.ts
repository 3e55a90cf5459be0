import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { rotationFromQuaternion } from "../testing/fixtures";
import { rotationFromAxisAngle, rotationFromEuler } from "./rotate";
import {
  angleAboutZ,
  axisAngleFromRotation,
  eulerFromRotation,
  frameWithFirstAxis,
  multiplyMat3,
  orthonormalize,
  transposeMat3,
} from "./rotation-tools";
import type { Mat3 } from "./types";

const quaternion = fc.tuple(
  fc.double({ min: -1, max: 1, noNaN: true }),
  fc.double({ min: -1, max: 1, noNaN: true }),
  fc.double({ min: -1, max: 1, noNaN: true }),
  fc.double({ min: -1, max: 1, noNaN: true }),
);
const asMat3 = (m: number[][]): Mat3 => [
  [m[0][0], m[0][1], m[0][2]],
  [m[1][0], m[1][1], m[1][2]],
  [m[2][0], m[2][1], m[2][2]],
];
const maxDiff = (a: Mat3, b: Mat3): number =>
  Math.max(...a.flatMap((row, i) => row.map((v, j) => Math.abs(v - b[i][j]))));
const SEQUENCES = ["XYZ", "XZY", "YXZ", "YZX", "ZXY", "ZYX", "XYX", "XZX", "YXY", "YZY", "ZXZ", "ZYZ"];

describe("rotation tools", () => {
  it("when two turns about z are multiplied, then the angles add (rotation group property, common practice, no source)", () => {
    const r = multiplyMat3(rotationFromAxisAngle([0, 0, 1], 20), rotationFromAxisAngle([0, 0, 1], 35));
    expect(maxDiff(r, rotationFromAxisAngle([0, 0, 1], 55))).toBeLessThan(1e-15);
    expect(
      maxDiff(multiplyMat3(r, transposeMat3(r)), [
        [1, 0, 0],
        [0, 1, 0],
        [0, 0, 1],
      ]),
    ).toBeLessThan(1e-15);
  });

  it("when a random rotation is read as axis and angle, then rotationFromAxisAngle gives it back (seeded property)", () => {
    fc.assert(
      fc.property(quaternion, ([w, x, y, z]) => {
        const r = asMat3(rotationFromQuaternion(w, x, y, z));
        const { axis, angleDeg } = axisAngleFromRotation(r);
        expect(angleDeg).toBeGreaterThanOrEqual(0);
        expect(angleDeg).toBeLessThanOrEqual(180);
        expect(maxDiff(rotationFromAxisAngle(axis, angleDeg), r)).toBeLessThan(1e-9);
      }),
      { seed: 42, numRuns: 400 },
    );
  });

  it("when the angle is 180° or 0°, then the axis-angle read-back still reproduces the rotation", () => {
    for (const axis of [
      [1, 0, 0],
      [0, 1, 0],
      [1, 2, -2],
      [0.3, -0.4, 0.1],
    ] as const) {
      for (const angle of [180, 179.99999, 0.000001]) {
        const r = rotationFromAxisAngle(axis, angle);
        const back = axisAngleFromRotation(r);
        expect(maxDiff(rotationFromAxisAngle(back.axis, back.angleDeg), r)).toBeLessThan(1e-9);
      }
    }
    expect(
      axisAngleFromRotation([
        [1, 0, 0],
        [0, 1, 0],
        [0, 0, 1],
      ]),
    ).toEqual({ axis: [0, 0, 1], angleDeg: 0 });
  });

  it("when a random rotation is read as Euler angles in each of the twelve sequences, then rotationFromEuler gives it back (seeded property)", () => {
    fc.assert(
      fc.property(quaternion, fc.constantFrom(...SEQUENCES), ([w, x, y, z], seq) => {
        const r = asMat3(rotationFromQuaternion(w, x, y, z));
        const angles = eulerFromRotation(seq, r);
        // Near gimbal lock only the sum (or difference) of the outer angles is defined: 1e-8 allows for that.
        expect(maxDiff(rotationFromEuler(seq, angles), r)).toBeLessThan(1e-8);
      }),
      { seed: 7, numRuns: 600 },
    );
  });

  it("when known ZYX angles are given, then they are read back, and at gimbal lock the rotation is still reproduced", () => {
    const back = eulerFromRotation("ZYX", rotationFromEuler("ZYX", [30, 20, -10]));
    expect(back[0]).toBeCloseTo(30, 10);
    expect(back[1]).toBeCloseTo(20, 10);
    expect(back[2]).toBeCloseTo(-10, 10);
    for (const seq of SEQUENCES) {
      const middle = seq[0] === seq[2] ? 0 : 90;
      const r = rotationFromEuler(seq, [25, middle, 40]);
      expect(maxDiff(rotationFromEuler(seq, eulerFromRotation(seq, r)), r)).toBeLessThan(1e-7);
    }
    expect(() => eulerFromRotation("XXY", rotationFromEuler("ZYX", [0, 0, 0]))).toThrow(RangeError);
  });

  it("when a rotation drifts, then orthonormalize returns a proper rotation close to it", () => {
    const r = rotationFromAxisAngle([1, 2, 3], 40);
    const drifted: Mat3 = [[r[0][0] * 1.001, r[0][1], r[0][2]], [r[1][0], r[1][1] + 0.0005, r[1][2]], r[2]];
    const o = orthonormalize(drifted);
    expect(
      maxDiff(multiplyMat3(o, transposeMat3(o)), [
        [1, 0, 0],
        [0, 1, 0],
        [0, 0, 1],
      ]),
    ).toBeLessThan(1e-15);
    expect(maxDiff(o, r)).toBeLessThan(2e-3);
  });

  it("when the rotation is about z, then angleAboutZ returns its angle; otherwise null", () => {
    expect(angleAboutZ(rotationFromAxisAngle([0, 0, 1], 37.5))).toBeCloseTo(37.5, 12);
    expect(angleAboutZ(rotationFromAxisAngle([0, 0, 1], -120))).toBeCloseTo(-120, 12);
    expect(angleAboutZ(rotationFromAxisAngle([1, 0, 0], 10))).toBeNull();
  });

  it("when a frame is built on a normal, then its first axis is that normal and it is right-handed", () => {
    const f = frameWithFirstAxis([0, 3, 4]);
    expect(f[0]).toEqual([0, 0.6, 0.8]);
    expect(
      maxDiff(multiplyMat3(f, transposeMat3(f)), [
        [1, 0, 0],
        [0, 1, 0],
        [0, 0, 1],
      ]),
    ).toBeLessThan(1e-15);
    const z = f[2];
    const c = [
      f[0][1] * f[1][2] - f[0][2] * f[1][1],
      f[0][2] * f[1][0] - f[0][0] * f[1][2],
      f[0][0] * f[1][1] - f[0][1] * f[1][0],
    ];
    expect(Math.max(...z.map((v, i) => Math.abs(v - c[i])))).toBeLessThan(1e-15);
  });
});
