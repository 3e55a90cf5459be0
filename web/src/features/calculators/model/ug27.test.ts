import { describe, expect, it } from "vitest";
import { decodeInputs } from "./inputs";
import { THIN_WALL_INPUTS, computeThinWall } from "./thin-wall";
import { UG27_INPUTS, computeUg27 } from "./ug27";

function ok<T>(o: { ok: true; result: T } | { ok: false; error: string }): T {
  if (!o.ok) throw new Error(`expected a result, got: ${o.error}`);
  return o.result;
}

/** The check for one address: the thin-walled calculator's inputs and the check's own. */
function check(search: string) {
  const thin = decodeInputs(THIN_WALL_INPUTS, search);
  return computeUg27(thin, ok(computeThinWall(thin)), decodeInputs(UG27_INPUTS, search));
}

describe("the thin-walled calculator's UG-27 check", () => {
  it("when a sphere of inside radius 48 in with a 0.125 in allowance carries 100 psi at S = 17 500 psi and E = 0.85, then R = 48.125 in and t = 4812.5/29 730 = 0.16187 in, 0.28687 in with the allowance, and a 5/16 in wall is enough (UG-27(d) t = PR/(2SE − 0.2P), recalled from memory; hand arithmetic)", () => {
    const r = ok(check("?units=us-psi&shape=sphere&p=100&r=48&t=0.3125&S=17500&E=0.85&CA=0.125"));
    expect(r.corrodedRadius).toBe(48.125);
    expect(r.result.required).toBeCloseTo(0.16187, 5);
    expect(r.result.requiredWithCorrosion).toBeCloseTo(0.28687, 5);
    expect(r.result.governing.paragraph).toBe("UG-27(d)");
    expect(r.wallEnough).toBe(true);
    expect(ok(check("?units=us-psi&shape=sphere&p=100&r=48&t=0.25&S=17500&E=0.85&CA=0.125")).wallEnough).toBe(
      false,
    );
  });

  it("when a cylinder is given by its mean radius (r = 604 mm, t = 8 mm) at 1.5 MPa, S = 138 MPa, E = 1, then R is the inside radius 600 mm and (c)(1) asks 900/137.1 = 6.5646 mm (UG-27(c)(1), recalled from memory; hand arithmetic)", () => {
    const r = ok(check("?p=1.5&r=604&t=8&given=mean&S=138&E=1&CA=0"));
    expect(r.corrodedRadius).toBe(600);
    expect(r.result.governing.paragraph).toBe("UG-27(c)(1)");
    expect(r.result.required).toBeCloseTo(6.5646, 4);
    expect(r.wallEnough).toBe(true);
  });

  it("when the pressure, S, E or the allowance cannot be checked, then the refusal names the field", () => {
    const refusal = (search: string) => {
      const o = check(search);
      return o.ok ? "" : o.error;
    };
    expect(refusal("?p=-1")).toMatch(/^Internal pressure p must be positive for UG-27/);
    expect(refusal("?S=0")).toMatch(/^Allowable stress S/);
    expect(refusal("?E=1.2")).toMatch(/^Joint efficiency E/);
    expect(refusal("?CA=-1")).toMatch(/^Corrosion allowance/);
    // S·E/0.6 = 230 MPa: the hoop formula's denominator S·E − 0.6P reaches zero there.
    expect(refusal("?p=230&S=138&E=1")).toMatch(
      /^Internal pressure p is beyond any UG-27 formula \(it must stay below 230\)/,
    );
    expect(refusal("?p=229&S=138&E=1")).toBe("");
  });
});
