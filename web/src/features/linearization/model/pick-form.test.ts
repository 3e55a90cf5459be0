import { describe, expect, it } from "vitest";
import type { PathFromPointTable } from "../../../../../core/contract/linearizations";
import { EMPTY_FORM, requestBodyOf } from "./line-form";
import { EMPTY_PICK, formWithPickedPath, pickableTables, pickRequestOf, pickSummary } from "./pick-form";

const TABLE = "5b0c7a52-2f57-4d3f-9d41-0d7c1a3f2b10";
const filled = { tableId: TABLE, start: ["0", "0", "0"], end: ["10", "0", "0"], tolerance: "0,1" } as const;

const picked = (points: number): PathFromPointTable => ({
  table: { id: TABLE, fileName: "nozzle.csv", unit: "MPa" },
  found: points + 1,
  pointCount: points,
  lineLength: 10,
  path:
    points >= 3
      ? {
          positions: "distance",
          lengthUnit: "mm",
          stressUnit: "MPa",
          lineDirection: [1, 0, 0],
          points: Array.from({ length: points }, (_, i) => ({
            distance: (10 * i) / (points - 1),
            xx: -1,
            yy: 200 - (20 * 10 * i) / (points - 1),
            zz: 50,
            xy: 0,
            yz: 0,
            zx: 0,
          })),
        }
      : null,
  notes: [],
  warnings: [],
});

describe("the pick form", () => {
  it("when a table, two ends and a tolerance with a decimal comma are typed, then the request carries them as numbers with the line's length unit", () => {
    const r = pickRequestOf({ ...filled, start: [...filled.start], end: [...filled.end] }, "in");
    expect(r).toEqual({
      ok: true,
      body: { tableId: TABLE, start: [0, 0, 0], end: [10, 0, 0], tolerance: 0.1, lengthUnit: "in" },
    });
  });

  it("when nothing is typed, then each missing field is named", () => {
    const r = pickRequestOf(EMPTY_PICK, "mm");
    expect(r.ok).toBe(false);
    if (!r.ok) expect(Object.keys(r.problems).sort()).toEqual(["end", "start", "tableId", "tolerance"]);
  });

  it("when the ends coincide or the tolerance is not positive, then end and tolerance are named", () => {
    const r = pickRequestOf(
      { tableId: TABLE, start: ["1", "2", "3"], end: ["1", "2", "3"], tolerance: "-1" },
      "mm",
    );
    expect(r.ok).toBe(false);
    if (!r.ok) expect(Object.keys(r.problems).sort()).toEqual(["end", "tolerance"]);
  });

  it("when tables are listed, then only those with x y z columns can be picked from", () => {
    const t = pickableTables([
      { id: "a", fileName: "a.csv", pointCount: 3, columns: { x: 0, y: 1, z: 2, xx: 3 } },
      { id: "b", fileName: "b.csv", pointCount: 3, columns: { xx: 0 } },
    ]);
    expect(t.map((x) => x.hasCoordinates)).toEqual([true, false]);
  });

  it("when a path was picked, then the summary says how many points were found and merged, and whether it can be used", () => {
    expect(pickSummary(picked(11))).toBe(
      '12 points of "nozzle.csv" within the tolerance, 11 places along the line (1 coincident merged). Ready to use: 11 points in MPa.',
    );
    expect(pickSummary(picked(2))).toMatch(/Too few or too many/);
  });

  it("when the picked path is used, then the line form holds it as a distance table the form reads back as the same points", () => {
    const form = formWithPickedPath({ ...EMPTY_FORM, S: "138", stressUnit: "psi" }, picked(11));
    expect(form.stressUnit).toBe("MPa");
    expect(form.lineDirection).toEqual(["1", "0", "0"]);
    const body = requestBodyOf(form);
    expect(body.ok).toBe(true);
    if (body.ok) {
      expect(body.body.path.positions).toBe("distance");
      expect(body.body.path.points).toEqual(picked(11).path!.points);
      expect(body.body.path.lineDirection).toEqual([1, 0, 0]);
    }
  });

  it("when the pick gave no path, then the line form is left as it was", () => {
    const form = { ...EMPTY_FORM, pathText: "typed" };
    expect(formWithPickedPath(form, picked(2))).toBe(form);
  });
});
