import { describe, expect, it } from "vitest";
import { displayUnit, formatStress, fromPa } from "./units";

describe("project display units", () => {
  it("when a project uses US customary units, then it shows ksi; SI shows MPa", () => {
    expect(displayUnit("US")).toBe("ksi");
    expect(displayUnit("SI")).toBe("MPa");
  });

  it("when 1 ksi in Pa is converted back, then it is 1 to the seven figures given (1 psi = 6.894757e3 Pa, NIST SP 811 appendix B, recalled from memory)", () => {
    expect(fromPa(6.894757e6, "ksi")).toBeCloseTo(1, 6);
    expect(fromPa(250e6, "MPa")).toBe(250);
  });
});

describe("stress in a table", () => {
  it("when there is no value, then a dash is shown", () => {
    expect(formatStress(null, "MPa")).toBe("—");
  });

  it("when the value is zero or negative zero, then it reads 0, never -0.000", () => {
    expect(formatStress(0, "MPa")).toBe("0");
    expect(formatStress(-0, "ksi")).toBe("0");
  });

  it("when values are written, then they carry about four significant figures and a hyphen minus", () => {
    expect(formatStress(250e6, "MPa")).toBe("250.0");
    expect(formatStress(-1234.5e6, "MPa")).toBe("-1235");
    expect(formatStress(6.894757e6, "ksi")).toBe("1.000");
  });
});
