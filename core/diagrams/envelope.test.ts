import { describe, expect, it } from "vitest";
import { envelopeHit, envelopeInPlane, type Criterion, type Material } from "../index";
import { seededRandom } from "../testing/fixtures";
import { ENVELOPE_FRAME, envelopeGeometry, onEnvelopePlot } from "./envelope";

const STEEL: Material = { yield: 355, ultimateTension: 470, ultimateCompression: 470 };
const CRITERIA: Criterion[] = ["von-mises", "tresca", "max-principal"];

/** The bench's picture: core's envelope outlines and the state's ray to the first of them. */
const OUTLINES = new Map(CRITERIA.map((c) => [c, envelopeInPlane(c, STEEL)]));

function picture(state: [number, number] | null, criteria: Criterion[] = CRITERIA) {
  const curves = criteria.map((c) => ({ key: c, points: OUTLINES.get(c)! }));
  const hit = state && criteria.length > 0 ? envelopeHit(state[0], state[1], criteria[0], STEEL) : null;
  return { curves, state, rayEnd: hit && hit.point };
}

describe("the envelope plot's geometry", () => {
  it("when 30 seeded states are drawn with three envelopes, then the square extent holds every envelope point and the state, and both scales map ±extent to the plot's edges", () => {
    const next = seededRandom(621);
    const size = 226; // the smaller side of the frame inside its margins
    for (let k = 0; k < 30; k++) {
      const scale = 10 ** (3 * next());
      const state: [number, number] = [(next() - 0.5) * scale, (next() - 0.5) * scale];
      const p = picture(state);
      const g = envelopeGeometry(p);
      for (const c of p.curves)
        for (const [a, b] of c.points)
          expect(Math.max(Math.abs(a), Math.abs(b))).toBeLessThanOrEqual(g.extent);
      expect(Math.max(Math.abs(state[0]), Math.abs(state[1]))).toBeLessThanOrEqual(g.extent);
      expect(g.plot).toEqual({ x: 46, y: 10, width: size, height: size });
      expect(g.x.map(-g.extent)).toBeCloseTo(46, 9);
      expect(g.x.map(g.extent)).toBeCloseTo(46 + size, 9);
      expect(g.y.map(-g.extent)).toBeCloseTo(10 + size, 9);
      expect(g.y.map(g.extent)).toBeCloseTo(10, 9);
      expect(g.state).toEqual({ cx: g.x.map(state[0]), cy: g.y.map(state[1]) });
    }
  }, 60_000);

  it("when the ray is drawn, then it starts at the origin and ends where core's envelopeHit says the state scaled by n meets the first envelope", () => {
    const p = picture([150, -4.06]);
    const g = envelopeGeometry(p);
    const hit = envelopeHit(150, -4.06, "von-mises", STEEL)!;
    expect(g.ray).toEqual({
      x1: g.x.map(0),
      y1: g.y.map(0),
      x2: g.x.map(hit.point[0]),
      y2: g.y.map(hit.point[1]),
    });
    expect(hit.point[0] / 150).toBeCloseTo(hit.n, 9);
    expect(envelopeGeometry(picture(null)).ray).toBeNull();
  });

  it("when nothing is drawn, then the plot spans ±1 and has no curve, state or ray", () => {
    const g = envelopeGeometry({ curves: [], state: null, rayEnd: null });
    expect(g.extent).toBe(1);
    expect(g.curves).toEqual([]);
    expect(g.state).toBeNull();
  });

  it("when ticks are drawn, then they are round numbers inside ±extent at the scale's positions, symmetric about zero", () => {
    for (const state of [
      [150, -4.06],
      [0.02, 0.01],
      [1.5e8, 0],
    ] as [number, number][]) {
      const g = envelopeGeometry(picture(state));
      for (const axis of [g.xTicks, g.yTicks]) {
        const values = axis.ticks.map((t) => t.value);
        const step = values[1] - values[0];
        for (const t of axis.ticks) {
          expect(Math.abs(t.value)).toBeLessThanOrEqual(g.extent);
          expect(Math.abs(t.value / step - Math.round(t.value / step))).toBeLessThan(1e-6);
        }
        expect(values.map((v) => -v + 0).sort((a, b) => a - b)).toEqual(
          values.map((v) => v + 0).sort((a, b) => a - b),
        );
      }
      for (const t of g.xTicks.ticks) expect(t.at).toBe(g.x.map(t.value));
    }
  });

  it("when each outline is written, then it is closed and starts at its first point", () => {
    const p = picture([100, 50]);
    const g = envelopeGeometry(p);
    g.curves.forEach((c, i) => {
      expect(c.d.endsWith("Z")).toBe(true);
      const [mx, my] = /^M([^,]+),([^L]+)L/.exec(c.d)!.slice(1).map(Number);
      expect(mx).toBeCloseTo(g.x.map(p.curves[i].points[0][0]), 2);
      expect(my).toBeCloseTo(g.y.map(p.curves[i].points[0][1]), 2);
    });
  });

  it("when a drawing point is tested, then it is on the plot inside the square and its edges, and off it in the margins", () => {
    const g = envelopeGeometry(picture([150, 0]));
    expect(onEnvelopePlot(g, 46, 10)).toBe(true);
    expect(onEnvelopePlot(g, 46 + 226, 10 + 226)).toBe(true);
    expect(onEnvelopePlot(g, 45.9, 100)).toBe(false);
    expect(onEnvelopePlot(g, 100, ENVELOPE_FRAME.height - 1)).toBe(false);
  });
});
