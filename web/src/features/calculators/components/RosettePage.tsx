import { toMicrostrain } from "../../../../../core";
import { Quantity } from "../../../components/Quantity";
import { Sym } from "../../../components/Sym";
import { fixed, sheetValue } from "../../../lib/number-format";
import { useInputs } from "../hooks/use-inputs";
import { calculatorRecordOf } from "../model/inputs";
import { ROSETTE_INPUTS, computeRosette, gaugeAngles } from "../model/rosette";
import { stressUnitOf } from "../model/units";
import { CalculatorPage } from "./CalculatorPage";
import { ChoiceField } from "./ChoiceField";
import { Formula, Validity } from "./Formula";
import { ElasticMaterialPicker } from "./ElasticMaterialPicker";
import { InputField } from "./InputField";
import { SendToBench } from "./SendToBench";
import { AddToLoadCase } from "./AddToLoadCase";
import { StateTable } from "./StateTable";
import { UnitSetPicker } from "./UnitSetPicker";

const FORMULAS: Record<string, string[]> = {
  rectangular: ["εx = ε₀,  εy = ε₉₀,  γxy = 2ε₄₅ − ε₀ − ε₉₀"],
  delta: ["εx = ε₀,  εy = (2ε₆₀ + 2ε₁₂₀ − ε₀)/3,  γxy = 2(ε₆₀ − ε₁₂₀)/√3"],
  any: ["εθ = εx cos²θ + εy sin²θ + γxy sin θ cos θ, solved for εx, εy, γxy from the three gauges"],
};

const micro = (v: number) => `${fixed(toMicrostrain(v), 1)}`;

