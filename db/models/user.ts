import { DataTypes, Model, type Sequelize } from "sequelize";

/** A person who signs in (table `users`). E-mail is unique case-insensitively (index on lower(email)). */
export class User extends Model {
  declare id: string;
  declare name: string;
  declare email: string;
  /** argon2id PHC string; never leaves the server. */
  declare passwordHash: string;
  declare passwordChangedAt: Date;
  declare lastSignInAt: Date | null;
  /** When a link mailed to the address (verification, invitation or reset) proved it; null until then. */
  declare emailVerifiedAt: Date | null;
  declare createdAt: Date;
  declare updatedAt: Date;
}

export function initUser(sequelize: Sequelize) {
  User.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      name: { type: DataTypes.STRING(100), allowNull: false },
      email: { type: DataTypes.STRING(254), allowNull: false },
      passwordHash: { type: DataTypes.TEXT, allowNull: false },
      passwordChangedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      lastSignInAt: { type: DataTypes.DATE, allowNull: true },
      emailVerifiedAt: { type: DataTypes.DATE, allowNull: true },
    },
    { sequelize, tableName: "users" },
  );
  return User;
}
