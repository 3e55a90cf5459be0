import type { ComparisonQuery } from "../../../core/contract/comparison";
import { currentMembership } from "../../auth/guards";
import { prefetchedComparisonStamp } from "../../auth/membership-prefetch";
import type { SessionLocals } from "../../auth/session-middleware";
import type { AppContext } from "../../context";
import { comparisonAnswer } from "../../domain/comparison/answer";
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
    const stamp = prefetchedComparisonStamp(
      (res.locals as Partial<SessionLocals>).prefetchedMembership,
      workspace.id,
      params.projectId,
    );
    const answer = await comparisonAnswer(
      context.sequelize,
      { workspaceId: workspace.id, projectId: params.projectId, query },
      stamp,
    );
    if (answer === null) throw errors.notFound("This project");
    // The ETag Express would compute, computed once per kept answer (res.send keeps a set one).
    res.set("Cache-Control", "no-store").set("ETag", answer.etag).type("json").send(answer.body);
  };
}
