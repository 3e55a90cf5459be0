import { describe, expect, it } from "vitest";
import { COMMON_SIX_ORDERS, COMPONENTS } from "../../../core";
import {
  COMPONENT_SYMBOLS,
  displayUnit,
  editableStress,
  formatStress,
  orderInSymbols,
  STRESS_COMPONENTS,
} from "./stress";

// 1 psi = 0.45359237 kg × 9.80665 m/s² / (0.0254 m)² = 6894.757293168 Pa (formula, from the exact
// definitions of the pound, standard gravity and the inch; NIST SP 811 lists 6.894 757 E+03).
const PA_PER_KSI = 6894757.293168;

describe("the one stress formatter", () => {
  it("when a stress in Pa is shown in MPa, then it has about four significant figures (1 MPa = 1e6 Pa, SI definition)", () => {
    expect(formatStress(1234.4e6, "MPa")).toBe("1234");
    expect(formatStress(199.485e6, "MPa")).toBe("199.5");
    expect(formatStress(33.75e6, "MPa")).toBe("33.75");
    expect(formatStress(2.5e6, "MPa")).toBe("2.500");
  });

  it("when a stress is compressive, then it is written with the ASCII minus so a copied cell pastes as a number", () => {
    expect(formatStress(-119.7e6, "MPa")).toBe("-119.7");
    expect(formatStress(-0.5e6, "MPa")).toBe("-0.500");
  });

  it("when a stress is in ksi, then the Pa value is converted with the exact psi (formula from unit definitions)", () => {
    expect(formatStress(12.5 * PA_PER_KSI, "ksi")).toBe("12.50");
    expect(formatStress(36 * PA_PER_KSI, "ksi")).toBe("36.00");
  });

  it("when a stress is exactly zero, missing, or a negative value too small to show, then it reads 0, — and 0.000 (never −0.000)", () => {
    expect(formatStress(0, "MPa")).toBe("0");
    expect(formatStress(null, "MPa")).toBe("—");
    expect(formatStress(-1e-10, "MPa")).toBe("0.000");
  });

  it("when a stored stress goes into a form or a link, then it keeps 12 significant figures of the converted value", () => {
    expect(editableStress(199.485e6, "MPa")).toBe(199.485);
    expect(editableStress(10 * PA_PER_KSI, "ksi")).toBe(10);
  });

  it("when a project's unit system is US or SI, then its stresses show in ksi or MPa", () => {
    expect(displayUnit("US")).toBe("ksi");
    expect(displayUnit("SI")).toBe("MPa");
  });
});

describe("the six components", () => {
  it("when web lists the components, then they are core's, in core's order, each with its three symbols", () => {
    expect(STRESS_COMPONENTS).toEqual(COMPONENTS);
    expect(Object.keys(COMPONENT_SYMBOLS)).toEqual([...COMPONENTS]);
    expect(STRESS_COMPONENTS.map((c) => COMPONENT_SYMBOLS[c].tensor).join(" ")).toBe(
      "σxx σyy σzz τxy τyz τzx",
    );
    expect(STRESS_COMPONENTS.map((c) => COMPONENT_SYMBOLS[c].short).join(" ")).toBe("σx σy σz τxy τyz τzx");
  });

  it("when a paste order is named, then the last shear reads τxz as result files write it (common practice, no source)", () => {
    expect(orderInSymbols(COMPONENTS)).toBe("σx σy σz τxy τyz τxz");
    for (const order of Object.values(COMMON_SIX_ORDERS))
      expect(orderInSymbols(order).split(" ")).toHaveLength(6);
  });
});
