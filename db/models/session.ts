import { DataTypes, Model, type Sequelize } from "sequelize";

/**
 * A lucia session (table `sessions`). `id` is the SHA-256 of the id in the cookie, so the
 * table alone cannot be used to sign in as anyone.
 */
export class Session extends Model {
  declare id: string;
  declare userId: string;
  declare expiresAt: Date;
  declare createdAt: Date;
}

export function initSession(sequelize: Sequelize) {
  Session.init(
    {
      id: { type: DataTypes.CHAR(64), primaryKey: true },
      userId: { type: DataTypes.UUID, allowNull: false },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
    },
    { sequelize, tableName: "sessions", updatedAt: false },
  );
  return Session;
}
