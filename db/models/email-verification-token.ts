import { DataTypes, Model, type Sequelize } from "sequelize";

/**
 * A single-use link that proves an account's e-mail address (table
 * `email_verification_tokens`); only the token's hash is kept. `nextPath` is the page the
 * person was on their way to when they signed up (an invitation, say).
 */
export class EmailVerificationToken extends Model {
  declare id: string;
  declare userId: string;
  declare tokenHash: string;
  declare nextPath: string | null;
  declare expiresAt: Date;
  declare usedAt: Date | null;
  declare createdAt: Date;
}

export function initEmailVerificationToken(sequelize: Sequelize) {
  EmailVerificationToken.init(
    {
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      userId: { type: DataTypes.UUID, allowNull: false },
      tokenHash: { type: DataTypes.CHAR(64), allowNull: false },
      nextPath: { type: DataTypes.STRING(500), allowNull: true },
      expiresAt: { type: DataTypes.DATE, allowNull: false },
      usedAt: { type: DataTypes.DATE, allowNull: true },
    },
    { sequelize, tableName: "email_verification_tokens", updatedAt: false },
  );
  return EmailVerificationToken;
}
