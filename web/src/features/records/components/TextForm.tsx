import { useId, useState, type FormEvent } from "react";
import { fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import type { ReadText } from "../model/forms";

/**
 * A labelled text box with its own check (the model's reader, whose error names the field) and
 * the server's answer beside it. Used for the reason of a submission, comments, answers and
 * decisions. `onSend` returns the mutation's promise; the box empties when it succeeds.
 */
export function TextForm({
  label,
  hint,
  submitLabel,
  read,
  onSend,
  onCancel,
  pending,
  error,
  rows = 3,
  field,
}: {
  label: string;
  hint?: string;
  submitLabel: string;
  read: (text: string) => ReadText;
  onSend: (value: string) => Promise<unknown>;
  onCancel?: () => void;
  pending: boolean;
  error: unknown;
  rows?: number;
  /** The body field the server names in a 400 (text, reason, comment). */
  field: string;
}) {
  const id = useId();
  const [text, setText] = useState("");
  const [localError, setLocalError] = useState<string | null>(null);
  const serverField = fieldErrorsOf(error)[field];
  const shownError = localError ?? (serverField ? `${label}: ${serverField}` : null);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const answer = read(text);
    if (!answer.ok) {
      setLocalError(answer.error);
      return;
    }
    setLocalError(null);
    onSend(answer.value).then(
      () => setText(""),
      () => undefined,
    );
  };
  return (
    <form onSubmit={submit} noValidate className="space-y-1.5">
      <label htmlFor={id} className="block text-sm font-semibold text-graphite">
        {label}
      </label>
      {hint && (
        <p id={`${id}-hint`} className="text-[13px] text-graphite-soft">
          {hint}
        </p>
      )}
      <textarea
        id={id}
        rows={rows}
        value={text}
        onChange={(e) => setText(e.target.value)}
        aria-invalid={shownError ? true : undefined}
        aria-describedby={
          [hint ? `${id}-hint` : null, shownError ? `${id}-error` : null].filter(Boolean).join(" ") ||
          undefined
        }
        className={`w-full rounded border bg-panel px-3 py-2 text-[15px] ${shownError ? "border-fail" : "border-rule-strong"}`}
      />
      {shownError && (
        <p id={`${id}-error`} className="text-sm text-fail">
          <span aria-hidden="true">✗ </span>
          {shownError}
        </p>
      )}
      {!shownError && !serverField && <FormMessage error={error} />}
      <div className="flex flex-wrap gap-2">
        <button type="submit" className={primaryButton} disabled={pending}>
          {submitLabel}
        </button>
        {onCancel && (
          <button type="button" className={quietButton} onClick={onCancel}>
            Cancel
          </button>
        )}
      </div>
    </form>
  );
}
