import type { AuditQuery } from "../../../core/contract/projects";
import { listAuditEvents } from "../../../db/repositories/audit";
import { loadCaseNames } from "../../../db/repositories/load-cases";
import { materialNames } from "../../../db/repositories/materials";
import { idsNamedIn } from "../../domain/audit/describe";
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
  const rows = await listAuditEvents({
    workspaceId: workspace.id,
    projectId,
    entityId,
    before,
    limit: limit + 1,
  });
  const page = rows.slice(0, limit);
  const ids = idsNamedIn(page);
  const [materials, loadCases] = await Promise.all([
    materialNames([...ids.materials]),
    loadCaseNames([...ids.loadCases]),
  ]);
  const names = {
    materials,
    loadCases: new Map([...loadCases].map(([id, c]) => [id, c.name])),
  };
  res.set("Cache-Control", "no-store").json({
    events: page.map((e) => presentAuditEvent(e, names)),
    nextBefore: rows.length > limit ? String(page[page.length - 1].id) : null,
  });
};
