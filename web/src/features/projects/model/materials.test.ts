import { describe, expect, it } from "vitest";
import { convertStress } from "../../../../../core";
import {
  createMaterialBodySchema,
  updateMaterialBodySchema,
  type Material,
} from "../../../../../core/contract/materials";
import { materialFormValues, newMaterialBody, optionalNumber } from "./materials";

const stored = (over: Partial<Material> = {}): Material => ({
  id: "00000000-0000-4000-8000-000000000001",
  workspaceId: "00000000-0000-4000-8000-000000000002",
  kind: "workspace",
  name: "Plate 16Mo3, cert. 4471",
  unit: "MPa",
  yieldPa: 275e6,
  ultimateTensionPa: 440e6,
  ultimateCompressionPa: null,
  elasticModulusPa: 210e9,
  poissonRatio: 0.3,
  reference: "mill certificate 4471",
  note: "",
  version: 2,
  createdAt: "2026-12-01T10:00:00.000Z",
  updatedAt: "2026-12-01T10:00:00.000Z",
  updatedBy: null,
  ...over,
});

describe("the material edit form's values", () => {
  it("when a material entered in MPa is opened, then strengths and E are shown back in MPa and missing ones stay empty", () => {
    const values = materialFormValues(stored());
    expect(values).toEqual({
      version: 2,
      name: "Plate 16Mo3, cert. 4471",
      unit: "MPa",
      yield: 275,
      ultimateTension: 440,
      ultimateCompression: null,
      elasticModulus: 210000,
      poissonRatio: 0.3,
      reference: "mill certificate 4471",
      note: "",
    });
    expect(updateMaterialBodySchema.safeParse(values).success).toBe(true);
  });

  it("when a material entered in ksi is opened, then 36 ksi comes back as 36 (1 psi = 6.894757e3 Pa, NIST SP 811, recalled from memory)", () => {
    const psiInPa = 6894.757293168361;
    const values = materialFormValues(
      stored({ unit: "ksi", yieldPa: 36e3 * psiInPa, elasticModulusPa: null }),
    );
    expect(values.yield).toBeCloseTo(36, 9);
    expect(values.elasticModulus).toBeNull();
  });

  it("when the Pa round trip leaves a tail (60.7 psi reads back 60.699999999999996), then the form shows 60.7", () => {
    const yieldPa = convertStress(60.7, "psi", "Pa");
    expect(convertStress(yieldPa, "Pa", "psi")).not.toBe(60.7);
    expect(materialFormValues(stored({ unit: "psi", yieldPa })).yield).toBe(60.7);
  });
});

describe("number boxes", () => {
  it("when an edit box is empty, null or absent, then it is not given (null)", () => {
    expect(optionalNumber("")).toBeNull();
    expect(optionalNumber(null)).toBeNull();
    expect(optionalNumber(undefined)).toBeNull();
  });

  it("when an edit box holds text, then it is read as a number for the schema to judge (NaN when it is none)", () => {
    expect(optionalNumber("0.29")).toBe(0.29);
    expect(Number.isNaN(optionalNumber("abc"))).toBe(true);
  });

  it("when the quick row leaves a strength blank or spaces, then it is sent as not given; other boxes are read as numbers", () => {
    const body = newMaterialBody({
      name: "Bar S355",
      unit: "MPa",
      yield: "355",
      ultimateTension: "   ",
      reference: "EN 10025-2 (recalled from memory)",
    });
    expect(body).toEqual({
      name: "Bar S355",
      unit: "MPa",
      yield: 355,
      ultimateTension: null,
      reference: "EN 10025-2 (recalled from memory)",
    });
    expect(createMaterialBodySchema.safeParse(body).success).toBe(true);
  });

  it("when the quick row's strength is not a number, then NaN is sent and the shared schema refuses it by name", () => {
    const body = newMaterialBody({
      name: "x",
      unit: "MPa",
      yield: "high",
      ultimateTension: "",
      reference: "",
    });
    const checked = createMaterialBodySchema.safeParse(body);
    expect(checked.success).toBe(false);
    expect(checked.error?.issues[0].path).toEqual(["yield"]);
  });
});
