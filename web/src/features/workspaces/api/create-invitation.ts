import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { invitationSchema, type CreateInvitationBody } from "../../../../../core/contract/invitations";
import { apiSend } from "../../../lib/api-client";
import { workspaceKeys } from "../../../entities/workspace/keys";

const responseSchema = z.object({ invitation: invitationSchema });

export const createInvitation = (v: { workspaceId: string; body: CreateInvitationBody }) =>
  apiSend("POST", `/workspaces/${v.workspaceId}/invitations`, v.body, responseSchema);

export function useCreateInvitation(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvitation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: workspaceKeys.invitations(workspaceId) }),
  });
}
