import { describe, expect, it } from "vitest";
import { parsePointTable } from "../../../../../core";
import {
  assignColumn,
  initialDraft,
  mappingIssues,
  newestMapping,
  parserOptions,
  previewOf,
  type RememberedMapping,
} from "./column-mapping";

const CSV = [
  "node,x,y,z,sxx [MPa],syy [MPa],szz [MPa],sxy [MPa],syz [MPa],sxz [MPa]",
  "1,0,0,0,100,20,0,5,0,0",
  "2,1,0,0,110,21,0,6,0,0",
  "3,2,0,0,120,22,0,7,0,0",
  "",
].join("\n");

describe("initialDraft", () => {
  it("when a CSV has generic header names, then the separator, the header, every column and the unit are guessed", () => {
    const d = initialDraft(CSV, null, "ksi");
    expect(d.separator).toBe(",");
    expect(d.header).toBe(true);
    expect(d.columns).toEqual({ xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9, id: 0, x: 1, y: 2, z: 3 });
    expect(d.unit).toBe("MPa");
    expect(d.idKind).toBe("number");
  });

  it("when a semicolon file writes decimal commas and text ids, then both are recognised", () => {
    const text = "id;xx;yy;zz;xy;yz;zx\nA1;1,5;2;3;0;0;0\nA2;1,6;2;3;0;0;0\nA3;1,7;2;3;0;0;0\n";
    const d = initialDraft(text, null, "MPa");
    expect(d.separator).toBe(";");
    expect(d.decimal).toBe(",");
    expect(d.idKind).toBe("text");
    expect(d.columns.id).toBe(0);
  });

  it("when the file has no header, then the last six columns are taken as xx yy zz xy yz zx and the project's unit stays", () => {
    const text = "7 1 2 3 4 5 6\n8 1 2 3 4 5 6\n9 1 2 3 4 5 6\n";
    const d = initialDraft(text, null, "psi");
    expect(d.header).toBe(false);
    expect(d.separator).toBe("whitespace");
    expect([d.columns.xx, d.columns.zx, d.columns.id]).toEqual([1, 6, null]);
    expect(d.unit).toBe("psi");
  });

  it("when the project's newest table has a mapping that fits the rows, then it is used over the guess", () => {
    const remembered: RememberedMapping = {
      layout: { separator: ",", decimal: ".", skipRows: 1, header: false },
      columns: { xx: 9, yy: 8, zz: 7, xy: 6, yz: 5, zx: 4, id: 0 },
      unit: "kPa",
      idKind: "number",
    };
    const d = initialDraft(CSV, remembered, "MPa");
    expect(d.skipRows).toBe(1);
    expect(d.header).toBe(false);
    expect(d.columns.xx).toBe(9);
    expect(d.unit).toBe("kPa");
  });

  it("when the remembered mapping names a column the rows do not have, then the guess is used", () => {
    const remembered: RememberedMapping = {
      layout: { separator: ",", decimal: ".", skipRows: 0, header: true },
      columns: { xx: 12, yy: 8, zz: 7, xy: 6, yz: 5, zx: 4 },
      unit: "kPa",
      idKind: "number",
    };
    const d = initialDraft(CSV, remembered, "MPa");
    expect(d.columns.xx).toBe(4);
    expect(d.unit).toBe("MPa");
  });
});

describe("assignColumn and mappingIssues", () => {
  it("when a column is given to a second role, then the first role loses it and the missing component is named", () => {
    const d = assignColumn(initialDraft(CSV, null, "MPa"), "id", 4);
    expect(d.columns.id).toBe(4);
    expect(d.columns.xx).toBeNull();
    expect(mappingIssues(d, 10).map((i) => i.field)).toEqual(["columns.xx"]);
  });

  it("when the decimal mark is a comma and the separator too, then the decimal field is named", () => {
    const d = { ...initialDraft(CSV, null, "MPa"), decimal: "," as const };
    expect(mappingIssues(d, 10)).toEqual([expect.objectContaining({ field: "decimal" })]);
  });

  it("when rows to skip is negative or fractional, then skipRows is named", () => {
    const d = initialDraft(CSV, null, "MPa");
    expect(mappingIssues({ ...d, skipRows: -1 }, 10)[0].field).toBe("skipRows");
    expect(mappingIssues({ ...d, skipRows: 1.5 }, 10)[0].field).toBe("skipRows");
  });

  it("when a column is past the row's width, then its role is named", () => {
    const d = assignColumn(initialDraft(CSV, null, "MPa"), "z", 14);
    expect(mappingIssues(d, 10)).toEqual([expect.objectContaining({ field: "columns.z" })]);
  });
});

describe("previewOf and parserOptions", () => {
  it("when rows are skipped and a header is read, then the preview shows the names and the data rows only", () => {
    const text = "title line\n" + CSV;
    const p = previewOf(text, { separator: ",", skipRows: 1, header: true });
    expect(p.names?.[0]).toBe("node");
    expect(p.rows.map((r) => r[0])).toEqual(["1", "2", "3"]);
    expect(p.fieldCount).toBe(10);
  });

  it("when the guessed mapping is handed to core's parser, then it reads the file's stresses in Pa (1 MPa = 1e6 Pa, SI definition)", () => {
    const d = initialDraft(CSV, null, "MPa");
    const table = parsePointTable(CSV, parserOptions(d, null));
    expect(table.count).toBe(3);
    expect(table.components[0]).toBe(100e6);
    expect(table.components[6 + 3]).toBe(6e6);
    expect(Array.from(table.ids as Float64Array)).toEqual([1, 2, 3]);
  });
});

describe("newestMapping", () => {
  it("when several tables are stored, then the one created last gives the mapping", () => {
    const base = {
      layout: { separator: "," as const, decimal: "." as const, skipRows: 0, header: true },
      columns: { xx: 0, yy: 1, zz: 2, xy: 3, yz: 4, zx: 5 },
      idKind: "number" as const,
    };
    const m = newestMapping([
      { ...base, unit: "MPa", createdAt: "2026-12-01T10:00:00.000Z" },
      { ...base, unit: "psi", createdAt: "2026-12-02T10:00:00.000Z" },
      { ...base, unit: "kPa", createdAt: "2026-11-30T10:00:00.000Z" },
    ]);
    expect(m?.unit).toBe("psi");
    expect(newestMapping([])).toBeNull();
  });
});
