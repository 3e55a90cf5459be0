import type { Transaction } from "sequelize";
import type { CreateLocationBody, UpdateLocationBody } from "../../../core/contract/projects";
import {
  countLiveLocations,
  createLocation,
  findLiveLocation,
  listLiveLocations,
  nextLocationPosition,
  updateLocation,
} from "../../../db/repositories/locations";
import { currentMembership, currentUser } from "../../auth/guards";
import type { AppContext } from "../../context";
import { errors } from "../../errors";
import type { RouteHandler } from "../../openapi/registry";
import { changedFields, recordAudit } from "../../domain/audit/record";
import { moveToTrashHandler } from "../../domain/trash/move-to-trash";
import { assertMaterialRef, columnsFromRef } from "../../domain/materials/resolve";
import { assertWithinLimit } from "../../domain/projects/limits";
import { findProject } from "../../domain/projects/scope";
import { assertVersion } from "../../domain/projects/versioning";
import { locationAuditFields, presentLocation } from "./presenter";

type NoInput = Record<string, never>;
type ProjectParams = { workspaceId: string; projectId: string };
type LocationParams = ProjectParams & { locationId: string };

async function findLocation(projectId: string, locationId: string, transaction?: Transaction) {
  const l = await findLiveLocation(projectId, locationId, { transaction, lock: true });
  if (!l) throw errors.notFound("This location");
  return l;
}

export const listLocationsHandler: RouteHandler<ProjectParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const project = await findProject(workspace.id, res.locals.input.params.projectId);
  const rows = await listLiveLocations(project.id);
  res.set("Cache-Control", "no-store").json({ locations: rows.map(presentLocation) });
};

export const getLocationHandler: RouteHandler<LocationParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const { projectId, locationId } = res.locals.input.params;
  const project = await findProject(workspace.id, projectId);
  res
    .set("Cache-Control", "no-store")
    .json({ location: presentLocation(await findLocation(project.id, locationId)) });
};

export function createLocationHandler(
  context: AppContext,
): RouteHandler<ProjectParams, NoInput, CreateLocationBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const body = res.locals.input.body;
    const location = await context.sequelize.transaction(async (transaction) => {
      const project = await findProject(workspace.id, res.locals.input.params.projectId, {
        transaction,
        lock: true,
      });
      await assertMaterialRef(workspace.id, body.material, "material", transaction);
      assertWithinLimit("locations", await countLiveLocations(project.id, transaction), 1, "locations");
      const columns = columnsFromRef(body.material);
      const created = await createLocation(
        {
          projectId: project.id,
          name: body.name,
          note: body.note,
          materialId: columns.materialId,
          publishedMaterial: columns.publishedMaterial,
          position: await nextLocationPosition(project.id, transaction),
          createdBy: user.id,
          updatedBy: user.id,
        },
        transaction,
      );
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: project.id,
        entityType: "location",
        entityId: created.id,
        action: "create",
        summary: `added the location "${created.name}" to "${project.name}"`,
        changes: { after: locationAuditFields(created) },
      });
      return created;
    });
    res.status(201).json({ location: presentLocation(location) });
  };
}

export function updateLocationHandler(
  context: AppContext,
): RouteHandler<LocationParams, NoInput, UpdateLocationBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const { version, material, ...body } = res.locals.input.body;
    const location = await context.sequelize.transaction(async (transaction) => {
      const project = await findProject(workspace.id, res.locals.input.params.projectId, { transaction });
      const l = await findLocation(project.id, res.locals.input.params.locationId, transaction);
      assertVersion(l, version, `The location "${l.name}"`, () => presentLocation(l));
      await assertMaterialRef(workspace.id, material, "material", transaction);
      const before = locationAuditFields(l);
      const columns =
        material === undefined
          ? {}
          : {
              materialId: columnsFromRef(material).materialId,
              publishedMaterial: columnsFromRef(material).publishedMaterial,
            };
      const updated = await updateLocation(
        l.id,
        { ...body, ...columns, version: l.version + 1, updatedBy: user.id },
        transaction,
      );
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: project.id,
        entityType: "location",
        entityId: l.id,
        action: "update",
        summary: `changed the location "${updated.name}" in "${project.name}"`,
        changes: changedFields(before, locationAuditFields(updated)),
      });
      return updated;
    });
    res.json({ location: presentLocation(location) });
  };
}

/** `DELETE`: the location goes to the trash. */
export const deleteLocationHandler = (context: AppContext) =>
  moveToTrashHandler<LocationParams>(context, {
    kind: "location",
    noun: "location",
    find: (projectId, params, transaction) => findLocation(projectId, params.locationId, transaction),
  });
