import type { Location as LocationView } from "../../../core/contract/projects";
import type { LocationRow } from "../../../db/repositories/locations";
import { refFromColumns } from "../../domain/materials/resolve";

/** A location as the API sends it. */
export function presentLocation(l: LocationRow): LocationView {
  return {
    id: l.id,
    projectId: l.projectId,
    name: l.name,
    note: l.note,
    material: refFromColumns(l.materialId, l.publishedMaterial),
    position: l.position,
    version: l.version,
    createdAt: l.createdAt.toISOString(),
    updatedAt: l.updatedAt.toISOString(),
  };
}

/** The fields the audit trail compares for a location. */
export function locationAuditFields(l: LocationRow) {
  return { name: l.name, note: l.note, material: refFromColumns(l.materialId, l.publishedMaterial) };
}
