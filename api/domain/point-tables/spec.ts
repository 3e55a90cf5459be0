import type { Transaction } from "sequelize";
import { requirementsFor, type Allowables, type PointTableSpec } from "../../../core";
import type { ProjectRow } from "../../../db/repositories/projects";
import { findLiveMaterial } from "../../../db/repositories/materials";
import {
  refFromColumns,
  resolveMaterial,
  type LibraryStrengths,
  type ResolvedMaterial,
} from "../materials/resolve";

/**
 * What a load case's point tables are rated against: the project's default material (a table's
 * points are not at any one location, so no location's own material applies) and the factors of
 * the load case's category, by the comparison's rules (core's `requirementsFor`; the project
 * default where the category names none). `basis` is that in one text: a stored evaluation
 * made against another text is out of date (the factors, the material or the category changed).
 */
export type PointTableRating = {
  spec: PointTableSpec;
  includeUnsuited: boolean;
  material: ResolvedMaterial;
  basis: string;
};

/** Version of the stored evaluation's shape; raising it makes every stored evaluation out of date. */
const EVALUATION_FORMAT = 1;

type ProjectAllowables = Pick<
  ProjectRow,
  | "requirements"
  | "categoryRequirements"
  | "includeUnsuitedCriteria"
  | "defaultMaterialId"
  | "defaultPublishedMaterial"
>;

/** The rating of a table of a load case of `category` in `project`, with the project's library given. */
export function ratingFor(
  project: ProjectAllowables,
  library: Map<string, LibraryStrengths>,
  category: string,
): PointTableRating {
  const material = resolveMaterial(
    refFromColumns(project.defaultMaterialId, project.defaultPublishedMaterial),
    library,
  );
  // Stored rows were validated against core's criteria when they were written (the comparison reads them the same way).
  const allowables = {
    defaults: project.requirements,
    categories: project.categoryRequirements,
  } as unknown as Allowables;
  const requirements = requirementsFor(allowables, category);
  const spec = { material: material.strengths, requirements };
  const includeUnsuited = project.includeUnsuitedCriteria;
  const basis = JSON.stringify({
    format: EVALUATION_FORMAT,
    spec,
    includeUnsuited,
    material: [material.label, material.note],
  });
  return { spec, includeUnsuited, material, basis };
}

/** {@link ratingFor}, reading the project's default library material when it names one. */
export async function loadRating(
  project: ProjectAllowables & Pick<ProjectRow, "workspaceId">,
  category: string,
  transaction?: Transaction,
): Promise<PointTableRating> {
  const library = new Map<string, LibraryStrengths>();
  if (project.defaultMaterialId) {
    const m = await findLiveMaterial(project.workspaceId, project.defaultMaterialId, { transaction });
    if (m) library.set(m.id, m);
  }
  return ratingFor(project, library, category);
}
