export {
  memberListSchema,
  memberParamsSchema,
  updateMemberBodySchema,
  workspaceIdParamsSchema,
} from "../../../core/contract/workspaces";
import { z } from "zod";
import { memberSchema } from "../../../core/contract/workspaces";

export const memberResponseSchema = z.object({ member: memberSchema });
