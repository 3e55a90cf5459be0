/**
 * linearize against closed-form cases: a uniform stress, a linear distribution, and the Lamé thick
 * cylinder under internal pressure. Sources beside each test. No published worked example of a
 * linearization with its printed numbers was at hand, so none is used here.
 */
import { describe, expect, it } from "vitest";
import { seededRandom } from "../testing/fixtures";
import { linearize } from "./linearize";
import { RECOMMENDED_MIN_POINTS } from "./path";
import { distancesTo, fieldAt, maxDiff6, pointsAlong, randomFrame, toGlobal } from "./test-fields";

describe("linearize: uniform stress (common practice, no source: the average of a constant is the constant, and its moment about mid-thickness is zero)", () => {
  it("when every point carries the same tensor, then it is all membrane, bending and peak are zero at both ends, for either bending rule", () => {
    const rnd = seededRandom(1601);
    for (let k = 0; k < 200; k++) {
      const frame = randomFrame(rnd);
      const s = Array.from({ length: 6 }, () => (rnd() * 2 - 1) * 300);
      const n = 3 + Math.floor(rnd() * 30);
      const t = 1 + rnd() * 100;
      const x = distancesTo(t, n, rnd);
      const stresses = toGlobal(
        fieldAt(x, () => s),
        frame,
      );
      for (const bending of ["annex-5a", "all-components"] as const) {
        const r = linearize({
          stresses,
          coordinates: pointsAlong([rnd(), rnd(), rnd()], frame[0], x),
          secondAxis: frame[1],
          bending,
        });
        expect(maxDiff6(r.membrane, s, 300)).toBeLessThan(1e-12);
        for (const end of ["start", "end"] as const) {
          expect(maxDiff6(r.bending[end], [0, 0, 0, 0, 0, 0], 300)).toBeLessThan(1e-12);
          expect(maxDiff6(r.peak[end], [0, 0, 0, 0, 0, 0], 300)).toBeLessThan(1e-12);
          expect(maxDiff6(r.membranePlusBending[end], s, 300)).toBeLessThan(1e-12);
        }
        expect(r.thickness).toBeCloseTo(t, 10);
      }
    }
  });
});

describe("linearize: linear distribution (common practice, no source: a linear σ is its own membrane + bending)", () => {
  it("when σ varies linearly through the wall, then membrane + bending reproduce it at both ends and peak is 0 for the bent components σyy, σzz; the others keep their linear part as peak (Annex 5-A, recalled from memory)", () => {
    const rnd = seededRandom(1602);
    for (let k = 0; k < 200; k++) {
      const frame = randomFrame(rnd);
      const a = Array.from({ length: 6 }, () => (rnd() * 2 - 1) * 200);
      const b = Array.from({ length: 6 }, () => (rnd() * 2 - 1) * 20);
      const t = 1 + rnd() * 50;
      const n = 3 + Math.floor(rnd() * 25);
      const x = distancesTo(t, n, rnd); // uneven spacing on purpose
      const at = (xi: number) => a.map((ac, c) => ac + b[c] * xi);
      const r = linearize({
        stresses: toGlobal(fieldAt(x, at), frame),
        distances: x,
        lineDirection: frame[0],
        secondAxis: frame[1],
      });
      const scale = 200 + 20 * t;
      // membrane of a linear σ is its mid-thickness value, for every component
      expect(maxDiff6(r.membrane, at(t / 2), scale)).toBeLessThan(1e-12);
      for (const c of [1, 2]) {
        expect(Math.abs(r.membranePlusBending.start[c] - at(0)[c]) / scale).toBeLessThan(1e-12);
        expect(Math.abs(r.membranePlusBending.end[c] - at(t)[c]) / scale).toBeLessThan(1e-12);
        expect(Math.abs(r.peak.start[c]) / scale).toBeLessThan(1e-12);
        expect(Math.abs(r.peak.end[c]) / scale).toBeLessThan(1e-12);
      }
      for (const c of [0, 3, 4, 5]) {
        expect(r.bending.start[c]).toBe(0);
        expect(Math.abs(r.peak.start[c] - (-b[c] * t) / 2) / scale).toBeLessThan(1e-12);
        expect(Math.abs(r.peak.end[c] - (b[c] * t) / 2) / scale).toBeLessThan(1e-12);
      }
      const all = linearize({
        stresses: toGlobal(fieldAt(x, at), frame),
        distances: x,
        lineDirection: frame[0],
        secondAxis: frame[1],
        bending: "all-components",
      });
      expect(maxDiff6(all.membranePlusBending.start, at(0), scale)).toBeLessThan(1e-12);
      expect(maxDiff6(all.membranePlusBending.end, at(t), scale)).toBeLessThan(1e-12);
      expect(maxDiff6(all.peak.start, [0, 0, 0, 0, 0, 0], scale)).toBeLessThan(1e-12);
      expect(maxDiff6(all.peak.end, [0, 0, 0, 0, 0, 0], scale)).toBeLessThan(1e-12);
    }
  });
});

