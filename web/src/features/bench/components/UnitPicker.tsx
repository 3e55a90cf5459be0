import { useId, useState } from "react";
import { STRESS_UNITS, type StressUnit } from "../../../../../core";
import { useBenchStore } from "../model/store";

/**
 * The stress unit, with the user's choice of what a change means made explicit: convert the
 * entered values (same stress, new numbers) or reinterpret them (same numbers, new unit).
 */
export function UnitPicker() {
  const unit = useBenchStore((s) => s.unit);
  const act = useBenchStore((s) => s.act);
  const [mode, setMode] = useState<"convert" | "reinterpret">("convert");
  const id = useId();
  return (
    <div className="flex flex-wrap items-center gap-x-3 gap-y-1 text-[13px]">
      <label htmlFor={id} className="text-graphite-soft">
        Unit
      </label>
      <select
        id={id}
        value={unit}
        onChange={(e) => act.changeUnit(e.target.value as StressUnit, mode)}
        className="num rounded-sm border border-rule bg-white px-1 py-0.5"
      >
        {STRESS_UNITS.map((u) => (
          <option key={u} value={u}>
            {u}
          </option>
        ))}
      </select>
      <fieldset className="flex items-center gap-2">
        <legend className="sr-only">When the unit changes</legend>
        <label className="flex items-center gap-1">
          <input
            type="radio"
            name={`${id}-mode`}
            checked={mode === "convert"}
            onChange={() => setMode("convert")}
          />
          convert values
        </label>
        <label className="flex items-center gap-1">
          <input
            type="radio"
            name={`${id}-mode`}
            checked={mode === "reinterpret"}
            onChange={() => setMode("reinterpret")}
          />
          reinterpret
        </label>
      </fieldset>
    </div>
  );
}
