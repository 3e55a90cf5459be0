import type { ProjectExport } from "../../../core/contract/project-export";
import { currentMembership, currentUser } from "../../auth/guards";
import type { AppContext } from "../../context";
import type { RouteHandler } from "../../openapi/registry";
import { findProject } from "../../domain/projects/scope";
import { exportProject } from "../../domain/projects/export";
import { importProject } from "./import";

type NoInput = Record<string, never>;

/** A file name safe in a Content-Disposition header. */
function fileNameFor(name: string): string {
  const slug =
    name
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, "-")
      .replace(/^-|-$/g, "") || "project";
  return `${slug}.sigmacube.json`;
}

export const exportHandler: RouteHandler<
  { workspaceId: string; projectId: string },
  NoInput,
  NoInput
> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const project = await findProject(workspace.id, res.locals.input.params.projectId);
  const file = await exportProject(project);
  res
    .set("Cache-Control", "no-store")
    .set("Content-Disposition", `attachment; filename="${fileNameFor(project.name)}"`)
    .json(file);
};

/** Imports a file already validated whole by the route's schema, in one transaction. */
export function importHandler(
  context: AppContext,
): RouteHandler<{ workspaceId: string }, NoInput, ProjectExport> {
  return async (_req, res) => {
    const user = currentUser(res);
    const { workspace } = currentMembership(res);
    const { project, counts } = await context.sequelize.transaction((transaction) =>
      importProject(transaction, user, workspace.id, res.locals.input.body),
    );
    res.status(201).json({ project: { id: project.id, name: project.name }, counts });
  };
}
