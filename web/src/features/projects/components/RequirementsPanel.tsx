import { useState } from "react";
import { CRITERION_LABELS, CRITERION_NAMES, type Project } from "../../../../../core/contract/projects";
import { FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import { Panel } from "../../../components/Panel";
import { useMaterials } from "../../../entities/material/queries";
import { useUpdateProject } from "../../../entities/project/mutations";
import { fieldErrorSummary, isVersionConflict } from "../model/errors";
import {
  canAddCategory,
  categoryBox,
  categoryRequirementsFromDrafts,
  emptyCategory,
  isRemovableCategory,
  requirementsFromDraft,
  setCategoryFactor,
  toCategoryDrafts,
  toDraft,
  type CategoryDraft,
  type FactorDraft,
} from "../model/requirements";
import { MaterialPicker } from "./MaterialPicker";
import { RequirementsSummary } from "./RequirementsSummary";

/**
 * What the project checks: the project-wide default factor per criterion, the factors per
 * load-case category that replace it, whether criteria that do not suit a material are rated,
 * the default material and display units.
 */
export function RequirementsPanel({ project, canEdit }: { project: Project; canEdit: boolean }) {
  const materials = useMaterials(project.workspaceId);
  const update = useUpdateProject(project.workspaceId, project.id);
  const [editing, setEditing] = useState(false);
  const [draft, setDraft] = useState<FactorDraft>(() => toDraft(project.requirements));
  const [categories, setCategories] = useState<CategoryDraft[]>(() =>
    toCategoryDrafts(project.categoryRequirements),
  );
  const [newCategory, setNewCategory] = useState("");
  const [includeUnsuited, setIncludeUnsuited] = useState(project.includeUnsuitedCriteria);
  const [material, setMaterial] = useState(project.defaultMaterial);
  const [unitSystem, setUnitSystem] = useState(project.unitSystem);
  const [name, setName] = useState(project.name);
  const [description, setDescription] = useState(project.description);

  const start = () => {
    setDraft(toDraft(project.requirements));
    setCategories(toCategoryDrafts(project.categoryRequirements));
    setIncludeUnsuited(project.includeUnsuitedCriteria);
    setMaterial(project.defaultMaterial);
    setUnitSystem(project.unitSystem);
    setName(project.name);
    setDescription(project.description);
    update.reset();
    setEditing(true);
  };
  const save = () => {
    const requirements = requirementsFromDraft(draft);
    const categoryRequirements = categoryRequirementsFromDrafts(categories, requirements);
    update.mutate(
      {
        version: project.version,
        name,
        description,
        requirements,
        categoryRequirements,
        includeUnsuitedCriteria: includeUnsuited,
        defaultMaterial: material,
        unitSystem,
      },
      { onSuccess: () => setEditing(false) },
    );
  };
  const conflict = isVersionConflict(update.error);

  return (
    <Panel
      id="requirements"
      index="1"
      title="Checks"
      subtitle="required safety factor per criterion and per load-case category, and the material used where a location names none"
    >
      <div className="space-y-3 p-3 text-[15px]">
        {!editing ? (
          <RequirementsSummary
            project={project}
            materials={materials.data}
            canEdit={canEdit}
            onChange={start}
          />
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
            <fieldset className="space-y-1">
              <legend className="mb-1 text-sm font-semibold">
                Factors per load-case category (leave empty to use the default)
              </legend>
              <table className="text-[13px]">
                <thead>
                  <tr className="text-left text-graphite-soft">
                    <th scope="col" className="pr-3 font-normal">
                      category
                    </th>
                    {CRITERION_NAMES.map((c) => (
                      <th key={c} scope="col" className="pr-2 font-normal">
                        {CRITERION_LABELS[c]}
                      </th>
                    ))}
                    <th />
                  </tr>
                </thead>
                <tbody>
                  {categories.map((cat, i) => (
                    <tr key={cat.category}>
                      <th scope="row" className="pr-3 text-left font-normal">
                        {cat.category}
                      </th>
                      {CRITERION_NAMES.map((c) => (
                        <td key={c} className="pr-2">
                          <input
                            aria-label={`Required factor for ${cat.category}, ${CRITERION_LABELS[c]}`}
                            inputMode="decimal"
                            {...categoryBox(draft, c)}
                            value={cat.factors[c]}
                            onChange={(e) =>
                              setCategories(setCategoryFactor(categories, i, c, e.target.value))
                            }
                            className="num w-16 rounded-sm border border-rule-strong bg-panel px-1 py-0.5 text-right disabled:opacity-50"
                          />
                        </td>
                      ))}
                      <td>
                        {isRemovableCategory(cat.category) && (
                          <button
                            type="button"
                            className={quietButton}
                            onClick={() => setCategories(categories.filter((_, j) => j !== i))}
                          >
                            Remove
                          </button>
                        )}
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
              <div className="flex items-center gap-2 text-[13px]">
                <input
                  aria-label="New category"
                  placeholder="another category, e.g. transport"
                  value={newCategory}
                  maxLength={40}
                  onChange={(e) => setNewCategory(e.target.value)}
                  className="rounded-sm border border-rule-strong bg-panel px-2 py-0.5"
                />
                <button
                  type="button"
                  className={quietButton}
                  disabled={!canAddCategory(categories, newCategory)}
                  onClick={() => {
                    setCategories([...categories, emptyCategory(newCategory.trim())]);
                    setNewCategory("");
                  }}
                >
                  Add category
                </button>
              </div>
              <p className="text-[12px] text-graphite-soft">
                A load case uses the factors of its category (matched ignoring case); a category with no
                factors, and a combination, uses the default.
              </p>
            </fieldset>
            <label className="flex items-center gap-2 text-[13px]">
              <input
                type="checkbox"
                checked={includeUnsuited}
                onChange={(e) => setIncludeUnsuited(e.target.checked)}
              />
              Also rate criteria that do not suit a location&apos;s material (ductile vs brittle) and let them
              govern
            </label>
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
                {fieldErrorSummary(update.error) ||
                  (update.error instanceof Error ? update.error.message : null)}
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
