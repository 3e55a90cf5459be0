import type { Sequelize } from "sequelize";
import { preparedQuery } from "../../../db/prepared-query";
import type { CategoryRequirement, Requirement } from "../../../core/contract/projects";
import type { Material } from "../../../db/models/material";
import type { StoredTerm } from "../combinations/superpose";
import { refFromColumns, resolveMaterial } from "../materials/resolve";
import { stateKey, type ComparisonInput, type ComparisonState } from "./build";
import type { StoredLineForComparison } from "./linearizations";
import { inputsStampSql } from "./stamp";
import { POINT_TABLES_SQL, pointTablesOf, type StoredTableSummary } from "./point-tables";

/**
 * The project, its live locations, cases and combinations (with their terms), the
 * workspace library and the current states at live locations in one round trip, as one JSON
 * text that PostgreSQL builds, lists in the order the comparison uses (position, then
 * creation). One statement instead of the nine model queries this took before: at 100
 * connections the comparison spent most of its time building, sending and hydrating queries
 * (a CPU profile put Sequelize, lodash and socket writes at over half the process), not computing.
 */
export const PROJECT_SQL = `
SELECT json_build_object(
  'requirements', p.requirements,
  'categoryRequirements', p.category_requirements,
  'includeUnsuitedCriteria', p.include_unsuited_criteria,
  'defaultMaterialId', p.default_material_id,
  'defaultPublishedMaterial', p.default_published_material,
  'locations', COALESCE((
    SELECT json_agg(json_build_object('id', l.id, 'name', l.name, 'materialId', l.material_id,
      'publishedMaterial', l.published_material) ORDER BY l.position, l.created_at)
    FROM locations l WHERE l.project_id = p.id AND l.deleted_at IS NULL), '[]'),
  'cases', COALESCE((
    SELECT json_agg(json_build_object('id', c.id, 'name', c.name, 'category', c.category,
      'version', c.version) ORDER BY c.position, c.created_at)
    FROM load_cases c WHERE c.project_id = p.id AND c.deleted_at IS NULL), '[]'),
  'combinations', COALESCE((
    SELECT json_agg(json_build_object('id', k.id, 'name', k.name, 'version', k.version, 'terms', COALESCE((
        SELECT json_agg(json_build_object('loadCaseId', t.load_case_id,
          'loadCaseName', COALESCE(tc.name, '(deleted case)'), 'factor', t.factor,
          'live', tc.id IS NOT NULL AND tc.deleted_at IS NULL) ORDER BY t.position)
        FROM combination_terms t LEFT JOIN load_cases tc ON tc.id = t.load_case_id
        WHERE t.combination_id = k.id), '[]')) ORDER BY k.position, k.created_at)
    FROM combinations k WHERE k.project_id = p.id AND k.deleted_at IS NULL), '[]'),
  'library', COALESCE((
    SELECT json_agg(json_build_object('id', m.id, 'name', m.name, 'reference', m.reference,
      'yieldPa', m.yield_pa, 'ultimateTensionPa', m.ultimate_tension_pa,
      'ultimateCompressionPa', m.ultimate_compression_pa))
    FROM materials m WHERE m.workspace_id = p.workspace_id AND m.deleted_at IS NULL), '[]'),
  'pointTables', ${POINT_TABLES_SQL},
  'states', COALESCE((
    SELECT json_agg(json_build_array(s.load_case_id, s.location_id, s.revision,
      s.xx_pa, s.yy_pa, s.zz_pa, s.xy_pa, s.yz_pa, s.zx_pa))
    FROM stress_states s
    JOIN load_cases c ON c.id = s.load_case_id
    JOIN locations l ON l.id = s.location_id AND l.deleted_at IS NULL
    WHERE s.is_current AND c.project_id = p.id), '[]'),
  'linearizations', COALESCE((
    SELECT json_agg(json_build_object('id', z.id, 'name', z.name, 'caseId', z.load_case_id,
      'locationId', z.location_id, 'version', z.version, 'summary', z.summary)
      ORDER BY z.position, z.created_at)
    FROM linearizations z WHERE z.project_id = p.id), '[]')
)::text AS source,
  ${inputsStampSql("p.id", "p.workspace_id")} AS stamp
FROM projects p
WHERE p.id = $1 AND p.workspace_id = $2 AND p.deleted_at IS NULL`;

