import { useMutation, useQueryClient } from "@tanstack/react-query";
import { signedInResponseSchema, type ResetPasswordBody } from "../../../../../core/contract/auth";
import { apiSend } from "../../../lib/api-client";
import { SESSION_KEY } from "../../../lib/session";

/** Sets a new password from a reset link and signs in here (everywhere else ends). */
export const resetPassword = (body: ResetPasswordBody) =>
  apiSend("POST", "/auth/reset-password", body, signedInResponseSchema);

export function useResetPassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resetPassword,
    onSuccess: (data) => {
      queryClient.clear();
      queryClient.setQueryData(SESSION_KEY, data);
    },
  });
}
