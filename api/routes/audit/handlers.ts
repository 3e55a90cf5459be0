import { Op, type WhereOptions } from "sequelize";
import type { AuditQuery } from "../../../core/contract/projects";
import { AuditEvent } from "../../../db/models/audit-event";
import { currentMembership } from "../../auth/guards";
import type { RouteHandler } from "../../openapi/registry";
import { presentAuditEvent } from "./presenter";

/** The workspace's trail, newest first, optionally for one project or one record; pages by `before`. */
export const listAuditHandler: RouteHandler<
  { workspaceId: string },
  AuditQuery,
  Record<string, never>
> = async (_req, res) => {
  const { workspace } = currentMembership(res);
  const { projectId, entityId, before, limit } = res.locals.input.query;
  const where: WhereOptions = { workspaceId: workspace.id };
  if (projectId) Object.assign(where, { projectId });
  if (entityId) Object.assign(where, { entityId });
  if (before) Object.assign(where, { id: { [Op.lt]: before } });
  const rows = await AuditEvent.findAll({ where, order: [["id", "DESC"]], limit: limit + 1 });
  const page = rows.slice(0, limit);
  res.set("Cache-Control", "no-store").json({
    events: page.map(presentAuditEvent),
    nextBefore: rows.length > limit ? String(page[page.length - 1].id) : null,
  });
};
