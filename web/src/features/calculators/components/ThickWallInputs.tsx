import type { UnitSet } from "../model/units";
import { InputField } from "./InputField";

/** The wall, the pressures and the radius to report, shared by both thick-walled calculators. */
export function ThickWallInputs({
  units,
  numbers,
  setNumber,
}: {
  units: UnitSet;
  numbers: { ri: number; ro: number; pi: number; po: number; r: number };
  setNumber: (key: "ri" | "ro" | "pi" | "po" | "r", value: number) => void;
}) {
  return (
    <>
      <InputField
        label="Inner radius rᵢ"
        dimension="length"
        units={units}
        value={numbers.ri}
        onCommit={(v) => setNumber("ri", v)}
      />
      <InputField
        label="Outer radius rₒ"
        dimension="length"
        units={units}
        value={numbers.ro}
        onCommit={(v) => setNumber("ro", v)}
      />
      <InputField
        label="Internal pressure pᵢ"
        dimension="stress"
        units={units}
        value={numbers.pi}
        onCommit={(v) => setNumber("pi", v)}
      />
      <InputField
        label="External pressure pₒ"
        dimension="stress"
        units={units}
        value={numbers.po}
        onCommit={(v) => setNumber("po", v)}
      />
      <InputField
        label="Radius r of the point"
        dimension="length"
        units={units}
        value={numbers.r}
        onCommit={(v) => setNumber("r", v)}
      />
    </>
  );
}
