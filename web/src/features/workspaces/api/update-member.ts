import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { memberSchema, type Role } from "../../../../../core/contract/workspaces";
import { apiSend } from "../../../lib/api-client";

const responseSchema = z.object({ member: memberSchema });

export const updateMember = (v: { workspaceId: string; memberId: string; role: Role }) =>
  apiSend("PATCH", `/workspaces/${v.workspaceId}/members/${v.memberId}`, { role: v.role }, responseSchema);

/** Changes a member's role (owners only; the last owner cannot step down). */
export function useUpdateMember(workspaceId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMember,
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["workspaces", workspaceId] }),
  });
}
