import { Invitation } from "./invitation";
import { Membership } from "./membership";
import { ShareLink } from "./share-link";
import { User } from "./user";
import { Workspace } from "./workspace";

/** The relations the account and workspace queries include; called once after every model is initialised. */
export function associateAccountModels() {
  // Models are module-level classes; a second initModels (another test app) must not add them twice.
  if (Membership.associations.user) return;
  Membership.belongsTo(User, { as: "user", foreignKey: "userId" });
  Membership.belongsTo(Workspace, { as: "workspace", foreignKey: "workspaceId" });
  Workspace.hasMany(Membership, { as: "memberships", foreignKey: "workspaceId" });
  Invitation.belongsTo(User, { as: "inviter", foreignKey: "createdBy" });
  Invitation.belongsTo(Workspace, { as: "workspace", foreignKey: "workspaceId" });
  ShareLink.belongsTo(User, { as: "creator", foreignKey: "createdBy" });
  ShareLink.belongsTo(Workspace, { as: "workspace", foreignKey: "workspaceId" });
}
