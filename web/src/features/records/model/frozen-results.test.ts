import { describe, expect, it } from "vitest";
import { frozenGoverning, frozenRows, rowName } from "./frozen-results";
import { COMBINATION_ROW, HYDRO_ROW, recordContent } from "./record-fixture";

describe("frozen results of a record", () => {
  it("when a record is shown, then each row carries its stresses in the project's unit and each check its factor or why it was not rated", () => {
    const rows = frozenRows(recordContent());
    expect(rows.map((r) => [r.rowId, r.name, r.kind])).toEqual([
      [HYDRO_ROW, "Hydrostatic test at mid-shell", "test"],
      [COMBINATION_ROW, "Test + wind at mid-shell", "combination"],
    ]);
    expect(rows[0].principal[0]).toBe("165.0");
    expect(rows[0].checks[0]).toEqual({
      criterion: "Tresca",
      factor: "1.58",
      required: "1.5",
      verdict: "close",
      note: null,
    });
    expect(rows[0].checks[1]).toMatchObject({
      factor: null,
      verdict: null,
      note: "not rated: the material has no ultimate tension",
    });
    expect(rows[1].checks[0].verdict).toBe("fail");
  });

  it("when the record was frozen, then the governing sentence is the one the comparison said then", () => {
    expect(frozenGoverning(recordContent())).toBe(
      "governs: Hydrostatic test at mid-shell, Tresca, SF 1.58 against 1.5 required (the project default)",
    );
    const none = recordContent();
    none.results.summary = null;
    none.results.governingOverall = null;
    expect(frozenGoverning(none)).toMatch(/^Nothing was evaluated in this record/);
  });

  it("when a comment names a row, then the row is named in words", () => {
    const rows = frozenRows(recordContent());
    expect(rowName(rows, HYDRO_ROW)).toBe("Hydrostatic test at mid-shell");
    expect(rowName(rows, "case:x:y")).toBe("a row no longer in this record");
  });
});
