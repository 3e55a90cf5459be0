import { useState, type FormEvent } from "react";
import { fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import { isVersionConflict } from "../model/errors";

/**
 * Inline edit of a record's text fields, sent with the version it started from; a 409 says
 * someone else changed it (the list shows their values after the refresh).
 */
export function RenameForm({
  label,
  fields,
  onSave,
  onCancel,
  pending,
  error,
}: {
  label: string;
  fields: { key: string; label: string; value: string; list?: string }[];
  onSave: (values: Record<string, string>) => void;
  onCancel: () => void;
  pending: boolean;
  error: unknown;
}) {
  const [values, setValues] = useState(() => Object.fromEntries(fields.map((f) => [f.key, f.value])));
  const submit = (e: FormEvent) => {
    e.preventDefault();
    onSave(values);
  };
  const errors = fieldErrorsOf(error);
  const conflict = isVersionConflict(error);
  return (
    <form onSubmit={submit} noValidate aria-label={label} className="flex flex-wrap items-start gap-2 py-1">
      {fields.map((f) => (
        <label key={f.key} className="text-[13px] text-graphite-soft">
          {f.label}
          <input
            list={f.list}
            value={values[f.key]}
            onChange={(e) => setValues({ ...values, [f.key]: e.target.value })}
            className={`ml-1 rounded-sm border bg-panel px-2 py-0.5 text-[14px] text-graphite ${errors[f.key] ? "border-fail" : "border-rule-strong"}`}
          />
        </label>
      ))}
      <button type="submit" className={primaryButton} disabled={pending}>
        Save
      </button>
      <button type="button" className={quietButton} onClick={onCancel}>
        Cancel
      </button>
      <div className="basis-full">
        {conflict ? (
          <FormMessage>
            Someone else changed this meanwhile; their version is shown now. Edit again to change it.
          </FormMessage>
        ) : (
          <FormMessage>
            {Object.values(errors).join(" ") || (error instanceof Error ? error.message : null)}
          </FormMessage>
        )}
      </div>
    </form>
  );
}
