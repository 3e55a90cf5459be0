import { eigs } from "mathjs";
import { describe, expect, it } from "vitest";
import { evaluateState } from "../checks/evaluate";
import type { CheckRequirement } from "../checks/requirements";
import { verdictForUtilisation } from "../checks/verdict";
import type { Material } from "../criteria/safety-factor";
import { principalStresses } from "../tensor/principal";
import { seededRandom } from "../testing/fixtures";
import type { StressTensor } from "../tensor/types";
import { evaluatePointTable, PointTableEvaluator } from "./evaluate-point-table";

const STEEL: Material = { yield: 250e6, ultimateTension: 400e6, ultimateCompression: 600e6 };
const ALL: CheckRequirement[] = [
  { criterion: "von-mises", requiredFactor: 1.5 },
  { criterion: "tresca", requiredFactor: 1.5, category: "test" },
  { criterion: "max-principal", requiredFactor: 2 },
  { criterion: "mohr-coulomb", requiredFactor: 2 },
  { criterion: "modified-mohr", requiredFactor: 2.5 },
];

/** `count` seeded random tensors (Pa), components uniform in ±scale, some scaled down so that verdicts vary. */
function randomTable(count: number, seed: number, scale = 200e6): Float64Array {
  const rnd = seededRandom(seed);
  const out = new Float64Array(6 * count);
  for (let k = 0; k < count; k++) {
    const size = scale * rnd() ** 2;
    for (let c = 0; c < 6; c++) out[6 * k + c] = (rnd() * 2 - 1) * size;
  }
  return out;
}

function tensorAt(table: Float64Array, k: number): StressTensor {
  const o = 6 * k;
  return {
    xx: table[o],
    yy: table[o + 1],
    zz: table[o + 2],
    xy: table[o + 3],
    yz: table[o + 4],
    zx: table[o + 5],
  };
}

describe("evaluatePointTable against the object API (evaluateState, principalStresses)", () => {
  const N = 3000;
  const table = randomTable(N, 150_115);
  const result = evaluatePointTable(
    table,
    { material: STEEL, requirements: ALL },
    { includeUnsuited: true, chunkSize: 256, worstCount: 25 },
  );

  // The timeout is room for a loaded machine (15 000 object-API evaluations), not a speed target.
  it(
    "when 3000 seeded random tensors are evaluated, then every point's principal stresses, von Mises, Tresca, factors and utilisations equal evaluateState's",
    { timeout: 60_000 },
    () => {
      let compared = 0;
      const mismatches: string[] = [];
      const same = (what: string, k: number, a: number, b: number) => {
        if (!Object.is(a, b)) mismatches.push(`point ${k} ${what}: ${a} ≠ ${b}`);
      };
      for (let k = 0; k < N; k++) {
        const s = tensorAt(table, k);
        const ref = evaluateState(s, STEEL, ALL, { includeUnsuited: true });
        for (let i = 0; i < 3; i++) same(`σ${i + 1}`, k, result.principal[3 * k + i], ref.principal[i]);
        same("von Mises", k, result.vonMises[k], ref.vonMises);
        same("Tresca", k, result.tresca[k], ref.tresca);
        ref.checks.forEach((check, c) => {
          if (check.status !== "evaluated") throw new Error(`check ${c} of point ${k} was not evaluated`);
          same(`${check.criterion} factor`, k, result.criteria[c].factor![k], check.factor);
          same(`${check.criterion} utilisation`, k, result.criteria[c].utilisation![k], check.utilisation);
          compared++;
        });
        same("governing utilisation", k, result.utilisation[k], ref.governing!.utilisation);
      }
      expect(mismatches).toEqual([]);
      expect(compared).toBe(5 * N);
    },
  );

  it("when the principal stresses are compared with principalStresses and with mathjs eigs (an independent solver), then they agree within 1e-13·‖σ‖F", () => {
    let worst = 0;
    let worstObject = 0;
    for (let k = 0; k < N; k += 10) {
      const s = tensorAt(table, k);
      const norm = Math.hypot(s.xx, s.yy, s.zz, Math.SQRT2 * s.xy, Math.SQRT2 * s.yz, Math.SQRT2 * s.zx);
      const object = principalStresses(s).values;
      const m = [
        [s.xx, s.xy, s.zx],
        [s.xy, s.yy, s.yz],
        [s.zx, s.yz, s.zz],
      ];
      const independent = (eigs(m) as unknown as { values: number[] }).values.slice().sort((a, b) => b - a);
      for (let i = 0; i < 3; i++) {
        worstObject = Math.max(worstObject, Math.abs(result.principal[3 * k + i] - object[i]) / norm);
        worst = Math.max(worst, Math.abs(result.principal[3 * k + i] - independent[i]) / norm);
      }
    }
    // ACCURACY in core/tolerances.ts: each principal stress within 1e-13·‖σ‖F
    expect(worstObject).toBeLessThan(1e-13);
    expect(worst).toBeLessThan(1e-13);
  });

  it(
    "when the table's summaries are compared with a brute-force pass over evaluateState, then counts, histogram, governing points and the worst list agree",
    { timeout: 60_000 },
    () => {
      const refs = Array.from({ length: N }, (_, k) =>
        evaluateState(tensorAt(table, k), STEEL, ALL, { includeUnsuited: true }),
      );
      const governing = refs.map((r) => r.governing!.utilisation);
      expect(result.failing).toBe(governing.filter((u) => verdictForUtilisation(u) === "fail").length);
      expect(result.close).toBe(governing.filter((u) => verdictForUtilisation(u) === "close").length);
      expect(result.failing).toBeGreaterThan(0);
      expect(result.close).toBeGreaterThan(0);
      // bins of 0.05 up to 1.5, then one open bin (the documented default)
      const bins = new Array<number>(31).fill(0);
      for (const u of governing) bins[u >= 1.5 ? 30 : Math.floor(u / 0.05)]++;
      expect(result.histogram.counts).toEqual(bins);
      ALL.forEach((req, c) => {
        const us = refs.map((r) => (r.checks[c] as { utilisation: number }).utilisation);
        const max = Math.max(...us);
        expect(result.criteria[c].governing).toEqual({
          index: us.indexOf(max),
          factor: (refs[us.indexOf(max)].checks[c] as { factor: number }).factor,
          utilisation: max,
        });
        expect(result.criteria[c].failing).toBe(us.filter((u) => u > 1).length);
        expect(result.criteria[c].category).toBe(req.category ?? null);
      });
      const order = governing
        .map((u, index) => ({ index, utilisation: u }))
        .sort((a, b) => b.utilisation - a.utilisation || a.index - b.index);
      expect(result.worst).toEqual(order.slice(0, 25));
    },
  );
});

