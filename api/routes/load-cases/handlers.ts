import type { Transaction } from "sequelize";
import type { CreateLoadCaseBody, PutStateBody, UpdateLoadCaseBody } from "../../../core/contract/load-cases";
import {
  countLiveLoadCases,
  createLoadCase,
  findLiveLoadCase,
  listLiveLoadCases,
  nextLoadCasePosition,
  updateLoadCase,
  type LoadCaseRow,
} from "../../../db/repositories/load-cases";
import { locationNames } from "../../../db/repositories/locations";
import { stateRevisions } from "../../../db/repositories/stress-states";
import { currentMembership, currentUser } from "../../auth/guards";
import type { AppContext } from "../../context";
import { errors } from "../../errors";
import type { RouteHandler } from "../../openapi/registry";
import { changedFields, recordAudit } from "../../domain/audit/record";
import { moveToTrashHandler } from "../../domain/trash/move-to-trash";
import { peopleById } from "../../domain/projects/people";
import { assertWithinLimit } from "../../domain/projects/limits";
import { findProject } from "../../domain/projects/scope";
import { assertVersion } from "../../domain/projects/versioning";
import { loadCaseAuditFields, presentLoadCases, presentState } from "./presenter";
import { assertProjectLocations, removeState, saveStateRevision } from "../../domain/load-cases/states";

type NoInput = Record<string, never>;
type ProjectParams = { workspaceId: string; projectId: string };
type CaseParams = ProjectParams & { loadCaseId: string };
type StateParams = CaseParams & { locationId: string };

/** The live load case, or 404; with a transaction it is locked FOR UPDATE (versions are compared under the lock). */
async function findLoadCase(projectId: string, loadCaseId: string, transaction?: Transaction) {
  const c = await findLiveLoadCase(projectId, loadCaseId, { transaction, lock: true });
  if (!c) throw errors.notFound("This load case");
  return c;
}

async function presentOne(c: LoadCaseRow, transaction?: Transaction) {
  return (await presentLoadCases([c], transaction))[0];
}

/** A write's transaction found the case at another version than the one sent: nothing was written. */
const STALE = Symbol("stale version");

/**
 * The 409 for a write based on an old version, built after its transaction ended: the row
 * lock is released at once, so fifty saves from one version queue on the lock for a read
 * each, not for a read and the presenter's three queries.
 */
async function refuseStale(projectId: string, loadCaseId: string, sentVersion: number) {
  // The transaction has just found the project in this workspace; the case is read afresh for its version.
  const c = await findLoadCase(projectId, loadCaseId);
  const current = await presentOne(c);
  assertVersion(c, sentVersion, `The load case "${c.name}"`, () => current);
  // Versions only grow, so a stale version cannot become current again.
  throw new Error(`load case ${loadCaseId} was stale at version ${sentVersion} but is now at it`);
}

export const listLoadCasesHandler: RouteHandler<ProjectParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const project = await findProject(workspace.id, res.locals.input.params.projectId);
  const cases = await listLiveLoadCases(project.id);
  res.set("Cache-Control", "no-store").json({ loadCases: await presentLoadCases(cases) });
};

export const getLoadCaseHandler: RouteHandler<CaseParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const project = await findProject(workspace.id, res.locals.input.params.projectId);
  const c = await findLoadCase(project.id, res.locals.input.params.loadCaseId);
  res.set("Cache-Control", "no-store").json({ loadCase: await presentOne(c) });
};

export function createLoadCaseHandler(
  context: AppContext,
): RouteHandler<ProjectParams, NoInput, CreateLoadCaseBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const body = res.locals.input.body;
    const created = await context.sequelize.transaction(async (transaction) => {
      const project = await findProject(workspace.id, res.locals.input.params.projectId, {
        transaction,
        lock: true,
      });
      const locationIds = body.states.map((s) => s.locationId);
      await assertProjectLocations(
        project.id,
        locationIds,
        body.states.map((_, i) => `states.${i}.locationId`),
        transaction,
      );
      assertWithinLimit("loadCases", await countLiveLoadCases(project.id, transaction), 1, "loadCases");
      const c = await createLoadCase(
        {
          projectId: project.id,
          name: body.name,
          category: body.category,
          description: body.description,
          position: await nextLoadCasePosition(project.id, transaction),
          createdBy: user.id,
          updatedBy: user.id,
        },
        transaction,
      );
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: project.id,
        entityType: "load-case",
        entityId: c.id,
        action: "create",
        summary: `created the load case "${c.name}" in "${project.name}"`,
        changes: { after: loadCaseAuditFields(c) },
      });
      const names = await locationNames(locationIds, transaction);
      for (const state of body.states) {
        await saveStateRevision(transaction, user, c.id, state, {
          workspaceId: workspace.id,
          projectId: project.id,
          caseName: c.name,
          locationName: names.get(state.locationId),
        });
      }
      return presentOne(c, transaction);
    });
    res.status(201).json({ loadCase: created });
  };
}

