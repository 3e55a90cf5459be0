import { fn, col } from "sequelize";
import type { CreateWorkspaceBody, UpdateWorkspaceBody } from "../../../core/contract/workspaces";
import { Membership } from "../../../db/models/membership";
import { Workspace } from "../../../db/models/workspace";
import { currentMembership, currentUser } from "../../auth/guards";
import type { AppContext } from "../../context";
import type { RouteHandler } from "../../openapi/registry";
import { presentWorkspace } from "./presenter";

type NoInput = Record<string, never>;
type WorkspaceParams = { workspaceId: string };

/** Number of members per workspace id. */
async function memberCounts(workspaceIds: string[]): Promise<Map<string, number>> {
  if (workspaceIds.length === 0) return new Map();
  const rows = (await Membership.findAll({
    attributes: ["workspaceId", [fn("count", col("id")), "count"]],
    where: { workspaceId: workspaceIds },
    group: ["workspaceId"],
    raw: true,
  })) as unknown as { workspaceId: string; count: string }[];
  return new Map(rows.map((r) => [r.workspaceId, Number(r.count)]));
}

export const listWorkspacesHandler: RouteHandler<NoInput, NoInput, NoInput> = async (_req, res) => {
  const memberships = await Membership.findAll({
    where: { userId: currentUser(res).id },
    include: [{ model: Workspace, as: "workspace", required: true }],
  });
  const counts = await memberCounts(memberships.map((m) => m.workspaceId));
  const workspaces = memberships
    .map((m) => {
      const workspace = (m as Membership & { workspace: Workspace }).workspace;
      return presentWorkspace(workspace, m.role, counts.get(m.workspaceId) ?? 1);
    })
    .sort((a, b) => a.name.localeCompare(b.name));
  res.set("Cache-Control", "no-store").json({ workspaces });
};

export function createWorkspaceHandler(
  context: AppContext,
): RouteHandler<NoInput, NoInput, CreateWorkspaceBody> {
  return async (_req, res) => {
    const user = currentUser(res);
    const workspace = await context.sequelize.transaction(async (transaction) => {
      const created = await Workspace.create(
        { name: res.locals.input.body.name, createdBy: user.id },
        { transaction },
      );
      await Membership.create(
        {
          workspaceId: created.id,
          userId: user.id,
          role: "owner",
          joinedVia: "created",
          lastActiveAt: new Date(),
        },
        { transaction },
      );
      return created;
    });
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
  await workspace.update({ name: res.locals.input.body.name });
  const counts = await memberCounts([workspace.id]);
  res.json({ workspace: presentWorkspace(workspace, membership.role, counts.get(workspace.id) ?? 1) });
};

/** Deletes the workspace and, by the foreign keys' cascade, its memberships, invitations and links. */
export const deleteWorkspaceHandler: RouteHandler<WorkspaceParams, NoInput, NoInput> = async (_req, res) => {
  await currentMembership(res).workspace.destroy();
  res.status(204).end();
};
