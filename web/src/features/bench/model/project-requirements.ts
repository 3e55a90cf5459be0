/**
 * What a bench opened from a project row checks: the project's required factors for the load
 * case's category (core's requirementsFor, the lookup the comparison uses), the material of the
 * location as the bench keeps it (MPa), and where both come from, in words.
 */
import { convertStress, requirementsFor } from "../../../../../core";
import type { LoadCase } from "../../../../../core/contract/load-cases";
import type { MaterialList, MaterialRef } from "../../../../../core/contract/materials";
import type { Project } from "../../../../../core/contract/projects";
import type { BenchState, ProjectRequirements } from "./bench-state";

/**
 * The project's factors for a load case of `category`, one per criterion the project checks, and
 * a sentence saying which allowables they are.
 * @param project name, default requirements and per-category factors
 * @param category the load case's category as typed ("" for none)
 */
export function projectRequirementsFor(
  project: Pick<Project, "name" | "requirements" | "categoryRequirements">,
  category: string,
): ProjectRequirements {
  const requirements = requirementsFor(
    { defaults: project.requirements, categories: project.categoryRequirements },
    category,
  );
  const used = requirements.find((r) => r.category !== null)?.category ?? null;
  const typed = category.trim();
  const which =
    used !== null
      ? `the “${used}” factors${requirements.some((r) => r.category === null) ? " (the rest from the project default)" : ""}`
      : typed
        ? `the project default (no factors given for “${typed}”)`
        : "the project default (the load case has no category)";
  return {
    requirements,
    source: `${project.name}${typed ? `, load case category “${typed}”` : ""}: ${which}`,
  };
}

/** The project's factors for a combination's superposed state: the default (a combination has no category). */
export function combinationRequirementsFor(
  project: Pick<Project, "name" | "requirements" | "categoryRequirements">,
): ProjectRequirements {
  return {
    requirements: requirementsFor(
      { defaults: project.requirements, categories: project.categoryRequirements },
      null,
    ),
    source: `${project.name}, combination: the project default (a combination has no category)`,
  };
}

/** The saved state at a location, as bench fields (tensor in the unit it was entered in). */
export function benchFieldsOf(
  loadCase: LoadCase,
  locationId: string,
): Pick<BenchState, "tensor" | "unit"> | null {
  const s = loadCase.states.find((x) => x.locationId === locationId);
  return s ? { tensor: { ...s.components }, unit: s.unit } : null;
}

/** The bench's material for a project material reference (strengths in MPa, as the bench keeps them). */
export function benchMaterialOf(
  ref: MaterialRef | null,
  list: MaterialList | undefined,
): BenchState["material"] | null {
  if (!ref || !list) return null;
  const mpa = (pa: number | null) => (pa === null ? null : convertStress(pa, "Pa", "MPa"));
  if (ref.kind === "published") {
    const m = list.published.find((p) => p.id === ref.id);
    return m
      ? {
          presetId: m.id,
          yield: mpa(m.yieldPa),
          ultimateTension: mpa(m.ultimateTensionPa),
          ultimateCompression: mpa(m.ultimateCompressionPa),
        }
      : null;
  }
  const m = list.materials.find((x) => x.id === ref.id);
  return m
    ? {
        presetId: null,
        yield: mpa(m.yieldPa),
        ultimateTension: mpa(m.ultimateTensionPa),
        ultimateCompression: mpa(m.ultimateCompressionPa),
      }
    : null;
}
