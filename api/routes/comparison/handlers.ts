import type { ComparisonQuery } from "../../../core/contract/comparison";
import { currentMembership } from "../../auth/guards";
import type { AppContext } from "../../context";
import { comparisonAnswer } from "../../domain/comparison/answer";
import { loadComparisonSource } from "../../domain/comparison/load";
import { refreshPointTables } from "../../domain/comparison/point-tables";
import { errors } from "../../errors";
import type { RouteHandler } from "../../openapi/registry";

type ProjectParams = { workspaceId: string; projectId: string };

/** `GET …/comparison?page&limit`: one page of rows, the governing results over all of them. */
export function comparisonHandler(
  context: AppContext,
): RouteHandler<ProjectParams, ComparisonQuery, Record<string, never>> {
  return async (_req, res) => {
    const { workspace } = currentMembership(res);
    const { params, query } = res.locals.input;
    const load = () => loadComparisonSource(context.sequelize, workspace.id, params.projectId);
    let source = await load();
    // Point tables evaluated against allowables that have changed since are evaluated again first.
    if (source !== null && (await refreshPointTables(source))) source = await load();
    if (source === null) throw errors.notFound("This project");
    res
      .set("Cache-Control", "no-store")
      .type("json")
      .send(await comparisonAnswer(params.projectId, source, query));
  };
}
