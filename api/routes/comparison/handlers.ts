import { currentMembership } from "../../auth/guards";
import type { RouteHandler } from "../../openapi/registry";
import { findProject } from "../projects/scope";
import { buildComparison } from "./build";
import { loadComparisonInput } from "./load";

type ProjectParams = { workspaceId: string; projectId: string };

export const comparisonHandler: RouteHandler<
  ProjectParams,
  Record<string, never>,
  Record<string, never>
> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const project = await findProject(workspace.id, res.locals.input.params.projectId);
  res.set("Cache-Control", "no-store").json(buildComparison(await loadComparisonInput(project)));
};
