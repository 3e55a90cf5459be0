import { describe, expect, it } from "vitest";
import { guessColumns, guessLayout } from "./guess-layout";

describe("guessColumns from generic header names (the trade's component notation, common practice, no source)", () => {
  it("when the header reads id x y z xx yy zz xy yz zx, then every role is mapped to its column", () => {
    const g = guessColumns(["id", "x", "y", "z", "xx", "yy", "zz", "xy", "yz", "zx"]);
    expect(g.columns).toEqual({ id: 0, x: 1, y: 2, z: 3, xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9 });
    expect(g.missing).toEqual([]);
    expect(g.unit).toBeNull();
  });

  it("when the shears come as sxy sxz syz (the other order), then xz maps to zx and the order is kept by column", () => {
    const g = guessColumns(["Node", "SXX", "SYY", "SZZ", "SXY", "SXZ", "SYZ"]);
    expect(g.columns).toEqual({ id: 0, xx: 1, yy: 2, zz: 3, xy: 4, zx: 5, yz: 6 });
  });

  it("when the header uses index notation s11 … s13 with units in brackets, then the components and the unit are found", () => {
    const g = guessColumns([
      "point",
      "coord_x",
      "coord_y",
      "coord_z",
      "s11 [MPa]",
      "s22 [MPa]",
      "s33 [MPa]",
      "s12 [MPa]",
      "s23 [MPa]",
      "s13 [MPa]",
    ]);
    expect(g.columns).toEqual({ id: 0, x: 1, y: 2, z: 3, xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9 });
    expect(g.unit).toBe("MPa");
  });

  it("when the header writes sigma_xx, tau_xy and σ/τ letters, then they are read as the same components", () => {
    const g = guessColumns(["sigma_xx", "sigma_yy", "sigma_zz", "tau_xy", "τyz", "τzx (psi)"]);
    expect(g.columns).toEqual({ xx: 0, yy: 1, zz: 2, xy: 3, yz: 4, zx: 5 });
    expect(g.unit).toBe("psi");
  });

  it("when a component is missing or a name is unknown, then the mapping is null, the found roles and the missing components are listed", () => {
    const g = guessColumns(["element", "sxx", "syy", "szz", "sxy", "comment", "s1"]);
    expect(g.columns).toBeNull();
    expect(g.found).toEqual({ id: 0, xx: 1, yy: 2, zz: 3, xy: 4 });
    expect(g.missing).toEqual(["yz", "zx"]);
  });

  it("when units in brackets disagree, then no unit is guessed", () => {
    expect(guessColumns(["sxx [MPa]", "syy [psi]", "szz", "sxy", "syz", "szx"]).unit).toBeNull();
  });
});

describe("guessLayout from the first lines", () => {
  it("when the lines are comma-, semicolon-, tab- or space-separated, then the separator and decimal mark are found", () => {
    expect(guessLayout("id,sxx,syy,szz,sxy,syz,szx\n1,1.5,2,3,4,5,6\n2,1,2,3,4,5,6\n")).toEqual({
      separator: ",",
      decimal: ".",
    });
    expect(guessLayout("id;sxx;syy;szz;sxy;syz;szx\n1;1,5;2;3;4;5;6\n2;1;2;3;4;5;6\n")).toEqual({
      separator: ";",
      decimal: ",",
    });
    expect(
      guessLayout("\uFEFFid\tsxx\tsyy\tszz\tsxy\tsyz\tszx\n1\t1.5\t2\t3\t4\t5\t6\n2\t1\t2\t3\t4\t5\t6\n"),
    ).toEqual({ separator: "\t", decimal: "." });
    expect(
      guessLayout(
        "  id   sxx  syy  szz  sxy  syz  szx\n   1   1,5    2    3    4    5    6\n   2   1    2    3    4    5    6\n",
      ),
    ).toEqual({ separator: "whitespace", decimal: "," });
  });
});
