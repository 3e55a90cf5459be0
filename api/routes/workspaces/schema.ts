import { z } from "zod";
import { workspaceSchema } from "../../../core/contract/workspaces";

export {
  createWorkspaceBodySchema,
  updateWorkspaceBodySchema,
  workspaceIdParamsSchema,
  workspaceListSchema,
} from "../../../core/contract/workspaces";

export const workspaceResponseSchema = z.object({ workspace: workspaceSchema });
