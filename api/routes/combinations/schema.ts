export {
  combinationListSchema,
  combinationParamsSchema,
  combinationResponseSchema,
  combinationResultsSchema,
  createCombinationBodySchema,
  updateCombinationBodySchema,
} from "../../../core/contract/combinations";
export { projectParamsSchema } from "../../../core/contract/projects";
