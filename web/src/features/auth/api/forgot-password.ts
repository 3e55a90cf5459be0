import { useMutation } from "@tanstack/react-query";
import { notice, type ForgotPasswordBody } from "../../../../../core/contract/auth";
import { apiSend } from "../../../lib/api-client";

/** Asks for a reset link; the answer is the same whether or not the address has an account. */
export const forgotPassword = (body: ForgotPasswordBody) =>
  apiSend("POST", "/auth/forgot-password", body, notice);

export const useForgotPassword = () => useMutation({ mutationFn: forgotPassword });
