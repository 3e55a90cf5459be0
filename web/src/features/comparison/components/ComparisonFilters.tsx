/** The comparison table's toolbar: free-text, kind, location and verdict filters, the row count and the pages. */
import type { PagedComparison } from "../../../../../core/contract/comparison";
import { ToolButton } from "../../../components/ToolButton";
import { KIND_OPTIONS, VERDICT_OPTIONS } from "../model/table-model";

const SELECT = "rounded-sm border border-rule-strong bg-panel px-1 py-0.5";

export function ComparisonFilters({
  text,
  onText,
  values,
  onFilter,
  locations,
  shown,
  total,
  unit,
  paging,
  onPage,
}: {
  text: string;
  onText: (text: string) => void;
  /** the chosen value of each filter ("" for all), read from the address */
  values: Record<"kind" | "locationId" | "verdict", string>;
  onFilter: (columnId: "kind" | "locationId" | "verdict", value: string) => void;
  locations: readonly [string, string][];
  shown: number;
  total: number;
  unit: string;
  paging?: PagedComparison["paging"];
  onPage?: (page: number) => void;
}) {
  const paged = paging && paging.totalPages > 1;
  return (
    <div className="flex flex-wrap items-center gap-3 border-b border-rule px-3 py-2 text-[13px]">
      <label>
        Filter{" "}
        <input
          aria-label="Filter rows"
          value={text}
          onChange={(e) => onText(e.target.value)}
          placeholder="case, location, material"
          className="rounded-sm border border-rule-strong bg-panel px-2 py-0.5"
        />
      </label>
      <label>
        Kind{" "}
        <select
          aria-label="Kind"
          value={values.kind}
          onChange={(e) => onFilter("kind", e.target.value)}
          className={SELECT}
        >
          {KIND_OPTIONS.map(([value, words]) => (
            <option key={value} value={value}>
              {words}
            </option>
          ))}
        </select>
      </label>
      <label>
        Location{" "}
        <select
          aria-label="Location"
          value={values.locationId}
          onChange={(e) => onFilter("locationId", e.target.value)}
          className={SELECT}
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
          value={values.verdict}
          onChange={(e) => onFilter("verdict", e.target.value)}
          className={SELECT}
        >
          {VERDICT_OPTIONS.map(([value, words]) => (
            <option key={value} value={value}>
              {words}
            </option>
          ))}
        </select>
      </label>
      <span className="ml-auto text-graphite-soft">
        <span className="num">{shown}</span> of <span className="num">{total}</span> rows
        {paged && (
          <>
            {" "}
            on this page, <span className="num">{paging.totalRows}</span> in all
          </>
        )}{" "}
        · stresses in {unit}
      </span>
      {paged && onPage && (
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
  );
}
