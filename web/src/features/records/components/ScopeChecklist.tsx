import { useId } from "react";
import type { ScopeOption } from "../model/scope";

/**
 * One list of the submit form's scope (load cases or locations): a fieldset of checkboxes under
 * its legend, "Select all" and "Select none", and the error that names the list beside it.
 */
export function ScopeChecklist({
  legend,
  noun,
  options,
  chosen,
  error,
  onTick,
  onSetAll,
  testId,
}: {
  legend: string;
  /** "load cases": completes the buttons' accessible names ("Select all load cases"). */
  noun: string;
  options: readonly ScopeOption[];
  chosen: readonly string[];
  error: string | undefined;
  onTick: (id: string, on: boolean) => void;
  onSetAll: (ids: readonly string[]) => void;
  testId: string;
}) {
  const id = useId();
  const errorId = `${id}-error`;
  return (
    <fieldset
      className={`min-w-0 space-y-1.5 rounded-sm border px-3 py-2 ${error ? "border-fail" : "border-rule"}`}
      aria-describedby={error ? errorId : undefined}
      data-testid={testId}
    >
      <legend className="px-1 text-sm font-semibold text-graphite">{legend}</legend>
      <div className="flex flex-wrap gap-2">
        <button
          type="button"
          className="text-[13px] text-ink underline underline-offset-2"
          aria-label={`Select all ${noun}`}
          onClick={() => onSetAll(options.map((o) => o.id))}
        >
          Select all
        </button>
        <button
          type="button"
          className="text-[13px] text-ink underline underline-offset-2"
          aria-label={`Select none of the ${noun}`}
          onClick={() => onSetAll([])}
        >
          Select none
        </button>
      </div>
      {options.length === 0 ? (
        <p className="text-[13px] text-graphite-soft">The project has none yet.</p>
      ) : (
        // Long lists scroll inside the box so the reason and the buttons stay in reach.
        <ul className="max-h-60 space-y-0.5 overflow-y-auto text-[14px]">
          {options.map((o) => (
            <li key={o.id}>
              <label className="flex items-start gap-2 break-words py-0.5">
                <input
                  type="checkbox"
                  className="mt-1 accent-ink"
                  checked={chosen.includes(o.id)}
                  onChange={(e) => onTick(o.id, e.target.checked)}
                />
                <span className="min-w-0">{o.label}</span>
              </label>
            </li>
          ))}
        </ul>
      )}
      {error && (
        <p id={errorId} className="text-sm text-fail">
          <span aria-hidden="true">✗ </span>
          {error}
        </p>
      )}
    </fieldset>
  );
}
