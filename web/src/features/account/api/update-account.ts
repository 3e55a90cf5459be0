import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { UpdateAccountBody } from "../../../../../core/contract/account";
import { signedInResponseSchema } from "../../../../../core/contract/auth";
import { apiSend } from "../../../lib/api-client";
import { SESSION_KEY } from "../../../lib/session";

/** Renames the account; the header follows at once. */
export const updateAccount = (body: UpdateAccountBody) =>
  apiSend("PATCH", "/account", body, signedInResponseSchema);

export function useUpdateAccount() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateAccount,
    onSuccess: (data) => queryClient.setQueryData(SESSION_KEY, data),
  });
}
