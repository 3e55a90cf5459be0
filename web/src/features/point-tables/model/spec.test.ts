import { describe, expect, it } from "vitest";
import type { MaterialList } from "../../../../../core/contract/materials";
import { optionOfRef, refFromOption, specFor, storedTableRating } from "./spec";

const list: MaterialList = {
  materials: [],
  published: [
    {
      id: "grade-a",
      kind: "published",
      name: "Grade A",
      standard: "a standard",
      scope: "",
      compressionBasis: "",
      brittle: false,
      note: "",
      yieldPa: 355e6,
      ultimateTensionPa: 470e6,
      ultimateCompressionPa: null,
    },
  ],
};
const project = {
  requirements: [
    { criterion: "von-mises" as const, requiredFactor: 1.5 },
    { criterion: "tresca" as const, requiredFactor: 1.5 },
  ],
  categoryRequirements: [{ category: "test", factors: { "von-mises": 1.1 } }],
};

describe("specFor", () => {
  it("when the load case's category has its own factor, then that factor replaces the default's (core's requirementsFor)", () => {
    const choice = specFor(project, "Test", { kind: "published", id: "grade-a" }, list);
    if (!("spec" in choice)) throw new Error(choice.problem);
    expect(choice.spec.requirements.map((r) => [r.criterion, r.requiredFactor])).toEqual([
      ["von-mises", 1.1],
      ["tresca", 1.5],
    ]);
    expect(choice.spec.material).toEqual({ yield: 355e6, ultimateTension: 470e6 });
    expect(choice.materialName).toBe("Grade A (a standard)");
  });

  it("when no material is chosen or it is gone, then the problem is said in words", () => {
    expect(specFor(project, "", null, list)).toEqual({ problem: expect.stringContaining("material") });
    expect(specFor(project, "", { kind: "published", id: "gone" }, list)).toEqual({
      problem: expect.stringContaining("no longer"),
    });
    expect(specFor({ ...project, requirements: [] }, "", null, list)).toEqual({
      problem: expect.stringContaining("criterion"),
    });
  });

  it("when a select's value is read back, then it names the same reference, and nonsense names none", () => {
    const ref = { kind: "workspace" as const, id: "0d5f3c1e-0000-4000-8000-000000000001" };
    expect(refFromOption(optionOfRef(ref))).toEqual(ref);
    expect(refFromOption("")).toBeNull();
    expect(refFromOption("other:x")).toBeNull();
  });
});

describe("storedTableRating", () => {
  it("when a stored table is opened, then it is rated against the project's default material and the case's category factors, with the project's unsuited-criteria choice", () => {
    const rating = storedTableRating(
      { ...project, defaultMaterial: { kind: "published", id: "grade-a" }, includeUnsuitedCriteria: true },
      "test",
      list,
    );
    if (rating === null || "problem" in rating) throw new Error("expected a spec");
    expect(rating.spec.material).toEqual({ yield: 355e6, ultimateTension: 470e6 });
    expect(rating.spec.requirements[0].requiredFactor).toBe(1.1);
    expect(rating.includeUnsuited).toBe(true);
  });

  it("when the materials are loading or the project names no default material, then it waits or says why", () => {
    const base = { ...project, includeUnsuitedCriteria: false };
    expect(
      storedTableRating({ ...base, defaultMaterial: { kind: "published", id: "grade-a" } }, "", undefined),
    ).toBeNull();
    expect(storedTableRating({ ...base, defaultMaterial: null }, "", list)).toEqual({
      problem: "the project names no default material, which the server rates stored tables against.",
    });
  });
});
