import { useMutation, useQueryClient } from "@tanstack/react-query";
import { verifiedResponseSchema, type VerifyEmailBody } from "../../../../../core/contract/auth";
import { apiSend } from "../../../lib/api-client";
import { SESSION_KEY } from "../../../lib/session";

/** Confirms the address with the mailed link's token and signs in here. */
export const verifyEmail = (body: VerifyEmailBody) =>
  apiSend("POST", "/auth/verify-email", body, verifiedResponseSchema);

export function useVerifyEmail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: verifyEmail,
    onSuccess: ({ user }) => {
      queryClient.clear();
      queryClient.setQueryData(SESSION_KEY, { user });
    },
  });
}
