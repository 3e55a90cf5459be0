import { describe, expect, it } from "vitest";
import { CRITERIA, factorFromPrincipals, type Material } from "../criteria/safety-factor";
import { seededRandom } from "../testing/fixtures";
import { factorBatch } from "./factor-batch";

const MATERIALS: Material[] = [
  { yield: 250, ultimateTension: 400, ultimateCompression: 900 },
  { yield: 355, ultimateTension: 510 }, // max-principal falls back to Sut in compression
];

describe("factorBatch against factorFromPrincipals (the object API's per-state factor)", () => {
  it("when 5000 seeded random states and the edge states (zero, hydrostatic, σ1 ≤ 0, σ3 ≥ −σ1) are rated with every criterion, then every factor is the same double", () => {
    const rnd = seededRandom(2026_12_03);
    const rows: [number, number, number, number][] = [
      [0, 0, 0, 0],
      [50, 50, 50, 0],
      [-10, -20, -30, 17.3],
      [100, 0, -100, 173.2],
      [100, 0, -99, 172],
      [0, -5, -80, 77],
      [Number.NaN, Number.NaN, Number.NaN, Number.NaN],
    ];
    for (let i = 0; i < 5000; i++) {
      const v = [0, 1, 2].map(() => (rnd() * 2 - 1) * 600).sort((a, b) => b - a);
      rows.push([v[0], v[1], v[2], rnd() * 700]);
    }
    const n = rows.length;
    const principal = new Float64Array(rows.flatMap((r) => r.slice(0, 3)));
    const vonMises = new Float64Array(rows.map((r) => r[3]));
    const out = new Float64Array(n);
    let compared = 0;
    const mismatches: string[] = [];
    for (const material of MATERIALS) {
      for (const criterion of CRITERIA) {
        out.fill(-1);
        let refuses = false;
        try {
          factorFromPrincipals(criterion, material, 1, 0, 1);
        } catch {
          refuses = true;
        }
        if (refuses) {
          // a strength the criterion needs is missing: both refuse
          expect(() => factorBatch(criterion, material, principal, vonMises, 0, n, out)).toThrow(RangeError);
          continue;
        }
        factorBatch(criterion, material, principal, vonMises, 0, n, out);
        for (let k = 0; k < n; k++) {
          const ref = factorFromPrincipals(criterion, material, rows[k][0], rows[k][2], rows[k][3]);
          if (!Object.is(out[k], ref)) mismatches.push(`${criterion} row ${k}: ${out[k]} ≠ ${ref}`);
          compared++;
        }
      }
    }
    expect(compared).toBe((5 + 3) * n); // the second material has no Suc: Mohr–Coulomb and modified Mohr refuse it
    expect(mismatches).toEqual([]);
  });

  it("when only a range of points is asked for, then only that range is written", () => {
    const out = new Float64Array(4).fill(-1);
    factorBatch(
      "tresca",
      MATERIALS[0],
      new Float64Array([1, 0, -1, 2, 0, -2, 4, 0, -4, 5, 0, -5]),
      new Float64Array(4),
      1,
      3,
      out,
    );
    expect(Array.from(out)).toEqual([-1, 250 / 4, 250 / 8, -1]);
  });

  it("when the material lacks a strength or modified Mohr refuses it, then it throws as strengthsFor does", () => {
    const p = new Float64Array(3);
    const v = new Float64Array(1);
    const o = new Float64Array(1);
    expect(() => factorBatch("von-mises", { ultimateTension: 300 }, p, v, 0, 1, o)).toThrow(
      /needs material.yield/,
    );
    expect(() =>
      factorBatch("modified-mohr", { ultimateTension: 300, ultimateCompression: 200 }, p, v, 0, 1, o),
    ).toThrow(/Suc ≥ Sut/);
  });
});
