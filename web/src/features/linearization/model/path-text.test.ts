import { describe, expect, it } from "vitest";
import { parsePathText } from "./path-text";

describe("parsePathText", () => {
  it("when seven bare columns are pasted, then they are read as distance and xx yy zz xy yz zx", () => {
    const parsed = parsePathText("0\t1\t2\t3\t4\t5\t6\n1\t7\t8\t9\t10\t11\t12\n");
    expect(parsed).toMatchObject({ ok: true, positions: "distance" });
    if (!parsed.ok) return;
    expect(parsed.points[1]).toEqual({ distance: 1, xx: 7, yy: 8, zz: 9, xy: 10, yz: 11, zx: 12 });
  });

  it("when a header names x y z and the components in another order, then each value goes to its named component", () => {
    const text = "x,y,z,sxx [MPa],sxy [MPa],syy [MPa],szz [MPa],syz [MPa],sxz [MPa]\n0,0,0,1,2,3,4,5,6\n";
    const parsed = parsePathText(text);
    expect(parsed).toMatchObject({ ok: true, positions: "xyz", unitInHeader: "MPa" });
    if (!parsed.ok) return;
    expect(parsed.points[0]).toEqual({ x: 0, y: 0, z: 0, xx: 1, xy: 2, yy: 3, zz: 4, yz: 5, zx: 6 });
  });

  it("when a header names a distance column and values use a decimal comma with semicolons, then they are read", () => {
    const parsed = parsePathText("d;sxx;syy;szz;sxy;syz;szx\n0;1,5;2;3;0;0;0\n2,5;1;2;3;0;0;0\n");
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    expect(parsed.points.map((p) => p.distance)).toEqual([0, 2.5]);
    expect(parsed.points[0].xx).toBe(1.5);
  });

  it("when a value is not a number, then the message names its line and column", () => {
    const parsed = parsePathText("0 1 2 3 4 5 6\n1 7 x 9 10 11 12\n");
    expect(parsed).toEqual({ ok: false, message: 'Line 2: yy (column 3) is "x", not a number.' });
  });

  it("when a line has a wrong number of bare values, then the message says what a line needs", () => {
    const parsed = parsePathText("1 2 3\n");
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.message).toContain("Give 7 per line");
  });

  it("when a header lacks a component, then the message names it", () => {
    const parsed = parsePathText("d sxx syy szz sxy syz\n0 1 2 3 4 5\n");
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.message).toContain("zx");
  });
});
