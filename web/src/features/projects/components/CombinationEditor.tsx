import { useState, type FormEvent } from "react";
import {
  combinationSchema,
  SUPERPOSITION_CAUTION,
  type Combination,
} from "../../../../../core/contract/combinations";
import type { LoadCase } from "../../../../../core/contract/load-cases";
import { ApiError, fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import { useCombinationMutations } from "../../../entities/combination/mutations";

type DraftTerm = { loadCaseId: string; factor: string };
type Draft = { name: string; description: string; terms: DraftTerm[] };

const draftOf = (c: Combination): Draft => ({
  name: c.name,
  description: c.description,
  terms: c.terms.map((t) => ({ loadCaseId: t.loadCaseId, factor: String(t.factor) })),
});

/** What a stale save was refused with: the version now stored and that record. */
type Conflict = { currentVersion: number; current: Combination };

function conflictOf(error: unknown): Conflict | null {
  if (!(error instanceof ApiError) || error.status !== 409) return null;
  const details = error.details as { currentVersion?: unknown; current?: unknown } | undefined;
  const current = combinationSchema.safeParse(details?.current);
  return typeof details?.currentVersion === "number" && current.success
    ? { currentVersion: details.currentVersion, current: current.data }
    : null;
}

/**
 * Edits one combination's name, description and terms over the version it was opened at. A
 * stale save is refused by the API (409, nothing written); the form then says so and offers to
 * reload the stored combination or to save this copy over the newer version.
 */
export function CombinationEditor({
  workspaceId,
  projectId,
  combination,
  cases,
  onDone,
}: {
  workspaceId: string;
  projectId: string;
  combination: Combination;
  cases: LoadCase[];
  onDone: () => void;
}) {
  const { update } = useCombinationMutations(workspaceId, projectId);
  const [draft, setDraft] = useState<Draft>(() => draftOf(combination));
  const [version, setVersion] = useState(combination.version);
  const errors = fieldErrorsOf(update.error);
  const conflict = conflictOf(update.error);
  const setTerm = (i: number, patch: Partial<DraftTerm>) =>
    setDraft({ ...draft, terms: draft.terms.map((t, j) => (j === i ? { ...t, ...patch } : t)) });

  const save = (basedOn: number) =>
    update.mutate(
      {
        id: combination.id,
        version: basedOn,
        name: draft.name,
        description: draft.description,
        terms: draft.terms
          .filter((t) => t.loadCaseId)
          .map((t) => ({
            loadCaseId: t.loadCaseId,
            factor: t.factor.trim() === "" ? NaN : Number(t.factor),
          })),
      },
      { onSuccess: onDone },
    );
  const submit = (e: FormEvent) => {
    e.preventDefault();
    save(version);
  };

  // Named as it was when opened, so the form keeps its name while a newer version comes and goes.
  const [label] = useState(`Edit combination ${combination.name}`);
  return (
    <form aria-label={label} onSubmit={submit} noValidate className="basis-full space-y-2 text-[14px]">
      <p className="text-[13px] text-graphite-soft">
        <span aria-hidden="true">⚠ </span>
        {SUPERPOSITION_CAUTION}
      </p>
      <label className="block">
        <span className="text-[13px] text-graphite-soft">Combination name</span>
        <input
          value={draft.name}
          onChange={(e) => setDraft({ ...draft, name: e.target.value })}
          aria-invalid={errors.name ? true : undefined}
          className="w-full rounded-sm border border-rule-strong bg-panel px-2 py-1"
        />
      </label>
      {errors.name && <p className="text-[13px] text-fail">✗ {errors.name}</p>}
      <label className="block">
        <span className="text-[13px] text-graphite-soft">Description</span>
        <textarea
          value={draft.description}
          onChange={(e) => setDraft({ ...draft, description: e.target.value })}
          rows={2}
          className="w-full rounded-sm border border-rule-strong bg-panel px-2 py-1"
        />
      </label>
      {errors.description && <p className="text-[13px] text-fail">✗ {errors.description}</p>}
      {draft.terms.map((t, i) => (
        <div key={i} className="flex flex-wrap items-center gap-2">
          <input
            aria-label={`Edited factor ${i + 1}`}
            inputMode="decimal"
            value={t.factor}
            onChange={(e) => setTerm(i, { factor: e.target.value })}
            className="num w-20 rounded-sm border border-rule-strong bg-panel px-2 py-1 text-right"
          />
          ×
          <select
            aria-label={`Edited load case ${i + 1}`}
            value={t.loadCaseId}
            onChange={(e) => setTerm(i, { loadCaseId: e.target.value })}
            className="rounded-sm border border-rule-strong bg-panel px-1 py-1"
          >
            <option value="">choose a load case</option>
            {cases.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
              </option>
            ))}
          </select>
          <button
            type="button"
            className={quietButton}
            aria-label={`Remove term ${i + 1}`}
            onClick={() => setDraft({ ...draft, terms: draft.terms.filter((_, j) => j !== i) })}
          >
            Remove
          </button>
          {(errors[`terms.${i}.factor`] || errors[`terms.${i}.loadCaseId`]) && (
            <span className="text-[13px] text-fail">
              ✗ {errors[`terms.${i}.factor`] ?? errors[`terms.${i}.loadCaseId`]}
            </span>
          )}
        </div>
      ))}
      <div className="flex flex-wrap items-center gap-2">
        <button
          type="button"
          className={quietButton}
          onClick={() => setDraft({ ...draft, terms: [...draft.terms, { loadCaseId: "", factor: "1.0" }] })}
        >
          Add a term
        </button>
        <button type="submit" className={primaryButton} disabled={update.isPending || !!conflict}>
          Save combination
        </button>
        <button type="button" className={quietButton} onClick={onDone}>
          Cancel
        </button>
        <span className="text-[12px] text-graphite-faint">
          editing version <span className="num">{version}</span>
        </span>
      </div>
      <FormMessage>{errors.terms}</FormMessage>
      {conflict && (
        <div
          role="alert"
          className="space-y-1 rounded-sm border border-fail bg-fail-wash px-2 py-1.5 text-fail"
        >
          <p>
            ✗ Someone changed this combination while you were editing (it is now version{" "}
            {conflict.currentVersion}). Nothing was overwritten.
          </p>
          <div className="flex gap-2">
            <button
              type="button"
              className={quietButton}
              onClick={() => {
                setDraft(draftOf(conflict.current));
                setVersion(conflict.currentVersion);
                update.reset();
              }}
            >
              Reload their version
            </button>
            <button
              type="button"
              className={quietButton}
              onClick={() => {
                setVersion(conflict.currentVersion);
                save(conflict.currentVersion);
              }}
            >
              Keep my edits and save over version {conflict.currentVersion}
            </button>
          </div>
        </div>
      )}
      {update.error && !conflict && Object.keys(errors).length === 0 && <FormMessage error={update.error} />}
    </form>
  );
}
