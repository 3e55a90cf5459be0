import { useVirtualizer } from "@tanstack/react-virtual";
import { useMemo, useRef, useState } from "react";
import { Link } from "react-router-dom";
import type { PointTable } from "../../../../../core";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { Verdict } from "../../../components/Verdict";
import { quietButton } from "../../../lib/forms";
import { formatStress } from "../../../lib/stress";
import { useWorstInBox } from "../hooks/use-worst-in-box";
import { WORST_KEPT } from "../model/pipeline";
import {
  DEFAULT_SORT,
  OPEN_BOX,
  nextSort,
  readBound,
  coordinateText,
  rowsOf,
  sortRows,
  type CoordinateBox,
  type SortKey,
} from "../model/worst-points";

/** Every row is one line of this height (px), so the list is measured once, not per row. */
const ROW = 30;
/** The list's viewport height (px). */
const VIEW = 360;
/** Rows drawn beyond the viewport on each side, so a quick scroll shows no blank band. */
const OVERSCAN = 6;
const AXES = ["x", "y", "z"] as const;

type BoxText = Record<(typeof AXES)[number], [string, string]>;
const EMPTY_TEXT: BoxText = { x: ["", ""], y: ["", ""], z: ["", ""] };

/**
 * The worst points of the table (or of a box of coordinates), highest utilisation first: a long
 * list of which @tanstack/react-virtual draws only the rows in view, sortable by any column, each
 * row with a link into the bench and — for those who may keep points (`selection` given) — a box
 * to keep the point as a location.
 */
