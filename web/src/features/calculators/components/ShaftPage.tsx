import type { ShaftPointStress } from "../../../../../core";
import { Quantity } from "../../../components/Quantity";
import { Sym } from "../../../components/Sym";
import { sheetValue } from "../../../lib/number-format";
import { useInputs } from "../hooks/use-inputs";
import { calculatorRecordOf } from "../model/inputs";
import { SHAFT_INPUTS, atCriticalPoint, computeShaft, isCriticalPoint } from "../model/shaft";
import { stressUnitOf } from "../model/units";
import { CalculatorPage } from "./CalculatorPage";
import { ChoiceField } from "./ChoiceField";
import { Formula, Validity } from "./Formula";
import { InputField } from "./InputField";
import { SendToBench } from "./SendToBench";
import { AddToLoadCase } from "./AddToLoadCase";
import { StateTable } from "./StateTable";
import { quietButton } from "../../../lib/forms";
import { UnitSetPicker } from "./UnitSetPicker";

function PointState({ p, unit, prefix }: { p: ShaftPointStress; unit: string; prefix: string }) {
  const q = (v: number) => <Quantity value={sheetValue(v)} unit={unit} />;
  return (
    <StateTable
      caption={`Stress state at the ${p.surface} surface, θ = ${p.angle}°`}
      unit={unit}
      rows={[
        {
          id: `${prefix}xx`,
          symbol: <Sym base="σ" sub="x" />,
          meaning: (
            <>
              along the shaft: bending {q(p.bending)} + axial {q(p.axial)}
            </>
          ),
          value: p.sigma,
        },
        {
          id: `${prefix}xy`,
          symbol: <Sym base="τ" sub="xy" />,
          meaning: (
            <>
              x–tangential: torsion {q(p.torsion)} + transverse shear {q(p.transverseShear)}
            </>
          ),
          value: p.tau,
        },
        {
          id: `${prefix}vm`,
          symbol: <Sym base="σ" sub="vM" />,
          meaning: "von Mises √(σx² + 3τxy²)",
          value: p.vonMises,
        },
      ]}
    />
  );
}

