import { POINT_TABLE_LIMITS } from "../../../core/contract/limits";
import type { CreatePointTableBody } from "../../../core/contract/point-tables";
import {
  countPointTables,
  createPointTable,
  deletePointTable,
  listPointTables,
  storePointTableContent,
  type PointTableRow,
} from "../../../db/repositories/point-tables";
import { currentMembership, currentUser } from "../../auth/guards";
import type { AppContext } from "../../context";
import { recordAudit } from "../../domain/audit/record";
import { currentEvaluation } from "../../domain/point-tables/evaluate";
import { pointTableLimitError } from "../../domain/point-tables/limits";
import { loadRating } from "../../domain/point-tables/spec";
import { peopleById } from "../../domain/projects/people";
import { errors } from "../../errors";
import type { RouteHandler } from "../../openapi/registry";
import { evaluationSummaryOf, presentPointTable } from "./presenter";
import { receiveContent } from "./receive-content";
import { sendColumns } from "./send-columns";
import { sendCsv, sendIds } from "./send-text";
import { assertReady, findCase, findTable, type CaseParams, type TableParams } from "./find";

type NoInput = Record<string, never>;

export const listPointTablesHandler: RouteHandler<CaseParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const { project, loadCase } = await findCase(workspace.id, res.locals.input.params);
  const tables = await listPointTables(loadCase.id);
  const rating = await loadRating(project, loadCase.category);
  const people = await peopleById(tables.map((t) => t.createdBy));
  const items = [];
  for (const t of tables) {
    const evaluation = await currentEvaluation(t, rating);
    items.push(presentPointTable(t, people, evaluation && evaluationSummaryOf(evaluation)));
  }
  res.set("Cache-Control", "no-store").json(items);
};

export const getPointTableHandler: RouteHandler<TableParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const { project, loadCase, table } = await findTable(workspace.id, res.locals.input.params);
  const evaluation = await currentEvaluation(table, await loadRating(project, loadCase.category));
  const people = await peopleById([table.createdBy]);
  res.set("Cache-Control", "no-store").json(presentPointTable(table, people, evaluation));
};

export function createPointTableHandler(
  context: AppContext,
): RouteHandler<CaseParams, NoInput, CreatePointTableBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const body = res.locals.input.body;
    if (body.sizeBytes > POINT_TABLE_LIMITS.bytesPerTable) {
      throw pointTableLimitError("bytesPerTable", "sizeBytes", body.sizeBytes);
    }
    const created = await context.sequelize.transaction(async (transaction) => {
      // The project row's lock serialises declarations, so two cannot both pass the limits.
      const { project, loadCase } = await findCase(workspace.id, res.locals.input.params, {
        transaction,
        lock: true,
      });
      const counts = await countPointTables(project.id, loadCase.id, transaction);
      if (counts.inLoadCase + 1 > POINT_TABLE_LIMITS.tablesPerLoadCase) {
        throw pointTableLimitError("tablesPerLoadCase", "pointTables", counts.inLoadCase + 1);
      }
      if (counts.inProject + 1 > POINT_TABLE_LIMITS.tablesPerProject) {
        throw pointTableLimitError("tablesPerProject", "pointTables", counts.inProject + 1);
      }
      const table = await createPointTable(
        {
          projectId: project.id,
          loadCaseId: loadCase.id,
          fileName: body.fileName,
          sizeBytes: body.sizeBytes,
          sha256: body.sha256,
          layout: body.layout,
          columns: body.columns,
          unit: body.unit,
          idKind: body.idKind,
          createdBy: user.id,
        },
        transaction,
      );
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: project.id,
        entityType: "point-table",
        entityId: table.id,
        action: "create",
        summary: `added the point table "${table.fileName}" to "${loadCase.name}" in "${project.name}"`,
        changes: { after: { fileName: table.fileName, sizeBytes: table.sizeBytes, sha256: table.sha256 } },
      });
      return table;
    });
    res.status(201).json(presentPointTable(created, await peopleById([user.id]), null));
  };
}

/**
 * PUT …/content: the file's bytes, parsed as they arrive and checked against the declaration;
 * then stored as binary chunks in one transaction (cut by the upload worker, the next while one is
 * written), evaluated, and answered with the table's summary.
 */
export function putContentHandler(context: AppContext): RouteHandler<TableParams, NoInput, NoInput> {
  return async (req, res) => {
    const { workspace } = currentMembership(res);
    const params = res.locals.input.params;
    const found = await findTable(workspace.id, params);
    if (found.table.status === "ready") {
      throw errors.conflictWithId(
        "content_present",
        `The point table "${found.table.fileName}" already holds its points; declare a new table to upload another file.`,
      );
    }
    const { summary, parse } = await receiveContent(req, found.table);
    let stored: PointTableRow;
    try {
      stored = await context.sequelize.transaction(async (transaction) => {
        const { table } = await findTable(workspace.id, params, { transaction, lock: true });
        if (table.status === "ready") {
          throw errors.conflictWithId(
            "content_present",
            `The point table "${table.fileName}" received its points from another upload meanwhile.`,
          );
        }
        return storePointTableContent(
          table.id,
          {
            chunks: parse.chunks(summary.chunkCount),
            pointCount: summary.count,
            hasCoordinates: summary.hasCoordinates,
            badRows: summary.badRows,
          },
          transaction,
        );
      });
    } finally {
      await parse.drop();
    }
    const evaluation = await currentEvaluation(
      stored,
      await loadRating(found.project, found.loadCase.category),
    );
    const people = await peopleById([stored.createdBy]);
    res.json(presentPointTable(stored, people, evaluation && evaluationSummaryOf(evaluation)));
  };
}

export const getColumnsHandler: RouteHandler<TableParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const { table } = await findTable(workspace.id, res.locals.input.params);
  assertReady(table);
  await sendColumns(res, table);
};

export const getIdsHandler: RouteHandler<TableParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const { table } = await findTable(workspace.id, res.locals.input.params);
  assertReady(table);
  await sendIds(res, table);
};

export const downloadHandler: RouteHandler<TableParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const { table } = await findTable(workspace.id, res.locals.input.params);
  assertReady(table);
  await sendCsv(res, table);
};

export function deletePointTableHandler(context: AppContext): RouteHandler<TableParams, NoInput, NoInput> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    await context.sequelize.transaction(async (transaction) => {
      const { project, loadCase, table } = await findTable(workspace.id, res.locals.input.params, {
        transaction,
        lock: true,
      });
      await deletePointTable(table.id, transaction);
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: project.id,
        entityType: "point-table",
        entityId: table.id,
        action: "delete",
        summary: `deleted the point table "${table.fileName}" of "${loadCase.name}" in "${project.name}"`,
        changes: { before: { fileName: table.fileName, pointCount: table.pointCount, sha256: table.sha256 } },
      });
    });
    res.status(204).end();
  };
}
