import { BufferAttribute, BufferGeometry } from "three";
import { describe, expect, it } from "vitest";
import { seededRandom } from "../../../../../core/testing/fixtures";
import { cloudBuffers } from "./cloud-buffers";
import { colourStep, colourTable, COLOUR_STEPS } from "./colour-scale";

describe("cloudBuffers (the 3D view's arrays, made in a worker)", () => {
  it("when 2000 seeded points are given, then the bounding sphere equals three.js's computeBoundingSphere on the same positions", () => {
    const random = seededRandom(31);
    const n = 2000;
    const coordinates = Float64Array.from(
      { length: 3 * n },
      (_, i) => (i % 3 === 0 ? 400 : 50) * random() - 20,
    );
    const utilisation = Float64Array.from({ length: n }, () => 2 * random());
    const { positions, sphere } = cloudBuffers(coordinates, utilisation);
    const g = new BufferGeometry();
    g.setAttribute("position", new BufferAttribute(positions, 3));
    g.computeBoundingSphere();
    expect(sphere.radius).toBeCloseTo(g.boundingSphere!.radius, 6);
    expect(sphere.centre[0]).toBeCloseTo(g.boundingSphere!.center.x, 6);
    expect(sphere.centre[1]).toBeCloseTo(g.boundingSphere!.center.y, 6);
    expect(sphere.centre[2]).toBeCloseTo(g.boundingSphere!.center.z, 6);
  });

  it("when the points span 400 along x and 50 along y and z, then x runs from −1 to 1 and the others keep their proportion (formula)", () => {
    const coordinates = Float64Array.of(-20, 0, 10, 380, 50, 60, 180, 25, 35);
    const { positions } = cloudBuffers(coordinates, Float64Array.of(0, 1, Number.NaN));
    // centre (180, 25, 35), span 400: (v − centre) · 2 / 400
    expect(Array.from(positions)).toEqual(
      [-1, -0.125, -0.125, 1, 0.125, 0.125, 0, 0, 0].map((v) => Math.fround(v)),
    );
  });

  it("when a point's utilisation is 0, 1 or NaN, then its colour is the colour table's entry for it (colour-scale.ts)", () => {
    const table = colourTable();
    const { colours } = cloudBuffers(new Float64Array(9), Float64Array.of(0, 1, Number.NaN));
    const entry = (u: number) => Array.from(table.subarray(3 * colourStep(u), 3 * colourStep(u) + 3));
    expect(Array.from(colours)).toEqual([...entry(0), ...entry(1), ...entry(0)]);
    expect(colourStep(1)).toBe(Math.round((COLOUR_STEPS - 1) / 1.5));
  });
});

describe("cloudBuffers of a sample of the points", () => {
  it("when only some points are drawn, then each drawn point has the position and colour it has among all points (the box stays the whole table's), and the sphere is three.js's of the drawn positions", () => {
    const random = seededRandom(5);
    const n = 3000;
    const coordinates = Float64Array.from({ length: 3 * n }, () => 100 * random() - 30);
    const utilisation = Float64Array.from({ length: n }, () => 1.6 * random());
    const indices = Uint32Array.from({ length: 400 }, (_, k) => 7 * k + (k % 5));
    const all = cloudBuffers(coordinates, utilisation);
    const some = cloudBuffers(coordinates, utilisation, indices);
    expect(some.positions.length).toBe(3 * indices.length);
    indices.forEach((i, k) => {
      expect(Array.from(some.positions.subarray(3 * k, 3 * k + 3))).toEqual(
        Array.from(all.positions.subarray(3 * i, 3 * i + 3)),
      );
      expect(Array.from(some.colours.subarray(3 * k, 3 * k + 3))).toEqual(
        Array.from(all.colours.subarray(3 * i, 3 * i + 3)),
      );
    });
    const g = new BufferGeometry();
    g.setAttribute("position", new BufferAttribute(some.positions, 3));
    g.computeBoundingSphere();
    expect(some.sphere.radius).toBeCloseTo(g.boundingSphere!.radius, 6);
    expect(some.sphere.centre[0]).toBeCloseTo(g.boundingSphere!.center.x, 6);
  });
});
