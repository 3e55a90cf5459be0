import type { Transaction } from "sequelize";
import { findLiveLocation } from "../../../db/repositories/locations";
import { findLiveMaterial } from "../../../db/repositories/materials";
import type { ProjectRow } from "../../../db/repositories/projects";
import { refFromColumns, resolveMaterial, type ResolvedMaterial } from "../materials/resolve";

/**
 * The material a line's Sy and Su are read from: its location's own, else the project's default
 * (the same rule the comparison applies to a location's states).
 * @param project the line's project (its default material columns)
 * @param locationId the line's location, or null for the project's default
 */
export async function materialOfLine(
  project: Pick<ProjectRow, "id" | "workspaceId" | "defaultMaterialId" | "defaultPublishedMaterial">,
  locationId: string | null,
  transaction?: Transaction,
): Promise<ResolvedMaterial> {
  const location = locationId ? await findLiveLocation(project.id, locationId, { transaction }) : null;
  const ref =
    (location && refFromColumns(location.materialId, location.publishedMaterial)) ??
    refFromColumns(project.defaultMaterialId, project.defaultPublishedMaterial);
  const library = new Map();
  if (ref?.kind === "workspace") {
    const row = await findLiveMaterial(project.workspaceId, ref.id, { transaction });
    if (row) library.set(row.id, row);
  }
  return resolveMaterial(ref, library);
}
