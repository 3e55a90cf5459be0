import { col, fn, type ModelStatic, type Model, type Transaction } from "sequelize";
import { Combination } from "../../../db/models/combination";
import { LoadCase } from "../../../db/models/load-case";
import { Location } from "../../../db/models/location";

/** How many live locations, load cases and combinations a project holds. */
export type ProjectCounts = { locations: number; loadCases: number; combinations: number };

/** Live (not trashed) locations, load cases and combinations per project id. */
export async function projectCounts(
  projectIds: string[],
  transaction?: Transaction,
): Promise<Map<string, ProjectCounts>> {
  const counts = new Map<string, ProjectCounts>(
    projectIds.map((id) => [id, { locations: 0, loadCases: 0, combinations: 0 }]),
  );
  if (projectIds.length === 0) return counts;
  const tally = async (model: ModelStatic<Model>, key: keyof ProjectCounts) => {
    const rows = (await model.findAll({
      attributes: ["projectId", [fn("count", col("id")), "count"]],
      where: { projectId: projectIds, deletedAt: null },
      group: ["projectId"],
      raw: true,
      transaction,
    })) as unknown as { projectId: string; count: string }[];
    for (const r of rows) counts.get(r.projectId)![key] = Number(r.count);
  };
  await tally(Location, "locations");
  await tally(LoadCase, "loadCases");
  await tally(Combination, "combinations");
  return counts;
}
