import { describe, expect, it } from "vitest";
import type { LinearizationView } from "../../../../../core/contract/linearizations";
import { linearizationInputSchema } from "../../../../../core/contract/linearizations";
import {
  EMPTY_FORM,
  classificationExplained,
  formFieldOf,
  formOf,
  requestBodyOf,
  type LineForm,
} from "./line-form";

const path = "d sxx syy szz sxy syz szx\n0 0 100 0 0 0 0\n5 0 100 0 0 0 0\n10 0 100 0 0 0 0";
const filled: LineForm = { ...EMPTY_FORM, name: " Shell ", pathText: path, S: "138", Sy: "", Su: "" };

describe("requestBodyOf", () => {
  it("when the form is filled, then the body passes the API's own schema with the typed values", () => {
    const made = requestBodyOf(filled);
    expect(made.ok).toBe(true);
    if (!made.ok) return;
    const parsed = linearizationInputSchema.parse(made.body);
    expect(parsed.name).toBe("Shell");
    expect(parsed.path.lineDirection).toEqual([1, 0, 0]);
    expect(parsed.allowables).toEqual({ source: "typed", S: 138, Sy: null, Su: null, timeDependent: false });
    expect(parsed.bending).toBe("annex-5a");
    expect(parsed.secondAxis).toBeNull();
  });

  it("when S is blank and the direction half typed, then both fields are named and nothing is sent", () => {
    const made = requestBodyOf({ ...filled, S: "", lineDirection: ["1", "", "0"] });
    expect(made).toEqual({
      ok: false,
      problems: { S: "give the allowable S (a number)", lineDirection: "give three numbers, x y z" },
    });
  });

  it("when every component is to be bent and allowables come from the material, then the body says so and carries no Sy", () => {
    const made = requestBodyOf({
      ...filled,
      bendEveryComponent: true,
      allowableSource: "material",
      Sy: "250",
    });
    if (!made.ok) throw new Error(JSON.stringify(made.problems));
    expect(made.body.bending).toBe("all-components");
    expect(made.body.allowables).toEqual({ source: "material", S: 138, timeDependent: false });
  });
});

describe("formOf", () => {
  it("when a saved line is opened, then the form it gives makes the same request again", () => {
    const made = requestBodyOf({ ...filled, secondAxis: ["0", "1", "0"], Sy: "250", Su: "400" });
    if (!made.ok) throw new Error("filled form");
    const body = linearizationInputSchema.parse(made.body);
    const saved = {
      id: "00000000-0000-4000-8000-000000000001",
      name: body.name,
      locationId: body.locationId,
      input: body,
    } as unknown as LinearizationView;
    const again = requestBodyOf(formOf(saved));
    if (!again.ok) throw new Error(JSON.stringify(again.problems));
    expect(linearizationInputSchema.parse(again.body)).toEqual(body);
  });
});

describe("classificationExplained", () => {
  it("when each classification is chosen, then the sentence names the checks it makes", () => {
    expect(classificationExplained({ membrane: "general", stresses: "primary" })).toContain("Pm ≤ S");
    expect(classificationExplained({ membrane: "local", stresses: "primary" })).toContain("PL ≤ 1.5S");
    expect(classificationExplained({ membrane: "local", stresses: "primary-plus-secondary" })).toContain(
      "PL + Pb + Q ≤ SPS",
    );
  });
});

describe("formFieldOf", () => {
  it("when the server names a point's field or an allowable, then the form field beside it is named", () => {
    expect(formFieldOf("path.points.3.distance")).toBe("path");
    expect(formFieldOf("path.lineDirection")).toBe("lineDirection");
    expect(formFieldOf("allowables.S")).toBe("S");
    expect(formFieldOf("secondAxis")).toBe("secondAxis");
  });
});
