import type { RequestHandler, Response } from "express";
import type { Session, User } from "lucia";
import type { Auth } from "./lucia";
import {
  comparisonProjectIdInPath,
  membershipPrefetch,
  workspaceIdInPath,
  type MembershipPrefetch,
} from "./membership-prefetch";

/**
 * What the session middleware leaves in `res.locals` for every /api request; `prefetchedMembership`
 * when the path names a workspace (see membership-prefetch.ts).
 */
export type SessionLocals = {
  user: User | null;
  session: Session | null;
  prefetchedMembership?: MembershipPrefetch;
};

/**
 * Reads the session cookie, validates it against PostgreSQL and puts the user and the
 * session in `res.locals` (both null when signed out). A session lucia has extended gets
 * a fresh cookie; a cookie for an ended session is cleared so the browser stops sending it.
 */
export function sessionMiddleware(auth: Auth): RequestHandler {
  return async (req, res, next) => {
    res.locals.user = null;
    res.locals.session = null;
    const sessionId = auth.readSessionCookie(req.headers.cookie ?? "");
    if (!sessionId) return next();
    const workspaceId = workspaceIdInPath(req.path);
    const comparisonProjectId = workspaceId ? comparisonProjectIdInPath(req.path) : null;
    const prefetch: MembershipPrefetch | undefined = workspaceId
      ? { workspaceId, ...(comparisonProjectId ? { comparisonProjectId } : {}) }
      : undefined;
    const { session, user } = prefetch
      ? await membershipPrefetch.run(prefetch, () => auth.validateSession(sessionId))
      : await auth.validateSession(sessionId);
    if (!session) {
      appendCookie(res, auth.createBlankSessionCookie().serialize());
      return next();
    }
    if (session.fresh) appendCookie(res, auth.createSessionCookie(session.id).serialize());
    res.locals.user = user;
    res.locals.session = session;
    res.locals.prefetchedMembership = prefetch;
    next();
  };
}

/** Adds a Set-Cookie header, replacing an earlier one for the same session cookie in this response. */
export function appendCookie(res: Response, serialized: string) {
  const name = serialized.slice(0, serialized.indexOf("="));
  const existing = res.getHeader("Set-Cookie");
  const list = (Array.isArray(existing) ? existing : existing ? [String(existing)] : []).filter(
    (cookie) => !cookie.startsWith(`${name}=`),
  );
  res.setHeader("Set-Cookie", [...list, serialized]);
}

/** Starts a new session for `userId` (a new id every time: sign-in rotates it) and sets its cookie. */
export async function startSession(auth: Auth, res: Response, userId: string): Promise<void> {
  const previous = res.locals.session as Session | null;
  if (previous) await auth.invalidateSession(previous.id);
  const session = await auth.createSession(userId, {});
  appendCookie(res, auth.createSessionCookie(session.id).serialize());
}

/** Ends the current session (if any) and clears the cookie. */
export async function endSession(auth: Auth, res: Response): Promise<void> {
  const current = res.locals.session as Session | null;
  if (current) await auth.invalidateSession(current.id);
  appendCookie(res, auth.createBlankSessionCookie().serialize());
}
