import { describe, expect, it } from "vitest";
import { PUBLISHED_MATERIALS } from "../../../../../core";
import { builtInElasticSources, elasticInputs, libraryElasticSources } from "./elastic-constants";

describe("E and ν for a rosette from a material", () => {
  it("when S355 is picked in SI, then E = 210 GPa and ν = 0.3 fill the fields (structural-steel values, recalled from memory)", () => {
    const s355 = builtInElasticSources(PUBLISHED_MATERIALS).find((m) => m.id === "published:s355")!;
    expect(elasticInputs(s355, "si")).toEqual({ E: 210, nu: 0.3 });
    expect(s355.note).toMatch(/recalled from memory/);
  });

  it("when a material is picked in US units, then E is converted exactly (1 psi = 6894.757293168 Pa, by definition of the pound-force and inch)", () => {
    const source = { id: "x", name: "x", elasticModulusPa: 200e9, poissonRatio: 0.3, note: "" };
    expect(elasticInputs(source, "us-ksi").E).toBeCloseTo(200e9 / 6894.757293168 / 1000, 6);
    expect(elasticInputs(source, "us-psi").E).toBeCloseTo(200e9 / 6894.757293168, 2);
  });

  it("when every built-in grade is listed, then each has E and ν (product rule: the list offers none without them)", () => {
    const list = builtInElasticSources(PUBLISHED_MATERIALS);
    expect(list.length).toBe(PUBLISHED_MATERIALS.length);
    for (const m of list) {
      expect(m.elasticModulusPa).toBeGreaterThan(0);
      expect(m.poissonRatio).toBeGreaterThan(0);
      expect(m.poissonRatio).toBeLessThan(0.5);
    }
  });

  it("when a library material lacks E or ν, then it is not offered", () => {
    const list = libraryElasticSources([
      { id: "a", name: "both", elasticModulusPa: 2e11, poissonRatio: 0.3, reference: "cert" },
      { id: "b", name: "no nu", elasticModulusPa: 2e11, poissonRatio: null, reference: "" },
      { id: "c", name: "no E", elasticModulusPa: null, poissonRatio: 0.3, reference: "" },
    ]);
    expect(list.map((m) => m.name)).toEqual(["both"]);
  });
});