const PROJECT_STATEMENT = { name: "comparison-inputs", text: PROJECT_SQL };

type ProjectRow = {
  requirements: Requirement[];
  categoryRequirements: CategoryRequirement[];
  includeUnsuitedCriteria: boolean;
  defaultMaterialId: string | null;
  defaultPublishedMaterial: string | null;
  locations: { id: string; name: string; materialId: string | null; publishedMaterial: string | null }[];
  cases: { id: string; name: string; category: string; version: number }[];
  combinations: { id: string; name: string; version: number; terms: StoredTerm[] }[];
  library: Pick<
    Material,
    "id" | "name" | "reference" | "yieldPa" | "ultimateTensionPa" | "ultimateCompressionPa"
  >[];
  /** Current states as [caseId, locationId, revision, xx, yy, zz, xy, yz, zx] (Pa): arrays keep the JSON small. */
  states: [string, string, number, number, number, number, number, number, number][];
  linearizations: StoredLineForComparison[];
  pointTables: StoredTableSummary[];
};

/** The loader's answer: the inputs as JSON text, and the stamp of those very inputs. */
export type ComparisonSource = { source: string; stamp: string };

/**
 * The inputs of the comparison of project `projectId` in `workspaceId` (live rows only) as
 * the JSON text PostgreSQL builds, in one query, with their inputs stamp read by the same
 * statement (so from the same snapshot: the stamp belongs to exactly these inputs); null when
 * there is no such live project (the caller answers 404). At the project limits the text is
 * about 1.3 MB.
 */
export async function loadComparisonSource(
  sequelize: Sequelize,
  workspaceId: string,
  projectId: string,
): Promise<ComparisonSource | null> {
  const [row] = await preparedQuery<ComparisonSource>(sequelize, PROJECT_STATEMENT, [projectId, workspaceId]);
  return row ?? null;
}

/**
 * The comparison's input from the loader's text: states indexed by case and location,
 * materials resolved per location (their own, else the project's default). Parsed in one go,
 * well under the 50 ms a request may hold the event loop at the project limits.
 */
export function comparisonInputFrom(
  projectId: string,
  source: string,
): ComparisonInput & { linearizations: StoredLineForComparison[] } {
  const project = JSON.parse(source) as ProjectRow;
  const states = new Map<string, ComparisonState>();
  for (const [loadCaseId, locationId, revision, xxPa, yyPa, zzPa, xyPa, yzPa, zxPa] of project.states) {
    states.set(stateKey(loadCaseId, locationId), {
      loadCaseId,
      locationId,
      revision,
      xxPa,
      yyPa,
      zzPa,
      xyPa,
      yzPa,
      zxPa,
    });
  }
  // resolveMaterial reads only the columns selected above; the rows stand in for model
  // instances, which would cost a hydration per row for nothing.
  const library = new Map(project.library.map((m) => [m.id, m as Material]));
  const defaultRef = refFromColumns(project.defaultMaterialId, project.defaultPublishedMaterial);
  return {
    projectId,
    allowables: {
      requirements: project.requirements,
      categoryRequirements: project.categoryRequirements,
    },
    includeUnsuitedCriteria: project.includeUnsuitedCriteria,
    locations: project.locations.map((l) => ({
      id: l.id,
      name: l.name,
      material: resolveMaterial(refFromColumns(l.materialId, l.publishedMaterial) ?? defaultRef, library),
    })),
    cases: project.cases,
    states,
    combinations: project.combinations,
    linearizations: project.linearizations,
    pointTables: pointTablesOf(project),
  };
}
