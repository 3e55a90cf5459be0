import { describe, expect, it } from "vitest";
import { stressInputSchema } from "../contract/load-cases";
import { MAX_STRESS_MAGNITUDE } from "../contract/materials";
import { MAX_INPUT_STRESS, stressInputProblem } from "./validate";

describe("the input range of stresses (product rule)", () => {
  it("when the engine's input bound is compared with the API contract's, then they are the same 1e12", () => {
    expect(MAX_INPUT_STRESS).toBe(1e12);
    expect(MAX_INPUT_STRESS).toBe(MAX_STRESS_MAGNITUDE);
  });

  it("when a value is 1e300, NaN or Infinity, then it has a problem; 1e12 and −1e12 have none", () => {
    expect(stressInputProblem(1e300)).toMatch(/is larger than 1e\+12 in magnitude/);
    expect(stressInputProblem(-1.5e12)).toMatch(/is larger than/);
    expect(stressInputProblem(Number.NaN)).toBe("is not a finite number");
    expect(stressInputProblem(Number.NEGATIVE_INFINITY)).toBe("is not a finite number");
    expect(stressInputProblem(1e12)).toBeUndefined();
    expect(stressInputProblem(-1e12)).toBeUndefined();
    expect(stressInputProblem(0)).toBeUndefined();
  });

  it("when the API's stress input holds 1e300 in σxx, then the contract refuses it naming the field", () => {
    const r = stressInputSchema.safeParse({
      unit: "MPa",
      components: { xx: 1e300, yy: 0, zz: 0, xy: 0, yz: 0, zx: 0 },
    });
    expect(r.success).toBe(false);
    if (r.success) return;
    expect(r.error.issues[0].path).toEqual(["components", "xx"]);
    expect(r.error.issues[0].message).toMatch(/at most 1e\+12/);
  });
});
