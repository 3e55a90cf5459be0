import type { ReactNode } from "react";
import { Link } from "react-router-dom";
import { Caution } from "../../../components/Caution";
import { Panel } from "../../../components/Panel";
import { CopyInputsLink } from "./SendToBench";

/**
 * The sheet every calculator fills: its name and purpose, the inputs, then the state it produces,
 * the formula with its source and the limits of validity, with the caution once beside the results.
 * When the inputs are refused, `error` (naming the field) takes the results' place.
 */
export function CalculatorPage({
  title,
  intro,
  inputs,
  error,
  results,
  formula,
  validity,
  actions,
}: {
  title: string;
  intro: ReactNode;
  inputs: ReactNode;
  error: string | undefined;
  results: ReactNode;
  formula: ReactNode;
  validity: ReactNode;
  actions: ReactNode;
}) {
  return (
    <div className="space-y-4">
      <div>
        <p className="text-sm">
          <Link to="/calculators">Calculators</Link> /
        </p>
        <h1 className="text-2xl font-semibold tracking-tight text-graphite">{title}</h1>
        <p className="mt-1 max-w-3xl text-graphite-soft">{intro}</p>
      </div>
      <div className="grid gap-4 lg:grid-cols-[minmax(0,24rem)_minmax(0,1fr)]">
        <Panel
          id="calc-inputs"
          index="1"
          title="Inputs"
          className="self-start"
          bodyClassName="space-y-3 px-3 py-3"
        >
          {inputs}
        </Panel>
        <div className="min-w-0 space-y-4">
          <Panel id="calc-results" index="2" title="Stress state" subtitle="tension positive">
            {error !== undefined ? (
              <p role="alert" className="px-3 py-2 text-[14px] text-fail" data-testid="calc-error">
                ✕ Not calculated: {error}
              </p>
            ) : (
              <div className="space-y-3 px-3 py-2">
                {results}
                <div className="flex flex-wrap items-center gap-3">{actions}</div>
              </div>
            )}
          </Panel>
          <Caution />
          <Panel id="calc-formula" index="3" title="Formula used">
            {formula}
          </Panel>
          <Panel id="calc-validity" index="4" title="Limits of validity">
            {validity}
          </Panel>
          <CopyInputsLink />
        </div>
      </div>
    </div>
  );
}
