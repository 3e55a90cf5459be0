import { useState, type FormEvent } from "react";
import { SUPERPOSITION_CAUTION, type Combination } from "../../../../../core/contract/combinations";
import type { LoadCase } from "../../../../../core/contract/load-cases";
import { fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import { Panel } from "../../../components/Panel";
import { ToolButton } from "../../../components/ToolButton";
import { useCombinationMutations } from "../../../entities/combination/mutations";
import { CombinationEditor } from "./CombinationEditor";

type DraftTerm = { loadCaseId: string; factor: string };

/** Named linear combinations of the load cases, with the superposition caution beside them. */
export function CombinationsPanel({
  workspaceId,
  projectId,
  combinations,
  cases,
  canEdit,
}: {
  workspaceId: string;
  projectId: string;
  combinations: Combination[];
  cases: LoadCase[];
  canEdit: boolean;
}) {
  const m = useCombinationMutations(workspaceId, projectId);
  const [name, setName] = useState("");
  const [terms, setTerms] = useState<DraftTerm[]>([{ loadCaseId: "", factor: "1.0" }]);
  const [editingId, setEditingId] = useState<string | null>(null);
  const errors = fieldErrorsOf(m.create.error);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    m.create.mutate(
      {
        name,
        terms: terms
          .filter((t) => t.loadCaseId)
          .map((t) => ({ loadCaseId: t.loadCaseId, factor: Number(t.factor) })),
      },
      { onSuccess: () => (setName(""), setTerms([{ loadCaseId: "", factor: "1.0" }])) },
    );
  };

  return (
    <Panel id="combinations" index="4" title="Combinations" subtitle="Σ factor × load case, by superposition">
      <p className="border-b border-rule bg-paper px-3 py-1.5 text-[13px] text-graphite-soft">
        <span aria-hidden="true">⚠ </span>
        {SUPERPOSITION_CAUTION}
      </p>
      <ul className="divide-y divide-rule">
        {combinations.length === 0 && <li className="p-3 text-graphite-soft">No combinations.</li>}
        {combinations.map((c) => (
          <li key={c.id} className="flex flex-wrap items-center gap-3 px-3 py-2">
            <span className="font-semibold">{c.name}</span>
            <span className="text-graphite-soft">
              ={" "}
              {c.terms.map((t, i) => (
                <span key={t.loadCaseId}>
                  {i > 0 && " + "}
                  <span className="num">{t.factor}</span> × {t.loadCaseName}
                </span>
              ))}
            </span>
            {c.description && (
              <span className="basis-full text-[13px] text-graphite-soft">{c.description}</span>
            )}
            {canEdit && editingId !== c.id && (
              <span className="ml-auto flex gap-2">
                <ToolButton aria-label={`Edit combination ${c.name}`} onClick={() => setEditingId(c.id)}>
                  Edit
                </ToolButton>
                <ToolButton aria-label={`Delete combination ${c.name}`} onClick={() => m.remove.mutate(c.id)}>
                  Delete
                </ToolButton>
              </span>
            )}
            {canEdit && editingId === c.id && (
              <CombinationEditor
                workspaceId={workspaceId}
                projectId={projectId}
                combination={c}
                cases={cases}
                onDone={() => setEditingId(null)}
              />
            )}
          </li>
        ))}
      </ul>
      {canEdit && cases.length > 0 && (
        <form onSubmit={submit} noValidate className="space-y-2 border-t border-rule p-3">
          <input
            aria-label="New combination name"
            placeholder="e.g. Operating + upset"
            value={name}
            onChange={(e) => setName(e.target.value)}
            className="w-full rounded-sm border border-rule-strong bg-panel px-2 py-1"
          />
          {terms.map((t, i) => (
            <div key={i} className="flex flex-wrap items-center gap-2 text-[14px]">
              <input
                aria-label={`Factor ${i + 1}`}
                inputMode="decimal"
                value={t.factor}
                onChange={(e) =>
                  setTerms(terms.map((x, j) => (j === i ? { ...x, factor: e.target.value } : x)))
                }
                className="num w-20 rounded-sm border border-rule-strong bg-panel px-2 py-1 text-right"
              />
              ×
              <select
                aria-label={`Load case ${i + 1}`}
                value={t.loadCaseId}
                onChange={(e) =>
                  setTerms(terms.map((x, j) => (j === i ? { ...x, loadCaseId: e.target.value } : x)))
                }
                className="rounded-sm border border-rule-strong bg-panel px-1 py-1"
              >
                <option value="">choose a load case</option>
                {cases.map((c) => (
                  <option key={c.id} value={c.id}>
                    {c.name}
                  </option>
                ))}
              </select>
              {(errors[`terms.${i}.factor`] || errors[`terms.${i}.loadCaseId`]) && (
                <span className="text-[13px] text-fail">
                  ✗ {errors[`terms.${i}.factor`] ?? errors[`terms.${i}.loadCaseId`]}
                </span>
              )}
            </div>
          ))}
          <div className="flex gap-2">
            <button
              type="button"
              className={quietButton}
              onClick={() => setTerms([...terms, { loadCaseId: "", factor: "1.0" }])}
            >
              Add a term
            </button>
            <button type="submit" className={primaryButton} disabled={m.create.isPending}>
              Add combination
            </button>
          </div>
          <FormMessage>{errors.name ?? errors.terms}</FormMessage>
        </form>
      )}
    </Panel>
  );
}
