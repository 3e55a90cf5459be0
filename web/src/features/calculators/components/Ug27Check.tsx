import { Quantity } from "../../../components/Quantity";
import { Verdict } from "../../../components/Verdict";
import type { Outcome } from "../model/outcome";
import type { Ug27Check } from "../model/ug27";
import { unitFor, type UnitSet } from "../model/units";

/** A thickness as the check shows it: 5 significant figures. */
const thicknessText = (v: number) => Number(v.toPrecision(5)).toString();

/**
 * The required-thickness check under the thin-walled calculator's stresses: each UG-27 formula
 * with its thickness and whether its limits hold, the governing thickness with the corrosion
 * allowance, and whether the wall typed is enough, in a word and a mark.
 */
export function Ug27CheckResults({ outcome, units }: { outcome: Outcome<Ug27Check>; units: UnitSet }) {
  const length = unitFor("length", units);
  if (!outcome.ok) {
    return (
      <p className="text-[13px] text-fail" data-testid="ug27-error">
        ✕ Required thickness not checked: {outcome.error}
      </p>
    );
  }
  const { result, corrodedRadius, wall, wallEnough } = outcome.result;
  const t = (v: number) => <Quantity value={thicknessText(v)} unit={length} />;
  return (
    <section aria-labelledby="ug27-heading" className="space-y-2" data-testid="ug27">
      <h3 id="ug27-heading" className="text-[14px] font-semibold">
        Required thickness, ASME BPVC Section VIII Division 1, UG-27
      </h3>
      <p className="text-[12px] text-graphite-soft">
        Formulas recalled from memory: verify them and their limits against the code edition you work to. R =
        rᵢ + corrosion allowance = {t(corrodedRadius)} (inside radius, corroded).
      </p>
      <table className="w-full text-[13px]">
        <caption className="sr-only">UG-27 thickness by each formula</caption>
        <thead>
          <tr className="border-b border-rule text-left text-[12px] text-graphite-soft">
            <th scope="col" className="py-1 pr-2 font-normal">
              formula
            </th>
            <th scope="col" className="py-1 pr-2 text-right font-normal">
              t required
            </th>
            <th scope="col" className="py-1 font-normal">
              limits
            </th>
          </tr>
        </thead>
        <tbody>
          {result.formulas.map((f) => (
            <tr
              key={f.paragraph}
              className="border-b border-rule last:border-0"
              data-testid={`ug27-${f.paragraph}`}
            >
              <td className="py-1 pr-2">
                {f.paragraph}: <span className="font-mono">{f.formula}</span>
              </td>
              <td className="py-1 pr-2 text-right" data-value={f.thickness}>
                {t(f.thickness)}
              </td>
              <td className="py-1">
                {f.applicable ? (
                  <span>
                    <span aria-hidden="true">✓ </span>within (t ≤ {t(f.thicknessLimit)}, P ≤{" "}
                    {Number(f.pressureLimit.toPrecision(4))} {unitFor("stress", units)})
                  </span>
                ) : (
                  <span className="text-fail">
                    <span aria-hidden="true">✕ </span>outside: use the code&apos;s thick-shell rules
                  </span>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="text-[13px]" data-testid="ug27-required" data-value={result.requiredWithCorrosion}>
        Required: {t(result.required)} ({result.governing.paragraph}) + corrosion allowance{" "}
        {t(result.corrosionAllowance)} = {t(result.requiredWithCorrosion)}, before mill tolerance.
      </p>
      <p className="text-[13px]" data-testid="ug27-verdict">
        <Verdict
          state={wallEnough && result.applicable ? "pass" : "fail"}
          label={
            !result.applicable ? "outside UG-27's limits" : wallEnough ? "wall thick enough" : "wall too thin"
          }
        />{" "}
        wall t = {t(wall)} against {t(result.requiredWithCorrosion)} required.
      </p>
    </section>
  );
}
