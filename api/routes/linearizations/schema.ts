export {
  linearizationCaseParamsSchema,
  linearizationInputSchema,
  linearizationListSchema,
  linearizationParamsSchema,
  linearizationPreviewSchema,
  linearizationResponseSchema,
  updateLinearizationBodySchema,
} from "../../../core/contract/linearizations";
