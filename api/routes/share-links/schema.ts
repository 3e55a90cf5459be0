export {
  createdShareLinkSchema,
  createShareLinkBodySchema,
  shareLinkListSchema,
  shareLinkParamsSchema,
  shareLinkPreviewSchema,
} from "../../../core/contract/share-links";
export {
  invitationTokenParamsSchema as shareLinkTokenParamsSchema,
  joinedWorkspaceSchema,
} from "../../../core/contract/invitations";
export { workspaceIdParamsSchema } from "../../../core/contract/workspaces";
