import { describe, expect, it } from "vitest";
import {
  planeStress,
  principalValues,
  rotateTensor,
  rotationFromAxisAngle,
  tractionOnPlane,
  type Mat3,
  type StressTensor,
} from "../index";
import { rotationFromQuaternion, seededRandom } from "../testing/fixtures";
import { boxesOverlap } from "./label-placement";
import { MOHR_FRAME, mohrCirclesOf, mohrGeometry, type MohrGeometry, type MohrInput } from "./mohr";

const tensor = (xx: number, yy: number, zz: number, xy = 0, yz = 0, zx = 0): StressTensor => ({
  xx,
  yy,
  zz,
  xy,
  yz,
  zx,
});

/** The 3D picture's input as the bench builds it: principal values and the faces of the turned element. */
function input3d(t: StressTensor, r: Mat3 = rotationFromAxisAngle([0, 0, 1], 0)): MohrInput {
  const faces = (["x′", "y′", "z′"] as const).map((face, i) => {
    const tr = tractionOnPlane(t, r[i]);
    return { face, normal: tr.normal, shear: tr.shear };
  });
  return { mode: "3d", principal: principalValues(t), faces, plane: null, zoom: null };
}

/** The in-plane picture's input for a plane state turned by θ about z, named by the bench's rule. */
function inputPlane(sx: number, sy: number, txy: number, theta: number): MohrInput {
  const t = tensor(sx, sy, 0, txy);
  const principal = principalValues(t);
  const circle = planeStress(sx, sy, txy);
  const rotated = rotateTensor(t, rotationFromAxisAngle([0, 0, 1], theta));
  // σz = 0 is the principal value nearest zero; the in-plane pair are the other two, larger first.
  const zIndex = principal.map((v, i) => [Math.abs(v), i]).sort((a, b) => a[0] - b[0])[0][1];
  const others = [0, 1, 2].filter((i) => i !== zIndex);
  return {
    mode: "plane",
    principal,
    faces: [],
    plane: {
      circle,
      sx: rotated.xx,
      sy: rotated.yy,
      txy: rotated.xy,
      theta,
      names: { major: `σ${others[0] + 1}`, minor: `σ${others[1] + 1}`, outOfPlane: `σ${zIndex + 1}` },
      sz: 0,
    },
    zoom: null,
  };
}

function expectNoLabelOverlap(g: MohrGeometry) {
  for (let i = 0; i < g.labels.length; i++)
    for (let j = i + 1; j < g.labels.length; j++) {
      const overlap = boxesOverlap(g.labels[i].box, g.labels[j].box);
      expect(overlap, `${g.labels[i].id} overlaps ${g.labels[j].id}`).toBe(false);
    }
}

function expectExtentHoldsEverything(g: MohrGeometry, i: MohrInput) {
  const { extent: e } = g;
  const inX = (v: number) => v >= e.x0 && v <= e.x1;
  const inY = (v: number) => v >= e.y0 && v <= e.y1;
  if (i.mode === "3d") {
    for (const c of g.circles) {
      expect(inX(c.center - c.radius) && inX(c.center + c.radius)).toBe(true);
      expect(inY(c.radius) && inY(0)).toBe(true);
    }
    for (const f of i.faces) expect(inX(f.normal) && inY(f.shear)).toBe(true);
  } else if (i.plane) {
    const p = i.plane;
    expect(inX(p.circle.s1) && inX(p.circle.s2) && inY(p.circle.radius) && inY(-p.circle.radius)).toBe(true);
    expect(inX(p.sx) && inX(p.sy) && inY(p.txy) && inY(-p.txy)).toBe(true);
  }
  expect(inX(0) && inY(0)).toBe(true);
  // The fitted scales show all of the extent: their domains contain it.
  expect(g.x.domain[0]).toBeLessThanOrEqual(e.x0 + 1e-9 * (e.x1 - e.x0));
  expect(g.x.domain[1]).toBeGreaterThanOrEqual(e.x1 - 1e-9 * (e.x1 - e.x0));
  expect(g.y.domain[0]).toBeLessThanOrEqual(e.y0 + 1e-9 * (e.y1 - e.y0));
  expect(g.y.domain[1]).toBeGreaterThanOrEqual(e.y1 - 1e-9 * (e.y1 - e.y0));
}

