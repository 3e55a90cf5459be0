import type { ShareLink, ShareLinkPreview, ShareLinkState } from "../../../core/contract/share-links";
import type { ShareLinkRow } from "../../../db/repositories/share-links";

/** A link's state at `now`: revoked wins over expired, expired over used up. */
export function shareLinkState(link: ShareLinkRow, now = new Date()): ShareLinkState {
  if (link.revokedAt) return "revoked";
  if (link.expiresAt.getTime() <= now.getTime()) return "expired";
  if (link.maxUses !== null && link.useCount >= link.maxUses) return "used_up";
  return "active";
}

/** What the list shows (never the token or its hash). */
export function presentShareLink(link: ShareLinkRow): ShareLink {
  return {
    id: link.id,
    role: link.role,
    label: link.label,
    state: shareLinkState(link),
    createdByName: link.creator?.name ?? null,
    createdAt: link.createdAt.toISOString(),
    expiresAt: link.expiresAt.toISOString(),
    maxUses: link.maxUses,
    useCount: link.useCount,
    revokedAt: link.revokedAt?.toISOString() ?? null,
  };
}

export function presentShareLinkPreview(link: ShareLinkRow): ShareLinkPreview {
  return {
    workspaceName: link.workspace?.name ?? "",
    role: link.role,
    state: shareLinkState(link),
    expiresAt: link.expiresAt.toISOString(),
  };
}
