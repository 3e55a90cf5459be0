import type { Model, ModelStatic, Transaction, WhereOptions } from "sequelize";
import type { TrashKind } from "../../core/contract/projects";
import type { AuditEntityType } from "../models/audit-event";
import { Combination } from "../models/combination";
import { LoadCase } from "../models/load-case";
import { Location } from "../models/location";
import { Material } from "../models/material";
import { Project } from "../models/project";
import { countLive } from "./plain";

/** A row that can be in the trash, as a plain object. */
export type TrashableRow = {
  id: string;
  name: string;
  deletedAt: Date | null;
  deletedBy: string | null;
  projectId?: string;
  workspaceId?: string;
};

/** Where each kind lives: its model, and whether it hangs off a project or straight off the workspace. */
export const TRASH_TABLES: Record<
  TrashKind,
  { model: ModelStatic<Model>; scope: "workspace" | "project"; entity: AuditEntityType; label: string }
> = {
  project: { model: Project, scope: "workspace", entity: "project", label: "project" },
  material: { model: Material, scope: "workspace", entity: "material", label: "material" },
  location: { model: Location, scope: "project", entity: "location", label: "location" },
  "load-case": { model: LoadCase, scope: "project", entity: "load-case", label: "load case" },
  combination: { model: Combination, scope: "project", entity: "combination", label: "combination" },
};

const plainTrashable = (row: Model): TrashableRow => {
  const r = row.get({ plain: true }) as TrashableRow;
  return {
    id: r.id,
    name: r.name,
    deletedAt: r.deletedAt,
    deletedBy: r.deletedBy,
    ...(r.projectId !== undefined && { projectId: r.projectId }),
    ...(r.workspaceId !== undefined && { workspaceId: r.workspaceId }),
  };
};

/**
 * The rows of one kind in the workspace that match `where` (e.g. `deletedAt` conditions):
 * kinds of the workspace by its id, kinds of a project by `projectIds`.
 */
export async function trashableRows(
  kind: TrashKind,
  workspaceId: string,
  projectIds: string[],
  where: WhereOptions,
  transaction?: Transaction,
): Promise<TrashableRow[]> {
  const spec = TRASH_TABLES[kind];
  const scope = spec.scope === "workspace" ? { workspaceId } : { projectId: projectIds };
  const rows = await spec.model.findAll({ where: { ...scope, ...where }, transaction });
  return rows.map(plainTrashable);
}

/** Moves the row `id` of `kind` to the trash (it keeps its data until it is purged). */
export async function markDeleted(kind: TrashKind, id: string, by: string, transaction?: Transaction) {
  await TRASH_TABLES[kind].model.update(
    { deletedAt: new Date(), deletedBy: by },
    { where: { id }, transaction },
  );
}

/** Takes the row `id` of `kind` out of the trash. */
export async function markRestored(kind: TrashKind, id: string, transaction?: Transaction) {
  await TRASH_TABLES[kind].model.update({ deletedAt: null, deletedBy: null }, { where: { id }, transaction });
}

/** Deletes the row `id` of `kind` for good (the database cascades take its children). */
export async function destroyForGood(kind: TrashKind, id: string, transaction?: Transaction) {
  await TRASH_TABLES[kind].model.destroy({ where: { id }, transaction });
}

/** How many rows of a project kind are live in `projectId`. */
export function countLiveOfKind(kind: TrashKind, projectId: string, transaction?: Transaction) {
  return countLive(TRASH_TABLES[kind].model, projectId, transaction);
}