/** States where names crowd one spot: the hard cases for label placement. */
const HARD_CASES: [string, MohrInput][] = [
  ["hydrostatic 100 MPa (three equal principal stresses)", input3d(tensor(100, 100, 100))],
  ["hydrostatic −50 MPa", input3d(tensor(-50, -50, -50))],
  ["all zero", input3d(tensor(0, 0, 0))],
  ["σ2 and σ3 near zero beside σ1 = 150 (0.4 and −0.3)", input3d(tensor(150, 0.4, -0.3))],
  ["σ2 = σ3 = 0 beside σ1 = 150 (uniaxial)", input3d(tensor(150, 0, 0))],
  ["three near-equal values 100, 100.2, 99.9", input3d(tensor(100, 100.2, 99.9))],
  ["pure shear τxy = 80 in the original axes", input3d(tensor(0, 0, 0, 80))],
  [
    "pure shear turned 45° about z (faces on the principal marks)",
    input3d(tensor(0, 0, 0, 80), rotationFromAxisAngle([0, 0, 1], 45)),
  ],
  [
    "σx = 150, σy = 0, τxy = 25 at its principal frame (faces on the marks)",
    input3d(tensor(150, 0, 0, 25), rotationFromAxisAngle([0, 0, 1], 9.2175)),
  ],
  ["in-plane: σx = 150, σy = 0, τxy = 25 at θ = θp", inputPlane(150, 0, 25, 9.2175)],
  ["in-plane: σx = 150, σy = 0, τxy = 25 at θ = 0", inputPlane(150, 0, 25, 0)],
  ["in-plane: pure shear τxy = 80 at θ = 45°", inputPlane(0, 0, 80, 45)],
  ["in-plane: pure shear τxy = 80 at θ = 0", inputPlane(0, 0, 80, 0)],
  ["in-plane: equal biaxial 100, 100 (a point circle)", inputPlane(100, 100, 0, 30)],
  ["in-plane: σx = 1, σy = −0.5, τxy = 0.2 (σ3 and σ2 near zero)", inputPlane(1, -0.5, 0.2, 10)],
];

describe("Mohr's circles of the diagram (Mohr's three-circle construction, common practice, no source)", () => {
  it("when the principal stresses are 154.06, 0, −4.06, then the circles are centred at (σi + σj)/2 with radius (σi − σj)/2 for (σ1,σ3), (σ1,σ2), (σ2,σ3)", () => {
    const [a, b, c] = mohrCirclesOf([154.06, 0, -4.06]);
    expect(a.center).toBeCloseTo(75, 12);
    expect(a.radius).toBeCloseTo(79.06, 12);
    expect(b).toEqual({ center: 77.03, radius: 77.03 });
    expect(c.center).toBeCloseTo(-2.03, 12);
    expect(c.radius).toBeCloseTo(2.03, 12);
  });

  it("when 1000 seeded principal triples are drawn, then every circle's centre and radius are (σi ± σj)/2 and its half-disk path runs from σj to σi on the σ axis", () => {
    const next = seededRandom(617);
    for (let k = 0; k < 1000; k++) {
      const v = [0, 1, 2].map(() => (next() - 0.5) * 10 ** (1 + 8 * next())).sort((p, q) => q - p);
      const principal = v as [number, number, number];
      const g = mohrGeometry({ mode: "3d", principal, faces: [], plane: null, zoom: null });
      const pairs = [
        [v[0], v[2]],
        [v[0], v[1]],
        [v[1], v[2]],
      ];
      pairs.forEach(([hi, lo], i) => {
        const tol = 1e-14 * Math.max(Math.abs(hi), Math.abs(lo));
        expect(Math.abs(g.circles[i].center - (hi + lo) / 2)).toBeLessThanOrEqual(tol);
        expect(Math.abs(g.circles[i].radius - (hi - lo) / 2)).toBeLessThanOrEqual(tol);
        const [, x0, y0] = /^M([^,]+),([^ ]+) /.exec(g.halfDisks![i])!.map(Number);
        expect(x0).toBeCloseTo(g.x.map(lo), 6);
        expect(y0).toBeCloseTo(g.y.map(0), 6);
      });
    }
  });
});

