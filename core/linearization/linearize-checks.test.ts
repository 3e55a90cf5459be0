/**
 * The category checks of a linearized line: which rules a classification calls for, their limits
 * (ASME BPVC Section VIII Division 2 Part 5, recalled from memory — each check's `source` says so),
 * ratio and verdict by the product's rule (core/checks/verdict.ts).
 */
import { describe, expect, it } from "vitest";
import { spsLimit } from "./category-checks";
import { linearize } from "./linearize";
import { distancesTo, fieldAt } from "./test-fields";
import type { LinearizationInput } from "./types";

/** A uniaxial hoop stress σyy = m + b(1 − 2x/t) on a 10-long line: membrane m, bending b at x = 0. */
function line(m: number, b: number): Pick<LinearizationInput, "stresses" | "distances" | "lineDirection"> {
  const x = distancesTo(10, 21);
  return {
    stresses: fieldAt(x, (xi) => [0, m + b * (1 - xi / 5), 0, 0, 0, 0]),
    distances: x,
    lineDirection: [1, 0, 0],
  };
}

describe("linearize: category checks (ASME BPVC VIII-2 Part 5, recalled from memory, verify against the code edition you work to)", () => {
  it("when the line is primary general membrane, then Pm ≤ S on the membrane and Pm + Pb ≤ 1.5S at the worse end are checked, with value, limit, ratio and verdict", () => {
    const r = linearize({
      ...line(100, 60),
      classification: { membrane: "general", stresses: "primary" },
      allowables: { S: 120 },
    });
    expect(r.checks.map((c) => c.rule)).toEqual(["Pm ≤ S", "Pm + Pb ≤ 1.5S"]);
    const [pm, pmb] = r.checks;
    expect(pm.value).toBeCloseTo(100, 10); // von Mises of a uniaxial 100
    expect(pm.limit).toBe(120);
    expect(pm.ratio).toBeCloseTo(100 / 120, 12);
    expect(pm.verdict).toBe("pass"); // 0.833 < 1/1.1
    expect(pm.at).toBe("membrane");
    expect(pmb.value).toBeCloseTo(160, 10);
    expect(pmb.at).toBe("start");
    expect(pmb.limit).toBe(180);
    expect(pmb.verdict).toBe("pass"); // 160/180 = 0.889 < 0.909
    for (const c of r.checks)
      expect(c.source).toContain("recalled from memory, verify against the code edition");
    expect(r.checksNote).toContain("general membrane");
  });

  it("when the line is primary local membrane, then PL ≤ 1.5S and PL + Pb ≤ 1.5S are checked; the worse end may be the last point", () => {
    const r = linearize({
      ...line(100, -70),
      classification: { membrane: "local", stresses: "primary" },
      allowables: { S: 110 },
    });
    expect(r.checks.map((c) => c.rule)).toEqual(["PL ≤ 1.5S", "PL + Pb ≤ 1.5S"]);
    expect(r.checks[0].limit).toBeCloseTo(165, 12);
    expect(r.checks[0].verdict).toBe("pass");
    expect(r.checks[1].value).toBeCloseTo(170, 10);
    expect(r.checks[1].at).toBe("end");
    expect(r.checks[1].verdict).toBe("fail"); // 170 > 165
  });

  it("when membrane + bending is just under the limit (within 10 %), then the verdict is close, by the product's pass/close/fail rule", () => {
    const r = linearize({
      ...line(100, 70),
      classification: { membrane: "local", stresses: "primary" },
      allowables: { S: 115 },
    });
    expect(r.checks[1].ratio).toBeCloseTo(170 / 172.5, 10);
    expect(r.checks[1].verdict).toBe("close");
  });

  it("when the line is primary plus secondary, then only PL + Pb + Q ≤ SPS is checked and the note says primary limits need a primary-only linearization", () => {
    const r = linearize({
      ...line(100, 200),
      classification: { membrane: "local", stresses: "primary-plus-secondary" },
      allowables: { S: 100, Sy: 200, Su: 400 },
    });
    expect(r.checks.map((c) => c.rule)).toEqual(["PL + Pb + Q ≤ SPS"]);
    expect(r.checks[0].value).toBeCloseTo(300, 10);
    expect(r.checks[0].limit).toBe(400); // max(3S, 2Sy) = 2Sy
    expect(r.checks[0].limitNote).toContain("2Sy");
    expect(r.checks[0].verdict).toBe("pass");
    expect(r.checksNote).toContain("primary loads alone");
  });

  it("when SPS is asked for, then it is max(3S, 2Sy), limited to 3S for Sy/Su > 0.7, time-dependent S, or a missing Sy or Su (ASME VIII-2 Part 5, recalled from memory)", () => {
    expect(spsLimit({ S: 100, Sy: 200, Su: 400 }).limit).toBe(400);
    expect(spsLimit({ S: 100, Sy: 140, Su: 400 }).limit).toBe(300); // 3S > 2Sy
    expect(spsLimit({ S: 100, Sy: 290, Su: 400 }).limit).toBe(300); // Sy/Su = 0.725 > 0.7
    expect(spsLimit({ S: 100, Sy: 280, Su: 400 }).limit).toBe(560); // Sy/Su = 0.7 exactly: 2Sy allowed
    expect(spsLimit({ S: 100, Sy: 200, Su: 400, timeDependent: true }).limit).toBe(300);
    expect(spsLimit({ S: 100, Sy: 200 }).note).toContain("Su not given");
    expect(spsLimit({ S: 100 }).note).toContain("Sy not given");
  });

  it("when no classification is given, then there are no checks and the note says how to get them", () => {
    const r = linearize(line(100, 10));
    expect(r.checks).toEqual([]);
    expect(r.checksNote).toContain("give classification");
  });

  it("when the allowables or classification are impossible or one comes without the other, then a RangeError names the field", () => {
    const base = line(100, 10);
    const cls = { membrane: "general", stresses: "primary" } as const;
    expect(() => linearize({ ...base, classification: cls })).toThrow(/allowables must be given/);
    expect(() => linearize({ ...base, allowables: { S: 100 } })).toThrow(/classification must be given/);
    expect(() => linearize({ ...base, classification: cls, allowables: { S: 0 } })).toThrow(/allowables\.S/);
    expect(() => linearize({ ...base, classification: cls, allowables: { S: NaN } })).toThrow(
      /allowables\.S/,
    );
    expect(() => linearize({ ...base, classification: cls, allowables: { S: 1, Sy: -1 } })).toThrow(
      /allowables\.Sy/,
    );
    expect(() =>
      linearize({
        ...base,
        classification: { membrane: "global" as "general", stresses: "primary" },
        allowables: { S: 1 },
      }),
    ).toThrow(/classification\.membrane/);
  });
});
