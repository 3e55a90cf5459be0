import { describe, expect, it } from "vitest";
import {
  evaluatePointTable,
  evaluateState,
  parsePointTable,
  type CheckRequirement,
  type Material,
  type PointTable,
} from "../../../../../core";
import { seededRandom } from "../../../../../core/testing/fixtures";
import type { PointTableEvaluationView } from "../../../entities/point-table/contract";
import {
  evaluationFromServer,
  rateInSlices,
  ratingDisagreements,
  tableFromColumns,
  tableFromColumnsInSlices,
  utilisationOfWorst,
} from "./stored-results";

const STEEL: Material = { yield: 250e6, ultimateTension: 400e6 };
const CHECKS: CheckRequirement[] = [
  { criterion: "von-mises", requiredFactor: 1.5 },
  { criterion: "tresca", requiredFactor: 1.5 },
];
const noPause = () => Promise.resolve();

/** `count` seeded random tensors (Pa), components uniform in ±scale scaled down at random, so verdicts vary. */
function randomComponents(count: number, seed: number, scale = 200e6): Float64Array {
  const rnd = seededRandom(seed);
  const out = new Float64Array(6 * count);
  for (let k = 0; k < count; k++) {
    const size = scale * rnd() ** 2;
    for (let c = 0; c < 6; c++) out[6 * k + c] = (rnd() * 2 - 1) * size;
  }
  return out;
}

/** What GET …/columns sends for a parsed table: its columns one after another (NaN coordinates without any). */
function columnsOf(table: PointTable): Float64Array {
  const n = table.count;
  const out = new Float64Array(9 * n);
  for (let i = 0; i < n; i++) {
    for (let c = 0; c < 6; c++) out[c * n + i] = table.components[6 * i + c];
    for (let a = 0; a < 3; a++) out[(6 + a) * n + i] = table.coordinates?.[3 * i + a] ?? Number.NaN;
  }
  return out;
}

const CSV = [
  "id,x,y,z,sxx,syy,szz,sxy,syz,szx",
  "N1,0,0,0,100,0,0,0,0,0",
  "N2,1.5,0,2,10,20,30,4,5,6",
  "N3,3,1,0,-50,25,0,12.5,0,-3",
].join("\n");
const MAPPING = {
  separator: "," as const,
  header: true,
  columns: { id: 0, x: 1, y: 2, z: 3, xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9 },
  unit: "MPa" as const,
};

describe("tableFromColumns", () => {
  it("when the server's columns of a table are turned back into a table, then components, coordinates and text ids equal what core's parser read from the file (round trip)", () => {
    const parsed = parsePointTable(CSV, { ...MAPPING, idKind: "text" });
    const table = tableFromColumns(columnsOf(parsed), parsed.count, ["N1", "N2", "N3"], {
      idKind: "text",
      hasCoordinates: true,
      badRows: { count: 0, first: [] },
    });
    expect(Array.from(table.components)).toEqual(Array.from(parsed.components));
    expect(Array.from(table.coordinates ?? [])).toEqual(Array.from(parsed.coordinates ?? []));
    expect(table.ids).toEqual(["N1", "N2", "N3"]);
  });

  it("when the table has no coordinates and no id column, then coordinates and ids are null and the components still land 6 per point", () => {
    const parsed = parsePointTable(CSV, {
      ...MAPPING,
      columns: { xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9 },
    });
    const table = tableFromColumns(columnsOf(parsed), 3, null, {
      idKind: "number",
      hasCoordinates: false,
      badRows: { count: 1, first: [{ line: 9, reason: "sxx is not a number" }] },
    });
    expect(table.coordinates).toBeNull();
    expect(table.ids).toBeNull();
    // σyy of the second point: 20 MPa
    expect(table.components[6 + 1]).toBe(20e6);
    expect(table.badRows.count).toBe(1);
  });

  it("when number ids come as JSON numbers, then they are kept as a Float64Array", () => {
    const table = tableFromColumns(new Float64Array(18), 2, [101, 205], {
      idKind: "number",
      hasCoordinates: false,
      badRows: { count: 0, first: [] },
    });
    expect(table.ids).toBeInstanceOf(Float64Array);
    expect(Array.from(table.ids as Float64Array)).toEqual([101, 205]);
  });

  it("when the columns or the ids do not match the count, then it refuses with a RangeError", () => {
    const stored = { idKind: "number" as const, hasCoordinates: false, badRows: { count: 0, first: [] } };
    expect(() => tableFromColumns(new Float64Array(17), 2, null, stored)).toThrow(RangeError);
    expect(() => tableFromColumns(new Float64Array(18), 2, [1], stored)).toThrow(RangeError);
  });
});

describe("tableFromColumnsInSlices", () => {
  it("when 10,000 seeded points are turned 999 at a time, then the table equals the one turned in one go, and a cancel stops it with null", async () => {
    const n = 10_000;
    const rnd = seededRandom(9);
    const columns = Float64Array.from({ length: 9 * n }, () => rnd() * 1e8 - 5e7);
    const stored = { idKind: "number" as const, hasCoordinates: true, badRows: { count: 0, first: [] } };
    const whole = tableFromColumns(columns, n, null, stored);
    let pauses = 0;
    const sliced = await tableFromColumnsInSlices(columns, n, null, stored, {
      slice: 999,
      pause: () => (pauses++, Promise.resolve()),
    });
    expect(pauses).toBe(Math.ceil(n / 999));
    expect(Array.from(sliced!.components)).toEqual(Array.from(whole.components));
    expect(Array.from(sliced!.coordinates!)).toEqual(Array.from(whole.coordinates!));
    const stopped = await tableFromColumnsInSlices(columns, n, null, stored, {
      slice: 999,
      pause: noPause,
      isCancelled: () => true,
    });
    expect(stopped).toBeNull();
  });
});