/**
 * Thick cylinder with closed ends under internal pressure p (Lamé; Timoshenko & Goodier, Theory of
 * Elasticity, the thick cylinder article — recalled from memory): σθ = A + B/r², σr = A − B/r²,
 * σz = A, with A = p·ri²/(ro² − ri²), B = A·ro².
 * Integrated by hand (x = r − ri, t = ro − ri):
 *   hoop membrane (1/t)∫σθ dr = A + B/(ri·ro) = p·ri/(ro − ri) exactly;
 *   hoop bending (6/t²)∫σθ(t/2 − x)dr = (6B/t²)[(ri + ro)t/(2ri·ro) − ln(ro/ri)];
 *   radial membrane A − B/(ri·ro) = −p·ri/(ri + ro); axial membrane A, no bending.
 * For p = 10, ri = 100, ro = 150 (MPa, mm) those give 20, 4.839073297272989, −4, 8; the bending value
 * and the von Mises stresses below were recomputed independently with scipy.integrate.quad and numpy
 * outside this project (4.839073297272989; von Mises membrane 20.784609690826528, membrane + bending
 * 25.092295014171345 at the bore and 16.7693169710204 at the outside; Tresca at the bore
 * 28.83907329727299).
 */
const P = 10;
const RI = 100;
const RO = 150;
const A = (P * RI * RI) / (RO * RO - RI * RI);
const B = A * RO * RO;
const T = RO - RI;
const HOOP_BENDING = ((6 * B) / (T * T)) * (((RI + RO) * T) / (2 * RI * RO) - Math.log(RO / RI));

/** Lamé stresses on a radial line at angle `thetaDeg` in the global x-y plane (cylinder axis = global z). */
function lameLine(n: number, thetaDeg = 30) {
  const th = (thetaDeg * Math.PI) / 180;
  const er = [Math.cos(th), Math.sin(th), 0] as const;
  const x = distancesTo(T, n);
  const local = fieldAt(x, (xi) => {
    const r = RI + xi;
    return [A - B / (r * r), A + B / (r * r), A, 0, 0, 0]; // radial, hoop, axial
  });
  const frame = [er, [-Math.sin(th), Math.cos(th), 0], [0, 0, 1]] as const;
  return {
    stresses: toGlobal(local, frame),
    coordinates: pointsAlong([RI * er[0], RI * er[1], 0], er, x),
  };
}

