import { describe, expect, it } from "vitest";
import { MAX_INPUT_STRESS, parseTensor } from "../../../../../core";
import type { StressState } from "../../../../../core/contract/load-cases";
import {
  describePaste,
  fieldsFromTensor,
  initialFields,
  initialSource,
  pastedSource,
  readStateFields,
  type StateFields,
} from "./state-form";

// Product rules of the state form (what it opens with, how it reads the six boxes and a paste).

const saved = (over: Partial<StressState> = {}): StressState => ({
  id: "00000000-0000-4000-8000-000000000001",
  locationId: "00000000-0000-4000-8000-000000000002",
  revision: 3,
  unit: "MPa",
  components: { xx: 67.49999999999999, yy: -12, zz: 0, xy: 1e-7, yz: 0, zx: 250 },
  componentsPa: { xx: 67.5e6, yy: -12e6, zz: 0, xy: 0.1, yz: 0, zx: 250e6 },
  source: "typed",
  note: "",
  calculator: null,
  savedAt: "2026-12-01T10:00:00.000Z",
  savedBy: null,
  ...over,
});

const fields = (over: Partial<StateFields> = {}): StateFields => ({
  xx: "0",
  yy: "0",
  zz: "0",
  xy: "0",
  yz: "0",
  zx: "0",
  ...over,
});

/** A paste core reads, or a failed test. */
function read(text: string) {
  const result = parseTensor(text);
  if (!result.ok) throw new Error(`core did not read ${text}: ${result.error.message}`);
  return result;
}

describe("what the state form opens with", () => {
  it("when there is no saved state, then all six boxes read 0", () => {
    expect(initialFields()).toEqual(fields());
  });

  it("when a state is saved, then each box holds its value in the saved unit to ten significant figures", () => {
    expect(initialFields(saved())).toEqual(fields({ xx: "67.5", yy: "-12", xy: "1e-7", zx: "250" }));
  });

  it("when the saved state was measured, then the source stays measured; any other source becomes typed", () => {
    expect(initialSource(saved({ source: "measured" }))).toBe("measured");
    expect(initialSource(saved({ source: "finite-element point" }))).toBe("typed");
    expect(initialSource(saved({ source: "pasted" }))).toBe("typed");
    expect(initialSource()).toBe("typed");
  });
});

describe("reading the six boxes", () => {
  it("when every box holds a number (a decimal comma and a true minus sign too), then the six values come out", () => {
    const out = readStateFields(fields({ xx: " 120.5 ", yy: "\u221245", xy: "1,5", zx: "2e3" }));
    expect(out).toEqual({ ok: true, components: { xx: 120.5, yy: -45, zz: 0, xy: 1.5, yz: 0, zx: 2000 } });
  });

  it("when a box is empty, then the form says that component must be a number", () => {
    expect(readStateFields(fields({ yz: "  " }))).toEqual({ ok: false, message: "τyz must be a number." });
  });

  it("when a box holds text that is not a number, then the form names the component", () => {
    expect(readStateFields(fields({ zz: "12 MPa" }))).toEqual({
      ok: false,
      message: "σzz must be a number.",
    });
  });

  it("when a box holds a comma before three digits, then it is refused as ambiguous with the component named", () => {
    const out = readStateFields(fields({ xx: "1,000" }));
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.message).toMatch(/^σxx: “1,000” is ambiguous/);
  });

  it("when a value is larger than any real stress, then core's reason follows the component's symbol", () => {
    const out = readStateFields(fields({ xy: String(MAX_INPUT_STRESS * 10) }));
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.message).toMatch(/^τxy is larger than 1e\+12 in magnitude/);
  });

  it("when two boxes are wrong, then the first in σxx…τzx order is the one reported", () => {
    expect(readStateFields(fields({ zx: "x", yy: "y" }))).toEqual({
      ok: false,
      message: "σyy must be a number.",
    });
  });
});

describe("reading a paste", () => {
  it("when a 3×3 matrix with a unit is pasted, then the boxes fill, the source is pasted and the note names the matrix and unit", () => {
    const result = read("100 20 0\n20 -50 0\n0 0 0 MPa");
    expect(fieldsFromTensor(result)).toEqual(fields({ xx: "100", yy: "-50", xy: "20" }));
    expect(pastedSource(result)).toBe("pasted");
    expect(describePaste(result, "ksi")).toBe("Read a 3×3 matrix, in MPa.");
  });

  it("when plane stress is pasted with no unit, then the note says the form's unit is assumed", () => {
    const result = read("σx σy τxy\n80 -20 15");
    expect(result.form).toBe("plane");
    expect(describePaste(result, "psi")).toBe("Read plane stress σx σy τxy (no unit written: psi).");
  });

  it("when six components with a header are pasted, then the note says six components", () => {
    const result = read("xx yy zz xy yz zx\n1 2 3 4 5 6");
    expect(fieldsFromTensor(result)).toEqual(
      fields({ xx: "1", yy: "2", zz: "3", xy: "4", yz: "5", zx: "6" }),
    );
    expect(describePaste(result, "MPa")).toBe("Read six components (no unit written: MPa).");
  });

  it("when a finite-element listing row is pasted, then the source is a finite-element point and the note names the node", () => {
    const result = read("Node SX SY SZ SXY SYZ SXZ\n12 100 0 0 5 0 0");
    expect(result.point).toEqual({ kind: "node", number: 12 });
    expect(pastedSource(result)).toBe("finite-element point");
    expect(describePaste(result, "MPa")).toBe("Read six components of node 12 (no unit written: MPa).");
  });
});
