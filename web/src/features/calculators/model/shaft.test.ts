/**
 * "Use the critical point": the shaft page moves its point to the critical one, so the state it
 * saves or sends is the critical state and the inputs stored with it give that state back.
 */
import { describe, expect, it } from "vitest";
import { seededRandom } from "../../../../../core/testing/fixtures";
import { decodeInputs, encodeInputs } from "./inputs";
import { SHAFT_INPUTS, atCriticalPoint, computeShaft, isCriticalPoint, keptAngle } from "./shaft";

function ok<T>(o: { ok: true; result: T } | { ok: false; error: string }): T {
  if (!o.ok) throw new Error(`expected a result, got: ${o.error}`);
  return o.result;
}

describe("the shaft's critical point as the point to save", () => {
  it("when a hollow shaft under My, Mz, tension and torque is moved to its critical point, then the point's σvM is √((M·ro/I + P/A)² + 3(T·ro/J)²) at θ = atan2(My, −Mz) on the outer face (combined bending, axial load and torsion of a circular shaft: formula)", () => {
    // D = 60 mm, d = 30 mm, My = 1200 N·m, Mz = 900 N·m, P = 20 kN, T = 900 N·m; the user's point
    // is on the bore at 10°, far from the critical one.
    const v = decodeInputs(
      SHAFT_INPUTS,
      "?section=hollow&D=60&d=30&My=1200&Mz=900&P=20000&T=900&surface=inner&angle=10",
    );
    const before = ok(computeShaft(v));
    expect(isCriticalPoint(before)).toBe(false);

    const moved = atCriticalPoint(v, before.critical);
    expect(moved.choices.surface).toBe("outer");
    const after = ok(computeShaft(moved));
    expect(isCriticalPoint(after)).toBe(true);

    const ro = 30;
    const ri = 15;
    const area = Math.PI * (ro ** 2 - ri ** 2);
    const I = (Math.PI * (ro ** 4 - ri ** 4)) / 4;
    const J = 2 * I;
    const M = Math.hypot(1200e3, 900e3);
    const sigma = (M * ro) / I + 20000 / area;
    const tau = (900e3 * ro) / J;
    const vm = Math.sqrt(sigma ** 2 + 3 * tau ** 2);
    expect(Math.abs(after.point.vonMises - vm)).toBeLessThanOrEqual(1e-12 * vm);
    expect(Math.abs(after.point.sigma - sigma)).toBeLessThanOrEqual(1e-8 * sigma);
    expect(after.point.tau).toBeCloseTo(tau, 10);
    const expectedAngle = (Math.atan2(1200, -900) * 180) / Math.PI;
    expect(Math.abs(moved.numbers.angle - expectedAngle)).toBeLessThanOrEqual(1e-6);
    // Everything but the point stays as typed.
    expect({ ...moved.numbers, angle: 10 }).toEqual(v.numbers);
    expect({ ...moved.choices, surface: "inner" }).toEqual(v.choices);
  });

  it("when the moved inputs go through the address and back (a saved state's reopen link), then the state is the same to the last bit", () => {
    const v = decodeInputs(SHAFT_INPUTS, "?D=45&My=350&Mz=-120&T=700&P=-5000&Vy=2000&Vz=-800&angle=0");
    const moved = atCriticalPoint(v, ok(computeShaft(v)).critical);
    const reopened = decodeInputs(SHAFT_INPUTS, encodeInputs(SHAFT_INPUTS, moved));
    expect(reopened).toEqual(moved);
    expect(ok(computeShaft(reopened)).point.tensor).toEqual(ok(computeShaft(moved)).point.tensor);
  });

  it("when random loads on random solid and hollow shafts are moved to the critical point, then no surface point sampled every 0.25° has a larger σvM = √(σx² + 3τxy²) by the shaft formulas (σx = (My·z − Mz·y)/I + P/A, τxy = T·ρ/J + (4k/(3A))·V·t̂; formula) (property, seeded)", () => {
    const random = seededRandom(1303);
    const load = (scale: number) => (random() * 2 - 1) * scale;
    for (let i = 0; i < 25; i++) {
      const hollow = random() < 0.5;
      const D = 20 + random() * 80;
      const d = hollow ? D * (0.2 + random() * 0.7) : 0;
      // N·m → N·mm for the moments; N and mm give MPa.
      const [My, Mz, T] = [load(2000) * 1e3, load(2000) * 1e3, load(2000) * 1e3];
      const [P, Vy, Vz] = [load(50000), load(20000), load(20000)];
      const query = new URLSearchParams({
        section: hollow ? "hollow" : "solid",
        D: String(D),
        d: String(hollow ? d : 30),
        My: String(My / 1e3),
        Mz: String(Mz / 1e3),
        T: String(T / 1e3),
        P: String(P),
        Vy: String(Vy),
        Vz: String(Vz),
        surface: random() < 0.5 ? "inner" : "outer",
        angle: String(random() * 360),
      });
      const v = decodeInputs(SHAFT_INPUTS, query.toString());
      const point = ok(computeShaft(atCriticalPoint(v, ok(computeShaft(v)).critical))).point;

      const ro = D / 2;
      const ri = d / 2;
      const area = Math.PI * (ro ** 2 - ri ** 2);
      const I = (Math.PI * (ro ** 4 - ri ** 4)) / 4;
      const k = (ro ** 2 + ro * ri + ri ** 2) / (ro ** 2 + ri ** 2);
      let largest = 0;
      for (const rho of hollow ? [ro, ri] : [ro]) {
        for (let a = 0; a < 360; a += 0.25) {
          const [c, s] = [Math.cos((a * Math.PI) / 180), Math.sin((a * Math.PI) / 180)];
          const sigma = (My * rho * s - Mz * rho * c) / I + P / area;
          const tau = (T * rho) / (2 * I) + ((4 * k) / (3 * area)) * (-Vy * s + Vz * c);
          largest = Math.max(largest, Math.sqrt(sigma ** 2 + 3 * tau ** 2));
        }
      }
      expect(point.vonMises).toBeGreaterThanOrEqual(largest * (1 - 1e-12));
      // and it is a point of the surface, not above it: within the sampling's reach of the largest
      expect(point.vonMises).toBeLessThanOrEqual(largest * 1.001);
    }
  });

  it("when the critical angle rounds up to 360°, then the kept angle is 0° (the same point, as the page reads it)", () => {
    expect(keptAngle(359.99999999999)).toBe(0);
    expect(keptAngle(126.86989764584402)).toBe(126.8698976);
  });
});
