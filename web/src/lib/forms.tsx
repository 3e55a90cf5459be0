import type { InputHTMLAttributes, ReactNode } from "react";
import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import { fieldErrorsOf } from "./api-client";

/** A labelled input with its error right beside it (below, tied by aria-describedby). */
export function Field({
  label,
  error,
  hint,
  id,
  ...input
}: { label: string; error?: string; hint?: ReactNode; id: string } & InputHTMLAttributes<HTMLInputElement>) {
  const describedBy = [error ? `${id}-error` : null, hint ? `${id}-hint` : null].filter(Boolean).join(" ");
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-graphite">
        {label}
      </label>
      <input
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy || undefined}
        className={`w-full rounded border bg-panel px-3 py-2 text-[15px] ${error ? "border-fail" : "border-rule-strong"}`}
        {...input}
      />
      {hint && (
        <p id={`${id}-hint`} className="text-sm text-graphite-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="text-sm text-fail">
          <span aria-hidden="true">✗ </span>
          {error}
        </p>
      )}
    </div>
  );
}

/** A form-level message (what no single field explains). */
export function FormMessage({ error, children }: { error?: unknown; children?: ReactNode }) {
  const text = children ?? (error instanceof Error ? error.message : null);
  if (!text) return null;
  return (
    <p role="alert" className="rounded border border-fail bg-fail-wash px-3 py-2 text-sm text-fail">
      <span aria-hidden="true">✗ </span>
      {text}
    </p>
  );
}

/**
 * Puts a 400's field errors beside the fields they name; returns whether any matched, so the
 * form shows a general message only for errors no field explains.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: Path<T>[],
) {
  const byField = fieldErrorsOf(error);
  let matched = false;
  for (const field of fields) {
    if (byField[field]) {
      setError(field, { type: "server", message: byField[field] });
      matched = true;
    }
  }
  return matched;
}

export const primaryButton =
  "rounded bg-ink px-4 py-2 font-semibold text-panel hover:bg-ink-hover disabled:opacity-60 disabled:cursor-wait";
export const quietButton =
  "rounded border border-rule-strong bg-panel px-3 py-1.5 text-sm text-graphite hover:border-ink hover:text-ink";
