import { useId } from "react";

/** A choice among a few named options, as radio buttons (every option visible at once). */
export function ChoiceField({
  legend,
  value,
  options,
  onChange,
}: {
  legend: string;
  value: string;
  options: readonly { value: string; label: string }[];
  onChange: (value: string) => void;
}) {
  const name = useId();
  return (
    <fieldset className="text-[13px]">
      <legend className="mb-0.5 text-[12px] text-graphite-soft">{legend}</legend>
      <div className="flex flex-wrap gap-x-3 gap-y-1">
        {options.map((o) => (
          <label key={o.value} className="flex items-center gap-1">
            <input type="radio" name={name} checked={value === o.value} onChange={() => onChange(o.value)} />
            {o.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
