import { useState, type FormEvent } from "react";
import type { Location } from "../../../../../core/contract/projects";
import { fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage, primaryButton } from "../../../lib/forms";
import { Panel } from "../../../components/Panel";
import { ToolButton } from "../../../components/ToolButton";
import { useLocationMutations } from "../../../entities/location/mutations";
import { useMaterials } from "../../../entities/material/queries";
import { MaterialPicker, materialName } from "./MaterialPicker";
import { RenameForm } from "./RenameForm";

/** The named points of the structure, each optionally with its own material. */
export function LocationsPanel({
  workspaceId,
  projectId,
  locations,
  canEdit,
}: {
  workspaceId: string;
  projectId: string;
  locations: Location[];
  canEdit: boolean;
}) {
  const { create, update, remove } = useLocationMutations(workspaceId, projectId);
  const materials = useMaterials(workspaceId);
  const [name, setName] = useState("");
  const [renaming, setRenaming] = useState<string | null>(null);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    create.mutate({ name }, { onSuccess: () => setName("") });
  };
  return (
    <Panel
      id="locations"
      index="2"
      title="Locations"
      subtitle="critical points where every load case is checked"
    >
      <ul className="divide-y divide-rule">
        {locations.length === 0 && <li className="p-3 text-graphite-soft">No locations yet.</li>}
        {locations.map((l) => (
          <li key={l.id} className="flex flex-wrap items-center gap-3 px-3 py-2">
            {renaming === l.id ? (
              <RenameForm
                label={`Rename location ${l.name}`}
                fields={[
                  { key: "name", label: "name", value: l.name },
                  { key: "note", label: "note", value: l.note },
                ]}
                pending={update.isPending}
                error={update.error}
                onCancel={() => setRenaming(null)}
                onSave={(v) =>
                  update.mutate(
                    { id: l.id, body: { version: l.version, name: v.name, note: v.note } },
                    { onSuccess: () => setRenaming(null) },
                  )
                }
              />
            ) : (
              <span>
                <span className="font-semibold">{l.name}</span>
                {l.note && <span className="ml-2 text-[13px] text-graphite-soft">{l.note}</span>}
              </span>
            )}
            {canEdit && renaming !== l.id && (
              <ToolButton
                aria-label={`Rename location ${l.name}`}
                onClick={() => (update.reset(), setRenaming(l.id))}
              >
                Rename
              </ToolButton>
            )}
            {canEdit ? (
              <MaterialPicker
                id={`material-${l.id}`}
                label="material"
                value={l.material}
                list={materials.data}
                noneLabel="project default"
                onChange={(material) => update.mutate({ id: l.id, body: { version: l.version, material } })}
              />
            ) : (
              <span className="text-[13px] text-graphite-soft">
                material: {materialName(l.material, materials.data) ?? "project default"}
              </span>
            )}
            {canEdit && (
              <ToolButton
                className="ml-auto"
                aria-label={`Delete location ${l.name}`}
                onClick={() => remove.mutate(l.id)}
              >
                Delete
              </ToolButton>
            )}
          </li>
        ))}
      </ul>
      {canEdit && (
        <form
          onSubmit={submit}
          noValidate
          className="flex flex-wrap items-start gap-2 border-t border-rule p-3"
        >
          <label className="sr-only" htmlFor="new-location">
            New location name
          </label>
          <input
            id="new-location"
            placeholder="e.g. head-to-shell junction"
            value={name}
            onChange={(e) => setName(e.target.value)}
            className="min-w-60 flex-1 rounded-sm border border-rule-strong bg-panel px-2 py-1"
          />
          <button type="submit" className={primaryButton} disabled={create.isPending}>
            Add location
          </button>
          <div className="basis-full">
            <FormMessage>{fieldErrorsOf(create.error).name}</FormMessage>
          </div>
        </form>
      )}
    </Panel>
  );
}
