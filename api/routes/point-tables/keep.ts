import type { Components } from "../../../core/contract/load-cases";
import type { KeepPointsBody } from "../../../core/contract/point-tables";
import { updateLoadCase } from "../../../db/repositories/load-cases";
import { countLiveLocations, createLocation, nextLocationPosition } from "../../../db/repositories/locations";
import { readChunk, type PointTableRow } from "../../../db/repositories/point-tables";
import { componentsPaOf, writeStressStates } from "../../../db/repositories/stress-states";
import { currentMembership, currentUser } from "../../auth/guards";
import type { AppContext } from "../../context";
import { recordAudit } from "../../domain/audit/record";
import { chunkIds, doublesOf } from "../../../db/repositories/point-table-chunks";
import { assertWithinLimit } from "../../domain/projects/limits";
import { errors } from "../../errors";
import type { RouteHandler } from "../../openapi/registry";
import { findTable, type TableParams } from "./find";

type NoInput = Record<string, never>;

/** A point found in the table: its id as stored, its components in Pa, its coordinates. */
type FoundPoint = { id: number | string; componentsPa: Components; xyz: [number, number, number] | null };

/** How an id sent in the body is compared with the stored ones (text ids as text, others as numbers). */
function idKey(id: number | string, textIds: boolean): string {
  return textIds ? `t:${String(id)}` : `n:${Number(id)}`;
}

/**
 * The points named, found by reading the table's chunks in order until every one is found (the
 * first point of the table with that id when ids repeat); 400 naming `points.i` for an id the
 * table does not hold.
 */
async function findPoints(table: PointTableRow, wanted: (number | string)[]): Promise<FoundPoint[]> {
  const textIds = table.idKind === "text" && table.columns.id !== undefined;
  const keys = wanted.map((id) => idKey(id, textIds));
  const found = new Map<string, FoundPoint>();
  const missing = new Set(keys);
  for (let i = 0; missing.size > 0; i++) {
    const chunk = await readChunk(table.id, i, { coordinates: table.hasCoordinates, ids: true });
    if (chunk === null) break;
    const ids = chunkIds(chunk);
    const n = chunk.pointCount;
    const comps = doublesOf(chunk.components!);
    const xyz = chunk.coordinates ? doublesOf(chunk.coordinates) : null;
    ids.forEach((id, k) => {
      const key = idKey(id, textIds);
      if (!missing.has(key)) return;
      missing.delete(key);
      found.set(key, {
        id,
        componentsPa: {
          xx: comps[k],
          yy: comps[n + k],
          zz: comps[2 * n + k],
          xy: comps[3 * n + k],
          yz: comps[4 * n + k],
          zx: comps[5 * n + k],
        },
        xyz: xyz ? [xyz[k], xyz[n + k], xyz[2 * n + k]] : null,
      });
    });
  }
  const problems = keys
    .map((key, i) =>
      found.has(key) ? null : { path: `points.${i}`, message: "is not a point of this table" },
    )
    .filter((p) => p !== null);
  if (problems.length) throw errors.invalidInput(problems);
  return keys.map((key) => found.get(key)!);
}

/**
 * POST …/keep: each named point becomes a project location ("FE point 1234", or the prefix
 * given) with its state saved in this load case as source "finite-element point" — through
 * `writeStressStates`, the one writer of states — so it joins the comparison like any location.
 * The load case's version is raised (its states changed), the whole is one audited transaction,
 * and the project's location limit applies.
 */
export function keepPointsHandler(context: AppContext): RouteHandler<TableParams, NoInput, KeepPointsBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const { params, body } = res.locals.input;
    const before = await findTable(workspace.id, params);
    if (before.table.status !== "ready") {
      throw errors.conflictWithId(
        "awaiting_content",
        "This point table has no points yet; upload its file first.",
      );
    }
    const points = await findPoints(before.table, body.points);
    const prefix = body.namePrefix ?? "FE point";
    const locations = await context.sequelize.transaction(async (transaction) => {
      const { project, loadCase, table } = await findTable(workspace.id, params, { transaction, lock: true });
      assertWithinLimit(
        "locations",
        await countLiveLocations(project.id, transaction),
        points.length,
        "points",
      );
      let position = await nextLocationPosition(project.id, transaction);
      const created: { id: string; name: string; point: FoundPoint }[] = [];
      for (const point of points) {
        const at = point.xyz ? ` at (${point.xyz.join(", ")})` : "";
        const location = await createLocation(
          {
            projectId: project.id,
            name: `${prefix} ${String(point.id)}`.slice(0, 120),
            note: `Point ${String(point.id)} of the point table "${table.fileName}"${at}, kept from load case "${loadCase.name}".`,
            position: position++,
            createdBy: user.id,
            updatedBy: user.id,
          },
          transaction,
        );
        await recordAudit(transaction, user, {
          workspaceId: workspace.id,
          projectId: project.id,
          entityType: "location",
          entityId: location.id,
          action: "create",
          summary: `kept point ${String(point.id)} of "${table.fileName}" as the location "${location.name}" in "${project.name}"`,
          changes: { after: { name: location.name, note: location.note } },
        });
        created.push({ id: location.id, name: location.name, point });
      }
      const written = await writeStressStates(
        created.map((c) => ({
          loadCaseId: loadCase.id,
          locationId: c.id,
          componentsPa: c.point.componentsPa,
          unit: table.unit,
          source: "finite-element point",
          note: `Point ${String(c.point.id)} of the point table "${table.fileName}".`,
          createdBy: user.id,
        })),
        transaction,
      );
      for (const [i, { saved }] of written.entries()) {
        await recordAudit(transaction, user, {
          workspaceId: workspace.id,
          projectId: project.id,
          entityType: "stress-state",
          entityId: saved.id,
          action: "create",
          summary: `entered the state of "${loadCase.name}" at "${created[i].name}" (revision ${saved.revision}, finite-element point)`,
          changes: {
            loadCaseId: loadCase.id,
            locationId: created[i].id,
            revision: saved.revision,
            fromPa: null,
            toPa: componentsPaOf(saved),
            unit: table.unit,
          },
        });
      }
      await updateLoadCase(loadCase.id, { version: loadCase.version + 1, updatedBy: user.id }, transaction);
      return created.map(({ id, name }) => ({ id, name }));
    });
    res.status(201).json({ locations });
  };
}
