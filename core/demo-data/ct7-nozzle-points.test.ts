import { describe, expect, it } from "vitest";
import { parsePointTable } from "../point-tables/parse-point-table";
import { CT7_NOZZLE_BORE_RADIUS_MM, ct7NozzlePointTable, stressAroundBore } from "./ct7-nozzle-points";

const A = CT7_NOZZLE_BORE_RADIUS_MM;

describe("stresses around nozzle N2's bore", () => {
  it("when the load is uniaxial, then the bore's edge carries 3σ across the load and −σ along it (Kirsch's solution, handbook formula, recalled from memory)", () => {
    const across = stressAroundBore(100, 0, A, A, Math.PI / 2);
    expect(across.xx).toBeCloseTo(300, 10);
    expect(across.yy).toBeCloseTo(0, 10);
    const along = stressAroundBore(100, 0, A, A, 0);
    expect(along.yy).toBeCloseTo(-100, 10);
    expect(along.xx).toBeCloseTo(0, 10);
  });

  it("when the membrane field is biaxial 1 : 2, then the edge on the x axis carries 2.5 times the hoop stress (superposition of Kirsch's solution, recalled from memory)", () => {
    const s = stressAroundBore(50, 100, A, A, 0);
    expect(s.yy).toBeCloseTo(250, 10);
    expect(s.xx).toBeCloseTo(0, 10);
    expect(s.xy).toBeCloseTo(0, 10);
  });

  it("when the point is far from the bore, then the stresses approach the membrane field (the hole's effect decays as (a/r)², formula)", () => {
    const r = 1000 * A;
    for (const theta of [0, 0.3, 1.1, 2.5]) {
      const s = stressAroundBore(50, 100, A, r, theta);
      expect(s.xx).toBeCloseTo(50, 3);
      expect(s.yy).toBeCloseTo(100, 3);
      expect(s.xy).toBeCloseTo(0, 3);
    }
  });
});

describe("the demo's point table", () => {
  it("when its text is parsed with its own mapping, then all 30,000 points are read, none bad, with unique node numbers", () => {
    const demo = ct7NozzlePointTable();
    const table = parsePointTable(demo.text, { ...demo.layout, columns: demo.columns, unit: demo.unit });
    expect(table.count).toBe(30_000);
    expect(table.badRows.count).toBe(0);
    expect(new Set(table.ids as Float64Array).size).toBe(30_000);
    // every point lies between the bore and five bore radii, on the mid-surface
    let rMin = Infinity;
    let rMax = 0;
    let zMax = 0;
    for (let k = 0; k < table.count; k++) {
      const [x, y, z] = table.coordinates!.subarray(3 * k, 3 * k + 3);
      rMin = Math.min(rMin, Math.hypot(x, y));
      rMax = Math.max(rMax, Math.hypot(x, y));
      zMax = Math.max(zMax, Math.abs(z));
    }
    expect(rMin).toBeCloseTo(A, 2);
    expect(rMax).toBeCloseTo(5 * A, 2);
    expect(zMax).toBe(0);
  });
});
