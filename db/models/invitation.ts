import { DataTypes, Model, type Sequelize } from "sequelize";
import type { MembershipRole } from "./membership";
import type { User } from "./user";
import type { Workspace } from "./workspace";

/** An e-mail invitation into a workspace (table `invitations`); only the token's hash is kept. */
export class Invitation extends Model {
  declare id: string;
  declare workspaceId: string;
  declare email: string;
  declare role: MembershipRole;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare lastSentAt: Date;
  declare sendCount: number;
  declare acceptedAt: Date | null;
  declare acceptedBy: string | null;
  declare revokedAt: Date | null;
  declare revokedBy: string | null;
  declare createdBy: string | null;
  declare createdAt: Date;
  declare updatedAt: Date;
  declare inviter?: User | null;
  declare workspace?: Workspace;
}

export function initInvitation(sequelize: Sequelize) {
  Invitation.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      workspaceId: { type: DataTypes.UUID, allowNull: false },
      email: { type: DataTypes.STRING(254), allowNull: false },
      role: { type: DataTypes.STRING(16), allowNull: false },
      tokenHash: { type: DataTypes.CHAR(64), allowNull: false },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      lastSentAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      sendCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      acceptedAt: { type: DataTypes.DATE, allowNull: true },
      acceptedBy: { type: DataTypes.UUID, allowNull: true },
      revokedAt: { type: DataTypes.DATE, allowNull: true },
      revokedBy: { type: DataTypes.UUID, allowNull: true },
      createdBy: { type: DataTypes.UUID, allowNull: true },
    },
    { sequelize, tableName: "invitations" },
  );
  return Invitation;
}
