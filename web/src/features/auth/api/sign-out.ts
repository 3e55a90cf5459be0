import { useMutation, useQueryClient } from "@tanstack/react-query";

import { apiSend } from "../../../lib/api-client";
import { SESSION_KEY } from "../../../lib/session";

/** Signs out of this browser. */
export const signOut = () => apiSend("POST", "/auth/sign-out", undefined, null);

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      queryClient.clear();
      queryClient.setQueryData(SESSION_KEY, { user: null });
    },
  });
}