describe("linearize: Lamé thick cylinder under internal pressure (Timoshenko & Goodier, recalled from memory; integrals by hand, recomputed with scipy quad)", () => {
  it("when a fine radial line is taken in the default frame, then y is hoop and the hoop membrane equals p·ri/(ro − ri), the radial −p·ri/(ri + ro), the axial A", () => {
    const r = linearize(lameLine(2001));
    expect(r.frame[1][0]).toBeCloseTo(-Math.sin(Math.PI / 6), 12); // default y = z × line = hoop
    expect(r.frame[1][1]).toBeCloseTo(Math.cos(Math.PI / 6), 12);
    expect(Math.abs(r.membrane[1] / ((P * RI) / (RO - RI)) - 1)).toBeLessThan(1e-7);
    expect(Math.abs(r.membrane[0] / ((-P * RI) / (RI + RO)) - 1)).toBeLessThan(1e-7);
    expect(Math.abs(r.membrane[2] / A - 1)).toBeLessThan(1e-12);
    for (const c of [3, 4, 5]) expect(Math.abs(r.membrane[c])).toBeLessThan(1e-12);
  });

  it("when a fine radial line is taken, then hoop bending, peaks and the equivalent stresses match the hand integration (scipy quad: 4.839073297272989, von Mises 20.7846…, 25.0923…, 16.7693…)", () => {
    const r = linearize(lameLine(2001));
    expect(HOOP_BENDING).toBeCloseTo(4.839073297272989, 12);
    expect(Math.abs(r.bending.start[1] / 4.839073297272989 - 1)).toBeLessThan(1e-6);
    expect(r.bending.start[0]).toBe(0); // radial (through-thickness) stress is not bent (Annex 5-A)
    expect(r.bending.start[2]).toBeCloseTo(0, 9); // axial stress is uniform
    // peaks: hoop σθ(ri) − σm − σb = 1.1609267027270107; radial at the bore −p − (−4) = −6
    expect(r.peak.start[1]).toBeCloseTo(1.1609267027270107, 5);
    expect(r.peak.end[1]).toBeCloseTo(0.8390732972729893, 5);
    expect(r.peak.start[0]).toBeCloseTo(-6, 5);
    expect(r.peak.end[0]).toBeCloseTo(4, 5);
    expect(r.total.start[0]).toBeCloseTo(-P, 10); // σr(ri) = −p
    expect(r.equivalent.membrane).toBeCloseTo(20.784609690826528, 5);
    expect(r.equivalent.membranePlusBending.start).toBeCloseTo(25.092295014171345, 5);
    expect(r.equivalent.membranePlusBending.end).toBeCloseTo(16.7693169710204, 5);
    const tr = linearize({ ...lameLine(2001), equivalent: "tresca" });
    expect(tr.equivalent.criterion).toBe("tresca");
    expect(tr.equivalent.membranePlusBending.start).toBeCloseTo(28.83907329727299, 5);
  });

  it("when the path is refined (11, 21, 41, 81, 161 points), then the hoop membrane and bending errors fall by about 4 per halving of the interval (second-order convergence)", () => {
    const exactM = (P * RI) / (RO - RI);
    let last: { m: number; b: number } | undefined;
    for (const n of [11, 21, 41, 81, 161]) {
      const r = linearize(lameLine(n));
      const err = { m: Math.abs(r.membrane[1] - exactM), b: Math.abs(r.bending.start[1] - HOOP_BENDING) };
      if (last) {
        expect(last.m / err.m).toBeGreaterThan(3.8);
        expect(last.m / err.m).toBeLessThan(4.2);
        expect(last.b / err.b).toBeGreaterThan(3.8);
        expect(last.b / err.b).toBeLessThan(4.2);
      }
      last = err;
    }
    // at the recommended minimum of points the membrane + bending is within 0.1 % for ro/ri = 1.5
    const r = linearize(lameLine(RECOMMENDED_MIN_POINTS));
    expect(Math.abs(r.membranePlusBending.start[1] / (exactM + HOOP_BENDING) - 1)).toBeLessThan(1e-3);
    expect(r.warnings).toEqual([]);
  });

  it("when the von Mises stresses of the points are linearized as scalars instead of the tensors, then the answer differs, so the function must (and does) use the tensors", () => {
    const line = lameLine(2001);
    const r = linearize(line);
    // linearize the point-wise von Mises scalar as if it were a component (the wrong way)
    const vm = new Float64Array(2001 * 6);
    for (let i = 0; i < 2001; i++) {
      const sr = r.local[6 * i];
      const sh = r.local[6 * i + 1];
      const sz = r.local[6 * i + 2];
      vm[6 * i + 1] = Math.sqrt(0.5 * ((sr - sh) ** 2 + (sh - sz) ** 2 + (sz - sr) ** 2));
    }
    const scalar = linearize({ stresses: vm, distances: r.x, lineDirection: [1, 0, 0] });
    const wrong = scalar.membranePlusBending.start[1];
    expect(Math.abs(wrong - r.equivalent.membranePlusBending.start)).toBeGreaterThan(1);
    expect(r.equivalent.membranePlusBending.start).toBeCloseTo(25.092295014171345, 5);
  });
});