/** Solid or hollow circular shaft under bending, torque, axial force and transverse shear. */
export function ShaftPage() {
  const { values, setNumber, setChoice, setUnits, setValues } = useInputs(SHAFT_INPUTS);
  const { units, numbers: n, choices: c } = values;
  const outcome = computeShaft(values);
  const unit = stressUnitOf(units);
  const r = outcome.ok ? outcome.result : undefined;
  const hollow = c.section === "hollow";
  const field = (key: keyof typeof SHAFT_INPUTS.numbers, label: string) => (
    <InputField
      label={label}
      dimension={SHAFT_INPUTS.numbers[key].dimension}
      units={units}
      value={n[key]}
      onCommit={(v) => setNumber(key, v)}
    />
  );
  const nominal = r !== undefined && r.kt.bending === 1 && r.kt.torsion === 1 && r.kt.axial === 1;
  return (
    <CalculatorPage
      title="Shaft under combined load"
      intro="The stress state at a point of a solid or hollow circular shaft's surface under bending, torque, axial force and transverse shear, and the point where the von Mises stress is largest."
      inputs={
        <>
          <UnitSetPicker value={units} onChange={setUnits} />
          <ChoiceField
            legend="Section"
            value={c.section}
            onChange={(v) => setChoice("section", v)}
            options={[
              { value: "solid", label: "solid" },
              { value: "hollow", label: "hollow" },
            ]}
          />
          {field("D", "Outer diameter D")}
          {hollow && field("d", "Bore diameter d")}
          <ChoiceField
            legend="Bending given as"
            value={c.moments}
            onChange={(v) => setChoice("moments", v)}
            options={[
              { value: "components", label: "two moments My, Mz" },
              { value: "direction", label: "one moment and its direction" },
            ]}
          />
          {c.moments === "components" ? (
            <>
              {field("My", "Bending moment My")}
              {field("Mz", "Bending moment Mz")}
            </>
          ) : (
            <>
              {field("M", "Bending moment M")}
              {field("phi", "Angle φ of the fibre it stretches")}
            </>
          )}
          {field("T", "Torque T")}
          {field("P", "Axial force P (tension +)")}
          {field("Vy", "Transverse shear Vy")}
          {field("Vz", "Transverse shear Vz")}
          <p className="text-[12px] text-graphite-soft">Stress-concentration factors (1 = nominal stress):</p>
          <div className="grid grid-cols-3 gap-2">
            {field("ktb", "Kt bending")}
            {field("ktt", "Kt torsion")}
            {field("kta", "Kt axial")}
          </div>
          {hollow && (
            <ChoiceField
              legend="Point on the"
              value={c.surface}
              onChange={(v) => setChoice("surface", v)}
              options={[
                { value: "outer", label: "outer surface" },
                { value: "inner", label: "bore surface" },
              ]}
            />
          )}
          {field("angle", "Angle θ of the point, from +y towards +z")}
        </>
      }
      error={outcome.ok ? undefined : outcome.error}
      results={
        r && (
          <>
            <p className="text-[13px] text-graphite-soft">
              Element axes at the point: x along the shaft, y tangential to the surface, z radial (inward).
              Only σx and τxy act.{" "}
              {nominal
                ? "Every stress here is nominal: no stress concentration (all Kt = 1)."
                : "Kt applied to bending, torsion and axial stress as entered; transverse shear stays nominal."}
            </p>
            <h3 className="text-[14px] font-semibold">
              At the {r.point.surface === "outer" ? "outer surface" : "bore"}, θ ={" "}
              <span className="num">{Number(r.point.angle.toFixed(2))}</span>°
            </h3>
            <PointState p={r.point} unit={unit} prefix="" />
            <div className="flex flex-wrap gap-3">
              <SendToBench tensor={r.point.tensor} units={units} label="Send this point to bench" />
              <AddToLoadCase
                record={calculatorRecordOf("shaft", values)}
                tensor={r.point.tensor}
                unit={unit}
              />
            </div>
            <h3 className="text-[14px] font-semibold" data-testid="critical-point">
              Critical point (largest von Mises): {r.critical.surface === "outer" ? "outer surface" : "bore"},
              θ = <span className="num">{r.critical.angle.toFixed(2)}</span>°
            </h3>
            <PointState p={r.critical} unit={unit} prefix="crit-" />
            {isCriticalPoint(r) ? (
              <p className="text-[13px]" data-testid="point-is-critical">
                <span aria-hidden="true">✓ </span>
                The point above is the critical point: "Add to load case" saves it with inputs that give it
                back.
              </p>
            ) : (
              <div className="flex flex-wrap items-center gap-3">
                <button
                  type="button"
                  className={quietButton}
                  data-testid="use-critical-point"
                  onClick={() => setValues(atCriticalPoint(values, r.critical))}
                >
                  Use the critical point
                </button>
                <span className="text-[12px] text-graphite-soft">
                  sets the point's {hollow ? "surface and " : ""}angle to it, so it can be added to a load
                  case or sent to the bench with its inputs
                </span>
              </div>
            )}
            <p className="text-[13px] text-graphite-soft">
              Nominal largest stresses, before Kt: bending{" "}
              <Quantity value={sheetValue(r.nominal.bending)} unit={unit} />, axial{" "}
              <Quantity value={sheetValue(r.nominal.axial)} unit={unit} />, torsion{" "}
              <Quantity value={sheetValue(r.nominal.torsion)} unit={unit} />, transverse shear{" "}
              <Quantity value={sheetValue(r.nominal.transverseShear)} unit={unit} />.
            </p>
          </>
        )
      }
      actions={
        r && (
          <SendToBench
            tensor={r.critical.tensor}
            units={units}
            label="Send the critical point to bench"
            testId="send-critical-to-bench"
          />
        )
      }
      formula={
        <Formula
          lines={[
            "A = π(rₒ² − rᵢ²),  I = π(rₒ⁴ − rᵢ⁴)/4,  J = 2I",
            "σx = Kt,b·(My·z − Mz·y)/I + Kt,a·P/A,  (y, z) = ρ(cos θ, sin θ)",
            "τxy = Kt,t·T·ρ/J + (4/(3A))·k·(V·t̂),  k = (rₒ² + rₒrᵢ + rᵢ²)/(rₒ² + rᵢ²)",
            "σvM = √(σx² + 3τxy²)",
          ]}
          source="handbook formulas for shafts, as in Roark’s Formulas for Stress and Strain and Shigley’s Mechanical Engineering Design; the transverse-shear maximum 4V/(3A)·k as in Gere & Goodno, Mechanics of Materials (recalled from memory in core)."
        />
      }
      validity={
        <Validity
          items={[
            "Straight, prismatic circular shaft, linear elastic; away from load points, shoulders, keyways and holes unless a Kt is entered for them.",
            "Transverse shear is the average over the radial line through the point (on the safe side of the exact elastic value at the surface) and is never multiplied by a Kt.",
            "The critical point is found by a numerical search over the surfaces (0.5° sampling, then refined).",
            "Signs: loads act on the cut face whose outward normal is +x; θ from +y towards +z.",
          ]}
        />
      }
    />
  );
}
