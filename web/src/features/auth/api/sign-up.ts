import { useMutation, useQueryClient } from "@tanstack/react-query";
import { signUpResponseSchema, type SignUpBody } from "../../../../../core/contract/auth";
import { apiSend } from "../../../lib/api-client";
import { SESSION_KEY } from "../../../lib/session";

/**
 * Creates the account. From an invitation link (with its token) it signs in at once;
 * otherwise the answer only says to check the mail.
 */
export const signUp = (body: SignUpBody) => apiSend("POST", "/auth/sign-up", body, signUpResponseSchema);

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (data) => {
      if (!("user" in data)) return;
      queryClient.clear();
      queryClient.setQueryData(SESSION_KEY, data);
    },
  });
}
