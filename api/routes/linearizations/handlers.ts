import type { Transaction } from "sequelize";
import { LINEARIZATION_LIMITS } from "../../../core/contract/limits";
import type {
  LinearizationInputBody,
  PathFromPointTableBody,
  UpdateLinearizationBody,
} from "../../../core/contract/linearizations";
import {
  countLinearizations,
  createLinearization,
  deleteLinearization,
  findLinearization,
  listLinearizations,
  updateLinearization,
  type LinearizationRow,
} from "../../../db/repositories/linearizations";
import { findLiveLoadCase } from "../../../db/repositories/load-cases";
import { findLiveLocation } from "../../../db/repositories/locations";
import { findPointTable } from "../../../db/repositories/point-tables";
import type { ProjectRow } from "../../../db/repositories/projects";
import { currentMembership, currentUser } from "../../auth/guards";
import type { AppContext } from "../../context";
import { recordAudit } from "../../domain/audit/record";
import {
  allowablesFor,
  computeLinearization,
  storedInputOf,
  summaryOf,
} from "../../domain/linearizations/compute";
import { materialOfLine } from "../../domain/linearizations/material";
import { pathFromStoredTable } from "../../domain/linearizations/point-table-path";
import { peopleById } from "../../domain/projects/people";
import { findProject } from "../../domain/projects/scope";
import { assertVersion } from "../../domain/projects/versioning";
import { errors, HttpError } from "../../errors";
import type { RouteHandler } from "../../openapi/registry";
import { presentLinearization, presentLinearizationSummary } from "./presenter";

type NoInput = Record<string, never>;
type CaseParams = { workspaceId: string; projectId: string; loadCaseId: string };
type LineParams = CaseParams & { linearizationId: string };

async function findCase(projectId: string, loadCaseId: string, transaction?: Transaction, lock = false) {
  const c = await findLiveLoadCase(projectId, loadCaseId, { transaction, lock });
  if (!c) throw errors.notFound("This load case");
  return c;
}

async function findLine(loadCaseId: string, id: string, transaction?: Transaction) {
  const line = await findLinearization(loadCaseId, id, { transaction, lock: true });
  if (!line) throw errors.notFound("This linearization");
  return line;
}

/** Refuses (400 naming `locationId`) a location that is not a live location of the project. */
async function assertLocation(projectId: string, locationId: string | null, transaction?: Transaction) {
  if (locationId === null) return;
  if (!(await findLiveLocation(projectId, locationId, { transaction }))) {
    throw errors.invalidInput([{ path: "locationId", message: "is not a location of this project" }]);
  }
}

/** The stored input, summary and the view of a body, computed by the server with core. */
async function computeBody(project: ProjectRow, body: LinearizationInputBody, transaction?: Transaction) {
  await assertLocation(project.id, body.locationId, transaction);
  const input = storedInputOf(body);
  const material =
    input.allowables.source === "material"
      ? await materialOfLine(project, body.locationId, transaction)
      : null;
  const result = computeLinearization(input, allowablesFor(input, material));
  return { input, result, summary: summaryOf(input, result) };
}

async function present(row: LinearizationRow, transaction?: Transaction) {
  return presentLinearization(row, await peopleById([row.updatedBy, row.createdBy], transaction));
}

/** `GET …/linearizations`: the case's lines, without their points. */
export const listLinearizationsHandler: RouteHandler<CaseParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const { projectId, loadCaseId } = res.locals.input.params;
  const project = await findProject(workspace.id, projectId);
  const c = await findCase(project.id, loadCaseId);
  const rows = await listLinearizations(c.id);
  res.set("Cache-Control", "no-store").json({ linearizations: rows.map(presentLinearizationSummary) });
};

/** `POST …/linearizations/preview`: the result of a line the server computes without saving it. */
export const previewLinearizationHandler: RouteHandler<CaseParams, NoInput, LinearizationInputBody> = async (
  _req,
  res,
) => {
  const { workspace } = currentMembership(res);
  const { projectId, loadCaseId } = res.locals.input.params;
  const project = await findProject(workspace.id, projectId);
  await findCase(project.id, loadCaseId);
  const { result } = await computeBody(project, res.locals.input.body);
  res.set("Cache-Control", "no-store").json({ result });
};

/**
 * `POST …/linearizations/path-from-point-table`: the path picked out of one of the case's stored
 * point tables (points within the tolerance of the line between two ends), not saved: the browser
 * puts it in the form. 400 naming `tableId` for a table that is not the case's, has no points yet
 * or has no x y z columns.
 */
export const pathFromPointTableHandler: RouteHandler<CaseParams, NoInput, PathFromPointTableBody> = async (
  _req,
  res,
) => {
  const { workspace } = currentMembership(res);
  const { projectId, loadCaseId } = res.locals.input.params;
  const body = res.locals.input.body;
  const project = await findProject(workspace.id, projectId);
  const c = await findCase(project.id, loadCaseId);
  const table = await findPointTable(c.id, body.tableId);
  const refuse = (message: string) => errors.invalidInput([{ path: "tableId", message }]);
  if (!table) throw refuse("is not a point table of this load case");
  if (table.status !== "ready") {
    throw refuse(`the point table "${table.fileName}" has no points yet; send its file first`);
  }
  if (!table.hasCoordinates) {
    throw refuse(
      `the point table "${table.fileName}" has no x y z columns, so no point can be placed on a line; map its coordinate columns when uploading it`,
    );
  }
  res.set("Cache-Control", "no-store").json(await pathFromStoredTable(table, body));
};

