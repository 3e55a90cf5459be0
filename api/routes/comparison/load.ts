import type { CategoryRequirement, Requirement } from "../../../core/contract/projects";
import { Combination } from "../../../db/models/combination";
import { LoadCase } from "../../../db/models/load-case";
import { Location } from "../../../db/models/location";
import type { Project } from "../../../db/models/project";
import { termsOf } from "../combinations/terms";
import { stateIndex } from "../combinations/superpose";
import { currentStatesOf } from "../load-cases/states";
import { libraryOf, refFromColumns, resolveMaterial } from "../materials/resolve";
import type { ComparisonInput } from "./build";

/** Loads everything the comparison of `project` needs (live rows only), as plain data. */
export async function loadComparisonInput(project: Project): Promise<ComparisonInput> {
  const order: [string, string][] = [
    ["position", "ASC"],
    ["createdAt", "ASC"],
  ];
  const [locations, cases, combinations, library] = await Promise.all([
    Location.findAll({ where: { projectId: project.id, deletedAt: null }, order }),
    LoadCase.findAll({ where: { projectId: project.id, deletedAt: null }, order }),
    Combination.findAll({ where: { projectId: project.id, deletedAt: null }, order }),
    libraryOf(project.workspaceId),
  ]);
  const defaultRef = refFromColumns(project.defaultMaterialId, project.defaultPublishedMaterial);
  const terms = await termsOf(combinations);
  const caseIds = [
    ...new Set([...cases.map((c) => c.id), ...[...terms.values()].flat().map((t) => t.loadCaseId)]),
  ];
  const states = stateIndex(await currentStatesOf(caseIds));
  return {
    projectId: project.id,
    allowables: {
      requirements: project.requirements as Requirement[],
      categoryRequirements: project.categoryRequirements as CategoryRequirement[],
    },
    includeUnsuitedCriteria: project.includeUnsuitedCriteria,
    locations: locations.map((l) => ({
      id: l.id,
      name: l.name,
      material: resolveMaterial(refFromColumns(l.materialId, l.publishedMaterial) ?? defaultRef, library),
    })),
    cases: cases.map((c) => ({ id: c.id, name: c.name, category: c.category, version: c.version })),
    states,
    combinations: combinations.map((c) => ({
      id: c.id,
      name: c.name,
      version: c.version,
      terms: terms.get(c.id)!,
    })),
  };
}
