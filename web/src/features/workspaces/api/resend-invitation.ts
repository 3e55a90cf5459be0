import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { invitationSchema } from "../../../../../core/contract/invitations";
import { apiSend } from "../../../lib/api-client";
import { workspaceKeys } from "../../../entities/workspace/keys";

const responseSchema = z.object({ invitation: invitationSchema });

export const resendInvitation = (v: { workspaceId: string; invitationId: string }) =>
  apiSend(
    "POST",
    `/workspaces/${v.workspaceId}/invitations/${v.invitationId}/resend`,
    undefined,
    responseSchema,
  );

export function useResendInvitation(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resendInvitation,
    onSettled: () => queryClient.invalidateQueries({ queryKey: workspaceKeys.invitations(workspaceId) }),
  });
}