describe("evaluatePointTable in chunks (a worker with progress and a cancel button)", () => {
  const table = randomTable(1000, 7);
  const spec = { material: STEEL, requirements: ALL.slice(0, 2) };

  it("when evaluated in chunks of 7 or all at once, then the results are equal and progress rises to the total", () => {
    const seen: number[] = [];
    const small = evaluatePointTable(table, spec, {
      chunkSize: 7,
      onProgress: (done, total) => seen.push(done / total),
    });
    const big = evaluatePointTable(table, spec, { chunkSize: 100_000 });
    expect(small).toEqual(big);
    expect(seen.length).toBe(Math.ceil(1000 / 7));
    expect(seen.at(-1)).toBe(1);
    expect(seen.every((p, i) => i === 0 || p > seen[i - 1])).toBe(true);
  });

  it("when the cancel check says stop after two chunks, then two chunks are evaluated and the result says cancelled", () => {
    let asked = 0;
    const r = evaluatePointTable(table, spec, { chunkSize: 100, isCancelled: () => ++asked > 2 });
    expect(r.cancelled).toBe(true);
    expect(r.evaluated).toBe(200);
    expect(Number.isNaN(r.utilisation[200])).toBe(true);
  });

  it("when a worker drives step() itself, then it ends after ceil(N/chunk) steps with the same result", () => {
    const ev = new PointTableEvaluator(table, spec, { chunkSize: 300 });
    let steps = 1;
    while (ev.step()) steps++;
    expect(steps).toBe(4);
    expect(ev.result).toEqual(evaluatePointTable(table, spec));
  });
});

describe("criteria that cannot be rated and points that cannot be read", () => {
  it("when a brittle criterion is asked of a ductile material without includeUnsuited, then it is not applicable with evaluateState's reason and no point is rated with it", () => {
    const table = randomTable(50, 3);
    const r = evaluatePointTable(table, { material: STEEL, requirements: ALL });
    const probe = evaluateState(tensorAt(table, 0), STEEL, ALL);
    r.criteria.forEach((c, i) => {
      expect(c.status).toBe(probe.checks[i].status);
      expect(c.utilisation === null).toBe(probe.checks[i].status !== "evaluated");
    });
    expect(r.criteria[2]).toMatchObject({
      status: "not-applicable",
      reason: (probe.checks[2] as { reason: string }).reason,
      governing: null,
    });
    for (let k = 0; k < 50; k++)
      expect(r.utilisation[k]).toBe(evaluateState(tensorAt(table, k), STEEL, ALL).governing!.utilisation);
  });

  it("when the material lacks the strengths of every criterion, then no point is rated and the histogram is empty", () => {
    const r = evaluatePointTable(randomTable(20, 4), {
      material: { ultimateTension: 300e6 },
      requirements: ALL.slice(0, 2),
    });
    expect(r.criteria.map((c) => c.status)).toEqual(["not-evaluated", "not-evaluated"]);
    expect(r.criteria[0].reason).toBe("needs the yield strength Sy");
    expect(r.histogram.counts.every((n) => n === 0)).toBe(true);
    expect(r.worst).toEqual([]);
  });

  it("when a point has a component that is not finite, then its outputs are NaN, it is reported, and the other points are rated as usual", () => {
    const table = randomTable(10, 5);
    table[6 * 4 + 2] = Number.NaN;
    const r = evaluatePointTable(table, { material: STEEL, requirements: ALL.slice(0, 1) });
    expect(r.badPoints).toEqual({ count: 1, first: [4] });
    expect(Number.isNaN(r.principal[12])).toBe(true);
    expect(Number.isNaN(r.utilisation[4])).toBe(true);
    expect(r.histogram.counts.reduce((a, b) => a + b, 0)).toBe(9);
    expect(r.utilisation[5]).toBe(
      evaluateState(tensorAt(table, 5), STEEL, ALL.slice(0, 1)).governing!.utilisation,
    );
  });
});
