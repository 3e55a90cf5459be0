import type { Adapter, DatabaseSession, DatabaseUser } from "lucia";
import { Op } from "sequelize";
import { preparedQuery } from "../../db/prepared-query";
import { Session } from "../../db/models/session";
import { inputsStampSql } from "../domain/comparison/stamp";
import { membershipPrefetch } from "./membership-prefetch";
import { MEMBERSHIP_COLUMNS, membershipFromRow, type MembershipRow } from "./membership-row";
import { hashToken } from "./tokens";

/**
 * The session ($1, its hash), its user and (when the request's path names a workspace) the
 * user's membership of it with the workspace: `$2` NULL matches no membership. When the path
 * asks for a project's comparison, the stamp of its inputs too (`$3` NULL: none).
 *
 * A named prepared statement (db/prepared-query.ts): every signed-in request runs it, and
 * PostgreSQL spent more time parsing and planning its joins than running them. Measured with a
 * CPU probe at 20 connections (comparison of an 8-row project): PostgreSQL's CPU per request
 * went from 0.75–0.84 ms to 0.19–0.26 ms, and the node process's from 1.35–1.58 ms to 0.87–1.08 ms.
 */
const SESSION_AND_USER_STATEMENT = {
  name: "session-and-user",
  text: `
SELECT s.user_id AS "userId", s.expires_at AS "expiresAt", u.name, u.email, u.created_at AS "createdAt",
  ${MEMBERSHIP_COLUMNS},
  CASE WHEN $3::uuid IS NULL THEN NULL
    ELSE ${inputsStampSql("$3::uuid", "$2::uuid")} END AS "comparisonStamp"
FROM sessions s JOIN users u ON u.id = s.user_id
LEFT JOIN memberships m ON m.user_id = s.user_id AND m.workspace_id = $2::uuid
LEFT JOIN workspaces w ON w.id = m.workspace_id
WHERE s.id = $1`,
};

type SessionUserRow = MembershipRow & {
  comparisonStamp: string | null;
  userId: string;
  expiresAt: Date | string;
  name: string;
  email: string;
  createdAt: Date | string;
};

/**
 * lucia 3's storage over the Sequelize models. Session ids are stored as their SHA-256
 * (`hashToken`), so reading the sessions table does not give anyone a usable cookie;
 * lucia itself only ever sees the plain id.
 */
export class SequelizeSessionAdapter implements Adapter {
  async getSessionAndUser(sessionId: string): Promise<[DatabaseSession | null, DatabaseUser | null]> {
    // One statement for both (every signed-in request runs it): two model queries here were
    // a third of the database round trips of a small comparison under load.
    const prefetch = membershipPrefetch.getStore();
    const [row] = await preparedQuery<SessionUserRow>(Session.sequelize!, SESSION_AND_USER_STATEMENT, [
      hashToken(sessionId),
      prefetch?.workspaceId ?? null,
      prefetch?.comparisonProjectId ?? null,
    ]);
    if (!row) return [null, null];
    if (prefetch) {
      prefetch.found = membershipFromRow(row);
      if (row.comparisonStamp !== null) prefetch.comparisonStamp = row.comparisonStamp;
    }
    return [
      { id: sessionId, userId: row.userId, expiresAt: new Date(row.expiresAt), attributes: {} },
      {
        id: row.userId,
        attributes: { name: row.name, email: row.email, createdAt: new Date(row.createdAt) },
      },
    ];
  }

  async getUserSessions(userId: string): Promise<DatabaseSession[]> {
    // Only hashes are stored, so the plain ids cannot be returned; lucia uses this for listings only.
    const sessions = await Session.findAll({ where: { userId } });
    return sessions.map((s) => ({ id: s.id, userId: s.userId, expiresAt: s.expiresAt, attributes: {} }));
  }

  async setSession(session: DatabaseSession): Promise<void> {
    await Session.create({ id: hashToken(session.id), userId: session.userId, expiresAt: session.expiresAt });
  }

  async updateSessionExpiration(sessionId: string, expiresAt: Date): Promise<void> {
    await Session.update({ expiresAt }, { where: { id: hashToken(sessionId) } });
  }

  async deleteSession(sessionId: string): Promise<void> {
    await Session.destroy({ where: { id: hashToken(sessionId) } });
  }

  async deleteUserSessions(userId: string): Promise<void> {
    await Session.destroy({ where: { userId } });
  }

  async deleteExpiredSessions(): Promise<void> {
    await Session.destroy({ where: { expiresAt: { [Op.lte]: new Date() } } });
  }
}

/** The user fields lucia hands back on every validated request. */
export type SessionUserAttributes = { name: string; email: string; createdAt: Date };