export function WorstPointsTable({
  table,
  utilisation,
  unit,
  selection,
  benchHref,
}: {
  table: PointTable;
  utilisation: Float64Array;
  unit: StressUnitName;
  /** the points ticked for keeping and how to tick one; null where the reader may not keep points */
  selection: { selected: ReadonlySet<number>; onToggle: (index: number) => void } | null;
  benchHref: (index: number) => string;
}) {
  const [boxText, setBoxText] = useState<BoxText>(EMPTY_TEXT);
  const [box, setBox] = useState<CoordinateBox>(OPEN_BOX);
  const [boxError, setBoxError] = useState<string | null>(null);
  const [sort, setSort] = useState(DEFAULT_SORT);
  const scroller = useRef<HTMLDivElement>(null);

  const indices = useWorstInBox(utilisation, table.coordinates, box, WORST_KEPT);
  const rows = useMemo(
    () => (indices === null ? [] : sortRows(rowsOf(table, utilisation, indices), sort)),
    [table, utilisation, indices, sort],
  );
  // TanStack Virtual returns fresh functions each render by design (it re-renders the list on
  // scroll, which is what this list needs); the React Compiler leaves this component alone.
  // eslint-disable-next-line react-hooks/incompatible-library
  const virtualizer = useVirtualizer({
    count: rows.length,
    getScrollElement: () => scroller.current,
    estimateSize: () => ROW,
    overscan: OVERSCAN,
    initialRect: { width: 0, height: VIEW },
  });
  const drawn = virtualizer.getVirtualItems();
  // the rows not drawn are stood in for by one empty row above and one below, so the table keeps
  // its columns aligned and the scroll bar its length
  const padTop = drawn.length > 0 ? drawn[0].start : 0;
  const padBottom = drawn.length > 0 ? virtualizer.getTotalSize() - drawn[drawn.length - 1].end : 0;

  const applyBox = () => {
    const next: CoordinateBox = { x: [null, null], y: [null, null], z: [null, null] };
    for (const a of AXES) {
      for (const side of [0, 1] as const) {
        const read = readBound(boxText[a][side], `${a} ${side === 0 ? "from" : "to"}`);
        if ("error" in read) return setBoxError(read.error);
        next[a][side] = read.value;
      }
    }
    setBoxError(null);
    setBox(next);
    virtualizer.scrollToOffset(0);
  };

  const header = (key: SortKey, label: string) => (
    <th
      scope="col"
      className="px-2 py-1 text-right font-semibold"
      aria-sort={sort.key === key ? (sort.descending ? "descending" : "ascending") : "none"}
    >
      <button type="button" className="hover:text-ink" onClick={() => setSort(nextSort(sort, key))}>
        {label}
        {sort.key === key ? (sort.descending ? " ↓" : " ↑") : ""}
      </button>
    </th>
  );

  return (
    <div className="space-y-2">
      {table.coordinates !== null && (
        <form
          className="flex flex-wrap items-end gap-2 text-sm"
          onSubmit={(e) => (e.preventDefault(), applyBox())}
          aria-label="Region of coordinates"
        >
          {AXES.map((a) => (
            <fieldset key={a} className="flex items-center gap-1">
              <legend className="sr-only">{a} range</legend>
              {([0, 1] as const).map((side) => (
                <input
                  key={side}
                  aria-label={`${a} ${side === 0 ? "from" : "to"}`}
                  placeholder={`${a} ${side === 0 ? "from" : "to"}`}
                  inputMode="decimal"
                  className="num w-20 rounded border border-rule-strong bg-panel px-1.5 py-1"
                  value={boxText[a][side]}
                  onChange={(e) => {
                    const next = { ...boxText, [a]: [...boxText[a]] as [string, string] };
                    next[a][side] = e.target.value;
                    setBoxText(next);
                  }}
                />
              ))}
            </fieldset>
          ))}
          <button type="submit" className={quietButton}>
            Show this region
          </button>
          {boxError && (
            <p className="w-full text-fail" role="alert">
              <span aria-hidden="true">✗ </span>
              {boxError}
            </p>
          )}
        </form>
      )}
      <p className="text-[13px] text-graphite-soft" aria-live="polite">
        {indices === null ? (
          "Finding the worst points…"
        ) : (
          <>
            <span className="num">{rows.length.toLocaleString("en-US")}</span> worst points
            {table.coordinates !== null ? " in the region" : ""} (at most {WORST_KEPT.toLocaleString("en-US")}
            ); stresses in {unit}, coordinates as in the file
          </>
        )}
      </p>
      <div
        className="overflow-auto rounded border border-rule bg-panel"
        style={{ maxHeight: VIEW }}
        ref={scroller}
        role="region"
        aria-label="Worst points"
        tabIndex={0}
        data-testid="worst-points"
      >
        <table className="w-full border-collapse text-[13px]">
          <thead className="sticky top-0 bg-panel">
            <tr className="border-b border-rule text-graphite-soft">
              {selection !== null && (
                <th scope="col" className="px-2 py-1">
                  <span className="sr-only">Keep</span>
                </th>
              )}
              {header("id", "point")}
              {table.coordinates !== null && (
                <>
                  {header("x", "x")}
                  {header("y", "y")}
                  {header("z", "z")}
                </>
              )}
              {header("utilisation", "u")}
              <th scope="col" className="px-2 py-1 text-left font-semibold">
                verdict
              </th>
              {header("s1", "σ₁")}
              {header("s3", "σ₃")}
              {header("vonMises", "σ von Mises")}
              {header("tresca", "σ₁ − σ₃")}
              <th scope="col" className="px-2 py-1">
                <span className="sr-only">Bench</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {padTop > 0 && <tr style={{ height: padTop }} aria-hidden="true" />}
            {drawn.map(({ index: at }) => {
              const r = rows[at];
              return (
                <tr key={r.index} className="border-b border-rule" style={{ height: ROW }}>
                  {selection !== null && (
                    <td className="px-2">
                      <input
                        type="checkbox"
                        aria-label={`Keep point ${r.id} as a location`}
                        checked={selection.selected.has(r.index)}
                        onChange={() => selection.onToggle(r.index)}
                      />
                    </td>
                  )}
                  <td className="num px-2 text-right">{r.id}</td>
                  {table.coordinates !== null && (
                    <>
                      <td className="num px-2 text-right">{coordinateText(r.x)}</td>
                      <td className="num px-2 text-right">{coordinateText(r.y)}</td>
                      <td className="num px-2 text-right">{coordinateText(r.z)}</td>
                    </>
                  )}
                  <td className="num px-2 text-right">{r.utilisation.toFixed(3)}</td>
                  <td className="px-2">
                    <Verdict state={r.verdict} />
                  </td>
                  <td className="num px-2 text-right">{formatStress(r.s1, unit)}</td>
                  <td className="num px-2 text-right">{formatStress(r.s3, unit)}</td>
                  <td className="num px-2 text-right">{formatStress(r.vonMises, unit)}</td>
                  <td className="num px-2 text-right">{formatStress(r.tresca, unit)}</td>
                  <td className="px-2">
                    <Link to={benchHref(r.index)} className="text-ink underline-offset-2 hover:underline">
                      bench
                    </Link>
                  </td>
                </tr>
              );
            })}
            {padBottom > 0 && <tr style={{ height: padBottom }} aria-hidden="true" />}
          </tbody>
        </table>
      </div>
    </div>
  );
}
