import type { CreateWorkspaceBody, UpdateWorkspaceBody } from "../../../core/contract/workspaces";
import {
  createWorkspaceWithOwner,
  deleteWorkspace,
  memberCounts,
  updateWorkspace,
  workspacesOfUser,
} from "../../../db/repositories/workspaces";
import { currentMembership, currentUser } from "../../auth/guards";
import type { AppContext } from "../../context";
import type { RouteHandler } from "../../openapi/registry";
import { presentWorkspace } from "./presenter";

type NoInput = Record<string, never>;
type WorkspaceParams = { workspaceId: string };

export const listWorkspacesHandler: RouteHandler<NoInput, NoInput, NoInput> = async (_req, res) => {
  const memberships = await workspacesOfUser(currentUser(res).id);
  const counts = await memberCounts(memberships.map((m) => m.membership.workspaceId));
  const workspaces = memberships
    .map(({ membership, workspace }) =>
      presentWorkspace(workspace, membership.role, counts.get(membership.workspaceId) ?? 1),
    )
    .sort((a, b) => a.name.localeCompare(b.name));
  res.set("Cache-Control", "no-store").json({ workspaces });
};

export function createWorkspaceHandler(
  context: AppContext,
): RouteHandler<NoInput, NoInput, CreateWorkspaceBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const workspace = await context.sequelize.transaction((transaction) =>
      createWorkspaceWithOwner(res.locals.input.body.name, user.id, transaction),
    );
    res.status(201).json({ workspace: presentWorkspace(workspace, "owner", 1) });
  };
}

export const getWorkspaceHandler: RouteHandler<WorkspaceParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace, membership } = currentMembership(res);
  const counts = await memberCounts([workspace.id]);
  res.set("Cache-Control", "no-store").json({
    workspace: presentWorkspace(workspace, membership.role, counts.get(workspace.id) ?? 1),
  });
};

export const updateWorkspaceHandler: RouteHandler<WorkspaceParams, NoInput, UpdateWorkspaceBody> = async (
  _req,
  res,
) => {
  const { workspace, membership } = currentMembership(res);
  const updated = await updateWorkspace(workspace.id, { name: res.locals.input.body.name });
  const counts = await memberCounts([workspace.id]);
  res.json({ workspace: presentWorkspace(updated, membership.role, counts.get(workspace.id) ?? 1) });
};

/** Deletes the workspace and, by the foreign keys' cascade, its memberships, invitations and links. */
export const deleteWorkspaceHandler: RouteHandler<WorkspaceParams, NoInput, NoInput> = async (_req, res) => {
  await deleteWorkspace(currentMembership(res).workspace.id);
  res.status(204).end();
};