describe("the Mohr diagram's extent, scales and ticks", () => {
  it("when 500 seeded states are drawn turned at random, in 3D, then the extent holds every circle, face point and the origin, and the scales show all of it", () => {
    const next = seededRandom(618);
    for (let k = 0; k < 500; k++) {
      const s = 10 ** (-2 + 10 * next());
      const t = tensor(
        ...([0, 1, 2, 3, 4, 5].map(() => (next() - 0.5) * s) as [
          number,
          number,
          number,
          number,
          number,
          number,
        ]),
      );
      const r = rotationFromQuaternion(
        next() - 0.5,
        next() - 0.5,
        next() - 0.5,
        next() - 0.5,
      ) as unknown as Mat3;
      const i = input3d(t, r);
      expectExtentHoldsEverything(mohrGeometry(i), i);
    }
  });

  it("when 300 seeded plane states are drawn in-plane at random θ, then the extent holds the circle and both face points", () => {
    const next = seededRandom(619);
    for (let k = 0; k < 300; k++) {
      const s = 10 ** (-2 + 10 * next());
      const i = inputPlane((next() - 0.5) * s, (next() - 0.5) * s, (next() - 0.5) * s, (next() - 0.5) * 360);
      expectExtentHoldsEverything(mohrGeometry(i), i);
    }
  });

  it("when the diagram is fitted, then the scales map the ends of their domains to the plot's edges (τ up in 3D, down in-plane) with one scale for σ and τ so circles stay round", () => {
    const plot = { left: 50, right: 466, top: 14, bottom: 210 }; // MOHR_FRAME's margins
    for (const [, i] of HARD_CASES) {
      const g = mohrGeometry(i);
      expect(g.x.map(g.x.domain[0])).toBeCloseTo(plot.left, 9);
      expect(g.x.map(g.x.domain[1])).toBeCloseTo(plot.right, 9);
      expect(g.y.map(g.y.domain[0])).toBeCloseTo(i.mode === "plane" ? plot.top : plot.bottom, 9);
      expect(g.y.map(g.y.domain[1])).toBeCloseTo(i.mode === "plane" ? plot.bottom : plot.top, 9);
      const perX = (plot.right - plot.left) / (g.x.domain[1] - g.x.domain[0]);
      const perY = (plot.bottom - plot.top) / (g.y.domain[1] - g.y.domain[0]);
      expect(perX / perY).toBeCloseTo(1, 9);
    }
    expect(MOHR_FRAME).toMatchObject({ width: 480, height: 246 });
  });

  it("when ticks are drawn, then they are round numbers inside the domain, placed where the scale puts them, and labelled in the axis's power of ten", () => {
    for (const [, i] of [...HARD_CASES, ["Pa", input3d(tensor(150e6, -4e6, 0, 25e6))] as const]) {
      const g = mohrGeometry(i);
      for (const [axis, scale] of [
        [g.xTicks, g.x],
        [g.yTicks, g.y],
      ] as const) {
        expect(axis.ticks.length).toBeGreaterThan(1);
        const step = axis.ticks[1].value - axis.ticks[0].value;
        for (const t of axis.ticks) {
          expect(t.value).toBeGreaterThanOrEqual(Math.min(...scale.domain));
          expect(t.value).toBeLessThanOrEqual(Math.max(...scale.domain));
          expect(Math.abs(t.value / step - Math.round(t.value / step))).toBeLessThan(1e-6);
          expect(t.at).toBe(scale.map(t.value));
          expect(Number(t.label.replace("−", "-")) * axis.scale).toBeCloseTo(t.value, 6);
        }
      }
    }
    expect(mohrGeometry(input3d(tensor(150e6, -4e6, 0, 25e6))).xTicks.multiplier).toBe("×10⁶ ");
  });

  it("when the view is zoomed 2× about a point, then that point is the centre of both domains and the spans halve", () => {
    const i = input3d(tensor(150, 0, 0, 25));
    const fitted = mohrGeometry(i);
    const zoomed = mohrGeometry({ ...i, zoom: { k: 2, cx: 40, cy: 10 } });
    expect((zoomed.x.domain[0] + zoomed.x.domain[1]) / 2).toBeCloseTo(40, 9);
    expect((zoomed.y.domain[0] + zoomed.y.domain[1]) / 2).toBeCloseTo(10, 9);
    const span = (d: readonly [number, number]) => d[1] - d[0];
    expect(span(zoomed.x.domain)).toBeCloseTo(span(fitted.x.domain) / 2, 9);
    expect(zoomed.fitCentre).toEqual(fitted.fitCentre);
  });
});

