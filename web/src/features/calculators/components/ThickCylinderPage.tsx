import { useInputs } from "../hooks/use-inputs";
import { calculatorRecordOf } from "../model/inputs";
import { THICK_CYLINDER_INPUTS, computeThickCylinder } from "../model/thick-wall";
import { stressUnitOf } from "../model/units";
import { CalculatorPage } from "./CalculatorPage";
import { ChoiceField } from "./ChoiceField";
import { Formula, Validity } from "./Formula";
import { InputField } from "./InputField";
import { SendToBench } from "./SendToBench";
import { AddToLoadCase } from "./AddToLoadCase";
import { LameResults } from "./LameResults";
import { ThickWallInputs } from "./ThickWallInputs";
import { UnitSetPicker } from "./UnitSetPicker";

const AXIAL_FORMULA: Record<string, string> = {
  closed: "σz = A  (closed ends)",
  open: "σz = 0  (open ends)",
  "plane-strain": "σz = ν(σr + σθ) = 2νA  (plane strain, εz = 0)",
};

/** Thick-walled cylinder under internal and external pressure (Lamé), with its end condition. */
export function ThickCylinderPage() {
  const { values, setNumber, setChoice, setUnits } = useInputs(THICK_CYLINDER_INPUTS);
  const { units, numbers: n, choices: c } = values;
  const outcome = computeThickCylinder(values);
  const unit = stressUnitOf(units);
  const r = outcome.ok ? outcome.result : undefined;
  return (
    <CalculatorPage
      title="Thick-walled cylinder (Lamé)"
      intro="Radial, hoop and axial stress at any radius of a thick-walled cylinder under internal and external pressure, and their distribution through the wall."
      inputs={
        <>
          <UnitSetPicker value={units} onChange={setUnits} />
          <ThickWallInputs units={units} numbers={n} setNumber={setNumber} />
          <ChoiceField
            legend="End condition"
            value={c.ends}
            onChange={(v) => setChoice("ends", v)}
            options={[
              { value: "closed", label: "closed ends" },
              { value: "open", label: "open ends" },
              { value: "plane-strain", label: "plane strain" },
            ]}
          />
          {c.ends === "plane-strain" && (
            <InputField
              label="Poisson's ratio ν"
              dimension="ratio"
              units={units}
              value={n.nu}
              onCommit={(v) => setNumber("nu", v)}
            />
          )}
        </>
      }
      error={outcome.ok ? undefined : outcome.error}
      results={
        r && (
          <>
            <LameResults
              result={r}
              units={units}
              axes="Element axes: x axial (along the cylinder), y hoop (circumferential), z radial."
              rows={[
                { id: "xx", sub: "z", meaning: "axial (element x)" },
                { id: "yy", sub: "θ", meaning: "hoop (element y)" },
                { id: "zz", sub: "r", meaning: "radial (element z)" },
              ]}
              series={[
                { id: "hoop", label: "σθ hoop", stroke: "#1d5a55", values: r.profile.map((q) => q.hoop) },
                {
                  id: "axial",
                  label: "σz axial",
                  stroke: "#9a6410",
                  dash: "6 3",
                  values: r.profile.map((q) => q.axial ?? 0),
                },
                {
                  id: "radial",
                  label: "σr radial",
                  stroke: "#2767a8",
                  dash: "2 3",
                  values: r.profile.map((q) => q.radial),
                },
              ]}
            />
          </>
        )
      }
      actions={
        r && (
          <>
            <SendToBench tensor={r.tensor} units={units} />
            <AddToLoadCase
              record={calculatorRecordOf("thick-cylinder", values)}
              tensor={r.tensor}
              unit={unit}
            />
          </>
        )
      }
      formula={
        <Formula
          lines={[
            "σr = A − B/r²,  σθ = A + B/r²",
            "A = (pᵢ·rᵢ² − pₒ·rₒ²)/(rₒ² − rᵢ²),  B = (pᵢ − pₒ)·rᵢ²·rₒ²/(rₒ² − rᵢ²)",
            AXIAL_FORMULA[c.ends],
            ...(r ? [`here A = ${Number(r.lameA.toPrecision(6))} ${unit}`] : []),
          ]}
          source="the Lamé solution as given in Timoshenko & Goodier, Theory of Elasticity (thick-walled cylinder), and Roark’s Formulas for Stress and Strain (thick-walled cylinders)."
        />
      }
      validity={
        <Validity
          items={[
            "Linear elastic, homogeneous, isotropic material; long straight wall.",
            "Away from the ends, end caps, openings and supports (closed ends: σz = A only away from the caps).",
            "Uniform pressures; no temperature gradient, no residual stress (autofrettage, shrink fits are not included).",
            "The largest stress difference is at the bore; check there first.",
          ]}
        />
      }
    />
  );
}
