export {
  createLocationBodySchema,
  locationListSchema,
  locationParamsSchema,
  locationResponseSchema,
  projectParamsSchema,
  updateLocationBodySchema,
} from "../../../core/contract/projects";