export function updateLoadCaseHandler(
  context: AppContext,
): RouteHandler<CaseParams, NoInput, UpdateLoadCaseBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const { version, states = [], removeStates = [], ...fields } = res.locals.input.body;
    const { projectId, loadCaseId } = res.locals.input.params;
    const updated = await context.sequelize.transaction(async (transaction) => {
      const project = await findProject(workspace.id, projectId, { transaction });
      const found = await findLoadCase(project.id, loadCaseId, transaction);
      if (found.version !== version) return STALE;
      const ids = [...states.map((s) => s.locationId), ...removeStates];
      await assertProjectLocations(
        project.id,
        ids,
        [
          ...states.map((_, i) => `states.${i}.locationId`),
          ...removeStates.map((_, i) => `removeStates.${i}`),
        ],
        transaction,
      );
      const before = loadCaseAuditFields(found);
      const c = await updateLoadCase(
        found.id,
        { ...fields, version: found.version + 1, updatedBy: user.id },
        transaction,
      );
      const changes = changedFields(before, loadCaseAuditFields(c));
      if (Object.keys(changes).length > 0) {
        await recordAudit(transaction, user, {
          workspaceId: workspace.id,
          projectId: project.id,
          entityType: "load-case",
          entityId: c.id,
          action: "update",
          summary: `changed the load case "${c.name}" in "${project.name}"`,
          changes,
        });
      }
      const names = await locationNames(ids, transaction);
      const scope = (locationId: string) => ({
        workspaceId: workspace.id,
        projectId: project.id,
        caseName: c.name,
        locationName: names.get(locationId),
      });
      for (const state of states)
        await saveStateRevision(transaction, user, c.id, state, scope(state.locationId));
      for (const locationId of removeStates)
        await removeState(transaction, user, c.id, locationId, scope(locationId));
      return presentOne(c, transaction);
    });
    if (updated === STALE) return refuseStale(projectId, loadCaseId, version);
    res.json({ loadCase: updated });
  };
}

/** Saves one location's state (the bench's "save back"): a new revision, the case's version raised. */
export function putStateHandler(context: AppContext): RouteHandler<StateParams, NoInput, PutStateBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const { version, ...state } = res.locals.input.body;
    const { projectId, loadCaseId, locationId } = res.locals.input.params;
    const updated = await context.sequelize.transaction(async (transaction) => {
      const project = await findProject(workspace.id, projectId, { transaction });
      const found = await findLoadCase(project.id, loadCaseId, transaction);
      if (found.version !== version) return STALE;
      await assertProjectLocations(project.id, [locationId], ["params.locationId"], transaction);
      const names = await locationNames([locationId], transaction);
      const c = await updateLoadCase(
        found.id,
        { version: found.version + 1, updatedBy: user.id },
        transaction,
      );
      await saveStateRevision(
        transaction,
        user,
        c.id,
        { locationId, ...state },
        {
          workspaceId: workspace.id,
          projectId: project.id,
          caseName: c.name,
          locationName: names.get(locationId),
        },
      );
      return presentOne(c, transaction);
    });
    if (updated === STALE) return refuseStale(projectId, loadCaseId, version);
    res.json({ loadCase: updated });
  };
}

export const stateHistoryHandler: RouteHandler<StateParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const { projectId, loadCaseId, locationId } = res.locals.input.params;
  const project = await findProject(workspace.id, projectId);
  const c = await findLoadCase(project.id, loadCaseId);
  const rows = await stateRevisions(c.id, locationId);
  const people = await peopleById(rows.map((r) => r.createdBy));
  res.set("Cache-Control", "no-store").json({ revisions: rows.map((r) => presentState(r, people)) });
};

/** `DELETE`: the load case goes to the trash. */
export const deleteLoadCaseHandler = (context: AppContext) =>
  moveToTrashHandler<CaseParams>(context, {
    kind: "load-case",
    noun: "load case",
    find: (projectId, params, transaction) => findLoadCase(projectId, params.loadCaseId, transaction),
  });
