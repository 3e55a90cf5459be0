import { useState } from "react";
import {
  CRITERION_LABELS,
  CRITERION_NAMES,
  type CriterionName,
  type Project,
  type Requirement,
} from "../../../../../core/contract/projects";
import { ApiError, fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import { Panel } from "../../../components/Panel";
import { useMaterials } from "../api/materials";
import { useUpdateProject } from "../api/projects";
import { MaterialPicker, materialName } from "./MaterialPicker";

/** What the project checks: required safety factor per criterion, default material, display units. */
export function RequirementsPanel({ project, canEdit }: { project: Project; canEdit: boolean }) {
  const materials = useMaterials(project.workspaceId);
  const update = useUpdateProject(project.workspaceId, project.id);
  const [editing, setEditing] = useState(false);
  const [draft, setDraft] = useState<Record<CriterionName, string>>(() => toDraft(project.requirements));
  const [material, setMaterial] = useState(project.defaultMaterial);
  const [unitSystem, setUnitSystem] = useState(project.unitSystem);
  const [name, setName] = useState(project.name);
  const [description, setDescription] = useState(project.description);

  const start = () => {
    setDraft(toDraft(project.requirements));
    setMaterial(project.defaultMaterial);
    setUnitSystem(project.unitSystem);
    setName(project.name);
    setDescription(project.description);
    update.reset();
    setEditing(true);
  };
  const save = () => {
    const requirements: Requirement[] = CRITERION_NAMES.filter((c) => draft[c].trim() !== "").map(
      (criterion) => ({
        criterion,
        requiredFactor: Number(draft[criterion]),
      }),
    );
    update.mutate(
      { version: project.version, name, description, requirements, defaultMaterial: material, unitSystem },
      { onSuccess: () => setEditing(false) },
    );
  };
  const conflict = update.error instanceof ApiError && update.error.status === 409;

  return (
    <Panel
      id="requirements"
      index="1"
      title="Checks"
      subtitle="required safety factor per criterion, and the material used where a location names none"
    >
      <div className="space-y-3 p-3 text-[15px]">
        {!editing ? (
          <>
            <ul className="flex flex-wrap gap-x-6 gap-y-1">
              {project.requirements.map((r) => (
                <li key={r.criterion}>
                  {CRITERION_LABELS[r.criterion]}: n ≥ <span className="num">{r.requiredFactor}</span>
                </li>
              ))}
            </ul>
            <p>
              Default material:{" "}
              <strong>{materialName(project.defaultMaterial, materials.data) ?? "none chosen"}</strong>
              {project.defaultMaterial?.kind === "published" && (
                <span className="text-graphite-soft">
                  {" "}
                  — published minimum values; verify against your certificate.
                </span>
              )}
            </p>
            <p className="text-graphite-soft">
              Values shown in {project.unitSystem === "US" ? "ksi (US customary)" : "MPa (SI)"}.
            </p>
            {canEdit && (
              <button type="button" className={quietButton} onClick={start}>
                Change checks
              </button>
            )}
          </>
        ) : (
          <div className="space-y-3">
            <div className="grid gap-2 sm:grid-cols-[1fr_2fr]">
              <label className="text-[13px] text-graphite-soft">
                Project name
                <input
                  value={name}
                  onChange={(e) => setName(e.target.value)}
                  className="mt-0.5 w-full rounded-sm border border-rule-strong bg-panel px-2 py-1 text-[15px] text-graphite"
                />
              </label>
              <label className="text-[13px] text-graphite-soft">
                Description
                <input
                  value={description}
                  onChange={(e) => setDescription(e.target.value)}
                  className="mt-0.5 w-full rounded-sm border border-rule-strong bg-panel px-2 py-1 text-[15px] text-graphite"
                />
              </label>
            </div>
            <fieldset className="grid grid-cols-1 gap-2 sm:grid-cols-3">
              <legend className="mb-1 text-sm font-semibold">
                Required safety factor (leave empty to skip a criterion)
              </legend>
              {CRITERION_NAMES.map((c) => (
                <label key={c} className="text-[13px] text-graphite-soft">
                  {CRITERION_LABELS[c]}
                  <input
                    aria-label={`Required factor, ${CRITERION_LABELS[c]}`}
                    inputMode="decimal"
                    value={draft[c]}
                    onChange={(e) => setDraft({ ...draft, [c]: e.target.value })}
                    className="num mt-0.5 w-full rounded-sm border border-rule-strong bg-panel px-2 py-1 text-right"
                  />
                </label>
              ))}
            </fieldset>
            <div className="flex flex-wrap gap-4">
              <MaterialPicker
                id="default-material"
                label="Default material"
                value={material}
                list={materials.data}
                noneLabel="none"
                onChange={setMaterial}
              />
              <label className="text-[13px] text-graphite-soft">
                Units{" "}
                <select
                  value={unitSystem}
                  onChange={(e) => setUnitSystem(e.target.value as "SI" | "US")}
                  className="rounded-sm border border-rule-strong bg-panel px-1 py-0.5"
                >
                  <option value="SI">SI (MPa)</option>
                  <option value="US">US customary (ksi)</option>
                </select>
              </label>
            </div>
            {conflict ? (
              <FormMessage>
                Someone changed this project meanwhile. Cancel and look again before saving.
              </FormMessage>
            ) : (
              <FormMessage>
                {Object.entries(fieldErrorsOf(update.error))
                  .map(([path, message]) => `${path}: ${message}`)
                  .join("; ") || (update.error instanceof Error ? update.error.message : null)}
              </FormMessage>
            )}
            <div className="flex gap-2">
              <button type="button" className={primaryButton} onClick={save} disabled={update.isPending}>
                Save checks
              </button>
              <button type="button" className={quietButton} onClick={() => setEditing(false)}>
                Cancel
              </button>
            </div>
          </div>
        )}
      </div>
    </Panel>
  );
}

function toDraft(requirements: Requirement[]): Record<CriterionName, string> {
  return Object.fromEntries(
    CRITERION_NAMES.map((c) => [
      c,
      String(requirements.find((r) => r.criterion === c)?.requiredFactor ?? ""),
    ]),
  ) as Record<CriterionName, string>;
}
