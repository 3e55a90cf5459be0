import { NumberField } from "../../../components/NumberField";
import { unitFor, type Dimension, type UnitSet } from "../model/units";

/** Up to 10 significant figures, ASCII minus: what an input shows of its stored value. */
const inputText = (v: number) => Number(v.toPrecision(10)).toString();

/** A number input of a calculator, with the unit its dimension takes in the chosen set. */
export function InputField({
  label,
  value,
  dimension,
  units,
  onCommit,
  min,
}: {
  label: string;
  value: number;
  dimension: Dimension;
  units: UnitSet;
  onCommit: (value: number) => void;
  min?: number;
}) {
  const unit = unitFor(dimension, units);
  return (
    <NumberField
      label={label}
      value={value}
      format={inputText}
      unit={unit === "" ? undefined : unit}
      min={min}
      onCommit={(v) => {
        // An emptied field means zero for a load and is refused where zero cannot be (the calculator says so).
        onCommit(v ?? 0);
      }}
      inputClassName="max-w-[9rem]"
    />
  );
}
