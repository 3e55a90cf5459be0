import { useId, useState, type ClipboardEvent, type FormEvent } from "react";
import { parseTensor, stressInputProblem, type Component, type ParseProblem } from "../../../../../core";
import { STATE_SOURCES, type StateSource, type StressState } from "../../../../../core/contract/load-cases";
import { STRESS_UNIT_NAMES, type StressUnitName } from "../../../../../core/contract/materials";
import { DecimalMarkSelect, PasteProblemChoices } from "../../../components/PasteChoices";
import { fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import { looksLikeSeveralNumbers, readNumberText } from "../../../lib/number-text";
import { useDecimalPreference } from "../../../lib/paste-preferences";
import { COMPONENT_SYMBOLS, STRESS_COMPONENTS } from "../../../lib/stress";
import type { StressBody } from "../../../entities/load-case/mutations";

const KEYS = STRESS_COMPONENTS;
const LABEL = (k: Component) => COMPONENT_SYMBOLS[k].tensor;

/**
 * Six components in a unit, with the source of the numbers: how an editor types a state at
 * one location. A matrix or a row pasted into any component (or into the paste box) is read the
 * way the bench reads it (core's parseTensor, the user's decimal mark, the order asked for six
 * bare values) and fills all six. Server errors appear beside the component they name.
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
  const [decimal, setDecimal] = useDecimalPreference();
  const [pasteText, setPasteText] = useState("");
  const [paste, setPaste] = useState<{ error: string; problem?: ParseProblem; text: string } | null>(null);
  const [pasteNote, setPasteNote] = useState<string | null>(null);
  const pasteId = useId();
  const serverErrors = fieldErrorsOf(error);

  /** Reads a pasted matrix or row into all six fields (and its unit, if written). */
  const readPaste = (text: string, choice: { decimal?: "." | ","; order?: readonly Component[] } = {}) => {
    const mark = choice.decimal ?? (decimal === "ask" ? undefined : decimal);
    const result = parseTensor(text, { decimal: mark, order: choice.order });
    if (!result.ok) {
      setPaste({ error: result.error.message, problem: result.error.problem, text });
      setPasteNote(null);
      return;
    }
    setPaste(null);
    setValues(Object.fromEntries(KEYS.map((k) => [k, String(result.tensor[k])])));
    if (result.unit) setUnit(result.unit);
    setSource(result.point ? "finite-element point" : "pasted");
    setPasteNote(
      `Read ${result.form === "matrix" ? "a 3×3 matrix" : result.form === "plane" ? "plane stress σx σy τxy" : "six components"}` +
        `${result.point ? ` of ${result.point.kind} ${result.point.number}` : ""}` +
        `${result.unit ? `, in ${result.unit}` : ` (no unit written: ${unit})`}.`,
    );
  };

  const onFieldPaste = (event: ClipboardEvent<HTMLInputElement>) => {
    const text = event.clipboardData.getData("text/plain");
    if (!looksLikeSeveralNumbers(text)) return;
    event.preventDefault();
    setPasteText(text);
    readPaste(text);
  };

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const parsed: Record<string, number> = {};
    for (const k of KEYS) {
      const read = readNumberText(values[k]);
      if ("refused" in read) {
        setLocalError(`${LABEL(k)}: ${read.refused}.`);
        return;
      }
      if (values[k].trim() === "" || !Number.isFinite(read.value)) {
        setLocalError(`${LABEL(k)} must be a number.`);
        return;
      }
      const problem = stressInputProblem(read.value);
      if (problem !== undefined) {
        setLocalError(`${LABEL(k)} ${problem}.`);
        return;
      }
      parsed[k] = read.value;
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
              {LABEL(k)}
              <input
                id={`${idPrefix}-${k}`}
                aria-label={`${LABEL(k)} (${unit})`}
                inputMode="decimal"
                value={values[k]}
                onChange={(e) => setValues({ ...values, [k]: e.target.value })}
                onPaste={onFieldPaste}
                className={`num mt-0.5 w-full rounded-sm border bg-panel px-2 py-1 text-right text-[14px] text-graphite ${message ? "border-fail" : "border-rule-strong"}`}
              />
              {message && <span className="text-fail">✗ {message}</span>}
            </label>
          );
        })}
      </div>
      <div className="text-[13px]">
        <label htmlFor={pasteId} className="text-graphite-soft">
          Or paste a matrix or a row (3×3, six components with a header, a listing row headed Node or Elem, or
          σx σy τxy)
        </label>
        <div className="mt-0.5 flex gap-2">
          <textarea
            id={pasteId}
            rows={2}
            value={pasteText}
            spellCheck={false}
            aria-invalid={paste !== null}
            onChange={(e) => setPasteText(e.target.value)}
            className={`num min-w-0 flex-1 resize-none rounded-sm border bg-panel px-2 py-1 text-[12px] leading-4 ${paste ? "border-fail" : "border-rule-strong"}`}
          />
          <button type="button" className={quietButton} onClick={() => readPaste(pasteText)}>
            Read
          </button>
        </div>
        <div className="mt-1 max-w-md">
          <DecimalMarkSelect value={decimal} onChange={setDecimal} />
        </div>
        {paste && (
          <div role="alert" className="mt-1 text-[12px] text-fail">
            <p>✗ Not read — {paste.error}. The fields are unchanged.</p>
            {paste.problem && (
              <PasteProblemChoices
                problem={paste.problem}
                onDecimal={(mark) => {
                  setDecimal(mark);
                  readPaste(paste.text, { decimal: mark });
                }}
                onOrder={(order) => readPaste(paste.text, { order })}
              />
            )}
          </div>
        )}
        {!paste && pasteNote && (
          <p role="status" className="mt-1 text-[12px] text-graphite-soft">
            {pasteNote}
          </p>
        )}
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
