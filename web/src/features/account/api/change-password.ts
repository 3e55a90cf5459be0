import { useMutation } from "@tanstack/react-query";
import type { ChangePasswordBody } from "../../../../../core/contract/account";
import { apiSend } from "../../../lib/api-client";

/** Changes the password (the current one is checked); other devices are signed out. */
export const changePassword = (body: ChangePasswordBody) => apiSend("POST", "/account/password", body, null);

export const useChangePassword = () => useMutation({ mutationFn: changePassword });
