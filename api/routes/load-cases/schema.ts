export {
  createLoadCaseBodySchema,
  loadCaseListSchema,
  loadCaseParamsSchema,
  loadCaseResponseSchema,
  putStateBodySchema,
  stateHistorySchema,
  stateParamsSchema,
  updateLoadCaseBodySchema,
} from "../../../core/contract/load-cases";
export { projectParamsSchema } from "../../../core/contract/projects";
