import type { Transaction } from "sequelize";
import { convertStress, type StressUnit } from "../../../core";
import type { CreateMaterialBody, MaterialInput, UpdateMaterialBody } from "../../../core/contract/materials";
import {
  createMaterial,
  findLiveMaterial,
  listLiveMaterials,
  updateMaterial,
  type MaterialRow,
} from "../../../db/repositories/materials";
import { markDeleted } from "../../../db/repositories/trash";
import { currentMembership, currentUser } from "../../auth/guards";
import type { AppContext } from "../../context";
import { errors } from "../../errors";
import type { RouteHandler } from "../../openapi/registry";
import { changedFields, recordAudit } from "../../domain/audit/record";
import { peopleById } from "../../domain/projects/people";
import { assertVersion } from "../../domain/projects/versioning";
import { presentMaterial, presentPublished } from "./presenter";

type NoInput = Record<string, never>;
type WorkspaceParams = { workspaceId: string };
type MaterialParams = WorkspaceParams & { materialId: string };

const toPa = (value: number | null | undefined, unit: StressUnit) =>
  value === null || value === undefined ? value : convertStress(value, unit, "Pa");

/** The stored columns for the strengths given in `unit` (fields absent stay absent). */
function columnsFor(input: Partial<MaterialInput>, unit: StressUnit) {
  return {
    yieldPa: toPa(input.yield, unit),
    ultimateTensionPa: toPa(input.ultimateTension, unit),
    ultimateCompressionPa: toPa(input.ultimateCompression, unit),
    elasticModulusPa: toPa(input.elasticModulus, unit),
  };
}

/** The fields the audit trail compares for a material. */
function auditFields(m: MaterialRow) {
  return {
    name: m.name,
    unit: m.unit,
    yieldPa: m.yieldPa,
    ultimateTensionPa: m.ultimateTensionPa,
    ultimateCompressionPa: m.ultimateCompressionPa,
    elasticModulusPa: m.elasticModulusPa,
    poissonRatio: m.poissonRatio,
    reference: m.reference,
    note: m.note,
  };
}

async function findMaterial(workspaceId: string, materialId: string, transaction?: Transaction) {
  const m = await findLiveMaterial(workspaceId, materialId, { transaction, lock: true });
  if (!m) throw errors.notFound("This material");
  return m;
}

async function present(m: MaterialRow) {
  return presentMaterial(m, await peopleById([m.updatedBy, m.createdBy]));
}

export const listMaterialsHandler: RouteHandler<WorkspaceParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const rows = await listLiveMaterials(workspace.id);
  const people = await peopleById(rows.flatMap((m) => [m.updatedBy, m.createdBy]));
  res.set("Cache-Control", "no-store").json({
    materials: rows.map((m) => presentMaterial(m, people)),
    published: presentPublished(),
  });
};

export const getMaterialHandler: RouteHandler<MaterialParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const m = await findMaterial(workspace.id, res.locals.input.params.materialId);
  res.set("Cache-Control", "no-store").json({ material: await present(m) });
};

export function createMaterialHandler(
  context: AppContext,
): RouteHandler<WorkspaceParams, NoInput, CreateMaterialBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const body = res.locals.input.body;
    const material = await context.sequelize.transaction(async (transaction) => {
      const created = await createMaterial(
        {
          workspaceId: workspace.id,
          name: body.name,
          unit: body.unit,
          ...columnsFor(body, body.unit),
          poissonRatio: body.poissonRatio,
          reference: body.reference,
          note: body.note,
          createdBy: user.id,
          updatedBy: user.id,
        },
        transaction,
      );
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: null,
        entityType: "material",
        entityId: created.id,
        action: "create",
        summary: `added the material "${created.name}" to the library`,
        changes: { after: auditFields(created) },
      });
      return created;
    });
    res.status(201).json({ material: await present(material) });
  };
}

export function updateMaterialHandler(
  context: AppContext,
): RouteHandler<MaterialParams, NoInput, UpdateMaterialBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const { version, ...body } = res.locals.input.body;
    const material = await context.sequelize.transaction(async (transaction) => {
      const m = await findMaterial(workspace.id, res.locals.input.params.materialId, transaction);
      const people = await peopleById([m.updatedBy, m.createdBy], transaction);
      assertVersion(m, version, `The material "${m.name}"`, () => presentMaterial(m, people));
      const before = auditFields(m);
      // Values sent without a unit are in the unit the material already has; strengths not sent keep their Pa values.
      const unit = (body.unit ?? m.unit) as StressUnit;
      const strengths = columnsFor(body, unit);
      const updated = await updateMaterial(
        m.id,
        {
          ...(body.name !== undefined && { name: body.name }),
          ...(body.unit !== undefined && { unit: body.unit }),
          ...Object.fromEntries(Object.entries(strengths).filter(([, v]) => v !== undefined)),
          ...(body.poissonRatio !== undefined && { poissonRatio: body.poissonRatio }),
          ...(body.reference !== undefined && { reference: body.reference }),
          ...(body.note !== undefined && { note: body.note }),
          version: m.version + 1,
          updatedBy: user.id,
        },
        transaction,
      );
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: null,
        entityType: "material",
        entityId: m.id,
        action: "update",
        summary: `changed the material "${updated.name}"`,
        changes: changedFields(before, auditFields(updated)),
      });
      return updated;
    });
    res.json({ material: await present(material) });
  };
}

export function deleteMaterialHandler(context: AppContext): RouteHandler<MaterialParams, NoInput, NoInput> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    await context.sequelize.transaction(async (transaction) => {
      const m = await findMaterial(workspace.id, res.locals.input.params.materialId, transaction);
      await markDeleted("material", m.id, user.id, transaction);
      await recordAudit(transaction, user, {
        workspaceId: workspace.id,
        projectId: null,
        entityType: "material",
        entityId: m.id,
        action: "delete",
        summary: `moved the material "${m.name}" to the trash`,
      });
    });
    res.status(204).end();
  };
}
