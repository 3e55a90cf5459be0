import { queryOptions, useQuery } from "@tanstack/react-query";
import { invitationListSchema } from "../../../../../core/contract/invitations";
import { apiGet } from "../../../lib/api-client";
import { workspaceKeys } from "../../../entities/workspace/keys";

export const listInvitations = (workspaceId: string) =>
  apiGet(`/workspaces/${workspaceId}/invitations`, invitationListSchema).then((r) => r.invitations);

export const invitationsQueryOptions = (workspaceId: string) =>
  queryOptions({
    queryKey: workspaceKeys.invitations(workspaceId),
    queryFn: () => listInvitations(workspaceId),
  });

/** Owners only. */
export const useInvitations = (workspaceId: string, enabled: boolean) =>
  useQuery({ ...invitationsQueryOptions(workspaceId), enabled });