function serverEvaluation(): PointTableEvaluationView {
  return {
    evaluatedAt: "2026-12-03T12:00:00.000Z",
    material: { label: "SA-516 Grade 70", note: "" },
    countFail: 1,
    countClose: 2,
    badPoints: 0,
    perCriterion: [
      {
        criterion: "von-mises",
        status: "evaluated",
        reason: null,
        requiredFactor: 1.5,
        category: null,
        governing: {
          index: 2,
          id: 3,
          x: null,
          y: null,
          z: null,
          factor: 0.9,
          utilisation: 1.5 / 0.9,
          verdict: "fail",
        },
        countFail: 1,
        countClose: 2,
      },
      {
        criterion: "tresca",
        status: "evaluated",
        reason: null,
        requiredFactor: 1.5,
        category: null,
        governing: {
          index: 0,
          id: 1,
          x: null,
          y: null,
          z: null,
          factor: null,
          utilisation: 0,
          verdict: "pass",
        },
        countFail: 0,
        countClose: 0,
      },
    ],
    histogram: { binWidth: 0.05, max: 1.5, counts: [1, 2, 0] },
    worst: [
      {
        index: 2,
        id: 3,
        x: null,
        y: null,
        z: null,
        utilisation: 1.5 / 0.9,
        verdict: "fail",
        componentsPa: { xx: 1, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 },
      },
    ],
  };
}

describe("evaluationFromServer", () => {
  it("when the server's evaluation is read, then its governing points, counts and histogram are the view's, and a factor sent as null is infinite", () => {
    const view = evaluationFromServer(serverEvaluation(), 3, new Float64Array(3));
    expect(view.criteria[0].governing).toEqual({ index: 2, factor: 0.9, utilisation: 1.5 / 0.9 });
    expect(view.criteria[1].governing?.factor).toBe(Infinity);
    expect([view.failing, view.close, view.criteria[0].failing, view.criteria[0].close]).toEqual([
      1, 2, 1, 2,
    ]);
    expect(view.histogram.counts).toEqual([1, 2, 0]);
    expect(view.worst).toEqual([{ index: 2, utilisation: 1.5 / 0.9 }]);
  });

  it("when the utilisation does not hold one value per point, then it refuses with a RangeError", () => {
    expect(() => evaluationFromServer(serverEvaluation(), 3, new Float64Array(2))).toThrow(RangeError);
  });
});

describe("utilisationOfWorst", () => {
  it("when only the server's worst points are known, then they carry their utilisation and every other point NaN", () => {
    const u = utilisationOfWorst(4, [
      { index: 3, utilisation: 1.2 },
      { index: 0, utilisation: 0.7 },
    ]);
    expect(u[3]).toBe(1.2);
    expect(u[0]).toBe(0.7);
    expect(Number.isNaN(u[1]) && Number.isNaN(u[2])).toBe(true);
  });
});

describe("rateInSlices", () => {
  it("when 5,000 seeded random points are rated in slices of 512, then every utilisation equals core's evaluatePointTable in one go and, on sampled points, the object API's evaluateState", async () => {
    const components = randomComponents(5000, 71);
    const spec = { material: STEEL, requirements: CHECKS };
    let reports = 0;
    const sliced = await rateInSlices(components, spec, false, {
      pause: noPause,
      slice: 512,
      onProgress: () => reports++,
    });
    const whole = evaluatePointTable(components, spec);
    expect(sliced).not.toBeNull();
    expect(Array.from(sliced!.utilisation)).toEqual(Array.from(whole.utilisation));
    expect(sliced!.criteria.map((c) => c.governing)).toEqual(whole.criteria.map((c) => c.governing));
    expect(reports).toBe(Math.ceil(5000 / 512));
    for (const k of [0, 1234, 4999]) {
      const o = 6 * k;
      const t = {
        xx: components[o],
        yy: components[o + 1],
        zz: components[o + 2],
        xy: components[o + 3],
        yz: components[o + 4],
        zx: components[o + 5],
      };
      const highest = Math.max(
        ...evaluateState(t, STEEL, CHECKS).checks.map((c) => (c.status === "evaluated" ? c.utilisation : -1)),
      );
      expect(sliced!.utilisation[k]).toBeCloseTo(highest, 12);
    }
  });

  it("when the rating is cancelled between slices, then it stops and answers null", async () => {
    let slices = 0;
    const rated = await rateInSlices(
      randomComponents(4000, 3),
      { material: STEEL, requirements: CHECKS },
      false,
      {
        pause: noPause,
        slice: 1000,
        onProgress: () => slices++,
        isCancelled: () => slices >= 2,
      },
    );
    expect(rated).toBeNull();
    expect(slices).toBe(2);
  });
});

describe("ratingDisagreements", () => {
  it("when this browser's governing points equal the server's, then there is no disagreement; when one moves, then its criterion is named", async () => {
    const components = randomComponents(2000, 5);
    const spec = { material: STEEL, requirements: CHECKS };
    const browser = (await rateInSlices(components, spec, false, { pause: noPause }))!;
    const server = browser.criteria.map((c) => ({ ...c, factor: undefined, utilisation: undefined }));
    expect(ratingDisagreements(server, browser.criteria)).toEqual([]);
    const moved = server.map((c, i) =>
      i === 1 && c.governing !== null
        ? { ...c, governing: { ...c.governing, index: c.governing.index + 1 } }
        : c,
    );
    expect(ratingDisagreements(moved, browser.criteria)).toEqual(["tresca"]);
  });
});
