import { Op, type Transaction } from "sequelize";
import {
  TRASH_KINDS,
  TRASH_RETENTION_DAYS,
  type TrashItem,
  type TrashKind,
} from "../../../core/contract/projects";
import { insertAuditEvent } from "../../../db/repositories/audit";
import { lockProject, projectNamesOf } from "../../../db/repositories/projects";
import {
  countLiveOfKind,
  destroyForGood,
  markRestored,
  trashableRows,
  TRASH_TABLES,
  type TrashableRow,
} from "../../../db/repositories/trash";
import { currentMembership, currentUser } from "../../auth/guards";
import type { AppContext } from "../../context";
import { errors } from "../../errors";
import type { RouteHandler } from "../../openapi/registry";
import { recordAudit } from "../../domain/audit/record";
import type { ProjectLimitName } from "../../../core/contract/limits";
import { assertWithinLimit } from "../../domain/projects/limits";
import { peopleById, personOf } from "../../domain/projects/people";

type NoInput = Record<string, never>;
type ItemParams = { workspaceId: string; kind: TrashKind; itemId: string };

const DAY_MS = 86_400_000;
const retentionCutoff = () => new Date(Date.now() - TRASH_RETENTION_DAYS * DAY_MS);

/** Every project of the workspace (trashed or not), by id. */
async function projectsOf(workspaceId: string, transaction?: Transaction) {
  const rows = await projectNamesOf(workspaceId, transaction);
  return new Map(rows.map((p) => [p.id, p]));
}

/**
 * Deletes for good what has been in the trash longer than the retention period (the
 * database cascades take their states, terms and children), leaving a line in the trail.
 */
async function purgeExpired(workspaceId: string, transaction: Transaction) {
  const projects = await projectsOf(workspaceId, transaction);
  for (const kind of TRASH_KINDS) {
    const expired = await trashableRows(
      kind,
      workspaceId,
      [...projects.keys()],
      { deletedAt: { [Op.lt]: retentionCutoff() } },
      transaction,
    );
    for (const row of expired) {
      await insertAuditEvent(
        {
          workspaceId,
          projectId: kind === "project" ? row.id : (row.projectId ?? null),
          entityType: TRASH_TABLES[kind].entity,
          entityId: row.id,
          action: "purge",
          actorId: null,
          actorName: "trash retention",
          summary: `deleted the ${TRASH_TABLES[kind].label} "${row.name}" for good after ${TRASH_RETENTION_DAYS} days in the trash`,
        },
        transaction,
      );
      await destroyForGood(kind, row.id, transaction);
    }
  }
}

export function listTrashHandler(
  context: AppContext,
): RouteHandler<{ workspaceId: string }, NoInput, NoInput> {
  return async (_req, res) => {
    const { workspace } = currentMembership(res);
    const items = await context.sequelize.transaction(async (transaction) => {
      await purgeExpired(workspace.id, transaction);
      const projects = await projectsOf(workspace.id, transaction);
      const found: { kind: TrashKind; row: TrashableRow }[] = [];
      for (const kind of TRASH_KINDS) {
        const rows = await trashableRows(
          kind,
          workspace.id,
          [...projects.keys()],
          { deletedAt: { [Op.ne]: null } },
          transaction,
        );
        found.push(...rows.map((row) => ({ kind, row })));
      }
      const people = await peopleById(
        found.map((f) => f.row.deletedBy),
        transaction,
      );
      return found
        .map(({ kind, row }): TrashItem => {
          const project = row.projectId ? projects.get(row.projectId) : undefined;
          return {
            kind,
            id: row.id,
            name: row.name,
            project: project
              ? { id: project.id, name: project.name, inTrash: project.deletedAt !== null }
              : null,
            deletedAt: row.deletedAt!.toISOString(),
            deletedBy: personOf(people, row.deletedBy),
            purgeAt: new Date(row.deletedAt!.getTime() + TRASH_RETENTION_DAYS * DAY_MS).toISOString(),
          };
        })
        .sort((a, b) => b.deletedAt.localeCompare(a.deletedAt));
    });
    res.set("Cache-Control", "no-store").json({ items, retentionDays: TRASH_RETENTION_DAYS });
  };
}

async function findTrashed(workspaceId: string, kind: TrashKind, itemId: string, transaction: Transaction) {
  const projects = await projectsOf(workspaceId, transaction);
  const [row] = await trashableRows(
    kind,
    workspaceId,
    [...projects.keys()],
    { id: itemId, deletedAt: { [Op.gte]: retentionCutoff() } },
    transaction,
  );
  if (!row) throw errors.notFound(`This ${TRASH_TABLES[kind].label} in the trash`);
  return { row, project: row.projectId ? projects.get(row.projectId)! : null };
}

/** The project limit a restored row counts against (projects and materials have none). */
const RESTORE_LIMITS: Partial<Record<keyof typeof TRASH_TABLES, ProjectLimitName>> = {
  location: "locations",
  "load-case": "loadCases",
  combination: "combinations",
};

export function restoreHandler(context: AppContext): RouteHandler<ItemParams, NoInput, NoInput> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const { kind, itemId } = res.locals.input.params;
    await context.sequelize.transaction(async (transaction) => {
      const { row, project } = await findTrashed(workspace.id, kind, itemId, transaction);
      if (project && project.deletedAt) {
        throw errors.conflictWithId(
          "project_in_trash",
          `The project "${project.name}" is in the trash too; restore the project first.`,
        );
      }
      const limit = RESTORE_LIMITS[kind];
      if (limit && row.projectId) {
        // Under the project's lock, as creates count, so a restore cannot slip past a limit beside a create.
        await lockProject(row.projectId, transaction);
        const live = await countLiveOfKind(kind, row.projectId, transaction);
        assertWithinLimit(limit, live, 1, "itemId");
      }
      await markRestored(kind, row.id, transaction);
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: kind === "project" ? row.id : (row.projectId ?? null),
        entityType: TRASH_TABLES[kind].entity,
        entityId: row.id,
        action: "restore",
        summary: `restored the ${TRASH_TABLES[kind].label} "${row.name}" from the trash`,
      });
    });
    res.status(204).end();
  };
}

export function purgeHandler(context: AppContext): RouteHandler<ItemParams, NoInput, NoInput> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const { kind, itemId } = res.locals.input.params;
    await context.sequelize.transaction(async (transaction) => {
      const { row } = await findTrashed(workspace.id, kind, itemId, transaction);
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: kind === "project" ? row.id : (row.projectId ?? null),
        entityType: TRASH_TABLES[kind].entity,
        entityId: row.id,
        action: "purge",
        summary: `deleted the ${TRASH_TABLES[kind].label} "${row.name}" for good`,
      });
      await destroyForGood(kind, row.id, transaction);
    });
    res.status(204).end();
  };
}
