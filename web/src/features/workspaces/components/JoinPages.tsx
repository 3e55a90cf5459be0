import { Link, useLocation, useNavigate, useParams } from "react-router-dom";
import { FormMessage, primaryButton } from "../../../lib/forms";
import { useSession } from "../../../lib/session";
import { useAcceptInvitation } from "../api/accept-invitation";
import { useInvitationPreview } from "../api/get-invitation-preview";
import { useShareLinkPreview } from "../api/get-share-link-preview";
import { useJoinShareLink } from "../api/join-share-link";
import { formatDate } from "../model/dates";
import { isNotFound } from "../model/errors";
import { shareLinkStateNote, signInLinks, UNUSABLE } from "../model/join";
import { RoleBadge } from "./RoleBadge";

function Sheet({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <section className="mx-auto max-w-lg rounded border border-rule bg-panel p-8">
      <h1 className="text-2xl font-semibold tracking-tight">{title}</h1>
      <div className="mt-4 space-y-4">{children}</div>
    </section>
  );
}

/** Sign-in and sign-up links that come back to this page afterwards. */
function SignInFirst({ email }: { email?: string }) {
  const location = useLocation();
  const links = signInLinks(location.pathname, email);
  return (
    <div className="flex gap-3">
      <Link to={links.signUp} className={primaryButton}>
        Create an account
      </Link>
      <Link to={links.signIn} className="rounded border border-rule-strong px-4 py-2 font-semibold text-ink">
        Sign in
      </Link>
    </div>
  );
}

/** `/invitations/:token`: the page the invitation mail links to. */
export function AcceptInvitationPage() {
  const { token = "" } = useParams();
  const preview = useInvitationPreview(token);
  const session = useSession();
  const accept = useAcceptInvitation();
  const navigate = useNavigate();
  if (preview.isPending || session.isPending) return <p className="text-graphite-soft">Loading…</p>;
  if (preview.error) {
    return (
      <Sheet title="This invitation link does not work">
        <p>
          {isNotFound(preview.error)
            ? "It may have been replaced by a newer mail; open the latest one, or ask for a new invitation."
            : preview.error.message}
        </p>
      </Sheet>
    );
  }
  const p = preview.data;
  const user = session.data?.user;
  return (
    <Sheet title={`Join ${p.workspaceName}`}>
      <p>
        {p.invitedByName ?? "A member"} invited <strong>{p.email}</strong> to join{" "}
        <strong>{p.workspaceName}</strong> as <RoleBadge role={p.role} />.
      </p>
      {p.state !== "pending" ? (
        <FormMessage>{UNUSABLE[p.state]}</FormMessage>
      ) : !user ? (
        <>
          <p className="text-graphite-soft">
            Sign in or create an account with {p.email} to accept. The invitation is valid until{" "}
            {formatDate(p.expiresAt)}.
          </p>
          <SignInFirst email={p.email} />
        </>
      ) : (
        <>
          <FormMessage error={accept.error} />
          <button
            type="button"
            className={primaryButton}
            disabled={accept.isPending}
            onClick={() =>
              accept.mutate(token, { onSuccess: (r) => navigate(`/workspaces/${r.workspaceId}`) })
            }
          >
            Accept and open the workspace
          </button>
        </>
      )}
    </Sheet>
  );
}

/** `/join/:token`: the page a share link opens. */
export function JoinShareLinkPage() {
  const { token = "" } = useParams();
  const preview = useShareLinkPreview(token);
  const session = useSession();
  const join = useJoinShareLink();
  const navigate = useNavigate();
  if (preview.isPending || session.isPending) return <p className="text-graphite-soft">Loading…</p>;
  if (preview.error)
    return (
      <Sheet title="This share link does not work">
        <p>Check that the whole link was copied, or ask for a new one.</p>
      </Sheet>
    );
  const p = preview.data;
  const user = session.data?.user;
  return (
    <Sheet title={`Join ${p.workspaceName}`}>
      <p>
        This link lets you join <strong>{p.workspaceName}</strong> as <RoleBadge role={p.role} />.
      </p>
      {!user ? (
        <>
          <p className="text-graphite-soft">
            Sign in or create an account first; you come back here afterwards.
          </p>
          <SignInFirst />
        </>
      ) : (
        <>
          {p.state !== "active" && (
            <p className="text-graphite-soft">
              {shareLinkStateNote(p.state)} If you are a member already, you can still open the workspace.
            </p>
          )}
          <FormMessage error={join.error} />
          <button
            type="button"
            className={primaryButton}
            disabled={join.isPending}
            onClick={() => join.mutate(token, { onSuccess: (r) => navigate(`/workspaces/${r.workspaceId}`) })}
          >
            Join and open the workspace
          </button>
        </>
      )}
    </Sheet>
  );
}
