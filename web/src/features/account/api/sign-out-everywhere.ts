import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiSend } from "../../../lib/api-client";
import { SESSION_KEY } from "../../../lib/session";

/** Ends every session of the account, this one included. */
export const signOutEverywhere = () => apiSend("POST", "/auth/sign-out-everywhere", undefined, null);

export function useSignOutEverywhere() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOutEverywhere,
    onSuccess: () => {
      queryClient.clear();
      queryClient.setQueryData(SESSION_KEY, { user: null });
    },
  });
}
