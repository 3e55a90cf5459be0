import {
  categoryRequirementIssues,
  type CategoryRequirement,
  type CreateProjectBody,
  type Requirement,
  type UpdateProjectBody,
} from "../../../core/contract/projects";
import {
  createProject,
  listLiveProjects,
  projectCounts,
  updateProject,
  type ProjectRow,
} from "../../../db/repositories/projects";
import { markDeleted } from "../../../db/repositories/trash";
import { currentMembership, currentUser } from "../../auth/guards";
import { errors } from "../../errors";
import type { AppContext } from "../../context";
import type { RouteHandler } from "../../openapi/registry";
import { changedFields, recordAudit } from "../../domain/audit/record";
import { assertMaterialRef, columnsFromRef } from "../../domain/materials/resolve";
import { peopleById } from "../../domain/projects/people";
import { presentProject, projectAuditFields } from "./presenter";
import { findProject } from "../../domain/projects/scope";
import { assertVersion } from "../../domain/projects/versioning";

type NoInput = Record<string, never>;
type WorkspaceParams = { workspaceId: string };
type ProjectParams = WorkspaceParams & { projectId: string };

async function present(p: ProjectRow) {
  const counts = await projectCounts([p.id]);
  return presentProject(p, counts.get(p.id)!, await peopleById([p.createdBy, p.updatedBy]));
}

export const listProjectsHandler: RouteHandler<WorkspaceParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const rows = await listLiveProjects(workspace.id);
  const counts = await projectCounts(rows.map((p) => p.id));
  const people = await peopleById(rows.flatMap((p) => [p.createdBy, p.updatedBy]));
  res
    .set("Cache-Control", "no-store")
    .json({ projects: rows.map((p) => presentProject(p, counts.get(p.id)!, people)) });
};

export const getProjectHandler: RouteHandler<ProjectParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const project = await findProject(workspace.id, res.locals.input.params.projectId);
  res.set("Cache-Control", "no-store").json({ project: await present(project) });
};

export function createProjectHandler(
  context: AppContext,
): RouteHandler<WorkspaceParams, NoInput, CreateProjectBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const body = res.locals.input.body;
    const project = await context.sequelize.transaction(async (transaction) => {
      await assertMaterialRef(workspace.id, body.defaultMaterial, "defaultMaterial", transaction);
      const columns = columnsFromRef(body.defaultMaterial);
      const created = await createProject(
        {
          workspaceId: workspace.id,
          name: body.name,
          description: body.description,
          unitSystem: body.unitSystem,
          requirements: body.requirements,
          categoryRequirements: body.categoryRequirements,
          includeUnsuitedCriteria: body.includeUnsuitedCriteria,
          defaultMaterialId: columns.materialId,
          defaultPublishedMaterial: columns.publishedMaterial,
          createdBy: user.id,
          updatedBy: user.id,
        },
        transaction,
      );
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: created.id,
        entityType: "project",
        entityId: created.id,
        action: "create",
        summary: `created the project "${created.name}"`,
        changes: { after: projectAuditFields(created) },
      });
      return created;
    });
    res.status(201).json({ project: await present(project) });
  };
}

export function updateProjectHandler(
  context: AppContext,
): RouteHandler<ProjectParams, NoInput, UpdateProjectBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const { version, defaultMaterial, ...body } = res.locals.input.body;
    const project = await context.sequelize.transaction(async (transaction) => {
      const p = await findProject(workspace.id, res.locals.input.params.projectId, {
        transaction,
        lock: true,
      });
      const counts = await projectCounts([p.id], transaction);
      const people = await peopleById([p.createdBy, p.updatedBy], transaction);
      assertVersion(p, version, `The project "${p.name}"`, () =>
        presentProject(p, counts.get(p.id)!, people),
      );
      await assertMaterialRef(workspace.id, defaultMaterial, "defaultMaterial", transaction);
      // A category's factors must name criteria the project checks, whichever of the two changes.
      const issues = categoryRequirementIssues(
        body.requirements ?? (p.requirements as Requirement[]),
        body.categoryRequirements ?? (p.categoryRequirements as CategoryRequirement[]),
      );
      if (issues.length > 0) {
        throw errors.invalidInput(issues.map((i) => ({ path: i.path.join("."), message: i.message })));
      }
      const before = projectAuditFields(p);
      const material =
        defaultMaterial === undefined
          ? {}
          : {
              defaultMaterialId: columnsFromRef(defaultMaterial).materialId,
              defaultPublishedMaterial: columnsFromRef(defaultMaterial).publishedMaterial,
            };
      const updated = await updateProject(
        p.id,
        { ...body, ...material, version: p.version + 1, updatedBy: user.id },
        transaction,
      );
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: p.id,
        entityType: "project",
        entityId: p.id,
        action: "update",
        summary: `changed the project "${updated.name}"`,
        changes: changedFields(before, projectAuditFields(updated)),
      });
      return updated;
    });
    res.json({ project: await present(project) });
  };
}

export function deleteProjectHandler(context: AppContext): RouteHandler<ProjectParams, NoInput, NoInput> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    await context.sequelize.transaction(async (transaction) => {
      const p = await findProject(workspace.id, res.locals.input.params.projectId, {
        transaction,
        lock: true,
      });
      await markDeleted("project", p.id, user.id, transaction);
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: p.id,
        entityType: "project",
        entityId: p.id,
        action: "delete",
        summary: `moved the project "${p.name}" to the trash`,
      });
    });
    res.status(204).end();
  };
}
