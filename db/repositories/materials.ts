import type { Transaction } from "sequelize";
import { Material } from "../models/material";
import { lockOf, toPlain, toPlainOrNull, updateById, type ReadOptions, type Row } from "./plain";

/** A library material of a workspace (strengths in Pa), as a plain object. */
export type MaterialRow = Row<Material>;

/** What creating a material sets; version and timestamps are the table's. */
export type NewMaterial = Pick<MaterialRow, "workspaceId" | "name" | "unit" | "createdBy" | "updatedBy"> &
  Partial<
    Pick<
      MaterialRow,
      | "yieldPa"
      | "ultimateTensionPa"
      | "ultimateCompressionPa"
      | "elasticModulusPa"
      | "poissonRatio"
      | "reference"
      | "note"
    >
  >;

/** The material `id` of `workspaceId`, not in the trash (locked FOR UPDATE with `lock`), or null. */
export async function findLiveMaterial(
  workspaceId: string,
  id: string,
  options: ReadOptions = {},
): Promise<MaterialRow | null> {
  const row = await Material.findOne({
    where: { id, workspaceId, deletedAt: null },
    transaction: options.transaction,
    lock: lockOf(options),
  });
  return toPlainOrNull(row);
}

/** The workspace's library materials not in the trash, by name. */
export async function listLiveMaterials(
  workspaceId: string,
  transaction?: Transaction,
): Promise<MaterialRow[]> {
  const rows = await Material.findAll({
    where: { workspaceId, deletedAt: null },
    order: [["name", "ASC"]],
    transaction,
  });
  return rows.map(toPlain);
}

export async function createMaterial(values: NewMaterial, transaction?: Transaction): Promise<MaterialRow> {
  return toPlain(await Material.create(values, { transaction }));
}

/** Sets `values` on the material `id`; the row as stored after. */
export async function updateMaterial(
  id: string,
  values: Partial<MaterialRow>,
  transaction?: Transaction,
): Promise<MaterialRow> {
  return (await updateById(Material, id, values, transaction))!;
}

/** The names of the library materials with these ids (trashed ones too), by id. */
export async function materialNames(ids: string[], transaction?: Transaction): Promise<Map<string, string>> {
  if (ids.length === 0) return new Map();
  const rows = await Material.findAll({ attributes: ["id", "name"], where: { id: ids }, transaction });
  return new Map(rows.map((m) => [m.id, m.name]));
}
