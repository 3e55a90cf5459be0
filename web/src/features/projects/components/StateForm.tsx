import { useState, type FormEvent } from "react";
import { STATE_SOURCES, type StateSource, type StressState } from "../../../../../core/contract/load-cases";
import { STRESS_UNIT_NAMES, type StressUnitName } from "../../../../../core/contract/materials";
import { fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import type { StressBody } from "../api/load-cases";

const KEYS = ["xx", "yy", "zz", "xy", "yz", "zx"] as const;
const LABEL: Record<(typeof KEYS)[number], string> = {
  xx: "σxx",
  yy: "σyy",
  zz: "σzz",
  xy: "τxy",
  yz: "τyz",
  zx: "τzx",
};

/**
 * Six components in a unit, with the source of the numbers: how an editor types a state at
 * one location. Server errors appear beside the component they name.
 */
export function StateForm({
  initial,
  defaultUnit,
  idPrefix,
  onSave,
  onCancel,
  pending,
  error,
}: {
  initial?: StressState;
  defaultUnit: StressUnitName;
  idPrefix: string;
  onSave: (stress: StressBody, source: StateSource) => void;
  onCancel: () => void;
  pending: boolean;
  error: unknown;
}) {
  const [unit, setUnit] = useState<StressUnitName>(initial?.unit ?? defaultUnit);
  const [values, setValues] = useState<Record<string, string>>(() =>
    Object.fromEntries(
      KEYS.map((k) => [k, initial ? String(Number(initial.components[k].toPrecision(10))) : "0"]),
    ),
  );
  const [source, setSource] = useState<StateSource>(initial?.source === "measured" ? "measured" : "typed");
  const [localError, setLocalError] = useState<string | null>(null);
  const serverErrors = fieldErrorsOf(error);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const parsed = Object.fromEntries(KEYS.map((k) => [k, Number(values[k].replace(",", "."))]));
    const bad = KEYS.find((k) => values[k].trim() === "" || !Number.isFinite(parsed[k]));
    if (bad) {
      setLocalError(`${LABEL[bad]} must be a number.`);
      return;
    }
    setLocalError(null);
    onSave({ unit, components: parsed as StressBody["components"] }, source);
  };

  return (
    <form onSubmit={submit} noValidate className="space-y-2 rounded-sm border border-rule bg-paper p-3">
      <div className="grid grid-cols-3 gap-2 sm:grid-cols-6">
        {KEYS.map((k) => {
          const message = serverErrors[`stress.components.${k}`];
          return (
            <label key={k} className="text-[13px] text-graphite-soft">
              {LABEL[k]}
              <input
                id={`${idPrefix}-${k}`}
                aria-label={`${LABEL[k]} (${unit})`}
                inputMode="decimal"
                value={values[k]}
                onChange={(e) => setValues({ ...values, [k]: e.target.value })}
                className={`num mt-0.5 w-full rounded-sm border bg-panel px-2 py-1 text-right text-[14px] text-graphite ${message ? "border-fail" : "border-rule-strong"}`}
              />
              {message && <span className="text-fail">✗ {message}</span>}
            </label>
          );
        })}
      </div>
      <div className="flex flex-wrap items-center gap-3 text-[13px]">
        <label>
          Unit{" "}
          <select
            aria-label="Unit"
            value={unit}
            onChange={(e) => setUnit(e.target.value as StressUnitName)}
            className="rounded-sm border border-rule-strong bg-panel px-1 py-0.5"
          >
            {STRESS_UNIT_NAMES.map((u) => (
              <option key={u}>{u}</option>
            ))}
          </select>
        </label>
        <label>
          Source{" "}
          <select
            aria-label="Source"
            value={source}
            onChange={(e) => setSource(e.target.value as StateSource)}
            className="rounded-sm border border-rule-strong bg-panel px-1 py-0.5"
          >
            {STATE_SOURCES.map((s) => (
              <option key={s}>{s}</option>
            ))}
          </select>
        </label>
        <button type="submit" className={primaryButton} disabled={pending}>
          Save state
        </button>
        <button type="button" className={quietButton} onClick={onCancel}>
          Cancel
        </button>
      </div>
      <FormMessage>{localError}</FormMessage>
      {error && Object.keys(serverErrors).length === 0 ? <FormMessage error={error} /> : null}
    </form>
  );
}
