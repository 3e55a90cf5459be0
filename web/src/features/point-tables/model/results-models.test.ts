import { interpolateCividis } from "d3";
import { describe, expect, it } from "vitest";
import { evaluateState, principalValues, vonMises } from "../../../../../core";
import { seededRandom } from "../../../../../core/testing/fixtures";
import { COLOUR_STEPS, COLOUR_TOP, colourStep, colourTable, fillColours, legendTicks } from "./colour-scale";
import { histogramGeometry } from "./histogram";
import {
  OPEN_BOX,
  nextSort,
  readBound,
  rowsOf,
  sortRows,
  worstInBox,
  worstInBoxSteps,
  type CoordinateBox,
} from "./worst-points";

/** Relative luminance of an sRGB colour (WCAG 2.x definition). */
function luminance(r: number, g: number, b: number): number {
  const lin = (c: number) => (c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);
  return 0.2126 * lin(r) + 0.7152 * lin(g) + 0.0722 * lin(b);
}

describe("colour scale and legend", () => {
  it("when the colour table is built, then its ends are d3-scale-chromatic's cividis at 0 and 1", () => {
    const table = colourTable();
    const css = (k: number) => `rgb(${[0, 1, 2].map((c) => Math.round(table[3 * k + c] * 255)).join(", ")})`;
    expect(css(0)).toBe(interpolateCividis(0));
    expect(css(COLOUR_STEPS - 1)).toBe(interpolateCividis(1));
  });

  it("when utilisation rises, then the colour's luminance (WCAG relative luminance) never falls, so the scale reads in greyscale", () => {
    const t = colourTable();
    let last = -1;
    for (let k = 0; k < COLOUR_STEPS; k += 5) {
      const l = luminance(t[3 * k], t[3 * k + 1], t[3 * k + 2]);
      expect(l).toBeGreaterThanOrEqual(last);
      last = l;
    }
  });

  it("when points are coloured, then u at or over the top takes the last entry and NaN the first", () => {
    const t = colourTable();
    const out = fillColours(Float64Array.of(Number.NaN, 0.75, 2.4), t, new Float32Array(9));
    expect(colourStep(0.75)).toBe(128);
    expect(Array.from(out.subarray(3, 6))).toEqual(Array.from(t.subarray(3 * 128, 3 * 129)));
    expect(Array.from(out.subarray(6, 9))).toEqual(Array.from(t.subarray(3 * 255, 3 * 256)));
    expect(Array.from(out.subarray(0, 3))).toEqual(Array.from(t.subarray(0, 3)));
  });

  it("when the legend is laid out, then ticks run from 0 to an open top with u = 1 marked as the required factor", () => {
    const ticks = legendTicks(0.25);
    expect(ticks.map((t) => t.label)).toEqual(["0.00", "0.25", "0.50", "0.75", "1.00", "1.25", "≥ 1.50"]);
    expect(ticks.filter((t) => t.required).map((t) => t.at)).toEqual([1 / COLOUR_TOP]);
  });
});

describe("histogramGeometry", () => {
  it("when bins are laid out, then bars touch the axis, the tallest reaches the top and u = 1 falls at its place", () => {
    const g = histogramGeometry({ binWidth: 0.5, max: 1.5, counts: [10, 40, 5, 1] }, 400, 100);
    expect(g.bars).toHaveLength(4);
    expect(g.bars.map((b) => b.y + b.height)).toEqual([100, 100, 100, 100]);
    expect(Math.min(...g.bars.map((b) => b.y))).toBe(0);
    expect(g.requiredAt).toBeCloseTo(200, 9);
    expect(g.bars.map((b) => b.verdict)).toEqual(["pass", "pass", "fail", "fail"]);
    expect(g.bars[3].to).toBeNull();
  });
});

