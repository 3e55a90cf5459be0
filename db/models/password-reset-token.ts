import { DataTypes, Model, type Sequelize } from "sequelize";

/** A single-use password-reset link (table `password_reset_tokens`); only the token's hash is kept. */
export class PasswordResetToken extends Model {
  declare id: string;
  declare userId: string;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: Date | null;
  declare createdAt: Date;
}

export function initPasswordResetToken(sequelize: Sequelize) {
  PasswordResetToken.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      userId: { type: DataTypes.UUID, allowNull: false },
      tokenHash: { type: DataTypes.CHAR(64), allowNull: false },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      usedAt: { type: DataTypes.DATE, allowNull: true },
    },
    { sequelize, tableName: "password_reset_tokens", updatedAt: false },
  );
  return PasswordResetToken;
}
