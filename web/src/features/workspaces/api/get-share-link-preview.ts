import { queryOptions, useQuery } from "@tanstack/react-query";
import { shareLinkPreviewSchema } from "../../../../../core/contract/share-links";
import { apiGet } from "../../../lib/api-client";

export const getShareLinkPreview = (token: string) => apiGet(`/share-links/${token}`, shareLinkPreviewSchema);

export const shareLinkPreviewQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ["share-link-preview", token],
    queryFn: () => getShareLinkPreview(token),
    retry: false,
  });

export const useShareLinkPreview = (token: string) => useQuery(shareLinkPreviewQueryOptions(token));
