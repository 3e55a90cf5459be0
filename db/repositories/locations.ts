import type { Transaction } from "sequelize";
import { Location } from "../models/location";
import {
  countLive,
  findLiveChild,
  listLiveChildren,
  liveChildIdsAmong,
  lastPosition,
  toPlain,
  updateById,
  type ReadOptions,
  type Row,
} from "./plain";

/** A location of a project (a point where states are checked), as a plain object. */
export type LocationRow = Row<Location>;

/** What creating a location sets; position, version and timestamps are the table's. */
export type NewLocation = Pick<LocationRow, "projectId" | "name" | "position" | "createdBy" | "updatedBy"> &
  Partial<Pick<LocationRow, "note" | "materialId" | "publishedMaterial">>;

/** The location `id` of `projectId`, not in the trash (locked FOR UPDATE with `lock`), or null. */
export async function findLiveLocation(
  projectId: string,
  id: string,
  options: ReadOptions = {},
): Promise<LocationRow | null> {
  return findLiveChild(Location, projectId, id, options);
}

/** The project's live locations in their order. */
export async function listLiveLocations(
  projectId: string,
  transaction?: Transaction,
): Promise<LocationRow[]> {
  return listLiveChildren(Location, projectId, transaction);
}

/** Which of `ids` are live locations of `projectId`. */
export async function liveLocationIdsAmong(
  projectId: string,
  ids: string[],
  transaction?: Transaction,
): Promise<Set<string>> {
  return liveChildIdsAmong(Location, projectId, ids, transaction);
}

/** The names of the locations with these ids (trashed ones too), by id. */
export async function locationNames(ids: string[], transaction?: Transaction): Promise<Map<string, string>> {
  if (ids.length === 0) return new Map();
  const rows = await Location.findAll({ attributes: ["id", "name"], where: { id: ids }, transaction });
  return new Map(rows.map((l) => [l.id, l.name]));
}

/** How many locations of the project are not in the trash. */
export function countLiveLocations(projectId: string, transaction?: Transaction): Promise<number> {
  return countLive(Location, projectId, transaction);
}

/** The position after the project's last location (trashed ones count, so a restore keeps its place). */
export async function nextLocationPosition(projectId: string, transaction?: Transaction): Promise<number> {
  return ((await lastPosition(Location, projectId, transaction)) ?? -1) + 1;
}

export async function createLocation(values: NewLocation, transaction?: Transaction): Promise<LocationRow> {
  return toPlain(await Location.create(values, { transaction }));
}

/** Sets `values` on the location `id`; the row as stored after. */
export async function updateLocation(
  id: string,
  values: Partial<LocationRow>,
  transaction?: Transaction,
): Promise<LocationRow> {
  return (await updateById(Location, id, values, transaction))!;
}
