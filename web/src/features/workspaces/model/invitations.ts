import type { InvitationState } from "../../../../../core/contract/invitations";
import { ApiError } from "../../../lib/api-client";

/** Each state in words with a mark, so it never rests on colour alone. */
export const INVITATION_STATE_WORDS: Readonly<Record<InvitationState, string>> = {
  pending: "○ pending",
  accepted: "✓ accepted",
  revoked: "✗ revoked",
  expired: "◌ expired",
};

/** An invitation not yet used or withdrawn can be mailed again or withdrawn; an expired one too. */
export const canResendOrRevoke = (state: InvitationState): boolean =>
  state === "pending" || state === "expired";

/** A 409 on inviting means the address is already a member or already invited: said beside the e-mail field. */
export const isAlreadyInvited = (error: unknown): error is ApiError =>
  error instanceof ApiError && error.status === 409;

/**
 * The inviting error shown above the table: not a 400 or 409 (those stand beside their field),
 * and only the server's answers (a failure to reach it has no status to judge).
 */
export const invitationErrorAboveTable = (error: unknown): ApiError | null =>
  error instanceof ApiError && ![400, 409].includes(error.status) ? error : null;
