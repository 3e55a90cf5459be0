import { DataTypes, Model, type Sequelize } from "sequelize";
import type { User } from "./user";

export type MembershipRole = "owner" | "editor" | "reviewer" | "viewer";
export type JoinedVia = "created" | "invitation" | "share_link" | "seed";

/** One person's role in one workspace (table `memberships`); `createdAt` is when they joined. */
export class Membership extends Model {
  declare id: string;
  declare workspaceId: string;
  declare userId: string;
  declare role: MembershipRole;
  declare joinedVia: JoinedVia;
  declare invitationId: string | null;
  declare shareLinkId: string | null;
  declare addedBy: string | null;
  declare lastActiveAt: Date | null;
  declare createdAt: Date;
  declare updatedAt: Date;
  declare user?: User;
}

export function initMembership(sequelize: Sequelize) {
  Membership.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      workspaceId: { type: DataTypes.UUID, allowNull: false },
      userId: { type: DataTypes.UUID, allowNull: false },
      role: { type: DataTypes.STRING(16), allowNull: false },
      joinedVia: { type: DataTypes.STRING(16), allowNull: false },
      invitationId: { type: DataTypes.UUID, allowNull: true },
      shareLinkId: { type: DataTypes.UUID, allowNull: true },
      addedBy: { type: DataTypes.UUID, allowNull: true },
      lastActiveAt: { type: DataTypes.DATE, allowNull: true },
    },
    { sequelize, tableName: "memberships" },
  );
  return Membership;
}
