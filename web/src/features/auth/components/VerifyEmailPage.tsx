import { useEffect, useRef } from "react";
import { Link, useNavigate, useParams } from "react-router-dom";
import { fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage } from "../../../lib/forms";
import { safeNext } from "../../../lib/session";
import { useVerifyEmail } from "../api/verify-email";
import { AuthCard } from "./AuthCard";

/** `/verify-email/:token`: the page the confirmation mail links to; confirms, signs in and goes on. */
export function VerifyEmailPage() {
  const { token = "" } = useParams();
  const navigate = useNavigate();
  const verify = useVerifyEmail();
  const sent = useRef(false);
  useEffect(() => {
    // Once only: the link is single-use, and React may run effects twice in development.
    if (sent.current) return;
    sent.current = true;
    verify.mutate({ token }, { onSuccess: ({ next }) => navigate(safeNext(next), { replace: true }) });
  }, [token, verify, navigate]);
  if (verify.isError) {
    const tokenError = fieldErrorsOf(verify.error).token;
    return (
      <AuthCard title="This link does not work">
        <FormMessage error={tokenError ? null : verify.error}>{tokenError}</FormMessage>
        <p className="mt-4 text-sm">
          <Link to="/sign-in" className="text-ink underline">
            Sign in
          </Link>{" "}
          or{" "}
          <Link to="/forgot-password" className="text-ink underline">
            choose a new password
          </Link>
          .
        </p>
      </AuthCard>
    );
  }
  return (
    <AuthCard title="Confirming your address">
      <p role="status" className="text-graphite-soft">
        One moment…
      </p>
    </AuthCard>
  );
}
