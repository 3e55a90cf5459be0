import type { MaterialList, MaterialRef } from "../../../../../core/contract/materials";
import { refFromValue, refValue } from "../model/material-refs";

/** Chooses a library material or a built-in published grade. */
export function MaterialPicker({
  id,
  label,
  value,
  list,
  noneLabel,
  onChange,
  disabled,
}: {
  id: string;
  label: string;
  value: MaterialRef | null;
  list: MaterialList | undefined;
  noneLabel: string;
  onChange: (ref: MaterialRef | null) => void;
  disabled?: boolean;
}) {
  return (
    <label htmlFor={id} className="text-[13px] text-graphite-soft">
      {label}{" "}
      <select
        id={id}
        value={refValue(value)}
        disabled={disabled}
        onChange={(e) => onChange(refFromValue(e.target.value))}
        className="rounded-sm border border-rule-strong bg-panel px-1 py-0.5 text-graphite"
      >
        <option value="">{noneLabel}</option>
        {list && list.materials.length > 0 && (
          <optgroup label="Workspace library">
            {list.materials.map((m) => (
              <option key={m.id} value={`workspace:${m.id}`}>
                {m.name}
              </option>
            ))}
          </optgroup>
        )}
        {list && (
          <optgroup label="Published minimum values (verify against your certificate)">
            {list.published.map((m) => (
              <option key={m.id} value={`published:${m.id}`}>
                {m.name} ({m.standard})
              </option>
            ))}
          </optgroup>
        )}
      </select>
    </label>
  );
}
