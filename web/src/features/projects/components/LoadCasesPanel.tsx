import { useState } from "react";
import { Link } from "react-router-dom";
import type { LoadCase } from "../../../../../core/contract/load-cases";
import type { StressUnitName } from "../../../../../core/contract/materials";
import type { Location } from "../../../../../core/contract/projects";
import { useDeleteLoadCase, useSaveState, useUpdateLoadCase } from "../../../entities/load-case/mutations";
import { FormMessage } from "../../../lib/forms";
import { Panel } from "../../../components/Panel";
import { ToolButton } from "../../../components/ToolButton";
import { currentVersionOf, isVersionConflict } from "../model/errors";
import { allowablesNote, cellTitle, isOpenCell, toggleCell } from "../model/load-cases";
import { LoadCaseStateCell } from "./LoadCaseStateCell";
import { NewLoadCaseForm } from "./NewLoadCaseForm";
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
  const update = useUpdateLoadCase(workspaceId, projectId);
  const remove = useDeleteLoadCase(workspaceId, projectId);
  const saveState = useSaveState(workspaceId, projectId);
  const [editing, setEditing] = useState<{ caseId: string; locationId: string } | null>(null);
  const [history, setHistory] = useState<{ caseId: string; locationId: string } | null>(null);
  const [renaming, setRenaming] = useState<string | null>(null);

  const editingCase = editing && cases.find((c) => c.id === editing.caseId);
  const editingState = editingCase?.states.find((s) => s.locationId === editing?.locationId);
  const conflict = isVersionConflict(saveState.error);
  const historyTitle = history && cellTitle(history, cases, locations);

  return (
    <Panel
      id="load-cases"
      index="3"
      title="Load cases"
      subtitle={`stress state at each location, in the unit it was entered (new states: ${unit}); tension positive`}
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
                  {c.description && (
                    <div className="max-w-56 text-[12px] font-normal text-graphite-soft">{c.description}</div>
                  )}
                  <Link
                    to={`/workspaces/${workspaceId}/projects/${projectId}/load-cases/${c.id}/point-tables`}
                    className="mr-2 text-[13px] font-normal text-ink underline-offset-2 hover:underline"
                  >
                    Point tables
                  </Link>
                  {canEdit && renaming !== c.id && (
                    <ToolButton
                      aria-label={`Rename load case ${c.name}`}
                      onClick={() => (update.reset(), setRenaming(c.id))}
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
                      pending={update.isPending}
                      error={update.error}
                      onCancel={() => setRenaming(null)}
                      onSave={(v) =>
                        update.mutate(
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
                {locations.map((l) => (
                  <td key={l.id} className="px-3 py-2">
                    <LoadCaseStateCell
                      workspaceId={workspaceId}
                      projectId={projectId}
                      loadCase={c}
                      location={l}
                      canEdit={canEdit}
                      historyOpen={isOpenCell(history, { caseId: c.id, locationId: l.id })}
                      onToggleHistory={() =>
                        setHistory(toggleCell(history, { caseId: c.id, locationId: l.id }))
                      }
                      onEdit={() => (saveState.reset(), setEditing({ caseId: c.id, locationId: l.id }))}
                    />
                  </td>
                ))}
                {canEdit && (
                  <td className="px-3 py-2 text-right">
                    <ToolButton aria-label={`Delete load case ${c.name}`} onClick={() => remove.mutate(c.id)}>
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
              Someone saved this load case meanwhile (now version {currentVersionOf(saveState.error)}). The
              table shows their values; save again to put yours over them.
            </FormMessage>
          )}
          <StateForm
            key={`${editing.caseId}:${editing.locationId}`}
            idPrefix="state"
            initial={editingState}
            defaultUnit={unit}
            pending={saveState.isPending}
            error={conflict ? null : saveState.error}
            onCancel={() => setEditing(null)}
            onSave={(stress, source) =>
              saveState.mutate(
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
        <NewLoadCaseForm
          workspaceId={workspaceId}
          projectId={projectId}
          allowableCategories={allowableCategories}
        />
      )}
    </Panel>
  );
}
