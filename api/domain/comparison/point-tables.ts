import type {
  ComparisonPointTableView,
  PointTableEvaluationSummary,
} from "../../../core/contract/point-tables";
import type { GoverningView } from "../../../core/contract/comparison";
import type { PointTableRow } from "../../../db/repositories/point-tables";
import type { ProjectRow } from "../../../db/repositories/projects";
import { currentEvaluation } from "../point-tables/evaluate";
import { ratingFor } from "../point-tables/spec";
import type { LibraryStrengths } from "../materials/resolve";

/**
 * The point tables' part of the comparison, kept out of the comparison's builder: each ready
 * table of a live load case as one summary row — per criterion its governing point (id and
 * coordinates), factor, utilisation and verdict, and how many points fail or are close — read
 * from the evaluation stored with the table, never evaluated per request. Each table's governing
 * points also compete for the comparison's governing checks (same rule: the highest utilisation),
 * named "point 1234 of "file.csv"" where a row names its location.
 *
 * What the answer depends on, for any cache of it: every ready table of the project's live load
 * cases — its id, file name, point count and its stored evaluation with the basis (allowables and
 * material) it was made against. The loader's text holds all of them (PROJECT_SQL's
 * `pointTables`), so a table added, deleted or evaluated again changes the text.
 */

/** The SQL of the loader's `pointTables` entry (a subquery of PROJECT_SQL, `p` the project). */
export const POINT_TABLES_SQL = `COALESCE((
    SELECT json_agg(json_build_object('id', t.id, 'caseId', t.load_case_id, 'fileName', t.file_name,
      'pointCount', t.point_count, 'hasCoordinates', t.has_coordinates, 'basis', t.evaluation_basis,
      'evaluation', t.evaluation - 'worst' - 'histogram') ORDER BY c.position, c.created_at, t.created_at)
    FROM point_tables t JOIN load_cases c ON c.id = t.load_case_id AND c.deleted_at IS NULL
    WHERE t.project_id = p.id AND t.status = 'ready'), '[]')`;

/** One table as the loader's text holds it. */
export type StoredTableSummary = {
  id: string;
  caseId: string;
  fileName: string;
  pointCount: number;
  hasCoordinates: boolean;
  basis: string | null;
  evaluation: PointTableEvaluationSummary | null;
};

/** What the section needs of the project as the loader's text holds it. */
type ProjectFields = Pick<
  ProjectRow,
  | "requirements"
  | "categoryRequirements"
  | "includeUnsuitedCriteria"
  | "defaultMaterialId"
  | "defaultPublishedMaterial"
> & {
  library: (LibraryStrengths & { id: string })[];
  cases: { id: string; name: string; category: string }[];
  pointTables?: StoredTableSummary[];
};

/** A table with its load case and whether its stored evaluation was made against today's allowables. */
export type ComparisonPointTable = StoredTableSummary & {
  caseName: string;
  category: string;
  current: boolean;
};

/** The project's tables from the loader's parsed text, each marked current or out of date. */
export function pointTablesOf(project: ProjectFields): ComparisonPointTable[] {
  const library = new Map(project.library.map((m) => [m.id, m]));
  const cases = new Map(project.cases.map((c) => [c.id, c]));
  return (project.pointTables ?? []).flatMap((t) => {
    const c = cases.get(t.caseId);
    if (!c) return [];
    const basis = ratingFor(project, library, c.category).basis;
    return [
      { ...t, caseName: c.name, category: c.category, current: t.evaluation !== null && t.basis === basis },
    ];
  });
}

/**
 * Evaluates again, and stores, every table whose stored evaluation was made against other
 * allowables than the project's today (a factor, the material or the case's category changed);
 * true when it did, so the caller reads the inputs again. Off the event loop's critical path:
 * the evaluation yields between slices.
 */
export async function refreshPointTables(source: string): Promise<boolean> {
  if (/"pointTables"\s*:\s*\[\]/.test(source)) return false;
  const project = JSON.parse(source) as ProjectFields;
  const library = new Map(project.library.map((m) => [m.id, m]));
  let refreshed = false;
  for (const t of pointTablesOf(project)) {
    if (t.current) continue;
    const rating = ratingFor(project, library, t.category);
    await currentEvaluation(
      {
        id: t.id,
        status: "ready",
        hasCoordinates: t.hasCoordinates,
        evaluation: null,
        evaluationBasis: null,
      } as Pick<PointTableRow, "id" | "status" | "hasCoordinates" | "evaluation" | "evaluationBasis">,
      rating,
    );
    refreshed = true;
  }
  return refreshed;
}

/**
 * The comparison's point-table section, and the governing candidates it adds: per table and
 * criterion, its governing point as the comparison names a governing check. Tables whose
 * evaluation is out of date are left out (the handler evaluates them before building).
 */
export function pointTableSection(tables: readonly ComparisonPointTable[]): {
  views: ComparisonPointTableView[];
  governing: GoverningView[];
} {
  const views: ComparisonPointTableView[] = [];
  const governing: GoverningView[] = [];
  for (const t of tables) {
    if (!t.current || t.evaluation === null) continue;
    views.push({
      tableId: t.id,
      fileName: t.fileName,
      caseId: t.caseId,
      caseName: t.caseName,
      category: t.category,
      pointCount: t.pointCount,
      material: t.evaluation.material,
      perCriterion: t.evaluation.perCriterion.map((c) => ({
        criterion: c.criterion,
        status: c.status,
        reason: c.reason,
        governing: c.governing && {
          index: c.governing.index,
          id: c.governing.id,
          x: c.governing.x,
          y: c.governing.y,
          z: c.governing.z,
        },
        factor: c.governing?.factor ?? null,
        utilisation: c.governing?.utilisation ?? null,
        verdict: c.governing?.verdict ?? null,
        requiredFactor: c.requiredFactor,
        category: c.category,
        countFail: c.countFail,
        countClose: c.countClose,
      })),
    });
    for (const c of t.evaluation.perCriterion) {
      if (c.status !== "evaluated" || c.governing === null) continue;
      governing.push({
        criterion: c.criterion,
        rowId: `point-table:${t.id}:${c.governing.index}`,
        caseName: t.caseName,
        locationName: `point ${String(c.governing.id)} of "${t.fileName}"`,
        factor: c.governing.factor,
        requiredFactor: c.requiredFactor,
        category: c.category,
        utilisation: c.governing.utilisation,
        verdict: c.governing.verdict,
      });
    }
  }
  return { views, governing };
}