describe("linearize: notes and warnings (our choices, stated in path.ts)", () => {
  it("when fewer points than recommended are given, then a warning names the recommended number; with enough, none", () => {
    const few = linearize(lameLine(5));
    expect(few.warnings.join(" ")).toContain(`at least ${RECOMMENDED_MIN_POINTS}`);
    expect(linearize(lameLine(RECOMMENDED_MIN_POINTS)).warnings).toEqual([]);
  });

  it("when the points are unevenly spaced, then a note says the stress was taken as linear between them; evenly spaced, no such note", () => {
    const x = distancesTo(10, 21, seededRandom(5));
    const s = fieldAt(x, (xi) => [0, xi * xi, 0, 0, 0, 0]);
    const uneven = linearize({ stresses: s, distances: x, lineDirection: [1, 0, 0] });
    expect(uneven.notes.some((n) => n.includes("unevenly spaced"))).toBe(true);
    const even = linearize({ stresses: s, distances: distancesTo(10, 21), lineDirection: [1, 0, 0] });
    expect(even.notes.some((n) => n.includes("unevenly spaced"))).toBe(false);
  });

  it("when the options are left at their defaults, then the result says Annex 5-A bending and von Mises, and that the method was recalled from memory; the other options say themselves", () => {
    const plain = linearize(lameLine(11));
    expect(plain.bendingRule).toBe("annex-5a");
    expect(plain.bentComponents).toEqual([1, 2]);
    expect(plain.equivalent.criterion).toBe("von-mises");
    expect(plain.equivalent.label).toBe("von Mises");
    expect(plain.notes.join(" ")).toContain("σyy and σzz only");
    expect(plain.source).toContain("Annex 5-A");
    expect(plain.source).toContain("recalled from memory, verify against the code edition you work to");
    expect(plain.frameNote).toContain("Default frame");
    const other = linearize({
      ...lameLine(11),
      bending: "all-components",
      equivalent: "tresca",
      secondAxis: [0, 0, 1],
    });
    expect(other.bentComponents).toEqual([0, 1, 2, 3, 4, 5]);
    expect(other.notes.join(" ")).toContain("'bend every component' option");
    expect(other.equivalent.label).toBe("Tresca stress intensity σ1 − σ3");
    expect(other.frameNote).toContain("Caller's frame");
  });

  it("when a point lies more than 1 % of the thickness off the line, then a warning names it; the distances are its projection", () => {
    const x = distancesTo(10, 11);
    const coordinates = pointsAlong([0, 0, 0], [1, 0, 0], x);
    coordinates[3 * 4 + 1] = 0.5; // point 4 is 0.5 off a 10-long line
    const r = linearize({ stresses: fieldAt(x, () => [1, 2, 3, 0, 0, 0]), coordinates });
    expect(r.warnings.join(" ")).toContain("Point 4 lies 0.500 off the line");
    expect(r.x[4]).toBeCloseTo(4, 12);
  });
});
