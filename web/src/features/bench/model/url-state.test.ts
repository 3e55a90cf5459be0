import { describe, expect, it } from "vitest";
import { rotateTensor, verdictForFactor as verdictFor } from "../../../../../core";
import * as act from "./actions";
import { initialBenchState } from "./bench-state";
import { benchAddress, decodeBenchState, encodeBenchState } from "./url-state";
import { resultsAsText } from "./results-text";
import { criteriaOf, planePrincipals } from "./derive";

describe("bench state in the URL and as text", () => {
  it("when a state is encoded and decoded, then tensor, unit, rotation, material and criteria come back and the readout is the same to 1e-12", () => {
    let s = act.loadExample(initialBenchState(), "junction-design");
    s = act.changeUnit(s, "ksi", "convert");
    s = act.turnElement(s, [0.2, -1, 0.4], 37.3);
    s = act.setStrength(s, "yield", 40);
    s = act.toggleEnvelope(s, "mohr-coulomb");
    s = act.setPlaneEnabled(act.setPlaneNormal(s, [1, 2, 2]), true);
    s = act.setMohrView(act.setRotationView(s, "euler"), "plane");
    s = act.setIncludeUnsuited(act.setBehaviour(s, "brittle"), true);
    const back = act.applyShared(initialBenchState(), decodeBenchState("?" + encodeBenchState(s)));
    expect(back.unit).toBe("ksi");
    expect(back.tensor.xx).toBe(s.tensor.xx === 0 ? 0 : Number(s.tensor.xx.toPrecision(15)));
    const a = rotateTensor(s.tensor, s.rotation);
    const b = rotateTensor(back.tensor, back.rotation);
    for (const c of ["xx", "yy", "zz", "xy", "yz", "zx"] as const)
      expect(Math.abs(a[c] - b[c])).toBeLessThan(1e-12);
    expect(back.material).toEqual({ ...s.material, yield: Number(s.material.yield!.toPrecision(15)) });
    expect(back.envelopeCriteria).toEqual(["von-mises", "tresca", "mohr-coulomb"]);
    expect(back.plane).toEqual({ enabled: true, normal: [1, 2, 2] });
    expect(back.rotationView).toBe("euler");
    expect(back.mohrView).toBe("plane");
    expect(back.behaviour).toBe("brittle");
    expect(back.includeUnsuited).toBe(true);
    expect(criteriaOf(back).map((r) => r.available && r.verdict)).toEqual(
      criteriaOf(s).map((r) => r.available && r.verdict),
    );
  });

  it("when a link holds malformed values, then they are ignored and the rest is read", () => {
    const d = decodeBenchState("s=1,2,x&u=bar&r=0,0,0,10&n=0.5&m=s235");
    expect(d.tensor).toBeUndefined();
    expect(d.unit).toBeUndefined();
    expect(d.rotation).toBeUndefined();
    expect(d.requiredFactor).toBeUndefined();
    expect(d.material?.yield).toBe(235);
  });

  it("when the results are copied as text, then the block holds the principal values, each criterion's verdict word and the caution", () => {
    const s = act.loadExample(initialBenchState(), "shaft-startup");
    const text = resultsAsText(s, "http://x/bench?s=1");
    expect(text).toMatch(/σ₁ +\d/);
    expect(text).toMatch(/von Mises .* (passes|close|FAILS)/);
    expect(text).toMatch(/licensed engineer/);
    expect(text).toMatch(/verify against the standard/);
    expect(text).toMatch(/Link: http:\/\/x\/bench/);
  });

  it("when n is below, just above and well above the required factor, then the verdict is fail, close and pass (10 % band)", () => {
    expect(verdictFor(1.49, 1.5)).toBe("fail");
    expect(verdictFor(1.5, 1.5)).toBe("close");
    expect(verdictFor(1.64, 1.5)).toBe("close");
    expect(verdictFor(1.66, 1.5)).toBe("pass");
  });

  it("when the shaft start-up state is checked against S355, then von Mises n = 355/√(σ² + 3τ²) (combined bending and torsion, Shigley eq. 5-15)", () => {
    const s = act.loadExample(initialBenchState(), "shaft-startup");
    const vm = criteriaOf(s).find((r) => r.criterion === "von-mises")!;
    const sigma = s.tensor.xx;
    const tau = s.tensor.xy;
    expect(vm.available && vm.n).toBeCloseTo(355 / Math.sqrt(sigma * sigma + 3 * tau * tau), 10);
    expect(planePrincipals([100, 0, -20])).toEqual([100, -20]);
    expect(planePrincipals([100, 5, -20])).toBeNull();
  });
});

describe("a link is an entry point too", () => {
  it("when a link carries 1e300 in σxx, then the tensor is not taken from it", () => {
    expect(decodeBenchState("?s=1e300,0,0,0,0,0&u=MPa").tensor).toBeUndefined();
    expect(decodeBenchState("?s=100,0,0,0,0,0&u=MPa").tensor).toEqual({
      xx: 100,
      yy: 0,
      zz: 0,
      xy: 0,
      yz: 0,
      zx: 0,
    });
  });

  it("when the address has already moved to another page, then the bench writes nothing; on its own page it keeps the source first and the hash last", () => {
    const query = encodeBenchState(initialBenchState());
    expect(
      benchAddress({ pathname: "/workspaces/w/projects/p", hash: "" }, "/bench", "w/p/c/l", query),
    ).toBeNull();
    expect(benchAddress({ pathname: "/bench", hash: "#mohr" }, "/bench", "w/p/c/l", query)).toBe(
      `/bench?source=w/p/c/l&${query}#mohr`,
    );
    expect(benchAddress({ pathname: "/bench", hash: "" }, "/bench", null, query)).toBe(`/bench?${query}`);
  });
});
