import type { Transaction } from "sequelize";
import type { User } from "lucia";
import type { MaterialRef } from "../../../core/contract/materials";
import type { ProjectExport } from "../../../core/contract/project-export";
import { createCombination } from "../../../db/repositories/combinations";
import { createLoadCase } from "../../../db/repositories/load-cases";
import { createLocation } from "../../../db/repositories/locations";
import { createMaterial } from "../../../db/repositories/materials";
import { createProject, type ProjectRow } from "../../../db/repositories/projects";
import { writeStressStates } from "../../../db/repositories/stress-states";
import { PROJECT_LIMITS } from "../../../core/contract/limits";
import { recordAudit } from "../../domain/audit/record";
import { importLinearizations } from "../../domain/linearizations/import-lines";
import { assertWithinLimit, projectLimitError } from "../../domain/projects/limits";
import { columnsFromRef } from "../../domain/materials/resolve";

/** What an import made. */
export type ImportCounts = { materials: number; locations: number; loadCases: number; combinations: number };

/**
 * Refuses (400 `project_limit`, naming the list) a file whose project would be larger than
 * PROJECT_LIMITS allow to create by hand, before anything is written.
 */
function assertFileWithinLimits(file: ProjectExport) {
  assertWithinLimit("locations", 0, file.locations.length, "locations");
  assertWithinLimit("loadCases", 0, file.loadCases.length, "loadCases");
  assertWithinLimit("combinations", 0, file.combinations.length, "combinations");
  file.combinations.forEach((c, i) => {
    if (c.terms.length > PROJECT_LIMITS.termsPerCombination) {
      throw projectLimitError("termsPerCombination", `combinations.${i}.terms`, c.terms.length);
    }
  });
}

/**
 * Writes a validated export file into `workspaceId` as a new project, all inside the caller's
 * `transaction` (any failure leaves nothing behind). Library materials become new library
 * entries of this workspace; states become revision 1 with their source kept; linearization lines
 * are linearized again by the server and saved under their cases.
 */
export async function importProject(
  transaction: Transaction,
  user: User,
  workspaceId: string,
  file: ProjectExport,
): Promise<{ project: ProjectRow; counts: ImportCounts }> {
  assertFileWithinLimits(file);
  const materialIds = new Map<string, string>();
  for (const m of file.materials) {
    const { key, ...values } = m;
    const created = await createMaterial(
      { ...values, workspaceId, createdBy: user.id, updatedBy: user.id },
      transaction,
    );
    materialIds.set(key, created.id);
  }
  const ref = (r: ProjectExport["project"]["defaultMaterial"]): MaterialRef | null =>
    !r ? null : r.kind === "published" ? r : { kind: "workspace", id: materialIds.get(r.key)! };
  const projectMaterial = columnsFromRef(ref(file.project.defaultMaterial));
  const project = await createProject(
    {
      workspaceId,
      name: file.project.name,
      description: file.project.description,
      unitSystem: file.project.unitSystem,
      requirements: file.project.requirements,
      categoryRequirements: file.project.categoryRequirements,
      includeUnsuitedCriteria: file.project.includeUnsuitedCriteria,
      defaultMaterialId: projectMaterial.materialId,
      defaultPublishedMaterial: projectMaterial.publishedMaterial,
      createdBy: user.id,
      updatedBy: user.id,
    },
    transaction,
  );
  const locationIds = new Map<string, string>();
  for (const [position, l] of file.locations.entries()) {
    const columns = columnsFromRef(ref(l.material));
    const created = await createLocation(
      {
        projectId: project.id,
        name: l.name,
        note: l.note,
        ...columns,
        position,
        createdBy: user.id,
        updatedBy: user.id,
      },
      transaction,
    );
    locationIds.set(l.key, created.id);
  }
  const caseIds = new Map<string, string>();
  let lineCount = 0;
  for (const [position, c] of file.loadCases.entries()) {
    const created = await createLoadCase(
      {
        projectId: project.id,
        name: c.name,
        category: c.category,
        description: c.description,
        position,
        createdBy: user.id,
        updatedBy: user.id,
      },
      transaction,
    );
    caseIds.set(c.key, created.id);
    await writeStressStates(
      c.states.map((s) => ({
        loadCaseId: created.id,
        locationId: locationIds.get(s.location)!,
        componentsPa: s.componentsPa,
        unit: s.unit,
        source: s.source,
        note: s.note,
        calculator: s.calculator,
        createdBy: user.id,
      })),
      transaction,
    );
    lineCount += await importLinearizations(
      transaction,
      user.id,
      project,
      created.id,
      c.linearizations ?? [],
      locationIds,
      `loadCases.${position}`,
    );
  }
  for (const [position, c] of file.combinations.entries()) {
    await createCombination(
      {
        projectId: project.id,
        name: c.name,
        description: c.description,
        position,
        createdBy: user.id,
        updatedBy: user.id,
      },
      c.terms.map((t) => ({ loadCaseId: caseIds.get(t.loadCase)!, factor: t.factor })),
      transaction,
    );
  }
  const counts = {
    materials: file.materials.length,
    locations: file.locations.length,
    loadCases: file.loadCases.length,
    combinations: file.combinations.length,
  };
  await recordAudit(transaction, user, {
    workspaceId,
    projectId: project.id,
    entityType: "project",
    entityId: project.id,
    action: "import",
    summary: `imported the project "${project.name}" (${counts.locations} locations, ${counts.loadCases} load cases, ${counts.combinations} combinations, ${counts.materials} library materials, ${lineCount} linearization lines)`,
    changes: { exportedAt: file.exportedAt, schemaVersion: file.schemaVersion },
  });
  return { project, counts };
}