/** Strain-gauge rosette: three readings to principal strains and the plane-stress state. */
export function RosettePage() {
  const { values, setNumber, setNumbers, setChoice, setUnits } = useInputs(ROSETTE_INPUTS);
  const { units, numbers: n, choices: c } = values;
  const outcome = computeRosette(values);
  const unit = stressUnitOf(units);
  const r = outcome.ok ? outcome.result : undefined;
  const angles = gaugeAngles(values);
  const field = (key: keyof typeof ROSETTE_INPUTS.numbers, label: string) => (
    <InputField
      label={label}
      dimension={ROSETTE_INPUTS.numbers[key].dimension}
      units={units}
      value={n[key]}
      onCommit={(v) => setNumber(key, v)}
    />
  );
  return (
    <CalculatorPage
      title="Strain-gauge rosette"
      intro="Three gauge readings at a free surface reduced to the in-plane strains, the principal strains and their direction, and the plane-stress state by Hooke's law."
      inputs={
        <>
          <UnitSetPicker value={units} onChange={setUnits} />
          <ChoiceField
            legend="Rosette"
            value={c.layout}
            onChange={(v) => setChoice("layout", v)}
            options={[
              { value: "rectangular", label: "rectangular 0/45/90°" },
              { value: "delta", label: "delta 0/60/120°" },
              { value: "any", label: "three gauges at any angles" },
            ]}
          />
          {(["1", "2", "3"] as const).map((k, i) => (
            <div key={k} className="grid grid-cols-2 gap-2">
              {c.layout === "any" ? (
                field(`a${k}`, `Gauge ${k} angle`)
              ) : (
                <p className="self-end text-[13px] text-graphite-soft">
                  Gauge {k} at <span className="num">{angles[i]}</span>°
                </p>
              )}
              {field(`e${k}`, `Gauge ${k} reading ε`)}
            </div>
          ))}
          <ChoiceField
            legend="Gauge factor"
            value={c.gf}
            onChange={(v) => setChoice("gf", v)}
            options={[
              { value: "as-read", label: "readings as taken" },
              { value: "corrected", label: "correct the readings" },
            ]}
          />
          {c.gf === "corrected" && (
            <div className="grid grid-cols-2 gap-2">
              {field("gfSet", "Instrument gauge factor")}
              {field("gfGauge", "Gauge factor of the gauges")}
            </div>
          )}
          <ElasticMaterialPicker units={units} onPick={(v) => setNumbers(v)} />
          {field("E", "Young's modulus E")}
          {field("nu", "Poisson's ratio ν")}
          <p className="text-[12px] text-graphite-soft">
            No transverse-sensitivity correction is applied here.
          </p>
        </>
      }
      error={outcome.ok ? undefined : outcome.error}
      results={
        r && (
          <>
            <p className="text-[13px] text-graphite-soft">
              Element axes: x along gauge 1's reference direction (0°), y at +90° from it in the surface, z
              normal to the surface (σz = 0: a free surface). Angles counter-clockwise from x.
            </p>
            <table className="text-[14px]">
              <caption className="sr-only">Strains</caption>
              <tbody>
                {[
                  ...(c.gf === "corrected"
                    ? ([
                        ["ε₁ corrected", r.readings[0] * 1e-6],
                        ["ε₂ corrected", r.readings[1] * 1e-6],
                        ["ε₃ corrected", r.readings[2] * 1e-6],
                      ] as const)
                    : []),
                  ["εx", r.strains.ex],
                  ["εy", r.strains.ey],
                  ["γxy", r.strains.gxy],
                  ["ε₁", r.principal.e1],
                  ["ε₂", r.principal.e2],
                  ["γmax", r.principal.gammaMaxInPlane],
                ].map(([label, v]) => (
                  <tr key={label as string}>
                    <th scope="row" className="pr-3 text-left font-normal">
                      {label}
                    </th>
                    <td className="text-right">
                      <Quantity value={micro(v as number)} unit="µε" />
                    </td>
                  </tr>
                ))}
                <tr>
                  <th scope="row" className="pr-3 text-left font-normal">
                    θ to ε₁
                  </th>
                  <td className="text-right">
                    <Quantity value={fixed(r.principal.thetaE1, 2)} unit="°" />
                  </td>
                </tr>
              </tbody>
            </table>
            <StateTable
              caption="Plane stress in the gauges' frame"
              unit={unit}
              rows={[
                {
                  id: "xx",
                  symbol: <Sym base="σ" sub="x" />,
                  meaning: "along x (0° gauge direction)",
                  value: r.stress.sx,
                },
                {
                  id: "yy",
                  symbol: <Sym base="σ" sub="y" />,
                  meaning: "along y (90° from x)",
                  value: r.stress.sy,
                },
                {
                  id: "xy",
                  symbol: <Sym base="τ" sub="xy" />,
                  meaning: "in-plane shear",
                  value: r.stress.txy,
                },
                {
                  id: "s1",
                  symbol: <Sym base="σ" sub="1" />,
                  meaning: `principal, at ${fixed(r.stress.thetaP, 2)}° from x`,
                  value: r.stress.s1,
                },
                {
                  id: "s2",
                  symbol: <Sym base="σ" sub="2" />,
                  meaning: "principal, at 90° from σ₁",
                  value: r.stress.s2,
                },
              ]}
            />
            <p className="text-[13px] text-graphite-soft">
              Shear modulus G = <Quantity value={sheetValue(r.stress.G)} unit={unit} />.
            </p>
          </>
        )
      }
      actions={
        r && (
          <>
            <SendToBench tensor={r.stress.tensor} units={units} />
            <AddToLoadCase
              record={calculatorRecordOf("rosette", values)}
              tensor={r.stress.tensor}
              unit={unit}
            />
          </>
        )
      }
      formula={
        <Formula
          lines={[
            ...(c.gf === "corrected" ? ["ε = ε_read · GF_instrument / GF_gauge  (each reading)"] : []),
            ...FORMULAS[c.layout],
            "ε₁,₂ = (εx + εy)/2 ± √(((εx − εy)/2)² + (γxy/2)²),  tan 2θ = γxy/(εx − εy)",
            "σx = E(εx + νεy)/(1 − ν²),  σy = E(εy + νεx)/(1 − ν²),  τxy = G·γxy,  G = E/(2(1 + ν))",
          ]}
          source="strain transformation and Hooke's law for plane stress, as in any strength-of-materials text; the gauge-factor correction from the definition GF = (ΔR/R)/ε (recalled from memory)."
        />
      }
      validity={
        <Validity
          items={[
            "Linear elastic, isotropic material; the gauges sit at one point of a free surface (plane stress, σz = 0).",
            "Readings within the gauges' linear range; γxy is the engineering shear strain.",
            "The three gauge directions must differ modulo 180°.",
            "The gauge-factor correction assumes the instrument turned ΔR/R into strain with the factor it was set to; transverse sensitivity is not corrected: enter readings corrected for it.",
          ]}
        />
      }
    />
  );
}
