import type {
  CategoryRequirement,
  Project as ProjectView,
  Requirement,
} from "../../../core/contract/projects";
import type { ProjectCounts, ProjectRow } from "../../../db/repositories/projects";
import { refFromColumns } from "../../domain/materials/resolve";
import { personOf, type PersonRef } from "../../domain/projects/people";

/** A project as the API sends it. */
export function presentProject(
  p: ProjectRow,
  counts: ProjectCounts,
  people: Map<string, PersonRef>,
): ProjectView {
  return {
    id: p.id,
    workspaceId: p.workspaceId,
    name: p.name,
    description: p.description,
    unitSystem: p.unitSystem,
    requirements: p.requirements as Requirement[],
    categoryRequirements: p.categoryRequirements as CategoryRequirement[],
    includeUnsuitedCriteria: p.includeUnsuitedCriteria,
    defaultMaterial: refFromColumns(p.defaultMaterialId, p.defaultPublishedMaterial),
    version: p.version,
    counts,
    createdAt: p.createdAt.toISOString(),
    updatedAt: p.updatedAt.toISOString(),
    createdBy: personOf(people, p.createdBy),
    updatedBy: personOf(people, p.updatedBy),
  };
}

/** The fields the audit trail compares for a project. */
export function projectAuditFields(p: ProjectRow) {
  return {
    name: p.name,
    description: p.description,
    unitSystem: p.unitSystem,
    requirements: p.requirements,
    categoryRequirements: p.categoryRequirements,
    includeUnsuitedCriteria: p.includeUnsuitedCriteria,
    defaultMaterial: refFromColumns(p.defaultMaterialId, p.defaultPublishedMaterial),
  };
}
