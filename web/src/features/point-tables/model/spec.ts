/**
 * What every point of a table is rated against, as the server's comparison rates a location: the
 * project's required factors for the load case's category (core's requirementsFor) and the
 * chosen material's strengths in Pa (only those given; whether it is ductile or brittle follows
 * from them, as on the server).
 */
import { requirementsFor, type Material, type PointTableSpec } from "../../../../../core";
import { materialLabel, type MaterialList, type MaterialRef } from "../../../../../core/contract/materials";
import type { Project } from "../../../../../core/contract/projects";

export type SpecChoice = { spec: PointTableSpec; materialName: string } | { problem: string };

/** The material a reference names, as core's Material in Pa, with its label; null when not in the list. */
export function materialOf(
  ref: MaterialRef,
  list: MaterialList,
): { material: Material; name: string } | null {
  const m =
    ref.kind === "published"
      ? list.published.find((p) => p.id === ref.id)
      : list.materials.find((x) => x.id === ref.id);
  if (m === undefined) return null;
  const material: Material = {};
  if (m.yieldPa) material.yield = m.yieldPa;
  if (m.ultimateTensionPa) material.ultimateTension = m.ultimateTensionPa;
  if (m.ultimateCompressionPa) material.ultimateCompression = m.ultimateCompressionPa;
  return { material, name: materialLabel(m) };
}

/** The rating spec for a load case of `category`, or what is missing, in words. */
export function specFor(
  project: Pick<Project, "requirements" | "categoryRequirements">,
  category: string,
  ref: MaterialRef | null,
  list: MaterialList | undefined,
): SpecChoice {
  if (project.requirements.length === 0) {
    return { problem: "The project checks no criterion yet: choose its criteria in the project's checks." };
  }
  if (ref === null) return { problem: "Choose the material the points are rated against." };
  if (list === undefined) return { problem: "The materials are still loading." };
  const found = materialOf(ref, list);
  if (found === null) return { problem: "The chosen material is no longer in the library: choose another." };
  const requirements = requirementsFor(
    { defaults: project.requirements, categories: project.categoryRequirements },
    category,
  );
  return { spec: { material: found.material, requirements }, materialName: found.name };
}

/** The reference a material select's value names ("published:S355", "workspace:<uuid>"). */
export function refFromOption(value: string): MaterialRef | null {
  const at = value.indexOf(":");
  const kind = value.slice(0, at);
  const id = value.slice(at + 1);
  if (at < 0 || id === "") return null;
  return kind === "published" ? { kind, id } : kind === "workspace" ? { kind, id } : null;
}

export const optionOfRef = (ref: MaterialRef | null) => (ref === null ? "" : `${ref.kind}:${ref.id}`);

/**
 * What a stored table's points are rated against in this browser, as the server rates them: the
 * project's default material (never the one chosen for a new file) and the load case's category
 * factors; null while the materials load, else the spec or why there is none.
 */
export function storedTableRating(
  project: Pick<
    Project,
    "requirements" | "categoryRequirements" | "defaultMaterial" | "includeUnsuitedCriteria"
  >,
  category: string,
  list: MaterialList | undefined,
): { spec: PointTableSpec; includeUnsuited: boolean } | { problem: string } | null {
  if (list === undefined) return null;
  const choice = specFor(project, category, project.defaultMaterial, list);
  if ("problem" in choice) {
    return {
      problem:
        project.defaultMaterial === null
          ? "the project names no default material, which the server rates stored tables against."
          : choice.problem,
    };
  }
  return { spec: choice.spec, includeUnsuited: project.includeUnsuitedCriteria };
}