describe("worstInBox", () => {
  const random = seededRandom(11);
  const n = 5000;
  const u = Float64Array.from({ length: n }, () => random() * 2);
  u[17] = Number.NaN;
  const coords = Float64Array.from({ length: 3 * n }, () => random() * 10);

  it("when the box is open, then the list is the top of a full sort (highest first, NaN left out)", () => {
    const expected = Array.from(u.keys())
      .filter((i) => !Number.isNaN(u[i]))
      .sort((a, b) => u[b] - u[a] || a - b)
      .slice(0, 50);
    expect(worstInBox(u, coords, OPEN_BOX, 50)).toEqual(expected);
  });

  it("when a box is given, then only points inside it are listed, still highest first", () => {
    const box: CoordinateBox = { x: [2, 5], y: [null, 3], z: [1, null] };
    const within = (i: number) =>
      coords[3 * i] >= 2 && coords[3 * i] <= 5 && coords[3 * i + 1] <= 3 && coords[3 * i + 2] >= 1;
    const expected = Array.from(u.keys())
      .filter((i) => !Number.isNaN(u[i]) && within(i))
      .sort((a, b) => u[b] - u[a] || a - b)
      .slice(0, 30);
    const got = worstInBox(u, coords, box, 30);
    expect(got).toEqual(expected);
    expect(got.length).toBe(30);
  });

  it("when the list is found in slices of 700 points (as the page does), then it is the same top of a full sort, found over one pause per slice", () => {
    const box: CoordinateBox = { x: [1, 8], y: [null, null], z: [null, 9] };
    const within = (i: number) => coords[3 * i] >= 1 && coords[3 * i] <= 8 && coords[3 * i + 2] <= 9;
    const expected = Array.from(u.keys())
      .filter((i) => !Number.isNaN(u[i]) && within(i))
      .sort((a, b) => u[b] - u[a] || a - b)
      .slice(0, 40);
    const steps = worstInBoxSteps(u, coords, box, 40, 700);
    let pauses = 0;
    let next = steps.next();
    while (next.done !== true) {
      pauses++;
      next = steps.next();
    }
    expect(next.value).toEqual(expected);
    expect(pauses).toBe(Math.ceil(n / 700) - 1);
  });
});

describe("rowsOf and sortRows", () => {
  const components = Float64Array.of(
    100e6,
    0,
    0,
    0,
    0,
    0,
    50e6,
    -50e6,
    0,
    20e6,
    0,
    0,
    10e6,
    10e6,
    10e6,
    0,
    0,
    0,
  );
  const table = {
    components,
    coordinates: Float64Array.of(0, 0, 0, 1, 2, 3, 4, 5, 6),
    ids: ["A", "B10", "B9"],
  };
  const u = Float64Array.of(0.6, 1.2, 0);

  it("when rows are built, then each point's stresses equal core's object API on its tensor", () => {
    const rows = rowsOf(table, u, [1]);
    const t = { xx: 50e6, yy: -50e6, zz: 0, xy: 20e6, yz: 0, zx: 0 };
    const [s1, , s3] = principalValues(t);
    expect(rows[0]).toMatchObject({
      id: "B10",
      x: 1,
      y: 2,
      z: 3,
      s1,
      s3,
      vonMises: vonMises(t),
      verdict: "fail",
    });
    // von Mises of uniaxial σ: σ itself (formula)
    expect(rowsOf(table, u, [0])[0].vonMises).toBeCloseTo(100e6, 3);
    // the verdict agrees with the object API's for a check at that utilisation
    const check = evaluateState(t, { yield: 250e6 }, [{ criterion: "von-mises", requiredFactor: 1.5 }]);
    expect(check.checks[0].status).toBe("evaluated");
  });

  it("when sorted by id, then text ids sort in natural order, and a second click reverses it", () => {
    const rows = rowsOf(table, u, [0, 1, 2]);
    const byId = nextSort({ key: "utilisation", descending: true }, "id");
    expect(sortRows(rows, { ...byId, descending: false }).map((r) => r.id)).toEqual(["A", "B9", "B10"]);
    expect(sortRows(rows, nextSort(byId, "id")).map((r) => r.id)).toEqual(["A", "B9", "B10"]);
    expect(sortRows(rows, byId).map((r) => r.id)).toEqual(["B10", "B9", "A"]);
    expect(sortRows(rows, { key: "utilisation", descending: true }).map((r) => r.index)).toEqual([1, 0, 2]);
  });

  it("when a box side is typed, then empty is open, a decimal comma is read and a word is refused naming the field", () => {
    expect(readBound("", "x from")).toEqual({ value: null });
    expect(readBound(" 2,5 ", "x from")).toEqual({ value: 2.5 });
    expect(readBound("abc", "x from")).toEqual({ error: "x from must be a number or empty." });
  });
});
