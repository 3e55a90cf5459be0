import type { ComparisonQuery } from "../../../core/contract/comparison";
import { currentMembership } from "../../auth/guards";
import type { AppContext } from "../../context";
import { errors } from "../../errors";
import type { RouteHandler } from "../../openapi/registry";
import { loadComparisonInput } from "./load";
import { comparisonPage } from "./paging";

type ProjectParams = { workspaceId: string; projectId: string };

/** `GET …/comparison?page&limit`: one page of rows, the governing results over all of them. */
export function comparisonHandler(
  context: AppContext,
): RouteHandler<ProjectParams, ComparisonQuery, Record<string, never>> {
  return async (_req, res) => {
    const { workspace } = currentMembership(res);
    const { params, query } = res.locals.input;
    const input = await loadComparisonInput(context.sequelize, workspace.id, params.projectId);
    if (!input) throw errors.notFound("This project");
    res.set("Cache-Control", "no-store").json(await comparisonPage(input, query));
  };
}
