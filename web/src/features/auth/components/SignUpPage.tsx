import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { Link, useNavigate, useSearchParams } from "react-router-dom";
import {
  nextPathSchema,
  PASSWORD_MIN_LENGTH,
  signUpBodySchema,
  type SignUpBody,
} from "../../../../../core/contract/auth";
import { ApiError } from "../../../lib/api-client";
import { applyServerErrors, Field, FormMessage, primaryButton } from "../../../lib/forms";
import { safeNext } from "../../../lib/session";
import { useSignUp } from "../api/sign-up";
import { AuthCard } from "./AuthCard";

/** An invitation page as `next` carries the invitation's token, which proves the address. */
const INVITATION_PATH = /^\/invitations\/([A-Za-z0-9_-]{20,100})$/;

/**
 * `/sign-up?next=…&email=…`: creates the account. Coming from an invitation link it signs
 * in and goes on to `next`; otherwise it says to check the mail (the same for an address
 * that has an account), and the mailed link confirms the address and goes on to `next`.
 */
export function SignUpPage() {
  const [params] = useSearchParams();
  const next = safeNext(params.get("next"));
  const invitationToken = INVITATION_PATH.exec(next)?.[1];
  const navigate = useNavigate();
  const signUp = useSignUp();
  const form = useForm<SignUpBody>({
    resolver: zodResolver(signUpBodySchema),
    defaultValues: { name: "", email: params.get("email") ?? "", password: "" },
  });
  const { errors } = form.formState;
  const onSubmit = form.handleSubmit((body) =>
    signUp.mutate(
      {
        ...body,
        // A `next` the server would refuse is dropped rather than failing a field the form does not show.
        ...(nextPathSchema.safeParse(next).success ? { next } : {}),
        ...(invitationToken ? { invitationToken } : {}),
      },
      {
        onSuccess: (data) => {
          if ("user" in data) navigate(next, { replace: true });
        },
        onError: (error) => {
          if (error instanceof ApiError && error.id === "email_taken") {
            form.setError("email", { type: "server", message: error.message });
          } else {
            applyServerErrors(error, form.setError, ["name", "email", "password"]);
          }
        },
      },
    ),
  );
  if (signUp.data && !("user" in signUp.data)) {
    return (
      <AuthCard title="Check your mail">
        <p role="status">{signUp.data.message}</p>
        <p className="mt-4 text-sm">
          Nothing arrived? Look in the spam folder, or{" "}
          <Link to={`/sign-in?next=${encodeURIComponent(next)}`} className="text-ink underline">
            sign in
          </Link>{" "}
          if you have an account already.
        </p>
      </AuthCard>
    );
  }
  const generalError =
    signUp.error instanceof ApiError && !["invalid_input", "email_taken"].includes(signUp.error.id)
      ? signUp.error
      : null;
  return (
    <AuthCard title="Create your account" intro="One account for every workspace you are invited to.">
      <form onSubmit={onSubmit} noValidate className="space-y-4">
        <Field
          id="sign-up-name"
          label="Your name"
          autoComplete="name"
          placeholder="Mira Castellan"
          error={errors.name?.message}
          {...form.register("name")}
        />
        <Field
          id="sign-up-email"
          label="E-mail address"
          type="email"
          autoComplete="email"
          error={errors.email?.message}
          {...form.register("email")}
        />
        <Field
          id="sign-up-password"
          label="Password"
          type="password"
          autoComplete="new-password"
          hint={`At least ${PASSWORD_MIN_LENGTH} characters; a few words you will remember work well.`}
          error={errors.password?.message}
          {...form.register("password")}
        />
        <FormMessage error={generalError} />
        <button type="submit" className={`${primaryButton} w-full`} disabled={signUp.isPending}>
          {signUp.isPending ? "Creating the account…" : "Create account"}
        </button>
      </form>
      <p className="mt-6 text-sm">
        Have an account already?{" "}
        <Link to={`/sign-in?next=${encodeURIComponent(next)}`} className="text-ink underline">
          Sign in
        </Link>
      </p>
    </AuthCard>
  );
}
