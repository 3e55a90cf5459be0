import { z } from "zod";
import { invitationSchema } from "../../../core/contract/invitations";

export {
  createInvitationBodySchema,
  invitationListSchema,
  invitationParamsSchema,
  invitationPreviewSchema,
  invitationTokenParamsSchema,
  joinedWorkspaceSchema,
} from "../../../core/contract/invitations";
export { workspaceIdParamsSchema } from "../../../core/contract/workspaces";

export const invitationResponseSchema = z.object({ invitation: invitationSchema });
