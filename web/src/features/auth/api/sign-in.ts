import { useMutation, useQueryClient } from "@tanstack/react-query";
import { signedInResponseSchema, type SignInBody } from "../../../../../core/contract/auth";
import { apiSend } from "../../../lib/api-client";
import { SESSION_KEY } from "../../../lib/session";

/** Signs in (a new session). */
export const signIn = (body: SignInBody) => apiSend("POST", "/auth/sign-in", body, signedInResponseSchema);

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (data) => {
      queryClient.clear();
      queryClient.setQueryData(SESSION_KEY, data);
    },
  });
}
