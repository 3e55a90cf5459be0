import type { Adapter, DatabaseSession, DatabaseUser } from "lucia";
import { Op } from "sequelize";
import { Session } from "../../db/models/session";
import { User } from "../../db/models/user";
import { hashToken } from "./tokens";

/**
 * lucia 3's storage over the Sequelize models. Session ids are stored as their SHA-256
 * (`hashToken`), so reading the sessions table does not give anyone a usable cookie;
 * lucia itself only ever sees the plain id.
 */
export class SequelizeSessionAdapter implements Adapter {
  async getSessionAndUser(sessionId: string): Promise<[DatabaseSession | null, DatabaseUser | null]> {
    const session = await Session.findByPk(hashToken(sessionId));
    if (!session) return [null, null];
    const user = await User.findByPk(session.userId);
    if (!user) return [null, null];
    return [
      { id: sessionId, userId: session.userId, expiresAt: session.expiresAt, attributes: {} },
      { id: user.id, attributes: userAttributes(user) },
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

function userAttributes(user: User): SessionUserAttributes {
  return { name: user.name, email: user.email, createdAt: user.createdAt };
}