/** `GET …/linearizations/{id}`: the line with its inputs and result. */
export const getLinearizationHandler: RouteHandler<LineParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const { projectId, loadCaseId, linearizationId } = res.locals.input.params;
  const project = await findProject(workspace.id, projectId);
  const c = await findCase(project.id, loadCaseId);
  const row = await findLinearization(c.id, linearizationId);
  if (!row) throw errors.notFound("This linearization");
  res.set("Cache-Control", "no-store").json({ linearization: await present(row) });
};

export function createLinearizationHandler(
  context: AppContext,
): RouteHandler<CaseParams, NoInput, LinearizationInputBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const body = res.locals.input.body;
    const { projectId, loadCaseId } = res.locals.input.params;
    const created = await context.sequelize.transaction(async (transaction) => {
      const project = await findProject(workspace.id, projectId, { transaction });
      // The case's row lock serialises creates in one case, so two cannot both pass the limit.
      const c = await findCase(project.id, loadCaseId, transaction, true);
      const count = await countLinearizations(c.id, transaction);
      if (count + 1 > LINEARIZATION_LIMITS.linesPerLoadCase) {
        throw new HttpError(
          400,
          "project_limit",
          `A load case holds at most ${LINEARIZATION_LIMITS.linesPerLoadCase} linearizations (limit "linesPerLoadCase"). Remove one first.`,
          {
            limit: "linesPerLoadCase",
            max: LINEARIZATION_LIMITS.linesPerLoadCase,
            requested: count + 1,
            path: "linearizations",
          },
        );
      }
      const { input, summary } = await computeBody(project, body, transaction);
      const row = await createLinearization(
        {
          projectId: project.id,
          loadCaseId: c.id,
          locationId: body.locationId,
          name: body.name,
          input: input as unknown as Record<string, unknown>,
          summary: summary as unknown as Record<string, unknown>,
          createdBy: user.id,
          updatedBy: user.id,
        },
        transaction,
      );
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: project.id,
        entityType: "linearization",
        entityId: row.id,
        action: "create",
        summary: `saved the linearization "${row.name}" under "${c.name}"`,
        changes: {
          after: { name: row.name, checks: summary.checks.map((k) => [k.rule, k.ratio, k.verdict]) },
        },
      });
      return present(row, transaction);
    });
    res.status(201).json({ linearization: created });
  };
}

/** A write's transaction found the line at another version than the one sent: nothing was written. */
const STALE = Symbol("stale version");

export function updateLinearizationHandler(
  context: AppContext,
): RouteHandler<LineParams, NoInput, UpdateLinearizationBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const { version, ...body } = res.locals.input.body;
    const { projectId, loadCaseId, linearizationId } = res.locals.input.params;
    const updated = await context.sequelize.transaction(async (transaction) => {
      const project = await findProject(workspace.id, projectId, { transaction });
      const c = await findCase(project.id, loadCaseId, transaction);
      const found = await findLine(c.id, linearizationId, transaction);
      if (found.version !== version) return STALE;
      const { input, summary } = await computeBody(project, body, transaction);
      const row = await updateLinearization(
        found.id,
        {
          name: body.name,
          locationId: body.locationId,
          input: input as unknown as Record<string, unknown>,
          summary: summary as unknown as Record<string, unknown>,
          version: found.version + 1,
          updatedBy: user.id,
        },
        transaction,
      );
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: project.id,
        entityType: "linearization",
        entityId: row.id,
        action: "update",
        summary: `changed the linearization "${row.name}" under "${c.name}"`,
        changes: { before: found.input, after: input },
      });
      return present(row, transaction);
    });
    if (updated === STALE) {
      // Read afresh after the transaction, so the row lock is held no longer than the write needed.
      const project = await findProject(workspace.id, projectId);
      const row = await findLinearization(loadCaseId, linearizationId);
      if (!row) throw errors.notFound("This linearization");
      const current = await present(row);
      assertVersion(row, version, `The linearization "${row.name}"`, () => current);
      throw new Error(
        `linearization ${linearizationId} of ${project.id} was stale at version ${version} but is now at it`,
      );
    }
    res.json({ linearization: updated });
  };
}

/**
 * `DELETE`: the line is deleted for good (lines have no trash); the audit trail keeps its inputs,
 * so it can be typed in again.
 */
export function deleteLinearizationHandler(context: AppContext): RouteHandler<LineParams, NoInput, NoInput> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const { projectId, loadCaseId, linearizationId } = res.locals.input.params;
    await context.sequelize.transaction(async (transaction) => {
      const project = await findProject(workspace.id, projectId, { transaction });
      const c = await findCase(project.id, loadCaseId, transaction);
      const row = await findLine(c.id, linearizationId, transaction);
      await deleteLinearization(row.id, transaction);
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: project.id,
        entityType: "linearization",
        entityId: row.id,
        action: "delete",
        summary: `deleted the linearization "${row.name}" under "${c.name}"`,
        changes: { before: { name: row.name, locationId: row.locationId, input: row.input } },
      });
    });
    res.status(204).end();
  };
}
