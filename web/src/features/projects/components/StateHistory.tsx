import { Link } from "react-router-dom";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { Quantity } from "../../../components/Quantity";
import { useStateHistory } from "../../../entities/load-case/queries";
import { calculatorLinkFor, calculatorTitle, describeCalculatorInputs } from "../../../lib/calculator-link";
import { COMPONENT_SYMBOLS, formatStress, STRESS_COMPONENTS as KEYS } from "../../../lib/stress";

/**
 * The revisions of one saved state, newest first: what a checker reads to see what changed and who
 * changed it, and for a state from a calculator, every input it was given and a link that reopens it.
 */
export function StateHistory(props: {
  workspaceId: string;
  projectId: string;
  loadCaseId: string;
  locationId: string;
  unit: StressUnitName;
  title: string;
}) {
  const history = useStateHistory(props.workspaceId, props.projectId, props.loadCaseId, props.locationId);
  return (
    <div className="border-t border-rule p-3">
      <p className="mb-1 text-sm font-semibold">Revisions of {props.title}</p>
      {history.isPending && <p className="text-graphite-soft">Loading…</p>}
      <table className="text-[13px]" aria-label={`Revisions of ${props.title}`}>
        <thead>
          <tr className="text-left text-graphite-soft">
            <th className="pr-3">rev.</th>
            <th className="pr-3">saved</th>
            <th className="pr-3">by</th>
            <th className="pr-3">source</th>
            {KEYS.map((k) => (
              <th key={k} className="pr-3 text-right">
                {COMPONENT_SYMBOLS[k].tensor}
              </th>
            ))}
            <th className="pr-3">note</th>
            <th className="pr-3">calculator inputs</th>
          </tr>
        </thead>
        <tbody>
          {history.data?.map((r) => (
            <tr key={r.id} className="border-t border-rule">
              <td className="num pr-3">{r.revision}</td>
              <td className="num pr-3">{new Date(r.savedAt).toLocaleString()}</td>
              <td className="pr-3">{r.savedBy?.name ?? "—"}</td>
              <td className="pr-3">
                {r.source} ({r.unit})
              </td>
              {KEYS.map((k) => (
                <td key={k} className="pr-3 text-right">
                  <Quantity value={formatStress(r.componentsPa[k], props.unit)} />
                </td>
              ))}
              <td className="pr-3 text-graphite-soft">{r.note}</td>
              <td className="pr-3" data-testid={`revision-${r.revision}-calculator`}>
                {r.calculator ? (
                  <>
                    <span className="font-semibold">
                      {calculatorTitle(r.calculator)}, version {r.calculator.version}
                    </span>
                    <ul className="num text-[12px]">
                      {describeCalculatorInputs(r.calculator).map((line) => (
                        <li key={line}>{line}</li>
                      ))}
                    </ul>
                    <Link className="text-ink underline" to={calculatorLinkFor(r.calculator)}>
                      Reopen in calculator
                      <span className="sr-only">: revision {r.revision}</span>
                    </Link>
                  </>
                ) : (
                  <span className="text-graphite-faint">—</span>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
