import { describe, expect, it } from "vitest";
import { editable, fixed } from "./format";

describe("bench number formats", () => {
  it("when a value is a million or more (stresses in Pa), then the input shows it with an exponent that Number() reads back", () => {
    expect(editable(150e6)).toBe("1.5e8");
    expect(editable(-4.0569415e6)).toBe("-4.05694e6");
    expect(Number(editable(154.0569415e6))).toBeCloseTo(154.057e6, -1);
    expect(editable(0.0005)).toBe("5e-4");
  });

  it("when a value is ordinary, then the input shows up to six significant figures and 0 for zero or −0", () => {
    expect(editable(199.485)).toBe("199.485");
    expect(editable(9790.24)).toBe("9790.24");
    expect(editable(-0)).toBe("0");
  });

  it("when the bench formats a tiny negative left by a rotation, then it shows 0.000 (the shared formatter)", () => {
    expect(fixed(-3.5e-15, 3)).toBe("0.000");
  });
});
