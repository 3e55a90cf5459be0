import type { LinearizationResultView } from "../../../../../core/contract/linearizations";
import { TableScroll } from "../../../components/TableScroll";
import { Verdict } from "../../../components/Verdict";
import { sheetValue } from "../../../lib/number-format";
import { LOCAL_COMPONENTS } from "../model/distribution";

const th = "px-2 py-1 text-left text-[13px] font-semibold text-graphite";
const td = "px-2 py-1 text-right num whitespace-nowrap";

/** A value with its unit after it, lighter. */
function Value({ v, unit }: { v: number; unit: string }) {
  return (
    <>
      {sheetValue(v)} <span className="text-graphite-soft">{unit}</span>
    </>
  );
}

/** Membrane, bending, membrane + bending, peak and total of each local component, at both surfaces. */
export function PartsTable({ result }: { result: LinearizationResultView }) {
  const u = result.stressUnit;
  const ends = [
    { key: "bending", label: "bending" },
    { key: "membranePlusBending", label: "membrane + bending" },
    { key: "peak", label: "peak" },
    { key: "total", label: "total" },
  ] as const;
  return (
    <TableScroll label="Membrane, bending and peak per component">
      <table className="w-full border-collapse text-[14px]" data-testid="parts-table">
        <thead className="border-b border-rule">
          <tr>
            <th className={th} rowSpan={2}>
              local component
            </th>
            <th className={th} rowSpan={2}>
              membrane
            </th>
            {ends.map((e) => (
              <th key={e.key} className={`${th} text-center`} colSpan={2}>
                {e.label}
              </th>
            ))}
          </tr>
          <tr>
            {ends.flatMap((e) => [
              <th key={`${e.key}s`} className={`${th} font-normal`}>
                first point
              </th>,
              <th key={`${e.key}e`} className={`${th} font-normal`}>
                last point
              </th>,
            ])}
          </tr>
        </thead>
        <tbody className="divide-y divide-rule">
          {LOCAL_COMPONENTS.map((c) => (
            <tr key={c.index}>
              <th scope="row" className={`${th} font-normal`}>
                {c.symbol} <span className="text-graphite-soft">({c.role})</span>
              </th>
              <td className={td}>
                <Value v={result.membrane[c.index]} unit={u} />
              </td>
              {ends.flatMap((e) => [
                <td key={`${e.key}s`} className={td}>
                  <Value v={result[e.key].start[c.index]} unit={u} />
                </td>,
                <td key={`${e.key}e`} className={td}>
                  <Value v={result[e.key].end[c.index]} unit={u} />
                </td>,
              ])}
            </tr>
          ))}
          <tr className="border-t-2 border-rule-strong">
            <th scope="row" className={th}>
              {result.equivalent.label}
            </th>
            <td className={td} data-testid="equivalent-membrane">
              <Value v={result.equivalent.membrane} unit={u} />
            </td>
            {ends.flatMap((e) => [
              <td key={`${e.key}s`} className={td}>
                <Value v={result.equivalent[e.key].start} unit={u} />
              </td>,
              <td key={`${e.key}e`} className={td}>
                <Value v={result.equivalent[e.key].end} unit={u} />
              </td>,
            ])}
          </tr>
        </tbody>
      </table>
    </TableScroll>
  );
}

/** The category checks, each with its verdict, how its limit was found and the source of its rule. */
export function ChecksTable({ result }: { result: LinearizationResultView }) {
  const u = result.stressUnit;
  if (result.checks.length === 0) return <p className="px-3 py-2 text-graphite-soft">{result.checksNote}</p>;
  return (
    <div className="space-y-2">
      <TableScroll label="Category checks">
        <table className="w-full border-collapse text-[14px]" data-testid="checks-table">
          <thead className="border-b border-rule">
            <tr>
              <th className={th}>rule</th>
              <th className={th}>where</th>
              <th className={`${th} text-right`}>value</th>
              <th className={`${th} text-right`}>limit</th>
              <th className={`${th} text-right`}>ratio</th>
              <th className={th}>verdict</th>
            </tr>
          </thead>
          <tbody className="divide-y divide-rule">
            {result.checks.map((k) => (
              <tr key={k.id} data-check={k.id}>
                <th scope="row" className={`${th} whitespace-nowrap`}>
                  {k.rule}
                </th>
                <td className="px-2 py-1 text-[13px]">
                  {k.at === "membrane" ? "membrane" : k.at === "start" ? "first point" : "last point"}
                </td>
                <td className={td}>
                  <Value v={k.value} unit={u} />
                </td>
                <td className={td}>
                  <Value v={k.limit} unit={u} />
                  <div className="text-[12px] text-graphite-soft">{k.limitNote}</div>
                </td>
                <td className={td}>{k.ratio.toFixed(3)}</td>
                <td className="px-2 py-1">
                  <Verdict state={k.verdict} />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </TableScroll>
      <p className="px-1 text-[13px] text-graphite-soft">{result.checksNote}</p>
      <ul className="space-y-1 px-1 text-[12px] text-graphite-soft" aria-label="Sources of the rules">
        {[...new Set(result.checks.map((k) => k.source))].map((source) => (
          <li key={source}>
            <span className="font-semibold">
              Source of{" "}
              {result.checks
                .filter((k) => k.source === source)
                .map((k) => k.rule)
                .join(", ")}
              :
            </span>{" "}
            {source}
          </li>
        ))}
      </ul>
    </div>
  );
}
