import { Link } from "react-router-dom";
import { Sym } from "../../../components/Sym";
import { useInputs } from "../hooks/use-inputs";
import { calculatorRecordOf } from "../model/inputs";
import { THIN_WALL_INPUTS, computeThinWall } from "../model/thin-wall";
import { stressUnitOf, unitFor } from "../model/units";
import { CalculatorPage } from "./CalculatorPage";
import { ChoiceField } from "./ChoiceField";
import { Formula, Validity } from "./Formula";
import { InputField } from "./InputField";
import { SendToBench } from "./SendToBench";
import { AddToLoadCase } from "./AddToLoadCase";
import { StateTable } from "./StateTable";
import { UnitSetPicker } from "./UnitSetPicker";
import { Ug27CheckResults } from "./Ug27Check";
import { UG27_INPUTS, computeUg27 } from "../model/ug27";
import type { UnitSet } from "../model/units";

/** Every input of the page: the calculator's and its UG-27 check's, for a change of unit set. */
const PAGE_INPUTS = {
  numbers: { ...THIN_WALL_INPUTS.numbers, ...UG27_INPUTS.numbers },
  choices: THIN_WALL_INPUTS.choices,
};

/** Thin-walled cylinder (closed ends) or sphere under internal pressure: membrane stresses. */
export function ThinWallPage() {
  const { values, setNumber, setChoice } = useInputs(THIN_WALL_INPUTS);
  // The UG-27 check's inputs share the address under their own names; a change of unit set
  // converts both groups in one write.
  const ug27 = useInputs(UG27_INPUTS);
  const both = useInputs(PAGE_INPUTS);
  const setUnits = (u: UnitSet) => both.setUnits(u);
  const { units, numbers: n, choices: c } = values;
  const outcome = computeThinWall(values);
  const check = outcome.ok ? computeUg27(values, outcome.result, ug27.values) : undefined;
  const unit = stressUnitOf(units);
  const sphere = c.shape === "sphere";
  const meanForm = c.form === "mean-diameter";
  const r = outcome.ok ? outcome.result : undefined;
  return (
    <CalculatorPage
      title="Thin-walled cylinder and sphere"
      intro="Membrane stresses of a closed-end cylinder or a sphere under internal pressure, with a check that the wall is thin enough for membrane theory."
      inputs={
        <>
          <UnitSetPicker value={units} onChange={setUnits} />
          <ChoiceField
            legend="Vessel"
            value={c.shape}
            onChange={(v) => setChoice("shape", v)}
            options={[
              { value: "cylinder", label: "cylinder, closed ends" },
              { value: "sphere", label: "sphere" },
            ]}
          />
          <InputField
            label="Internal pressure p"
            dimension="stress"
            units={units}
            value={n.p}
            onCommit={(v) => setNumber("p", v)}
          />
          <InputField
            label="Radius r"
            dimension="length"
            units={units}
            value={n.r}
            onCommit={(v) => setNumber("r", v)}
          />
          <ChoiceField
            legend="The radius given is the"
            value={c.given}
            onChange={(v) => setChoice("given", v)}
            options={[
              { value: "inner", label: "inner radius" },
              { value: "mean", label: "mean radius" },
              { value: "outer", label: "outer radius" },
            ]}
          />
          <InputField
            label="Wall thickness t"
            dimension="length"
            units={units}
            value={n.t}
            onCommit={(v) => setNumber("t", v)}
          />
          <ChoiceField
            legend="Formula"
            value={c.form}
            onChange={(v) => setChoice("form", v)}
            options={[
              { value: "inside-radius", label: "inside radius" },
              { value: "mean-diameter", label: "mean diameter" },
            ]}
          />
          <ChoiceField
            legend="Radial stress σr"
            value={c.radial}
            onChange={(v) => setChoice("radial", v)}
            options={[
              { value: "membrane", label: "0 (mid-wall, membrane)" },
              { value: "inner-surface", label: "−p (inside face)" },
            ]}
          />
          <p className="pt-1 text-[12px] text-graphite-soft">
            Required-thickness check (ASME VIII-1 UG-27; not part of the state saved):
          </p>
          <InputField
            label="Allowable stress S"
            dimension="stress"
            units={units}
            value={ug27.values.numbers.S}
            onCommit={(v) => ug27.setNumber("S", v)}
          />
          <InputField
            label="Joint efficiency E"
            dimension="ratio"
            units={units}
            value={ug27.values.numbers.E}
            onCommit={(v) => ug27.setNumber("E", v)}
          />
          <InputField
            label="Corrosion allowance"
            dimension="length"
            units={units}
            value={ug27.values.numbers.CA}
            onCommit={(v) => ug27.setNumber("CA", v)}
          />
        </>
      }
      error={outcome.ok ? undefined : outcome.error}
      results={
        r && (
          <>
            <p className="text-[13px] text-graphite-soft">
              Element axes: x {sphere ? "tangential" : "axial (along the vessel)"}, y{" "}
              {sphere ? "tangential" : "hoop (circumferential)"}, z radial. Inside radius used:{" "}
              <span className="num">{Number(r.insideRadius.toPrecision(6))}</span>{" "}
              <span className="unit">{unitFor("length", units)}</span>.
            </p>
            <StateTable
              caption="Membrane stresses"
              unit={unit}
              rows={[
                {
                  id: "xx",
                  symbol: <Sym base="σ" sub="x" />,
                  meaning: sphere ? "tangential" : "axial (longitudinal)",
                  value: r.axial,
                },
                {
                  id: "yy",
                  symbol: <Sym base="σ" sub="y" />,
                  meaning: sphere ? "tangential" : "hoop (circumferential)",
                  value: r.hoop,
                },
                { id: "zz", symbol: <Sym base="σ" sub="z" />, meaning: "radial", value: r.radial },
              ]}
            />
            <p className="text-[13px] text-graphite-soft">All shears are zero: these are principal axes.</p>
            {r.warning !== undefined && r.thickLink !== undefined && (
              <div
                role="note"
                className="space-y-1 rounded-sm border border-close bg-close-wash px-3 py-2 text-[14px]"
                data-testid="thin-wall-warning"
              >
                <p>
                  <span aria-hidden="true">△ </span>
                  {r.warning[0]}
                </p>
                <p className="text-[13px]" data-testid="thin-wall-radius">
                  {r.warning[1]}
                </p>
                <Link to={r.thickLink} data-testid="open-thick">
                  Open in the thick-walled calculator with the same inputs
                </Link>
              </div>
            )}
            {check && <Ug27CheckResults outcome={check} units={units} />}
          </>
        )
      }
      actions={
        r && (
          <>
            <SendToBench tensor={r.tensor} units={units} />
            <AddToLoadCase record={calculatorRecordOf("thin-wall", values)} tensor={r.tensor} unit={unit} />
          </>
        )
      }
      formula={
        <Formula
          lines={
            sphere
              ? [
                  meanForm
                    ? "σ = p·(dᵢ + t)/(4t),  dᵢ = 2rᵢ"
                    : "σ = p·rᵢ/(2t)  in every tangential direction",
                  "σr = 0 or −p",
                ]
              : meanForm
                ? ["σθ = p·(dᵢ + t)/(2t)  (hoop)", "σx = p·dᵢ/(4t)  (axial, closed ends)", "σr = 0 or −p"]
                : ["σθ = p·rᵢ/t  (hoop)", "σx = p·rᵢ/(2t)  (axial, closed ends)", "σr = 0 or −p"]
          }
          source="thin-walled pressure vessels in any strength-of-materials text, e.g. the open textbook “Strength of Materials” (EngineeringMechanicsOER, ch. 13); the mean-diameter form as in Shigley’s Mechanical Engineering Design."
        />
      }
      validity={
        <Validity
          items={[
            "t/r ≤ 0.1 (common practice): beyond it thin-wall theory underestimates the hoop stress at the bore; use the thick-walled calculator.",
            "Away from heads, nozzles, supports and changes of thickness; no bending of the wall.",
            "Internal pressure. Under external pressure buckling usually governs and is not checked here.",
            "The mean-diameter form gives a hoop stress larger by (1 + t/dᵢ) than the inside-radius form: a convention, not an error.",
            "UG-27 check: internal pressure only, formulas recalled from memory (verify against your code edition); one joint efficiency for both cylinder formulas (enter the lower); R is the inside radius plus the corrosion allowance; no mill tolerance and no other loadings.",
          ]}
        />
      }
    />
  );
}
