import type { Sequelize } from "sequelize";
import { initAppSetting } from "./app-setting";
import { associateAccountModels } from "./associations";
import { initDevMailMessage } from "./dev-mail-message";
import { initEmailVerificationToken } from "./email-verification-token";
import { initInvitation } from "./invitation";
import { initMembership } from "./membership";
import { initPasswordResetToken } from "./password-reset-token";
import { initProjectModels } from "./project-models";
import { initRecordModels } from "./record-models";
import { initSession } from "./session";
import { initShareLink } from "./share-link";
import { initUser } from "./user";
import { initWorkspace } from "./workspace";

/** Registers every model on `sequelize` (call once per instance). */
export function initModels(sequelize: Sequelize) {
  const models = {
    AppSetting: initAppSetting(sequelize),
    User: initUser(sequelize),
    Session: initSession(sequelize),
    PasswordResetToken: initPasswordResetToken(sequelize),
    EmailVerificationToken: initEmailVerificationToken(sequelize),
    Workspace: initWorkspace(sequelize),
    Membership: initMembership(sequelize),
    Invitation: initInvitation(sequelize),
    ShareLink: initShareLink(sequelize),
    DevMailMessage: initDevMailMessage(sequelize),
    ...initProjectModels(sequelize),
    ...initRecordModels(sequelize),
  };
  associateAccountModels();
  return models;
}

export type Models = ReturnType<typeof initModels>;
