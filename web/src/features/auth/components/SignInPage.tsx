import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { Link, useNavigate, useSearchParams } from "react-router-dom";
import { signInBodySchema, type SignInBody } from "../../../../../core/contract/auth";
import { ApiError } from "../../../lib/api-client";
import { applyServerErrors, Field, FormMessage, primaryButton } from "../../../lib/forms";
import { safeNext } from "../../../lib/session";
import { useSignIn } from "../api/sign-in";
import { AuthCard } from "./AuthCard";

/** `/sign-in?next=…`: signs in and goes back to where the visitor was going. */
export function SignInPage() {
  const [params] = useSearchParams();
  const next = safeNext(params.get("next"));
  const navigate = useNavigate();
  const signIn = useSignIn();
  const form = useForm<SignInBody>({
    resolver: zodResolver(signInBodySchema),
    defaultValues: { email: params.get("email") ?? "", password: "" },
  });
  const { errors } = form.formState;
  const onSubmit = form.handleSubmit((body) =>
    signIn.mutate(body, {
      onSuccess: () => navigate(next, { replace: true }),
      onError: (error) => applyServerErrors(error, form.setError, ["email", "password"]),
    }),
  );
  const generalError =
    signIn.error instanceof ApiError && signIn.error.id !== "invalid_input" ? signIn.error : null;
  const withNext = (path: string) => `${path}?next=${encodeURIComponent(next)}`;
  return (
    <AuthCard title="Sign in" intro="Sign in to your team's workspaces and calculation records.">
      <form onSubmit={onSubmit} noValidate className="space-y-4">
        <Field
          id="sign-in-email"
          label="E-mail address"
          type="email"
          autoComplete="email"
          error={errors.email?.message}
          {...form.register("email")}
        />
        <Field
          id="sign-in-password"
          label="Password"
          type="password"
          autoComplete="current-password"
          error={errors.password?.message}
          {...form.register("password")}
        />
        <FormMessage error={generalError} />
        <button type="submit" className={`${primaryButton} w-full`} disabled={signIn.isPending}>
          {signIn.isPending ? "Signing in…" : "Sign in"}
        </button>
      </form>
      <p className="mt-6 flex justify-between text-sm">
        <Link to="/forgot-password" className="text-ink underline">
          Forgot your password?
        </Link>
        <Link to={withNext("/sign-up")} className="text-ink underline">
          Create an account
        </Link>
      </p>
    </AuthCard>
  );
}
