import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { Link, useNavigate, useParams } from "react-router-dom";
import { z } from "zod";
import { newPasswordSchema, PASSWORD_MIN_LENGTH } from "../../../../../core/contract/auth";
import { ApiError, fieldErrorsOf } from "../../../lib/api-client";
import { applyServerErrors, Field, FormMessage, primaryButton } from "../../../lib/forms";
import { useResetPassword } from "../api/reset-password";
import { AuthCard } from "./AuthCard";

const formSchema = z.object({ password: newPasswordSchema });

/** `/reset-password/:token`: the page the reset mail links to. */
export function ResetPasswordPage() {
  const { token = "" } = useParams();
  const navigate = useNavigate();
  const reset = useResetPassword();
  const form = useForm<{ password: string }>({
    resolver: zodResolver(formSchema),
    defaultValues: { password: "" },
  });
  const onSubmit = form.handleSubmit(({ password }) =>
    reset.mutate(
      { token, password },
      {
        onSuccess: () => navigate("/workspaces", { replace: true }),
        onError: (error) => applyServerErrors(error, form.setError, ["password"]),
      },
    ),
  );
  const tokenError = fieldErrorsOf(reset.error).token;
  const generalError =
    reset.error instanceof ApiError && reset.error.id !== "invalid_input" ? reset.error : null;
  return (
    <AuthCard title="Choose a new password" intro="Setting it signs you out on every other device.">
      <form onSubmit={onSubmit} noValidate className="space-y-4">
        <Field
          id="reset-password"
          label="New password"
          type="password"
          autoComplete="new-password"
          hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
          error={form.formState.errors.password?.message}
          {...form.register("password")}
        />
        <FormMessage error={generalError}>
          {tokenError && (
            <>
              {tokenError}{" "}
              <Link to="/forgot-password" className="underline">
                Ask for a new link
              </Link>
            </>
          )}
        </FormMessage>
        <button type="submit" className={`${primaryButton} w-full`} disabled={reset.isPending}>
          Set the new password
        </button>
      </form>
    </AuthCard>
  );
}
