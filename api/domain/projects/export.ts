import type { Transaction } from "sequelize";
import {
  PROJECT_EXPORT_FORMAT,
  PROJECT_EXPORT_SCHEMA_VERSION,
  type ProjectExport,
} from "../../../core/contract/project-export";
import type { StressUnitName, MaterialRef } from "../../../core/contract/materials";
import type { StateSource } from "../../../core/contract/load-cases";
import type { CategoryRequirement, Requirement } from "../../../core/contract/projects";
import { listLiveCombinations } from "../../../db/repositories/combinations";
import { listLinearizationsOfCases } from "../../../db/repositories/linearizations";
import { listLiveLoadCases } from "../../../db/repositories/load-cases";
import { listLiveLocations } from "../../../db/repositories/locations";
import type { ProjectRow } from "../../../db/repositories/projects";
import { componentsPaOf, currentStatesOf, type StressStateRow } from "../../../db/repositories/stress-states";
import { termsOf } from "../combinations/terms";
import type { StoredLinearizationInput } from "../linearizations/compute";
import { libraryOf, refFromColumns } from "../materials/resolve";

/** The export file of a project ({@link exportProjectWithKeys} without the keys). */
export async function exportProject(project: ProjectRow, transaction?: Transaction): Promise<ProjectExport> {
  return (await exportProjectWithKeys(project, transaction)).file;
}

/** Which database id each key of an export file stands for, and the current state rows exported. */
export type ExportKeys = {
  materials: Map<string, string>;
  locations: Map<string, string>;
  loadCases: Map<string, string>;
  states: StressStateRow[];
};

/**
 * The export file of a project: live locations, load cases with their current states
 * (Pa as stored) and their linearization lines (inputs only, in the units typed), combinations
 * whose cases are all live, and the library materials the project refers to. Keys are short labels ("m1", "l1", "c1") made for the file; `keys` maps
 * each database id to its key, for a frozen record that must match rows across revisions.
 * Inside `transaction` every read sees that transaction's snapshot (a record freezes its
 * content in one REPEATABLE READ transaction, so no write lands between two of these reads).
 */
export async function exportProjectWithKeys(
  project: ProjectRow,
  transaction?: Transaction,
): Promise<{ file: ProjectExport; keys: ExportKeys }> {
  // One after another: queries on one transaction share its one connection, and node-postgres
  // deprecates queueing several on a client at once (Promise.all here did that).
  const locations = await listLiveLocations(project.id, transaction);
  const cases = await listLiveLoadCases(project.id, transaction);
  const combinations = await listLiveCombinations(project.id, transaction);
  const library = await libraryOf(project.workspaceId, transaction);
  const materialKeys = new Map<string, string>();
  const exportRef = (ref: MaterialRef | null): ProjectExport["project"]["defaultMaterial"] => {
    if (!ref) return null;
    if (ref.kind === "published") return { kind: "published", id: ref.id };
    if (!library.has(ref.id)) return null; // a library material in the trash is not exported
    if (!materialKeys.has(ref.id)) materialKeys.set(ref.id, `m${materialKeys.size + 1}`);
    return { kind: "library", key: materialKeys.get(ref.id)! };
  };
  const defaultMaterial = exportRef(
    refFromColumns(project.defaultMaterialId, project.defaultPublishedMaterial),
  );
  const locationKeys = new Map(locations.map((l, i) => [l.id, `l${i + 1}`]));
  const caseKeys = new Map(cases.map((c, i) => [c.id, `c${i + 1}`]));
  const states = await currentStatesOf(
    cases.map((c) => c.id),
    transaction,
  );
  const terms = await termsOf(combinations, transaction);
  const lines = await listLinearizationsOfCases(
    cases.map((c) => c.id),
    transaction,
  );

  const exportedLocations = locations.map((l) => ({
    key: locationKeys.get(l.id)!,
    name: l.name,
    note: l.note,
    material: exportRef(refFromColumns(l.materialId, l.publishedMaterial)),
  }));
  const file: ProjectExport = {
    format: PROJECT_EXPORT_FORMAT,
    schemaVersion: PROJECT_EXPORT_SCHEMA_VERSION,
    exportedAt: new Date().toISOString(),
    project: {
      name: project.name,
      description: project.description,
      unitSystem: project.unitSystem,
      requirements: project.requirements as Requirement[],
      categoryRequirements: project.categoryRequirements as CategoryRequirement[],
      includeUnsuitedCriteria: project.includeUnsuitedCriteria,
      defaultMaterial,
    },
    materials: [...materialKeys].map(([id, key]) => {
      const m = library.get(id)!;
      return {
        key,
        name: m.name,
        unit: m.unit as StressUnitName,
        yieldPa: m.yieldPa,
        ultimateTensionPa: m.ultimateTensionPa,
        ultimateCompressionPa: m.ultimateCompressionPa,
        elasticModulusPa: m.elasticModulusPa,
        poissonRatio: m.poissonRatio,
        reference: m.reference,
        note: m.note,
      };
    }),
    locations: exportedLocations,
    loadCases: cases.map((c) => ({
      key: caseKeys.get(c.id)!,
      name: c.name,
      category: c.category,
      description: c.description,
      states: states
        .filter((s) => s.loadCaseId === c.id)
        .map((s) => ({
          location: locationKeys.get(s.locationId)!,
          unit: s.unit as StressUnitName,
          componentsPa: componentsPaOf(s),
          source: s.source as StateSource,
          note: s.note,
          calculator: s.calculator ?? null,
        })),
      linearizations: lines
        .filter((line) => line.loadCaseId === c.id)
        .map((line) => {
          const { path, secondAxis, classification, allowables, equivalent, bending } =
            line.input as unknown as StoredLinearizationInput;
          return {
            name: line.name,
            // A line whose location is in the trash keeps its inputs but loses the link.
            location: line.locationId ? (locationKeys.get(line.locationId) ?? null) : null,
            path,
            secondAxis,
            classification,
            allowables,
            equivalent,
            bending,
          };
        }),
    })),
    combinations: combinations
      .filter((c) => terms.get(c.id)!.every((t) => caseKeys.has(t.loadCaseId)))
      .map((c) => ({
        name: c.name,
        description: c.description,
        terms: terms.get(c.id)!.map((t) => ({ loadCase: caseKeys.get(t.loadCaseId)!, factor: t.factor })),
      })),
  };
  return {
    file,
    keys: { materials: materialKeys, locations: locationKeys, loadCases: caseKeys, states },
  };
}
