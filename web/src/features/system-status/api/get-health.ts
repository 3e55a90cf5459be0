import { queryOptions, useQuery } from "@tanstack/react-query";
import { healthResponseSchema } from "../../../../../core/contract/health";
import { apiGet } from "../../../lib/api-client";

export const getHealth = () => apiGet("/health", healthResponseSchema, [503]);

export const healthQueryOptions = () =>
  queryOptions({ queryKey: ["health"], queryFn: getHealth, refetchInterval: 30_000, retry: false });

/** The server's and the database's state, refreshed every 30 s. */
export const useHealth = () => useQuery(healthQueryOptions());
