import { useId, useState, type FormEvent } from "react";
import { useLoadCases } from "../../../entities/load-case/queries";
import { useLocations } from "../../../entities/location/queries";
import { fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import { readReason } from "../model/forms";
import {
  loadCaseOptions,
  locationOptions,
  namesAFormField,
  readScope,
  scopeCountLine,
  scopeServerErrors,
  setScopeList,
  setScopeMode,
  tickScopeItem,
  WHOLE_PROJECT,
  type RecordScopeInput,
  type ScopeChoice,
  type ScopeErrors,
} from "../model/scope";
import { ScopeChecklist } from "./ScopeChecklist";

const REASON_LABEL = "What changed and why";

/**
 * "Submit for check": what changed and why, and what the record covers — the whole project
 * (the default) or chosen load cases and locations, at least one of each. Each error sits beside
 * the field or list it names, whether this form or the API found it.
 */
export function SubmitRecordForm({
  workspaceId,
  projectId,
  pending,
  error,
  onSend,
  onCancel,
}: {
  workspaceId: string;
  projectId: string;
  pending: boolean;
  error: unknown;
  onSend: (body: { reason: string; scope: RecordScopeInput | null }) => Promise<unknown>;
  onCancel: () => void;
}) {
  const id = useId();
  const loadCases = useLoadCases(workspaceId, projectId);
  const locations = useLocations(workspaceId, projectId);
  const [reason, setReason] = useState("");
  const [choice, setChoice] = useState<ScopeChoice>(WHOLE_PROJECT);
  const [reasonError, setReasonError] = useState<string | null>(null);
  const [scopeErrors, setScopeErrors] = useState<ScopeErrors>({});
  const [sent, setSent] = useState<RecordScopeInput | null>(null);
  // The API's scope errors speak of the lists as they were sent: once a box changes, they are old.
  const [scopeChangedSinceSend, setScopeChangedSinceSend] = useState(false);

  const options = {
    loadCases: loadCaseOptions(loadCases.data ?? []),
    locations: locationOptions(locations.data ?? []),
  };
  const serverFields = fieldErrorsOf(error);
  const serverScope = scopeChangedSinceSend ? {} : scopeServerErrors(serverFields, sent, options);
  const shownReason = reasonError ?? (serverFields.reason ? `${REASON_LABEL}: ${serverFields.reason}` : null);
  const shownScope: ScopeErrors = {
    loadCases: scopeErrors.loadCases ?? serverScope.loadCases,
    locations: scopeErrors.locations ?? serverScope.locations,
  };
  const anyFieldNamed = namesAFormField(serverFields);

  const change = (next: ScopeChoice) => {
    setChoice(next);
    setScopeErrors({});
    setScopeChangedSinceSend(true);
  };
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const readR = readReason(reason);
    const readS = readScope(choice, options);
    setReasonError(readR.ok ? null : readR.error);
    setScopeErrors(readS.ok ? {} : readS.errors);
    if (!readR.ok || !readS.ok) return;
    setSent(readS.value);
    setScopeChangedSinceSend(false);
    onSend({ reason: readR.value, scope: readS.value }).catch(() => undefined);
  };

  const listsPending = choice.mode === "chosen" && (loadCases.isPending || locations.isPending);
  const listsError = choice.mode === "chosen" ? (loadCases.error ?? locations.error) : null;
  const describedBy = [`${id}-hint`, shownReason ? `${id}-error` : null].filter(Boolean).join(" ");
  return (
    <form onSubmit={submit} noValidate className="space-y-3">
      <div className="space-y-1.5">
        <label htmlFor={id} className="block text-sm font-semibold text-graphite">
          {REASON_LABEL}
        </label>
        <p id={`${id}-hint`} className="text-[13px] text-graphite-soft">
          Shown in the revision table. The inputs and results are frozen as they are now; a checker reviews
          them.
        </p>
        <textarea
          id={id}
          rows={3}
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          aria-invalid={shownReason ? true : undefined}
          aria-describedby={describedBy}
          className={`w-full rounded border bg-panel px-3 py-2 text-[15px] ${shownReason ? "border-fail" : "border-rule-strong"}`}
        />
        {shownReason && (
          <p id={`${id}-error`} className="text-sm text-fail">
            <span aria-hidden="true">✗ </span>
            {shownReason}
          </p>
        )}
      </div>

      <fieldset className="min-w-0 space-y-1.5">
        <legend className="text-sm font-semibold text-graphite">What this record covers</legend>
        <label className="flex items-center gap-2 text-[14px]">
          <input
            type="radio"
            name={`${id}-scope`}
            className="accent-ink"
            checked={choice.mode === "whole"}
            onChange={() => change(setScopeMode(choice, "whole"))}
          />
          The whole project
        </label>
        <label className="flex items-center gap-2 text-[14px]">
          <input
            type="radio"
            name={`${id}-scope`}
            className="accent-ink"
            checked={choice.mode === "chosen"}
            onChange={() => change(setScopeMode(choice, "chosen"))}
          />
          Chosen load cases and locations
        </label>
        {choice.mode === "chosen" && (
          <div className="space-y-2 pt-1">
            <p className="text-[13px] text-graphite-soft">
              The record freezes only these load cases at these locations, the combinations made only of them
              and the governing case among them; results outside it are not part of the record.
            </p>
            {listsPending && (
              <p className="text-[13px] text-graphite-soft">Reading the project&apos;s lists…</p>
            )}
            {listsError && <FormMessage error={listsError} />}
            {!listsPending && !listsError && (
              <>
                <div className="grid gap-3 sm:grid-cols-2">
                  <ScopeChecklist
                    legend="Load cases"
                    noun="load cases"
                    testId="scope-load-cases"
                    options={options.loadCases}
                    chosen={choice.loadCaseIds}
                    error={shownScope.loadCases}
                    onTick={(item, on) => change(tickScopeItem(choice, "loadCases", item, on))}
                    onSetAll={(ids) => change(setScopeList(choice, "loadCases", ids))}
                  />
                  <ScopeChecklist
                    legend="Locations"
                    noun="locations"
                    testId="scope-locations"
                    options={options.locations}
                    chosen={choice.locationIds}
                    error={shownScope.locations}
                    onTick={(item, on) => change(tickScopeItem(choice, "locations", item, on))}
                    onSetAll={(ids) => change(setScopeList(choice, "locations", ids))}
                  />
                </div>
                <p className="text-[13px] text-graphite" aria-live="polite" data-testid="scope-count">
                  {scopeCountLine(choice, options)}
                </p>
              </>
            )}
          </div>
        )}
      </fieldset>

      {!anyFieldNamed && <FormMessage error={error} />}
      <div className="flex flex-wrap gap-2">
        <button type="submit" className={primaryButton} disabled={pending}>
          Submit for check
        </button>
        <button type="button" className={quietButton} onClick={onCancel}>
          Cancel
        </button>
      </div>
    </form>
  );
}
