import { workspaceIdParamsSchema } from "../../../core/contract/workspaces";

export {
  createMaterialBodySchema,
  materialListSchema,
  materialParamsSchema,
  materialResponseSchema,
  updateMaterialBodySchema,
} from "../../../core/contract/materials";
export { workspaceIdParamsSchema };
