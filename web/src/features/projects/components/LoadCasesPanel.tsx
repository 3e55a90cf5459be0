import { useState, type FormEvent } from "react";
import type { LoadCase } from "../../../../../core/contract/load-cases";
import type { StressUnitName } from "../../../../../core/contract/materials";
import type { Location } from "../../../../../core/contract/projects";
import { fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage, primaryButton } from "../../../lib/forms";
import { Panel } from "../../../components/Panel";
import { ToolButton } from "../../../components/ToolButton";
import { useLoadCaseMutations } from "../api/load-cases";
import { benchLinkForState } from "../../../lib/bench-link";
import { currentVersionOf, isVersionConflict } from "../model/errors";
import { allowablesNote, categorySuggestions, cellTitle, isOpenCell, toggleCell } from "../model/load-cases";
import { SavedStateCell } from "./SavedStateCell";
import { StateForm } from "./StateForm";
import { RenameForm } from "./RenameForm";
import { StateHistory } from "./StateHistory";

/** Load cases × locations: each cell is the saved state (non-zero components), with its source and revision. */
export function LoadCasesPanel({
  workspaceId,
  projectId,
  cases,
  locations,
  unit,
  canEdit,
  allowableCategories = [],
}: {
  workspaceId: string;
  projectId: string;
  cases: LoadCase[];
  locations: Location[];
  unit: StressUnitName;
  canEdit: boolean;
  /** Categories the project gives factors of their own (the checks panel); others use the default. */
  allowableCategories?: string[];
}) {
  const m = useLoadCaseMutations(workspaceId, projectId);
  const [editing, setEditing] = useState<{ caseId: string; locationId: string } | null>(null);
  const [history, setHistory] = useState<{ caseId: string; locationId: string } | null>(null);
  const [renaming, setRenaming] = useState<string | null>(null);
  const [name, setName] = useState("");
  const [category, setCategory] = useState("");

  const add = (e: FormEvent) => {
    e.preventDefault();
    m.create.mutate({ name, category }, { onSuccess: () => (setName(""), setCategory("")) });
  };
  const editingCase = editing && cases.find((c) => c.id === editing.caseId);
  const editingState = editingCase?.states.find((s) => s.locationId === editing?.locationId);
  const conflict = isVersionConflict(m.saveState.error);
  const historyTitle = history && cellTitle(history, cases, locations);

  return (
    <Panel
      id="load-cases"
      index="3"
      title="Load cases"
      subtitle={`stress state at each location, in ${unit}; tension positive`}
    >
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-[14px]">
          <thead>
            <tr className="border-b border-rule text-left text-[13px] text-graphite-soft">
              <th scope="col" className="px-3 py-1.5 font-semibold">
                Case
              </th>
              {locations.map((l) => (
                <th key={l.id} scope="col" className="px-3 py-1.5 font-semibold">
                  {l.name}
                </th>
              ))}
              {canEdit && (
                <th scope="col" className="sr-only">
                  Actions
                </th>
              )}
            </tr>
          </thead>
          <tbody>
            {cases.length === 0 && (
              <tr>
                <td className="px-3 py-3 text-graphite-soft" colSpan={locations.length + 2}>
                  No load cases yet.
                </td>
              </tr>
            )}
            {cases.map((c) => (
              <tr key={c.id} className="border-b border-rule align-top">
                <th scope="row" className="px-3 py-2 text-left">
                  <span className="font-semibold">{c.name}</span>
                  {c.category && (
                    <span className="ml-2 rounded-sm bg-paper-deep px-1 text-[12px] text-graphite-soft">
                      {c.category}
                    </span>
                  )}
                  <div className="text-[12px] font-normal text-graphite-soft" data-testid="case-allowables">
                    {allowablesNote(c.category, allowableCategories)}
                  </div>
                  <div className="text-[12px] font-normal text-graphite-faint">version {c.version}</div>
                  {c.description && (
                    <div className="max-w-56 text-[12px] font-normal text-graphite-soft">{c.description}</div>
                  )}
                  {canEdit && renaming !== c.id && (
                    <ToolButton
                      aria-label={`Rename load case ${c.name}`}
                      onClick={() => (m.update.reset(), setRenaming(c.id))}
                    >
                      Rename
                    </ToolButton>
                  )}
                  {renaming === c.id && (
                    <RenameForm
                      label={`Rename load case ${c.name}`}
                      fields={[
                        { key: "name", label: "name", value: c.name },
                        { key: "category", label: "category", value: c.category, list: "case-categories" },
                        { key: "description", label: "description", value: c.description },
                      ]}
                      pending={m.update.isPending}
                      error={m.update.error}
                      onCancel={() => setRenaming(null)}
                      onSave={(v) =>
                        m.update.mutate(
                          {
                            id: c.id,
                            body: {
                              version: c.version,
                              name: v.name,
                              category: v.category,
                              description: v.description,
                            },
                          },
                          { onSuccess: () => setRenaming(null) },
                        )
                      }
                    />
                  )}
                </th>
                {locations.map((l) => {
                  const s = c.states.find((x) => x.locationId === l.id);
                  const cell = { caseId: c.id, locationId: l.id };
                  return (
                    <td key={l.id} className="px-3 py-2">
                      {s ? (
                        <SavedStateCell
                          state={s}
                          unit={unit}
                          benchLink={benchLinkForState(
                            { workspaceId, projectId, loadCaseId: c.id, locationId: l.id },
                            s.components,
                            s.unit,
                          )}
                          caseName={c.name}
                          locationName={l.name}
                          historyOpen={isOpenCell(history, cell)}
                          onHistory={() => setHistory(toggleCell(history, cell))}
                          onEdit={canEdit ? () => (m.saveState.reset(), setEditing(cell)) : undefined}
                        />
                      ) : canEdit ? (
                        <ToolButton
                          aria-label={`Enter ${c.name} at ${l.name}`}
                          onClick={() => (
                            m.saveState.reset(),
                            setEditing({ caseId: c.id, locationId: l.id })
                          )}
                        >
                          Enter state
                        </ToolButton>
                      ) : (
                        <span className="text-graphite-faint">—</span>
                      )}
                    </td>
                  );
                })}
                {canEdit && (
                  <td className="px-3 py-2 text-right">
                    <ToolButton
                      aria-label={`Delete load case ${c.name}`}
                      onClick={() => m.remove.mutate(c.id)}
                    >
                      Delete
                    </ToolButton>
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {history && historyTitle !== null && (
        <StateHistory
          workspaceId={workspaceId}
          projectId={projectId}
          loadCaseId={history.caseId}
          locationId={history.locationId}
          unit={unit}
          title={historyTitle}
        />
      )}
      {editing && editingCase && (
        <div className="border-t border-rule p-3">
          <p className="mb-2 text-sm font-semibold">
            {editingCase.name} at {locations.find((l) => l.id === editing.locationId)?.name}
          </p>
          {conflict && (
            <FormMessage>
              Someone saved this load case meanwhile (now version {currentVersionOf(m.saveState.error)}). The
              table shows their values; save again to put yours over them.
            </FormMessage>
          )}
          <StateForm
            key={`${editing.caseId}:${editing.locationId}`}
            idPrefix="state"
            initial={editingState}
            defaultUnit={unit}
            pending={m.saveState.isPending}
            error={conflict ? null : m.saveState.error}
            onCancel={() => setEditing(null)}
            onSave={(stress, source) =>
              m.saveState.mutate(
                {
                  caseId: editingCase.id,
                  locationId: editing.locationId,
                  version: editingCase.version,
                  stress,
                  source,
                },
                { onSuccess: () => setEditing(null) },
              )
            }
          />
        </div>
      )}
      {canEdit && (
        <form onSubmit={add} noValidate className="flex flex-wrap items-start gap-2 border-t border-rule p-3">
          <label className="sr-only" htmlFor="new-case">
            New load case name
          </label>
          <input
            id="new-case"
            placeholder="e.g. Hydrostatic test"
            value={name}
            onChange={(e) => setName(e.target.value)}
            className="min-w-52 flex-1 rounded-sm border border-rule-strong bg-panel px-2 py-1"
          />
          <label className="sr-only" htmlFor="new-case-category">
            Category
          </label>
          <input
            id="new-case-category"
            list="case-categories"
            placeholder="category"
            value={category}
            onChange={(e) => setCategory(e.target.value)}
            className="w-36 rounded-sm border border-rule-strong bg-panel px-2 py-1"
          />
          <datalist id="case-categories">
            {categorySuggestions(allowableCategories).map((s) => (
              <option key={s} value={s} />
            ))}
          </datalist>
          <button type="submit" className={primaryButton} disabled={m.create.isPending}>
            Add load case
          </button>
          <div className="basis-full">
            <FormMessage>{fieldErrorsOf(m.create.error).name}</FormMessage>
          </div>
        </form>
      )}
    </Panel>
  );
}
