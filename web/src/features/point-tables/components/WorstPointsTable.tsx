import { useMemo, useState } from "react";
import { Link } from "react-router-dom";
import type { PointTable } from "../../../../../core";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { Verdict } from "../../../components/Verdict";
import { quietButton } from "../../../lib/forms";
import { formatStress } from "../../../lib/stress";
import { WORST_KEPT } from "../model/pipeline";
import { rowWindow } from "../model/windowing";
import {
  DEFAULT_SORT,
  OPEN_BOX,
  nextSort,
  readBound,
  coordinateText,
  rowsOf,
  sortRows,
  worstInBox,
  type CoordinateBox,
  type SortKey,
} from "../model/worst-points";

const ROW = 30;
const VIEW = 360;
const AXES = ["x", "y", "z"] as const;

type BoxText = Record<(typeof AXES)[number], [string, string]>;
const EMPTY_TEXT: BoxText = { x: ["", ""], y: ["", ""], z: ["", ""] };

/**
 * The worst points of the table (or of a box of coordinates), highest utilisation first: a long
 * list drawn a window at a time, sortable by any column, each row with a box to keep the point as
 * a location and a link into the bench.
 */
export function WorstPointsTable({
  table,
  utilisation,
  unit,
  selected,
  onToggle,
  benchHref,
}: {
  table: PointTable;
  utilisation: Float64Array;
  unit: StressUnitName;
  selected: ReadonlySet<number>;
  onToggle: (index: number) => void;
  benchHref: (index: number) => string;
}) {
  const [boxText, setBoxText] = useState<BoxText>(EMPTY_TEXT);
  const [box, setBox] = useState<CoordinateBox>(OPEN_BOX);
  const [boxError, setBoxError] = useState<string | null>(null);
  const [sort, setSort] = useState(DEFAULT_SORT);
  const [scrollTop, setScrollTop] = useState(0);

  const indices = useMemo(
    () => worstInBox(utilisation, table.coordinates, box, WORST_KEPT),
    [utilisation, table.coordinates, box],
  );
  const rows = useMemo(
    () => sortRows(rowsOf(table, utilisation, indices), sort),
    [table, utilisation, indices, sort],
  );
  const w = rowWindow(scrollTop, VIEW, ROW, rows.length);

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
    setScrollTop(0);
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
      <p className="text-[13px] text-graphite-soft">
        <span className="num">{rows.length.toLocaleString("en-US")}</span> worst points
        {table.coordinates !== null ? " in the region" : ""} (at most {WORST_KEPT.toLocaleString("en-US")});
        stresses in {unit}, coordinates as in the file
      </p>
      <div
        className="overflow-auto rounded border border-rule bg-panel"
        style={{ maxHeight: VIEW }}
        onScroll={(e) => setScrollTop(e.currentTarget.scrollTop)}
        role="region"
        aria-label="Worst points"
        tabIndex={0}
        data-testid="worst-points"
      >
        <table className="w-full border-collapse text-[13px]">
          <thead className="sticky top-0 bg-panel">
            <tr className="border-b border-rule text-graphite-soft">
              <th scope="col" className="px-2 py-1">
                <span className="sr-only">Keep</span>
              </th>
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
            {w.padTop > 0 && <tr style={{ height: w.padTop }} aria-hidden="true" />}
            {rows.slice(w.first, w.last + 1).map((r) => (
              <tr key={r.index} className="border-b border-rule" style={{ height: ROW }}>
                <td className="px-2">
                  <input
                    type="checkbox"
                    aria-label={`Keep point ${r.id} as a location`}
                    checked={selected.has(r.index)}
                    onChange={() => onToggle(r.index)}
                  />
                </td>
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
            ))}
            {w.padBottom > 0 && <tr style={{ height: w.padBottom }} aria-hidden="true" />}
          </tbody>
        </table>
      </div>
    </div>
  );
}
