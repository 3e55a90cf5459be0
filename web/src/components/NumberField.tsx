import { readNumberText } from "../lib/number-text";
import { useEffect, useId, useRef, useState, type KeyboardEvent, type ReactNode } from "react";

/**
 * A number input for the sheet. While typing, the draft is the user's own text; on Enter or leaving
 * the field it is read, and a bad entry stays visible with a message that names the field, while
 * the stored value is left as it was.
 */
export function NumberField({
  label,
  value,
  onCommit,
  format,
  unit,
  hideLabel = false,
  className = "",
  inputClassName = "",
  min,
  check,
  onValidityChange,
  describedBy,
}: {
  /** accessible name, also used in error messages ("σxy is not a number") */
  label: string;
  value: number | null;
  onCommit: (value: number | null) => void;
  format: (value: number) => string;
  unit?: ReactNode;
  hideLabel?: boolean;
  className?: string;
  inputClassName?: string;
  /** smallest accepted value (inclusive) */
  min?: number;
  /** a further rule: returns why a number is refused ("is larger than 1e12 …"), after the label */
  check?: (value: number) => string | undefined;
  /**
   * Told whenever the field starts or stops holding a refused entry (and valid on unmount), so
   * whatever shows results from the stored value can say they are out of date meanwhile.
   */
  onValidityChange?: (valid: boolean) => void;
  describedBy?: string;
}) {
  const id = useId();
  const [draft, setDraft] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [focusText, setFocusText] = useState<string | null>(null);
  const report = useRef(onValidityChange);
  useEffect(() => {
    report.current = onValidityChange;
  });
  const invalid = error !== null;
  useEffect(() => {
    report.current?.(!invalid);
  }, [invalid]);
  useEffect(() => () => report.current?.(true), []);

  function commit() {
    if (draft === null) return;
    if (draft === focusText) {
      // Unchanged: keep the stored value exactly (the text may be rounded).
      setDraft(null);
      setError(null);
      return;
    }
    const text = draft.trim();
    if (text === "") {
      if (value === null) {
        setDraft(null);
        setError(null);
        return;
      }
      onCommit(null);
      setDraft(null);
      setError(null);
      return;
    }
    const read = readNumberText(text);
    if ("refused" in read) {
      setError(`${label}: ${read.refused}`);
      return;
    }
    const n = read.value;
    if (!Number.isFinite(n)) {
      setError(`${label}: “${draft}” is not a number`);
      return;
    }
    if (min !== undefined && n < min) {
      setError(`${label}: must be at least ${min}`);
      return;
    }
    const problem = check?.(n);
    if (problem !== undefined) {
      setError(`${label}: ${problem}`);
      return;
    }
    setError(null);
    setDraft(null);
    onCommit(n);
  }

  function onKeyDown(event: KeyboardEvent<HTMLInputElement>) {
    if (event.key === "Enter") commit();
    if (event.key === "Escape") {
      setDraft(null);
      setError(null);
    }
  }

  const shown = draft ?? (value === null ? "" : format(value));
  return (
    <div className={`relative ${className}`}>
      <label htmlFor={id} className={hideLabel ? "sr-only" : "mb-0.5 block text-[12px] text-graphite-soft"}>
        {label}
      </label>
      <div className="flex items-baseline gap-1">
        <input
          id={id}
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          value={shown}
          aria-invalid={error !== null}
          aria-describedby={[error ? `${id}-error` : "", describedBy ?? ""].join(" ").trim() || undefined}
          onFocus={() => {
            const text = value === null ? "" : Number(value.toPrecision(10)).toString();
            setFocusText(text);
            if (draft === null) setDraft(text);
          }}
          onChange={(e) => setDraft(e.target.value)}
          onBlur={commit}
          onKeyDown={onKeyDown}
          className={`num w-full min-w-0 rounded-sm border bg-white px-1.5 py-0.5 text-right text-[13px] ${
            error ? "border-fail" : "border-rule focus:border-ink"
          } ${inputClassName}`}
        />
        {unit !== undefined && <span className="unit text-[12px]">{unit}</span>}
      </div>
      {error && (
        <p
          id={`${id}-error`}
          role="alert"
          className="absolute z-10 mt-0.5 rounded-sm bg-fail-wash px-1 text-[12px] text-fail"
        >
          {error}
        </p>
      )}
    </div>
  );
}
