import { createHash } from "node:crypto";
import { QueryTypes, type Sequelize, type Transaction } from "sequelize";
import { ENGINE_NAME, ENGINE_VERSION } from "../../../core/constants/engine";
import type { ComparisonWithSections } from "../../../core/contract/comparison";
import {
  RECORD_CONTENT_FORMAT,
  RECORD_CONTENT_VERSION,
  type RecordContent,
  type RecordScopeInput,
} from "../../../core/contract/records";
import { listReadyPointTablesOfProject, type PointTableRow } from "../../../db/repositories/point-tables";
import type { ProjectRow } from "../../../db/repositories/projects";
import {
  comparisonInputFrom,
  loadComparisonSource,
  PROJECT_SQL,
  type ComparisonSource,
} from "../comparison/load";
import { comparisonPageWithSections } from "../comparison/sections";
import { exportProjectWithKeys } from "../projects/export";
import { linearizationEndsOf } from "./linearization-ends";
import { resolveRecordScope, type UnknownScopeIds } from "./scope";
import { restrictComparisonInput, restrictExport } from "./scope-restrict";

const invert = (m: Map<string, string>): Record<string, string> =>
  Object.fromEntries([...m].map(([id, key]) => [key, id]));

/**
 * Everything a frozen record holds, taken from the project as it is now: its inputs as the
 * export writes them, the key → id maps, the revision of every state, and the full comparison
 * (every row) computed with this process's engine. The comparison runs through paging.ts, so a
 * large project yields the event loop between runs as the comparison route does.
 *
 * The inputs and the comparison are read by separate statements. Pass a REPEATABLE READ
 * `transaction` (see freeze.ts) and every statement reads the same snapshot, so no write can
 * land between the inputs and the comparison; without one, the reads are independent.
 *
 * With a `scope` (scope.ts) that is not the whole project, the inputs and the comparison's input
 * are cut to the chosen load cases and locations before the comparison is built (so its governing
 * cases are the scope's) and the content names the scope; without one, or with one that chooses
 * everything, the content is exactly what it was before scopes existed (same fields, same hash).
 */
export async function buildRecordContent(
  sequelize: Sequelize,
  project: ProjectRow,
  transaction?: Transaction,
  scopeChoice: { scope: RecordScopeInput | null; unknownIds: UnknownScopeIds } = {
    scope: null,
    unknownIds: "refuse",
  },
): Promise<RecordContent> {
  // One after another: on a transaction every statement goes through one connection, and pg
  // deprecates issuing them concurrently.
  const whole = await exportProjectWithKeys(project, transaction);
  const source = transaction
    ? await comparisonSourceIn(sequelize, project, transaction)
    : await loadComparisonSource(sequelize, project.workspaceId, project.id);
  const tables = await listReadyPointTablesOfProject(project.id, transaction);
  if (source === null) throw new Error(`project ${project.id} vanished while its record was taken`);
  const caseIdOf = invert(whole.keys.loadCases);
  const locationIdOf = invert(whole.keys.locations);
  const scope = resolveRecordScope(
    scopeChoice.scope,
    {
      loadCases: whole.file.loadCases.map((c) => ({ id: caseIdOf[c.key], name: c.name })),
      locations: whole.file.locations.map((l) => ({ id: locationIdOf[l.key], name: l.name })),
    },
    scopeChoice.unknownIds,
  );
  const { file, keys } = scope ? restrictExport(whole.file, whole.keys, scope) : whole;
  const wholeInput = comparisonInputFrom(project.id, source.source);
  const input = scope ? restrictComparisonInput(wholeInput, scope) : wholeInput;
  const { paging: _paging, ...results } = await comparisonPageWithSections(input, {
    page: 1,
    limit: Number.MAX_SAFE_INTEGER,
  });
  const caseKey = keys.loadCases;
  const locationKey = keys.locations;
  return {
    format: RECORD_CONTENT_FORMAT,
    contentVersion: RECORD_CONTENT_VERSION,
    engine: { name: ENGINE_NAME, version: ENGINE_VERSION },
    takenAt: new Date().toISOString(),
    project: { id: project.id, workspaceId: project.workspaceId, version: project.version },
    inputs: file,
    ids: {
      materials: invert(keys.materials),
      locations: invert(keys.locations),
      loadCases: invert(keys.loadCases),
    },
    stateRevisions: keys.states
      .filter((s) => caseKey.has(s.loadCaseId) && locationKey.has(s.locationId))
      .map((s) => ({
        loadCase: caseKey.get(s.loadCaseId)!,
        location: locationKey.get(s.locationId)!,
        revision: s.revision,
        savedAt: s.createdAt.toISOString(),
        savedBy: s.createdBy,
      })),
    results: results satisfies ComparisonWithSections,
    // Only with tables or lines, so a record of a project without any reads (and hashes) as before.
    ...pointTableFilesOf(results, tables),
    ...(await linearizationEndsOf(results, transaction)),
    // Only for a subset, so a whole-project record reads (and hashes) as before.
    ...(scope ? { scope } : {}),
  };
}

/** The SHA-256 of each point table the comparison rated, as the report prints it. */
function pointTableFilesOf(
  results: ComparisonWithSections,
  tables: readonly Pick<PointTableRow, "id" | "sha256">[],
): Pick<RecordContent, "pointTableFiles"> {
  const rated = new Set((results.pointTables ?? []).map((t) => t.tableId));
  const files = tables.filter((t) => rated.has(t.id)).map((t) => ({ tableId: t.id, sha256: t.sha256 }));
  return files.length === 0 ? {} : { pointTableFiles: files };
}

/**
 * The comparison's input text read inside `transaction` (the prepared statement of
 * loadComparisonSource runs on a pooled connection outside any transaction).
 */
async function comparisonSourceIn(
  sequelize: Sequelize,
  project: ProjectRow,
  transaction: Transaction,
): Promise<ComparisonSource | null> {
  const [row] = await sequelize.query<ComparisonSource>(PROJECT_SQL, {
    bind: [project.id, project.workspaceId],
    type: QueryTypes.SELECT,
    transaction,
  });
  return row ?? null;
}

/** JSON with every object's keys in sorted order, so equal content always hashes the same. */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v !== null && typeof v === "object" && !Array.isArray(v)
      ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : 1)))
      : v,
  );
}

/** The record's content hash: SHA-256 of its canonical JSON, hex. */
export function recordHash(content: RecordContent): string {
  return createHash("sha256").update(canonicalJson(content)).digest("hex");
}
