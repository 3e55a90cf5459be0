import { useMutation, useQueryClient } from "@tanstack/react-query";
import { signedInResponseSchema, type SignUpBody } from "../../../../../core/contract/auth";
import { apiSend } from "../../../lib/api-client";
import { SESSION_KEY } from "../../../lib/session";

/** Creates the account and signs in. */
export const signUp = (body: SignUpBody) => apiSend("POST", "/auth/sign-up", body, signedInResponseSchema);

export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (data) => {
      queryClient.clear();
      queryClient.setQueryData(SESSION_KEY, data);
    },
  });
}
