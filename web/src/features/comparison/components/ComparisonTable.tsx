import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnFiltersState,
  type SortingState,
} from "@tanstack/react-table";
import { useMemo, useState } from "react";
import { Link } from "react-router-dom";
import {
  formatFactor,
  type Comparison,
  type ComparisonRowView,
  type PagedComparison,
} from "../../../../../core/contract/comparison";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { CRITERION_LABELS, type CriterionName } from "../../../../../core/contract/projects";
import { Quantity, stressTone } from "../../../components/Quantity";
import { ToolButton } from "../../../components/ToolButton";
import { Verdict } from "../../../components/Verdict";
import { benchLinkForCombination, benchLinkForState } from "../../../lib/bench-link";
import { editableStress, formatStress } from "../../../lib/stress";
import { checkOf, governingMarks } from "../model/rows";

const helper = createColumnHelper<ComparisonRowView>();

/** Sorts utilisation with "not evaluated" last. */
const utilisationOf = (row: ComparisonRowView, c: CriterionName) => {
  const check = checkOf(row, c);
  return check?.status === "evaluated" ? check.utilisation : -1;
};

/**
 * Every case and combination × location, sortable by any column and filterable by text,
 * kind, location and verdict; governing rows are highlighted and say for which criterion.
 * A project too large for one page is shown a page at a time (`paging`, `onPage`): sorting
 * and filters then act on the page shown, while the governing marks cover every row.
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
  const [sorting, setSorting] = useState<SortingState>([]);
  const [globalFilter, setGlobalFilter] = useState("");
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const locations = [...new Map(comparison.rows.map((r) => [r.locationId, r.locationName])).entries()];

  const columns = useMemo(
    () => [
      helper.accessor("caseName", {
        header: "Case",
        cell: (info) => {
          const r = info.row.original;
          const m = marks.get(r.rowId);
          return (
            <div>
              <span className="font-semibold">{r.caseName}</span>
              {r.kind === "combination" && (
                <span className="ml-1.5 rounded-sm bg-paper-deep px-1 text-[11px] text-graphite-soft">
                  combination
                </span>
              )}
              {m && m.overall.length > 0 && (
                <div className="text-[12px] font-semibold text-ink">
                  <span aria-hidden="true">◆ </span>governs{" "}
                  {m.overall.map((c) => CRITERION_LABELS[c]).join(", ")}
                </div>
              )}
              {m && m.atLocation.length > 0 && m.overall.length === 0 && (
                <div className="text-[12px] text-ink">
                  <span aria-hidden="true">◇ </span>governs here:{" "}
                  {m.atLocation.map((c) => CRITERION_LABELS[c]).join(", ")}
                </div>
              )}
              <div className="text-[12px] text-graphite-soft" data-testid="allowable">
                {r.category && r.kind === "load-case" ? `${r.category} · ` : ""}factors: {r.allowable.label}
              </div>
            </div>
          );
        },
      }),
      helper.accessor("kind", { header: "Kind", filterFn: "equalsString", enableHiding: true }),
      helper.accessor("locationId", {
        header: "Location",
        filterFn: "equalsString",
        cell: (info) => (
          <div>
            {info.row.original.locationName}
            <div className="text-[12px] text-graphite-soft">{info.row.original.material.label}</div>
          </div>
        ),
        sortingFn: (a, b) => a.original.locationName.localeCompare(b.original.locationName),
      }),
      ...([0, 1, 2] as const).map((k) =>
        helper.accessor((r) => r.principalPa[k], {
          id: `s${k + 1}`,
          header: `σ${["₁", "₂", "₃"][k]}`,
          cell: (i) => (
            <Quantity
              value={formatStress(i.getValue(), unit)}
              tone={stressTone(i.getValue(), Math.max(...i.row.original.principalPa.map(Math.abs)))}
            />
          ),
          meta: { numeric: true },
        }),
      ),
      helper.accessor("vonMisesPa", {
        header: "σvm",
        cell: (i) => <Quantity value={formatStress(i.getValue(), unit)} />,
        meta: { numeric: true },
      }),
      helper.accessor("trescaPa", {
        header: "σ₁−σ₃",
        cell: (i) => <Quantity value={formatStress(i.getValue(), unit)} />,
        meta: { numeric: true },
      }),
      helper.accessor("maxShearPa", {
        header: "τmax",
        cell: (i) => <Quantity value={formatStress(i.getValue(), unit)} />,
        meta: { numeric: true },
      }),
      ...criteria.map((c) =>
        helper.accessor((r) => utilisationOf(r, c), {
          id: `u:${c}`,
          header: `${CRITERION_LABELS[c]}: SF / required`,
          meta: { numeric: true },
          cell: (i) => {
            const check = checkOf(i.row.original, c);
            if (!check) return null;
            if (check.status === "not-evaluated") {
              return (
                <span className="text-[12px] text-graphite-soft" title={check.reason}>
                  not evaluated:{" "}
                  {check.missing.length > 0 ? `needs ${check.missing.join(", ")}` : check.reason}
                </span>
              );
            }
            if (check.status === "not-applicable") {
              return (
                <span className="text-[12px] text-graphite-soft" title={check.reason}>
                  not applicable to this material
                </span>
              );
            }
            return (
              <span className="inline-flex items-center gap-2 whitespace-nowrap">
                <span className="num">{formatFactor(check.factor)}</span>
                <span
                  className="unit text-[12px]"
                  title={`required: ${check.category === null ? "project default" : `“${check.category}” factor`}`}
                >
                  / {check.requiredFactor}
                  {check.category !== null && <sup className="ml-0.5">{check.category}</sup>}
                </span>
                <span className="num text-[12px] text-graphite-soft">u {check.utilisation.toFixed(2)}</span>
                <Verdict state={check.verdict} />
                {check.unsuited && (
                  <span className="text-[11px] text-close" title={check.unsuited}>
                    unsuited, rated on request
                  </span>
                )}
              </span>
            );
          },
        }),
      ),
      helper.accessor((r) => worstVerdict(r), {
        id: "verdict",
        header: "Worst",
        filterFn: "equalsString",
        cell: () => null,
        enableHiding: true,
      }),
      helper.display({
        id: "bench",
        header: "",
        cell: (i) => {
          const r = i.row.original;
          const toUnit = (x: number) => editableStress(x, unit);
          const values = Object.fromEntries(
            Object.entries(r.componentsPa).map(([k, v]) => [k, toUnit(v)]),
          ) as ComparisonRowView["componentsPa"];
          const to =
            r.kind === "load-case"
              ? benchLinkForState(
                  {
                    workspaceId,
                    projectId: comparison.projectId,
                    loadCaseId: r.caseId,
                    locationId: r.locationId,
                  },
                  values,
                  unit,
                )
              : // The bench says the superposed state is view-only and a superposition, and checks it
                // with the project's default factors and the location's material, as this row is.
                benchLinkForCombination(
                  r.caseName,
                  { workspaceId, projectId: comparison.projectId, locationId: r.locationId },
                  values,
                  unit,
                );
          return (
            <Link
              to={to}
              className="whitespace-nowrap text-[13px] text-ink underline-offset-2 hover:underline"
              aria-label={`Open ${r.caseName} at ${r.locationName} in the bench`}
            >
              Open in bench
            </Link>
          );
        },
      }),
    ],
    [criteria, marks, unit, workspaceId, comparison.projectId],
  );

  // TanStack Table returns fresh functions each render by design; this component is not memoised by the compiler.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: comparison.rows,
    columns,
    state: { sorting, globalFilter, columnFilters, columnVisibility: { kind: false, verdict: false } },
    onSortingChange: setSorting,
    onGlobalFilterChange: setGlobalFilter,
    onColumnFiltersChange: setColumnFilters,
    globalFilterFn: (row, _id, value: string) =>
      `${row.original.caseName} ${row.original.locationName} ${row.original.category} ${row.original.material.label}`
        .toLowerCase()
        .includes(value.toLowerCase()),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  const setFilter = (id: string, value: string) => table.getColumn(id)?.setFilterValue(value || undefined);

  return (
    <div>
      <div className="flex flex-wrap items-center gap-3 border-b border-rule px-3 py-2 text-[13px]">
        <label>
          Filter{" "}
          <input
            aria-label="Filter rows"
            value={globalFilter}
            onChange={(e) => setGlobalFilter(e.target.value)}
            placeholder="case, location, material"
            className="rounded-sm border border-rule-strong bg-panel px-2 py-0.5"
          />
        </label>
        <label>
          Kind{" "}
          <select
            aria-label="Kind"
            onChange={(e) => setFilter("kind", e.target.value)}
            className="rounded-sm border border-rule-strong bg-panel px-1 py-0.5"
          >
            <option value="">all</option>
            <option value="load-case">load cases</option>
            <option value="combination">combinations</option>
          </select>
        </label>
        <label>
          Location{" "}
          <select
            aria-label="Location"
            onChange={(e) => setFilter("locationId", e.target.value)}
            className="rounded-sm border border-rule-strong bg-panel px-1 py-0.5"
          >
            <option value="">all</option>
            {locations.map(([id, name]) => (
              <option key={id} value={id}>
                {name}
              </option>
            ))}
          </select>
        </label>
        <label>
          Verdict{" "}
          <select
            aria-label="Verdict"
            onChange={(e) => setFilter("verdict", e.target.value)}
            className="rounded-sm border border-rule-strong bg-panel px-1 py-0.5"
          >
            <option value="">all</option>
            <option value="fail">fails</option>
            <option value="close">close</option>
            <option value="pass">passes</option>
          </select>
        </label>
        <span className="ml-auto text-graphite-soft">
          <span className="num">{table.getRowModel().rows.length}</span> of{" "}
          <span className="num">{comparison.rows.length}</span> rows
          {paging && paging.totalPages > 1 && (
            <>
              {" "}
              on this page, <span className="num">{paging.totalRows}</span> in all
            </>
          )}{" "}
          · stresses in {unit}
        </span>
        {paging && paging.totalPages > 1 && onPage && (
          <nav aria-label="Comparison pages" className="flex items-center gap-2">
            <ToolButton disabled={paging.page <= 1} onClick={() => onPage(paging.page - 1)}>
              Previous
            </ToolButton>
            <span>
              page <span className="num">{paging.page}</span> of{" "}
              <span className="num">{paging.totalPages}</span>
            </span>
            <ToolButton disabled={paging.page >= paging.totalPages} onClick={() => onPage(paging.page + 1)}>
              Next
            </ToolButton>
          </nav>
        )}
      </div>
      <div className="overflow-x-auto">
        <table
          className="w-full border-collapse text-[14px]"
          aria-label="Comparison of load cases and locations"
        >
          <thead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id} className="border-b border-rule text-left text-[13px] text-graphite-soft">
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const numeric = (header.column.columnDef.meta as { numeric?: boolean } | undefined)
                    ?.numeric;
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={
                        sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined
                      }
                      className={`px-2 py-1.5 font-semibold ${numeric ? "text-right" : ""}`}
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
              const m = marks.get(row.original.rowId);
              const highlight =
                m && m.overall.length > 0 ? "bg-ink-wash" : m && m.atLocation.length > 0 ? "bg-paper" : "";
              return (
                <tr
                  key={row.id}
                  className={`border-b border-rule align-top ${highlight}`}
                  data-governs={m && m.overall.length > 0 ? "overall" : undefined}
                >
                  {row.getVisibleCells().map((cell) => {
                    const numeric = (cell.column.columnDef.meta as { numeric?: boolean } | undefined)
                      ?.numeric;
                    return (
                      <td key={cell.id} className={`px-2 py-1.5 ${numeric ? "text-right" : ""}`}>
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </td>
                    );
                  })}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}

/** The row's worst verdict over its evaluated checks ("" when none was evaluated). */
function worstVerdict(row: ComparisonRowView): string {
  const verdicts = row.checks.flatMap((c) => (c.status === "evaluated" ? [c.verdict] : []));
  return verdicts.includes("fail")
    ? "fail"
    : verdicts.includes("close")
      ? "close"
      : verdicts.length
        ? "pass"
        : "";
}
