import type { UpdateMemberBody } from "../../../core/contract/workspaces";
import {
  deleteMembership,
  findMember,
  findMembershipById,
  membersOf,
  updateMembership,
  lockWorkspace,
} from "../../../db/repositories/workspaces";
import { currentMembership, currentUser } from "../../auth/guards";
import type { AppContext } from "../../context";
import { errors } from "../../errors";
import type { RouteHandler } from "../../openapi/registry";
import { assertKeepsAnOwner } from "../../domain/members/last-owner";
import { presentMember } from "./presenter";

type NoInput = Record<string, never>;
type WorkspaceParams = { workspaceId: string };
type MemberParams = WorkspaceParams & { memberId: string };

const ROLE_ORDER = { owner: 0, editor: 1, reviewer: 2, viewer: 3 } as const;

export const listMembersHandler: RouteHandler<WorkspaceParams, NoInput, NoInput> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const rows = await membersOf(workspace.id);
  rows.sort((a, b) => ROLE_ORDER[a.role] - ROLE_ORDER[b.role] || a.user.name.localeCompare(b.user.name));
  res
    .set("Cache-Control", "no-store")
    .json({ members: rows.map((row) => presentMember(row, currentUser(res).id)) });
};

export function updateMemberHandler(
  context: AppContext,
): RouteHandler<MemberParams, NoInput, UpdateMemberBody> {
  return async (_req, res) => {
    const { workspace } = currentMembership(res);
    const { memberId } = res.locals.input.params;
    const { role } = res.locals.input.body;
    const updated = await context.sequelize.transaction(async (transaction) => {
      await lockWorkspace(workspace.id, transaction);
      const target = await findMember(workspace.id, memberId, transaction);
      if (!target) throw errors.notFound("This member");
      await assertKeepsAnOwner(target, role, transaction);
      const changed = await updateMembership(target.id, { role }, transaction);
      return { ...changed, user: target.user };
    });
    res.json({ member: presentMember(updated, currentUser(res).id) });
  };
}

export function removeMemberHandler(context: AppContext): RouteHandler<MemberParams, NoInput, NoInput> {
  return async (_req, res) => {
    const { workspace } = currentMembership(res);
    await context.sequelize.transaction(async (transaction) => {
      await lockWorkspace(workspace.id, transaction);
      const target = await findMember(workspace.id, res.locals.input.params.memberId, transaction);
      if (!target) throw errors.notFound("This member");
      await assertKeepsAnOwner(target, null, transaction);
      await deleteMembership(target.id, transaction);
    });
    res.status(204).end();
  };
}

export function leaveWorkspaceHandler(context: AppContext): RouteHandler<WorkspaceParams, NoInput, NoInput> {
  return async (_req, res) => {
    const { membership } = currentMembership(res);
    await context.sequelize.transaction(async (transaction) => {
      await lockWorkspace(membership.workspaceId, transaction);
      const mine = await findMembershipById(membership.id, transaction);
      if (!mine) return;
      await assertKeepsAnOwner(mine, null, transaction);
      await deleteMembership(mine.id, transaction);
    });
    res.status(204).end();
  };
}
