import { queryOptions, useQuery } from "@tanstack/react-query";
import { invitationPreviewSchema } from "../../../../../core/contract/invitations";
import { apiGet } from "../../../lib/api-client";

export const getInvitationPreview = (token: string) =>
  apiGet(`/invitations/${token}`, invitationPreviewSchema);

export const invitationPreviewQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ["invitation-preview", token],
    queryFn: () => getInvitationPreview(token),
    retry: false,
  });

export const useInvitationPreview = (token: string) => useQuery(invitationPreviewQueryOptions(token));
