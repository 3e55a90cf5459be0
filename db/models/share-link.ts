import { DataTypes, Model, type Sequelize } from "sequelize";
import type { User } from "./user";
import type { Workspace } from "./workspace";

/** A link that lets a signed-in person join a workspace (table `share_links`); only the token's hash is kept. */
export class ShareLink extends Model {
  declare id: string;
  declare workspaceId: string;
  declare role: "editor" | "reviewer" | "viewer";
  declare label: string | null;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare maxUses: number | null;
  declare useCount: number;
  declare revokedAt: Date | null;
  declare revokedBy: string | null;
  declare createdBy: string | null;
  declare createdAt: Date;
  declare updatedAt: Date;
  declare creator?: User | null;
  declare workspace?: Workspace;
}

export function initShareLink(sequelize: Sequelize) {
  ShareLink.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      workspaceId: { type: DataTypes.UUID, allowNull: false },
      role: { type: DataTypes.STRING(16), allowNull: false },
      label: { type: DataTypes.STRING(100), allowNull: true },
      tokenHash: { type: DataTypes.CHAR(64), allowNull: false },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      maxUses: { type: DataTypes.INTEGER, allowNull: true },
      useCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
      revokedAt: { type: DataTypes.DATE, allowNull: true },
      revokedBy: { type: DataTypes.UUID, allowNull: true },
      createdBy: { type: DataTypes.UUID, allowNull: true },
    },
    { sequelize, tableName: "share_links" },
  );
  return ShareLink;
}
