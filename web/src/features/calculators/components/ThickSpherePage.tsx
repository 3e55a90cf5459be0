import { useInputs } from "../hooks/use-inputs";
import { calculatorRecordOf } from "../model/inputs";
import { THICK_SPHERE_INPUTS, computeThickSphere } from "../model/thick-wall";
import { stressUnitOf } from "../model/units";
import { CalculatorPage } from "./CalculatorPage";
import { Formula, Validity } from "./Formula";
import { SendToBench } from "./SendToBench";
import { AddToLoadCase } from "./AddToLoadCase";
import { LameResults } from "./LameResults";
import { ThickWallInputs } from "./ThickWallInputs";
import { UnitSetPicker } from "./UnitSetPicker";

/** Thick-walled sphere under internal and external pressure (Lamé). */
export function ThickSpherePage() {
  const { values, setNumber, setUnits } = useInputs(THICK_SPHERE_INPUTS);
  const { units, numbers: n } = values;
  const outcome = computeThickSphere(values);
  const unit = stressUnitOf(units);
  const r = outcome.ok ? outcome.result : undefined;
  return (
    <CalculatorPage
      title="Thick-walled sphere (Lamé)"
      intro="Radial and tangential stress at any radius of a thick-walled sphere under internal and external pressure, and their distribution through the wall."
      inputs={
        <>
          <UnitSetPicker value={units} onChange={setUnits} />
          <ThickWallInputs units={units} numbers={n} setNumber={setNumber} />
        </>
      }
      error={outcome.ok ? undefined : outcome.error}
      results={
        r && (
          <>
            <LameResults
              result={r}
              units={units}
              axes="Element axes: x and y two tangents to the sphere (meridional and circumferential), z radial."
              rows={[
                { id: "xx", sub: "θ", meaning: "tangential (element x)" },
                { id: "yy", sub: "φ", meaning: "tangential (element y)" },
                { id: "zz", sub: "r", meaning: "radial (element z)" },
              ]}
              series={[
                { id: "hoop", label: "σθ = σφ", stroke: "#1d5a55", values: r.profile.map((q) => q.hoop) },
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
              record={calculatorRecordOf("thick-sphere", values)}
              tensor={r.tensor}
              unit={unit}
            />
          </>
        )
      }
      formula={
        <Formula
          lines={[
            "σr = A − B/r³,  σθ = σφ = A + B/(2r³)",
            "A = (pᵢ·rᵢ³ − pₒ·rₒ³)/(rₒ³ − rᵢ³),  B = (pᵢ − pₒ)·rᵢ³·rₒ³/(rₒ³ − rᵢ³)",
            ...(r ? [`here A = ${Number(r.lameA.toPrecision(6))} ${unit}`] : []),
          ]}
          source="the Lamé solution as given in Timoshenko & Goodier, Theory of Elasticity (spherical container under pressure), and Roark’s Formulas for Stress and Strain (thick-walled spheres)."
        />
      }
      validity={
        <Validity
          items={[
            "Linear elastic, homogeneous, isotropic material; a complete spherical wall.",
            "Away from nozzles, supports and joints to other shells.",
            "Uniform pressures; no temperature gradient or residual stress.",
            "The largest stress difference is at the inside face.",
          ]}
        />
      }
    />
  );
}
