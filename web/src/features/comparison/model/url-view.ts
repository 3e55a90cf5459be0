/**
 * The comparison's view (sort, text filter and column filters) as address parameters, so
 * "Copy link to this page" and the browser's back button bring back exactly what was on screen.
 * `sort=name` sorts ascending, `sort=-name` descending; `q` is the text filter; `f.<column>` a
 * column's filter. Other parameters of the address are kept as they are.
 */
export type ComparisonView = {
  sorting: { id: string; desc: boolean }[];
  globalFilter: string;
  columnFilters: { id: string; value: string }[];
};

const FILTER_PREFIX = "f.";

/** Reads the view from an address's parameters; absent parameters give the unsorted, unfiltered view. */
export function viewFromSearch(search: URLSearchParams): ComparisonView {
  const sort = search.get("sort") ?? "";
  const sorting = sort
    ? [{ id: sort.replace(/^-/, ""), desc: sort.startsWith("-") }].filter((s) => s.id !== "")
    : [];
  const columnFilters = [...search.entries()]
    .filter(
      ([key, value]) => key.startsWith(FILTER_PREFIX) && key.length > FILTER_PREFIX.length && value !== "",
    )
    .map(([key, value]) => ({ id: key.slice(FILTER_PREFIX.length), value }));
  return { sorting, globalFilter: search.get("q") ?? "", columnFilters };
}

/** The address's parameters with the view written in (empty parts removed), other parameters kept. */
export function searchWithView(search: URLSearchParams, view: ComparisonView): URLSearchParams {
  const next = new URLSearchParams(
    [...search.entries()].filter(([key]) => key !== "sort" && key !== "q" && !key.startsWith(FILTER_PREFIX)),
  );
  const first = view.sorting[0];
  if (first) next.set("sort", `${first.desc ? "-" : ""}${first.id}`);
  if (view.globalFilter) next.set("q", view.globalFilter);
  for (const f of view.columnFilters) if (f.value !== "") next.set(`${FILTER_PREFIX}${f.id}`, f.value);
  return next;
}
