import { useState } from "react";
import {
  ALLOWABLE_CATEGORY_SUGGESTIONS,
  CRITERION_LABELS,
  CRITERION_NAMES,
  type CategoryRequirement,
  type CriterionName,
  type Project,
  type Requirement,
} from "../../../../../core/contract/projects";
import { ApiError, fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import { Panel } from "../../../components/Panel";
import { useMaterials } from "../../../entities/material/queries";
import { useUpdateProject } from "../../../entities/project/mutations";
import { MaterialPicker, materialName } from "./MaterialPicker";

/** One category's factors as typed (empty: use the default's). */
type CategoryDraft = { category: string; factors: Record<CriterionName, string> };

/**
 * What the project checks: the project-wide default factor per criterion, the factors per
 * load-case category that replace it, whether criteria that do not suit a material are rated,
 * the default material and display units.
 */
export function RequirementsPanel({ project, canEdit }: { project: Project; canEdit: boolean }) {
  const materials = useMaterials(project.workspaceId);
  const update = useUpdateProject(project.workspaceId, project.id);
  const [editing, setEditing] = useState(false);
  const [draft, setDraft] = useState<Record<CriterionName, string>>(() => toDraft(project.requirements));
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
    const requirements: Requirement[] = CRITERION_NAMES.filter((c) => draft[c].trim() !== "").map(
      (criterion) => ({
        criterion,
        requiredFactor: Number(draft[criterion]),
      }),
    );
    const checked = new Set(requirements.map((r) => r.criterion));
    // Categories with no factor of their own are left out (they use the default anyway); a factor
    // for a criterion no longer checked is dropped with it, as the form shows it greyed.
    const categoryRequirements: CategoryRequirement[] = categories
      .map((c) => ({
        category: c.category.trim(),
        factors: Object.fromEntries(
          CRITERION_NAMES.filter((k) => checked.has(k) && c.factors[k].trim() !== "").map((k) => [
            k,
            Number(c.factors[k]),
          ]),
        ),
      }))
      .filter((c) => Object.keys(c.factors).length > 0);
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
  const conflict = update.error instanceof ApiError && update.error.status === 409;

  return (
    <Panel
      id="requirements"
      index="1"
      title="Checks"
      subtitle="required safety factor per criterion and per load-case category, and the material used where a location names none"
    >
      <div className="space-y-3 p-3 text-[15px]">
        {!editing ? (
          <>
            <p className="text-[13px] text-graphite-soft">
              Project default (every load case whose category has no factors of its own):
            </p>
            <ul className="flex flex-wrap gap-x-6 gap-y-1" data-testid="default-requirements">
              {project.requirements.map((r) => (
                <li key={r.criterion}>
                  {CRITERION_LABELS[r.criterion]}: n ≥ <span className="num">{r.requiredFactor}</span>
                </li>
              ))}
            </ul>
            {project.categoryRequirements.length > 0 && (
              <table className="text-[14px]" data-testid="category-requirements">
                <thead>
                  <tr className="text-left text-[13px] text-graphite-soft">
                    <th scope="col" className="pr-4 font-normal">
                      load-case category
                    </th>
                    {project.requirements.map((r) => (
                      <th key={r.criterion} scope="col" className="pr-4 text-right font-normal">
                        {CRITERION_LABELS[r.criterion]}
                      </th>
                    ))}
                  </tr>
                </thead>
                <tbody>
                  {project.categoryRequirements.map((c) => (
                    <tr key={c.category}>
                      <th scope="row" className="pr-4 text-left font-normal">
                        {c.category}
                      </th>
                      {project.requirements.map((r) => (
                        <td key={r.criterion} className="pr-4 text-right">
                          {c.factors[r.criterion] === undefined ? (
                            <span className="text-graphite-soft">default</span>
                          ) : (
                            <>
                              n ≥ <span className="num">{c.factors[r.criterion]}</span>
                            </>
                          )}
                        </td>
                      ))}
                    </tr>
                  ))}
                </tbody>
              </table>
            )}
            <p className="text-[13px] text-graphite-soft">
              {project.includeUnsuitedCriteria
                ? "Criteria that do not suit a location's material (ductile vs brittle) are rated on request and can govern."
                : "Criteria that do not suit a location's material (fracture criteria on a ductile metal, yield criteria on a brittle one) are shown as not applicable and left out of the governing search."}
            </p>
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
                            disabled={draft[c].trim() === ""}
                            title={
                              draft[c].trim() === "" ? "the project does not check this criterion" : undefined
                            }
                            placeholder={draft[c].trim() === "" ? "—" : draft[c]}
                            value={cat.factors[c]}
                            onChange={(e) =>
                              setCategories(
                                categories.map((x, j) =>
                                  j === i ? { ...x, factors: { ...x.factors, [c]: e.target.value } } : x,
                                ),
                              )
                            }
                            className="num w-16 rounded-sm border border-rule-strong bg-panel px-1 py-0.5 text-right disabled:opacity-50"
                          />
                        </td>
                      ))}
                      <td>
                        {!(ALLOWABLE_CATEGORY_SUGGESTIONS as readonly string[]).includes(cat.category) && (
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
                  disabled={
                    newCategory.trim() === "" ||
                    categories.some((c) => c.category.toLowerCase() === newCategory.trim().toLowerCase())
                  }
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

function emptyCategory(category: string): CategoryDraft {
  return {
    category,
    factors: Object.fromEntries(CRITERION_NAMES.map((c) => [c, ""])) as Record<CriterionName, string>,
  };
}

/** The stored categories as drafts, with the usual four offered first even when they have no factors. */
function toCategoryDrafts(stored: CategoryRequirement[]): CategoryDraft[] {
  const drafts: CategoryDraft[] = ALLOWABLE_CATEGORY_SUGGESTIONS.map((c) => emptyCategory(c));
  for (const s of stored) {
    let d = drafts.find((x) => x.category.toLowerCase() === s.category.trim().toLowerCase());
    if (!d) {
      d = emptyCategory(s.category);
      drafts.push(d);
    }
    for (const c of CRITERION_NAMES) {
      const v = s.factors[c];
      if (v !== undefined) d.factors[c] = String(v);
    }
  }
  return drafts;
}
