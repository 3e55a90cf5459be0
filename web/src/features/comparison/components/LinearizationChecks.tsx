import { Link } from "react-router-dom";
import type { ComparisonLinearization } from "../../../../../core/contract/linearizations";
import { TableScroll } from "../../../components/TableScroll";
import { Verdict } from "../../../components/Verdict";
import { sheetValue } from "../../../lib/number-format";

const th = "px-2 py-1 text-left text-[13px] font-semibold text-graphite";
const td = "px-2 py-1 text-right num whitespace-nowrap";

/**
 * The saved stress classification lines, one section per line: its case, location and
 * classification, and each category check with its verdict and the source of its rule. The
 * line's own page shows the distributions; this table only says how each came out.
 */
export function LinearizationChecks({
  lines,
  workspaceId,
  projectId,
}: {
  lines: readonly ComparisonLinearization[];
  workspaceId: string;
  projectId: string;
}) {
  return (
    <TableScroll label="Stress classification lines">
      <table className="w-full border-collapse text-[14px]" data-testid="linearization-checks">
        <thead className="border-b border-rule">
          <tr>
            <th className={th}>line</th>
            <th className={th}>rule</th>
            <th className={`${th} text-right`}>value</th>
            <th className={`${th} text-right`}>limit</th>
            <th className={`${th} text-right`}>ratio</th>
            <th className={th}>verdict</th>
          </tr>
        </thead>
        {lines.map((line) => (
          <tbody key={line.id} className="border-b border-rule" data-line={line.name}>
            {line.checks.length === 0 && (
              <tr>
                <th scope="row" className={`${th} font-normal`}>
                  {line.name}
                </th>
                <td colSpan={5} className="px-2 py-1 text-graphite-soft">
                  no checks made
                </td>
              </tr>
            )}
            {line.checks.map((k, i) => (
              <tr key={k.rule} className={k.rule === line.governingRule ? "font-semibold" : ""}>
                {i === 0 && (
                  <th scope="rowgroup" rowSpan={line.checks.length} className={`${th} align-top font-normal`}>
                    <Link
                      to={`/workspaces/${workspaceId}/projects/${projectId}/linearization?case=${line.caseId}&line=${line.id}`}
                      className="font-semibold text-ink underline-offset-2 hover:underline"
                    >
                      {line.name}
                    </Link>
                    <div className="text-[12px] text-graphite-soft">
                      {line.caseName}
                      {line.locationName ? ` at ${line.locationName}` : ""}; {line.category};{" "}
                      {line.equivalent === "tresca" ? "Tresca" : "von Mises"}
                    </div>
                  </th>
                )}
                <td className="px-2 py-1 whitespace-nowrap" title={k.source}>
                  {k.rule}
                  {k.source.includes("recalled from memory") && (
                    <span className="block text-[11px] font-normal text-graphite-soft">
                      recalled from memory
                    </span>
                  )}
                </td>
                <td className={td}>
                  {sheetValue(k.value)} <span className="text-graphite-soft">{line.stressUnit}</span>
                </td>
                <td className={td}>
                  {sheetValue(k.limit)} <span className="text-graphite-soft">{line.stressUnit}</span>
                </td>
                <td className={td}>{k.ratio.toFixed(3)}</td>
                <td className="px-2 py-1">
                  <Verdict state={k.verdict} />
                </td>
              </tr>
            ))}
          </tbody>
        ))}
      </table>
    </TableScroll>
  );
}
