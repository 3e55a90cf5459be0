import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { Link } from "react-router-dom";
import { forgotPasswordBodySchema, type ForgotPasswordBody } from "../../../../../core/contract/auth";
import { ApiError } from "../../../lib/api-client";
import { applyServerErrors, Field, FormMessage, primaryButton } from "../../../lib/forms";
import { useForgotPassword } from "../api/forgot-password";
import { AuthCard } from "./AuthCard";

/** `/forgot-password`: mails a single-use link valid for one hour. */
export function ForgotPasswordPage() {
  const forgot = useForgotPassword();
  const form = useForm<ForgotPasswordBody>({
    resolver: zodResolver(forgotPasswordBodySchema),
    defaultValues: { email: "" },
  });
  const onSubmit = form.handleSubmit((body) =>
    forgot.mutate(body, { onError: (error) => applyServerErrors(error, form.setError, ["email"]) }),
  );
  if (forgot.isSuccess) {
    return (
      <AuthCard title="Check your mail">
        <p role="status">{forgot.data.message}</p>
        <p className="mt-4 text-sm">
          <Link to="/sign-in" className="text-ink underline">
            Back to sign-in
          </Link>
        </p>
      </AuthCard>
    );
  }
  const generalError =
    forgot.error instanceof ApiError && forgot.error.id !== "invalid_input" ? forgot.error : null;
  return (
    <AuthCard
      title="Forgot your password?"
      intro="Give the address you sign in with; we mail you a link to choose a new password."
    >
      <form onSubmit={onSubmit} noValidate className="space-y-4">
        <Field
          id="forgot-email"
          label="E-mail address"
          type="email"
          autoComplete="email"
          error={form.formState.errors.email?.message}
          {...form.register("email")}
        />
        <FormMessage error={generalError} />
        <button type="submit" className={`${primaryButton} w-full`} disabled={forgot.isPending}>
          Send the link
        </button>
      </form>
    </AuthCard>
  );
}
