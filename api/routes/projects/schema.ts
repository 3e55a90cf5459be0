export {
  createProjectBodySchema,
  projectListSchema,
  projectParamsSchema,
  projectResponseSchema,
  updateProjectBodySchema,
} from "../../../core/contract/projects";
export { workspaceIdParamsSchema } from "../../../core/contract/workspaces";
