import { queryOptions, useQuery } from "@tanstack/react-query";
import { shareLinkListSchema } from "../../../../../core/contract/share-links";
import { apiGet } from "../../../lib/api-client";

export const listShareLinks = (workspaceId: string) =>
  apiGet(`/workspaces/${workspaceId}/share-links`, shareLinkListSchema).then((r) => r.shareLinks);

export const shareLinksQueryOptions = (workspaceId: string) =>
  queryOptions({
    queryKey: ["workspaces", workspaceId, "share-links"],
    queryFn: () => listShareLinks(workspaceId),
  });

/** Editors and owners only. */
export const useShareLinks = (workspaceId: string, enabled: boolean) =>
  useQuery({ ...shareLinksQueryOptions(workspaceId), enabled });
