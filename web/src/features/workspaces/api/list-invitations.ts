import { queryOptions, useQuery } from "@tanstack/react-query";
import { invitationListSchema } from "../../../../../core/contract/invitations";
import { apiGet } from "../../../lib/api-client";

export const listInvitations = (workspaceId: string) =>
  apiGet(`/workspaces/${workspaceId}/invitations`, invitationListSchema).then((r) => r.invitations);

export const invitationsQueryOptions = (workspaceId: string) =>
  queryOptions({
    queryKey: ["workspaces", workspaceId, "invitations"],
    queryFn: () => listInvitations(workspaceId),
  });

/** Owners only. */
export const useInvitations = (workspaceId: string, enabled: boolean) =>
  useQuery({ ...invitationsQueryOptions(workspaceId), enabled });
