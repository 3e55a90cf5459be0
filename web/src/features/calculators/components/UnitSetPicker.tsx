import { useId } from "react";
import { UNIT_SETS, UNIT_SET_LABEL, type UnitSet } from "../model/units";

/** The unit set of the inputs and results; a change converts the entered values (same quantities). */
export function UnitSetPicker({ value, onChange }: { value: UnitSet; onChange: (units: UnitSet) => void }) {
  const id = useId();
  return (
    <div className="text-[13px]">
      <label htmlFor={id} className="mb-0.5 block text-[12px] text-graphite-soft">
        Units (a change converts the entered values)
      </label>
      <select
        id={id}
        value={value}
        onChange={(e) => onChange(e.target.value as UnitSet)}
        className="rounded-sm border border-rule bg-white px-1 py-0.5"
      >
        {UNIT_SETS.map((u) => (
          <option key={u} value={u}>
            {UNIT_SET_LABEL[u]}
          </option>
        ))}
      </select>
    </div>
  );
}
