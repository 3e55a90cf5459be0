import { describe, expect, it } from "vitest";
import { linearize } from "../../../../../core";
import type { LinearizationResultView } from "../../../../../core/contract/linearizations";
import { distributionOf } from "./distribution";

/** core's result in the API's JSON shape (arrays instead of Float64Arrays), for the parts the plot reads. */
function viewOf(r: ReturnType<typeof linearize>): LinearizationResultView {
  const rows: number[][] = [];
  for (let i = 0; i < r.pointCount; i++) rows.push(Array.from(r.local.subarray(6 * i, 6 * i + 6)));
  const ends = (e: { start: Float64Array; end: Float64Array }) => ({
    start: Array.from(e.start),
    end: Array.from(e.end),
  });
  return {
    thickness: r.thickness,
    x: Array.from(r.x),
    local: rows,
    membrane: Array.from(r.membrane),
    membranePlusBending: ends(r.membranePlusBending),
    bentComponents: [...r.bentComponents],
  } as unknown as LinearizationResultView;
}

describe("distributionOf", () => {
  it("when the hoop stress is linear through the wall, then membrane + bending lies on the total at every point (a linear distribution is all membrane + bending, common practice, no source)", () => {
    const n = 7;
    const stresses = new Float64Array(6 * n);
    for (let i = 0; i < n; i++) stresses[6 * i + 1] = 300 - 40 * i;
    const r = linearize({
      stresses,
      distances: Float64Array.from({ length: n }, (_, i) => i * 2),
      lineDirection: [1, 0, 0],
      secondAxis: [0, 1, 0],
    });
    const d = distributionOf(viewOf(r), 1);
    expect(d.bent).toBe(true);
    d.total.forEach((v, i) => expect(d.membranePlusBending[i]).toBeCloseTo(v, 9));
    // The membrane is the mean of a linear distribution: (300 + 60)/2 = 180.
    expect(d.membrane.every((m) => Math.abs(m - 180) < 1e-9)).toBe(true);
  });

  it("when the through-thickness stress is linear, then Annex 5-A leaves it unbent and its membrane + bending line is flat", () => {
    const stresses = new Float64Array(18);
    [10, 20, 30].forEach((v, i) => (stresses[6 * i] = v));
    const r = linearize({ stresses, distances: Float64Array.of(0, 1, 2), lineDirection: [1, 0, 0] });
    const d = distributionOf(viewOf(r), 0);
    expect(d.bent).toBe(false);
    expect(d.membranePlusBending).toEqual([20, 20, 20]);
  });
});