describe("the Mohr diagram's labels", () => {
  it.each(HARD_CASES)("when the state is %s, then no two labels overlap", (_, i) => {
    const g = mohrGeometry(i);
    expect(g.labels.length).toBeGreaterThanOrEqual(i.mode === "3d" ? 7 : 6);
    expectNoLabelOverlap(g);
  });

  it("when σ3 and σ2 sit within two units of each other near zero (the case that once read “σg2”), then their names are apart and each stays within 40 units of its mark", () => {
    const g = mohrGeometry(input3d(tensor(150, 0.4, -0.3)));
    const s2 = g.principalMarks.find((m) => m.key === "s2")!;
    const s3 = g.principalMarks.find((m) => m.key === "s3")!;
    expect(Math.abs(s2.cx - s3.cx)).toBeLessThan(2);
    const box = (id: string) => g.labels.find((l) => l.id === id)!.box;
    expect(boxesOverlap(box("principal-s2"), box("principal-s3"))).toBe(false);
    for (const m of g.principalMarks) {
      const b = box(`principal-${m.key}`);
      expect(Math.abs(b.x + b.width / 2 - m.cx)).toBeLessThan(40);
    }
  });

  it("when the principal stresses are far apart, then each name sits centred under its mark, 14 units below the axis, as the diagram has always drawn it", () => {
    const g = mohrGeometry(input3d(tensor(150, 60, -40)));
    for (const m of g.principalMarks) expect(m.label).toEqual({ x: m.cx, y: m.cy + 14, anchor: "middle" });
    const tau = g.maxShear!;
    expect(tau.label).toEqual({
      x: g.x.map(g.circles[0].center) + 4,
      y: g.y.map(g.circles[0].radius) - 5,
      anchor: "start",
    });
    expect(tau.text).toBe("95.0"); // four significant figures of the largest stress, 150
  });

  it("when 600 seeded states with clustered principal stresses are drawn at random turns, then no two labels ever overlap", () => {
    const next = seededRandom(620);
    for (let k = 0; k < 600; k++) {
      // Values drawn from a few clusters, so that names crowd: some equal, some near, some apart.
      const centre = (next() - 0.5) * 200;
      const pick = () =>
        next() < 0.3 ? centre : next() < 0.6 ? centre + (next() - 0.5) * 4 : (next() - 0.5) * 300;
      const l = [pick(), pick(), pick()];
      const q = rotationFromQuaternion(next() - 0.5, next() - 0.5, next() - 0.5, next() - 0.5);
      // σ = Q diag(l) Qᵀ with Q's columns the principal directions.
      const at = (i: number, j: number) => l.reduce((sum, lk, k2) => sum + q[i][k2] * lk * q[j][k2], 0);
      const t = tensor(at(0, 0), at(1, 1), at(2, 2), at(0, 1), at(1, 2), at(2, 0));
      const r =
        next() < 0.3
          ? rotationFromAxisAngle([0, 0, 1], 0)
          : (rotationFromQuaternion(next(), next() - 0.5, next() - 0.5, next() - 0.5) as unknown as Mat3);
      expectNoLabelOverlap(mohrGeometry(input3d(t, r)));
      if (k % 4 === 0)
        expectNoLabelOverlap(mohrGeometry(inputPlane(l[0], l[1], (next() - 0.5) * 10, (next() - 0.5) * 360)));
    }
  }, 60_000);
});
