import { queryOptions, useQuery } from "@tanstack/react-query";
import { shareLinkListSchema } from "../../../../../core/contract/share-links";
import { apiGet } from "../../../lib/api-client";
import { workspaceKeys } from "../../../entities/workspace/keys";

export const listShareLinks = (workspaceId: string) =>
  apiGet(`/workspaces/${workspaceId}/share-links`, shareLinkListSchema).then((r) => r.shareLinks);

export const shareLinksQueryOptions = (workspaceId: string) =>
  queryOptions({
    queryKey: workspaceKeys.shareLinks(workspaceId),
    queryFn: () => listShareLinks(workspaceId),
  });

/** Editors and owners only. */
export const useShareLinks = (workspaceId: string, enabled: boolean) =>
  useQuery({ ...shareLinksQueryOptions(workspaceId), enabled });
