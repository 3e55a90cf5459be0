import type { ComparisonQuery } from "../../../core/contract/comparison";
import { currentMembership } from "../../auth/guards";
import type { AppContext } from "../../context";
import { comparisonAnswer } from "../../domain/comparison/answer";
import { loadComparisonSource } from "../../domain/comparison/load";
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
    const source = await loadComparisonSource(context.sequelize, workspace.id, params.projectId);
    if (source === null) throw errors.notFound("This project");
    res
      .set("Cache-Control", "no-store")
      .type("json")
      .send(await comparisonAnswer(params.projectId, source, query));
  };
}
