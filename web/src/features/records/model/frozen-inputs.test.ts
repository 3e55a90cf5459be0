import { describe, expect, it } from "vitest";
import { frozenInputs, provenance } from "./frozen-inputs";
import { recordContent } from "./record-fixture";

describe("frozen inputs of a record", () => {
  it("when a record is shown, then its factors, locations, states (with unit and revision) and combinations read in words", () => {
    const inputs = frozenInputs(recordContent());
    expect(inputs.requirements[0]).toMatchObject({
      label: "Project default",
      value: "Tresca n ≥ 1.5, maximum principal n ≥ 2",
      detail: "default material: built-in sa516-70",
    });
    expect(inputs.requirements[1]).toEqual({ label: "Category “test”", value: "Tresca n ≥ 1.25" });
    expect(inputs.locations).toEqual([{ label: "mid-shell", value: "built-in sa516-70", detail: undefined }]);
    expect(inputs.states[0].label).toBe("Hydrostatic test at mid-shell");
    expect(inputs.states[0].value).toMatch(/^σx 165\.0 {2}σy 0 .* MPa$/);
    expect(inputs.states[0].detail).toMatch(/^test; revision 6, saved /);
    expect(inputs.combinations).toEqual([
      { label: "Test + wind", value: "1.2 × Hydrostatic test", detail: undefined },
    ]);
    expect(inputs.materials).toEqual([]);
  });

  it("when the provenance is written, then it names the engine, its version and the hash", () => {
    expect(provenance(recordContent(), "3fa9c0de")).toMatch(
      /^Engine sigmacube-core 0\.1\.0; inputs taken .+; content hash 3fa9c0de$/,
    );
  });
});
