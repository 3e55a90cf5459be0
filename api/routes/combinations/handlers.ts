import type { Transaction } from "sequelize";
import {
  SUPERPOSITION_CAUTION,
  type CreateCombinationBody,
  type UpdateCombinationBody,
} from "../../../core/contract/combinations";
import {
  countLiveCombinations,
  createCombination,
  findLiveCombination,
  listLiveCombinations,
  nextCombinationPosition,
  replaceTerms,
  updateCombination,
  type CombinationRow,
} from "../../../db/repositories/combinations";
import { liveLoadCaseIdsAmong } from "../../../db/repositories/load-cases";
import { listLiveLocations } from "../../../db/repositories/locations";
import { currentStatesOf } from "../../../db/repositories/stress-states";
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
import { combinationFormula, presentCombination } from "./presenter";
import { stateIndex, superposeAt } from "../../domain/combinations/superpose";
import { termsOf } from "../../domain/combinations/terms";

type NoInput = Record<string, never>;
type ProjectParams = { workspaceId: string; projectId: string };
type CombinationParams = ProjectParams & { combinationId: string };
type TermInput = { loadCaseId: string; factor: number };

async function findCombination(projectId: string, combinationId: string, transaction?: Transaction) {
  const c = await findLiveCombination(projectId, combinationId, { transaction, lock: true });
  if (!c) throw errors.notFound("This combination");
  return c;
}

/** Refuses (400 naming `terms.i.loadCaseId`) cases that are not live cases of the project. */
async function assertProjectCases(projectId: string, terms: TermInput[], transaction: Transaction) {
  const known = await liveLoadCaseIdsAmong(
    projectId,
    terms.map((t) => t.loadCaseId),
    transaction,
  );
  const problems = terms
    .map((t, i) =>
      known.has(t.loadCaseId)
        ? null
        : { path: `terms.${i}.loadCaseId`, message: "is not a load case of this project" },
    )
    .filter((p) => p !== null);
  if (problems.length) throw errors.invalidInput(problems);
}

async function present(c: CombinationRow, transaction?: Transaction) {
  const terms = (await termsOf([c], transaction)).get(c.id)!;
  return presentCombination(c, terms, await peopleById([c.updatedBy, c.createdBy], transaction));
}

/** A write's transaction found the combination at another version than the one sent: nothing was written. */
const STALE = Symbol("stale version");

/** The 409 for a write based on an old version, built after its transaction ended (the row lock is held no longer than the read). */
async function refuseStale(projectId: string, combinationId: string, sentVersion: number) {
  // The transaction has just found the project in this workspace; the combination is read afresh for its version.
  const c = await findCombination(projectId, combinationId);
  const current = await present(c);
  assertVersion(c, sentVersion, `The combination "${c.name}"`, () => current);
  // Versions only grow, so a stale version cannot become current again.
  throw new Error(`combination ${combinationId} was stale at version ${sentVersion} but is now at it`);
}

export const listCombinationsHandler: RouteHandler<ProjectParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const project = await findProject(workspace.id, res.locals.input.params.projectId);
  const rows = await listLiveCombinations(project.id);
  const terms = await termsOf(rows);
  const people = await peopleById(rows.flatMap((c) => [c.updatedBy, c.createdBy]));
  res
    .set("Cache-Control", "no-store")
    .json({ combinations: rows.map((c) => presentCombination(c, terms.get(c.id)!, people)) });
};

export const getCombinationHandler: RouteHandler<CombinationParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const project = await findProject(workspace.id, res.locals.input.params.projectId);
  const c = await findCombination(project.id, res.locals.input.params.combinationId);
  res.set("Cache-Control", "no-store").json({ combination: await present(c) });
};

/** The superposed state of the combination at every live location of the project. */
export const combinationResultsHandler: RouteHandler<CombinationParams, NoInput, NoInput> = async (
  _req,
  res,
) => {
  const { workspace } = currentMembership(res);
  const project = await findProject(workspace.id, res.locals.input.params.projectId);
  const c = await findCombination(project.id, res.locals.input.params.combinationId);
  const terms = (await termsOf([c])).get(c.id)!;
  const locations = await listLiveLocations(project.id);
  const states = stateIndex(await currentStatesOf(terms.map((t) => t.loadCaseId)));
  const results = locations.map((l) => {
    const s = superposeAt(terms, l.id, states);
    return s.status === "combined"
      ? { status: "combined" as const, locationId: l.id, locationName: l.name, componentsPa: s.tensorPa }
      : {
          status: "incomplete" as const,
          locationId: l.id,
          locationName: l.name,
          missingCases: s.missingCases,
        };
  });
  res.set("Cache-Control", "no-store").json({
    combination: presentCombination(c, terms, await peopleById([c.updatedBy, c.createdBy])),
    results,
    caution: SUPERPOSITION_CAUTION,
  });
};

export function createCombinationHandler(
  context: AppContext,
): RouteHandler<ProjectParams, NoInput, CreateCombinationBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const body = res.locals.input.body;
    const created = await context.sequelize.transaction(async (transaction) => {
      const project = await findProject(workspace.id, res.locals.input.params.projectId, {
        transaction,
        lock: true,
      });
      await assertProjectCases(project.id, body.terms, transaction);
      const live = await countLiveCombinations(project.id, transaction);
      assertWithinLimit("combinations", live, 1, "combinations");
      const c = await createCombination(
        {
          projectId: project.id,
          name: body.name,
          description: body.description,
          position: await nextCombinationPosition(project.id, transaction),
          createdBy: user.id,
          updatedBy: user.id,
        },
        body.terms,
        transaction,
      );
      const view = await present(c, transaction);
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: project.id,
        entityType: "combination",
        entityId: c.id,
        action: "create",
        summary: `created the combination "${c.name}" = ${combinationFormula(view.terms)}`,
        changes: { after: { name: c.name, description: c.description, terms: body.terms } },
      });
      return view;
    });
    res.status(201).json({ combination: created });
  };
}

export function updateCombinationHandler(
  context: AppContext,
): RouteHandler<CombinationParams, NoInput, UpdateCombinationBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const { version, terms, ...fields } = res.locals.input.body;
    const { projectId, combinationId } = res.locals.input.params;
    const updated = await context.sequelize.transaction(async (transaction) => {
      const project = await findProject(workspace.id, projectId, { transaction });
      const found = await findCombination(project.id, combinationId, transaction);
      if (found.version !== version) return STALE;
      const current = await present(found, transaction);
      if (terms) await assertProjectCases(project.id, terms, transaction);
      const before = {
        name: found.name,
        description: found.description,
        terms: current.terms.map(({ loadCaseId, factor }) => ({ loadCaseId, factor })),
      };
      const c = await updateCombination(
        found.id,
        { ...fields, version: found.version + 1, updatedBy: user.id },
        transaction,
      );
      if (terms) await replaceTerms(c.id, terms, transaction);
      const view = await present(c, transaction);
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: project.id,
        entityType: "combination",
        entityId: c.id,
        action: "update",
        summary: `changed the combination "${c.name}" (now ${combinationFormula(view.terms)})`,
        changes: changedFields(before, { name: c.name, description: c.description, terms }),
      });
      return view;
    });
    if (updated === STALE) return refuseStale(projectId, combinationId, version);
    res.json({ combination: updated });
  };
}

/** `DELETE`: the combination goes to the trash. */
export const deleteCombinationHandler = (context: AppContext) =>
  moveToTrashHandler<CombinationParams>(context, {
    kind: "combination",
    noun: "combination",
    find: (projectId, params, transaction) => findCombination(projectId, params.combinationId, transaction),
  });
