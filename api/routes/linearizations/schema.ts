export {
  linearizationCaseParamsSchema,
  linearizationInputSchema,
  linearizationListSchema,
  linearizationParamsSchema,
  linearizationPreviewSchema,
  linearizationResponseSchema,
  pathFromPointTableBodySchema,
  pathFromPointTableResponseSchema,
  updateLinearizationBodySchema,
} from "../../../core/contract/linearizations";
