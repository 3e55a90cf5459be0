import { PUBLISHED_MATERIALS } from "../../../core";
import type {
  Material as MaterialView,
  PublishedMaterialView,
  StressUnitName,
} from "../../../core/contract/materials";
import type { MaterialRow } from "../../../db/repositories/materials";
import { personOf, type PersonRef } from "../../domain/projects/people";

const MPA = 1e6;

/** A library material as the API sends it (values in Pa, with the unit entered). */
export function presentMaterial(m: MaterialRow, people: Map<string, PersonRef>): MaterialView {
  return {
    id: m.id,
    workspaceId: m.workspaceId,
    kind: "workspace",
    name: m.name,
    unit: m.unit as StressUnitName,
    yieldPa: m.yieldPa,
    ultimateTensionPa: m.ultimateTensionPa,
    ultimateCompressionPa: m.ultimateCompressionPa,
    elasticModulusPa: m.elasticModulusPa,
    poissonRatio: m.poissonRatio,
    reference: m.reference,
    note: m.note,
    version: m.version,
    createdAt: m.createdAt.toISOString(),
    updatedAt: m.updatedAt.toISOString(),
    updatedBy: personOf(people, m.updatedBy ?? m.createdBy),
  };
}

/** The built-in list (core's PUBLISHED_MATERIALS, not a copy) in Pa, each with its standard and note. */
export function presentPublished(): PublishedMaterialView[] {
  return PUBLISHED_MATERIALS.map((m) => ({
    id: m.id,
    kind: "published",
    name: m.name,
    standard: m.standard,
    scope: m.scope,
    yieldPa: m.yield === undefined ? null : m.yield * MPA,
    ultimateTensionPa: m.ultimateTension * MPA,
    ultimateCompressionPa: m.ultimateCompression * MPA,
    compressionBasis: m.compressionBasis,
    brittle: m.brittle,
    note: m.note,
  }));
}
