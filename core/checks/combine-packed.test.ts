import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { combineLoadCases, combinePacked } from "./combine";
import { COMPONENTS, type StressTensor } from "../tensor/types";

// Superposition Σ fᵢ·σᵢ (common practice, no source: linear elasticity). The packed form must
// give what combineLoadCases gives for the same terms, bit for bit (same order of additions).
describe("combinePacked (superposition over packed states)", () => {
  const stress = fc.double({ min: -1e9, max: 1e9, noNaN: true });
  const tensor = fc.record({ xx: stress, yy: stress, zz: stress, xy: stress, yz: stress, zx: stress });

  it("when random states and factors are combined, then every component equals combineLoadCases'", () => {
    fc.assert(
      fc.property(
        fc.array(tensor, { minLength: 1, maxLength: 8 }),
        fc.array(fc.record({ pick: fc.nat(), factor: fc.double({ min: -10, max: 10, noNaN: true }) }), {
          maxLength: 12,
        }),
        (states: StressTensor[], terms) => {
          const packed = new Float64Array(6 * states.length);
          states.forEach((s, i) =>
            packed.set(
              COMPONENTS.map((c) => s[c]),
              6 * i,
            ),
          );
          const indices = terms.map((t) => t.pick % states.length);
          const out = new Float64Array(6);
          combinePacked(
            packed,
            indices,
            terms.map((t) => t.factor),
            out,
          );
          const expected = combineLoadCases(
            terms.map((t, k) => ({ factor: t.factor, tensor: states[indices[k]] })),
          );
          expect([...out]).toEqual(COMPONENTS.map((c) => expected[c]));
        },
      ),
      { seed: 20261203, numRuns: 300 },
    );
  });

  it("when the sum overflows, then it is refused naming the component, as combineLoadCases does", () => {
    const packed = Float64Array.of(1e308, 0, 0, 0, 0, 0);
    expect(() => combinePacked(packed, [0, 0], [1, 1], new Float64Array(6))).toThrow(
      /combined xx component overflows/,
    );
  });
});
