import {
  createShareLinkBodySchema,
  type ShareLink,
  type ShareLinkRole,
  type ShareLinkState,
} from "../../../../../core/contract/share-links";

/** Each state in words with a mark, so it never rests on colour alone. */
export const SHARE_LINK_STATE_WORDS: Readonly<Record<ShareLinkState, string>> = {
  active: "✓ active",
  expired: "◌ expired",
  revoked: "✗ revoked",
  used_up: "● used up",
};

/** The new-link form as typed (the number inputs hold text). */
export type ShareLinkFormValues = {
  role: ShareLinkRole;
  label: string;
  expiresInDays: string;
  maxUses: string;
};

/** What the new-link form starts with: a viewer link for a week, any number of uses. */
export const SHARE_LINK_FORM_DEFAULTS: ShareLinkFormValues = {
  role: "viewer",
  label: "",
  expiresInDays: "7",
  maxUses: "",
};

/**
 * The body a new link is asked for with: an empty label is left out, an empty lifetime is sent as
 * NaN (so the schema asks for a whole number instead of using its default), an empty use limit
 * means no limit (null).
 */
export function shareLinkBody(v: ShareLinkFormValues) {
  return {
    role: v.role,
    label: v.label || undefined,
    expiresInDays: v.expiresInDays.trim() === "" ? Number.NaN : Number(v.expiresInDays),
    maxUses: v.maxUses.trim() === "" ? null : Number(v.maxUses),
  };
}

/**
 * The form checked with the same shared schema the server uses, before anything is sent: the body
 * to send, or one message per field (the schema's last for it), keyed by the field's name.
 */
export function checkShareLinkForm(
  v: ShareLinkFormValues,
): { ok: true; body: ReturnType<typeof shareLinkBody> } | { ok: false; errors: Record<string, string> } {
  const body = shareLinkBody(v);
  const checked = createShareLinkBodySchema.safeParse(body);
  if (checked.success) return { ok: true, body };
  return {
    ok: false,
    errors: Object.fromEntries(checked.error.issues.map((i) => [String(i.path[0]), i.message])),
  };
}

/** "3 / 10" when the link has a use limit, "3" when it has none. */
export const shareLinkUses = (l: Pick<ShareLink, "useCount" | "maxUses">): string =>
  `${l.useCount}${l.maxUses !== null ? ` / ${l.maxUses}` : ""}`;

/** A revoked link stays revoked; any other can be revoked (an expired or used-up one too, to be sure). */
export const canRevokeShareLink = (state: ShareLinkState): boolean => state !== "revoked";
