import { describe, expect, it } from "vitest";
import { searchWithView, viewFromSearch, type ComparisonView } from "./url-view";

// Product rule (no outside source): the comparison's view lives in its address.

describe("the comparison's view in the address", () => {
  it("when a view is written and read back, then the same sort and filters return and other parameters stay", () => {
    const view: ComparisonView = {
      sorting: [{ id: "utilisation", desc: true }],
      globalFilter: "shell",
      columnFilters: [
        { id: "kind", value: "combination" },
        { id: "verdict", value: "close" },
      ],
    };
    const search = searchWithView(new URLSearchParams("page=2"), view);
    expect(search.get("page")).toBe("2");
    expect(search.get("sort")).toBe("-utilisation");
    expect(viewFromSearch(search)).toEqual(view);
  });

  it("when the address has no view, then the table is unsorted and unfiltered, and clearing a view removes its parameters", () => {
    expect(viewFromSearch(new URLSearchParams(""))).toEqual({
      sorting: [],
      globalFilter: "",
      columnFilters: [],
    });
    const cleared = searchWithView(new URLSearchParams("sort=name&q=x&f.kind=case&page=3"), {
      sorting: [],
      globalFilter: "",
      columnFilters: [],
    });
    expect(cleared.toString()).toBe("page=3");
  });

  it("when a parameter is empty or malformed, then it is ignored rather than filtering on nothing", () => {
    expect(viewFromSearch(new URLSearchParams("sort=-&f.=x&f.kind="))).toEqual({
      sorting: [],
      globalFilter: "",
      columnFilters: [],
    });
  });
});
