import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnFiltersState,
  type SortingState,
  type Updater,
} from "@tanstack/react-table";
import { useMemo } from "react";
import { useSearchParams } from "react-router-dom";
import type { Comparison, PagedComparison } from "../../../../../core/contract/comparison";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { governingMarks } from "../model/rows";
import {
  comparisonColumns,
  HIDDEN_COLUMNS,
  locationOptions,
  matchesText,
  rowHighlight,
} from "../model/table-model";
import { searchWithView, viewFromSearch, type ComparisonView } from "../model/url-view";
import { ComparisonFilters } from "./ComparisonFilters";
import { tableColumns } from "./comparison-columns";

const isNumeric = (meta: unknown) => (meta as { numeric?: boolean } | undefined)?.numeric;

/**
 * Every case and combination × location, sortable by any column and filterable by text,
 * kind, location and verdict; governing rows are highlighted and say for which criterion.
 * A project too large for one page is shown a page at a time (`paging`, `onPage`): sorting
 * and filters then act on the page shown, while the governing marks cover every row.
 * Columns, filters and sort values come from model/table-model.ts; the sort and filters live in
 * the address (model/url-view.ts), so a copied link or the back button brings the same view.
 */
export function ComparisonTable({
  comparison,
  unit,
  workspaceId,
  paging,
  onPage,
}: {
  comparison: Comparison;
  unit: StressUnitName;
  workspaceId: string;
  paging?: PagedComparison["paging"];
  onPage?: (page: number) => void;
}) {
  const marks = useMemo(() => governingMarks(comparison), [comparison]);
  const criteria = comparison.requirements.map((r) => r.criterion);
  const criteriaKey = criteria.join(" ");
  const [search, setSearch] = useSearchParams();
  const view = useMemo(() => viewFromSearch(search), [search]);
  const { sorting, globalFilter, columnFilters } = view;
  // Replace, not push: typing in the filter would otherwise fill the history with one entry per letter.
  const setView = (change: Partial<ComparisonView>) =>
    setSearch((current) => searchWithView(current, { ...viewFromSearch(current), ...change }), {
      replace: true,
    });
  const apply = <T,>(updater: Updater<T>, old: T): T =>
    typeof updater === "function" ? (updater as (old: T) => T)(old) : updater;
  const filterValue = (id: string) => columnFilters.find((f) => f.id === id)?.value ?? "";
  const columns = useMemo(
    () =>
      tableColumns(comparisonColumns(criteria, unit), {
        unit,
        workspaceId,
        projectId: comparison.projectId,
        marks,
      }),
    // criteriaKey stands for the criteria list, a fresh array each render.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [criteriaKey, marks, unit, workspaceId, comparison.projectId],
  );

  // TanStack Table returns fresh functions each render by design; this component is not memoised by the compiler.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: comparison.rows,
    columns,
    state: { sorting, globalFilter, columnFilters, columnVisibility: HIDDEN_COLUMNS },
    onSortingChange: (updater: Updater<SortingState>) => setView({ sorting: apply(updater, sorting) }),
    onGlobalFilterChange: (updater: Updater<string>) =>
      setView({ globalFilter: String(apply(updater, globalFilter) ?? "") }),
    onColumnFiltersChange: (updater: Updater<ColumnFiltersState>) =>
      setView({
        columnFilters: apply<ColumnFiltersState>(updater, columnFilters)
          .filter((f) => f.value !== undefined && f.value !== "")
          .map((f) => ({ id: f.id, value: String(f.value) })),
      }),
    globalFilterFn: (row, _id, value: string) => matchesText(row.original, value),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });

  return (
    <div>
      <ComparisonFilters
        text={globalFilter}
        onText={(text) => setView({ globalFilter: text })}
        values={{
          kind: filterValue("kind"),
          locationId: filterValue("locationId"),
          verdict: filterValue("verdict"),
        }}
        onFilter={(id, value) => table.getColumn(id)?.setFilterValue(value || undefined)}
        locations={locationOptions(comparison.rows)}
        shown={table.getRowModel().rows.length}
        total={comparison.rows.length}
        unit={unit}
        paging={paging}
        onPage={onPage}
      />
      {/* Scrolls sideways inside its own box on a phone; focusable so the keyboard can scroll it. */}
      <div
        className="relative overflow-x-auto focus-visible:outline focus-visible:outline-2 focus-visible:outline-ink"
        role="region"
        aria-label="Comparison table, scrolls sideways"
        tabIndex={0}
      >
        <table
          className="w-full border-collapse text-[14px]"
          aria-label="Comparison of load cases and locations"
        >
          <thead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id} className="border-b border-rule text-left text-[13px] text-graphite-soft">
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={
                        sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined
                      }
                      className={`px-2 py-1.5 font-semibold ${isNumeric(header.column.columnDef.meta) ? "text-right" : ""}`}
                    >
                      {header.column.getCanSort() ? (
                        <button
                          type="button"
                          onClick={header.column.getToggleSortingHandler()}
                          className="inline-flex items-center gap-1 hover:text-ink"
                        >
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden="true" className="text-[10px]">
                            {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}
                          </span>
                        </button>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => {
              const mark = rowHighlight(marks.get(row.original.rowId));
              return (
                <tr
                  key={row.id}
                  className={`border-b border-rule align-top ${mark.className}`}
                  data-governs={mark.governs}
                >
                  {row.getVisibleCells().map((cell) => (
                    <td
                      key={cell.id}
                      className={`px-2 py-1.5 ${isNumeric(cell.column.columnDef.meta) ? "text-right" : ""}`}
                    >
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}
