import { Link, NavLink, useNavigate } from "react-router-dom";
import { useSession } from "../../../lib/session";
import { useSignOut } from "../api/sign-out";

/** The header's right side: the signed-in person with Account and Sign out, or Sign in / Create account. */
export function UserMenu() {
  const session = useSession();
  const signOut = useSignOut();
  const navigate = useNavigate();
  if (session.isPending) return null;
  const user = session.data?.user;
  if (!user) {
    return (
      <div className="flex items-center gap-3 text-[15px]">
        <Link to="/sign-in" className="text-graphite-soft hover:text-ink">
          Sign in
        </Link>
        <Link
          to="/sign-up"
          className="rounded bg-ink px-3 py-1.5 font-semibold text-panel hover:bg-ink-hover"
        >
          Create account
        </Link>
      </div>
    );
  }
  return (
    <div className="flex items-center gap-3 text-[15px]">
      <NavLink
        to="/account"
        className="text-graphite hover:text-ink"
        aria-label={`Account settings for ${user.name}`}
      >
        <span
          aria-hidden="true"
          className="mr-1.5 inline-grid h-7 w-7 place-items-center rounded-full bg-ink-wash text-sm font-semibold text-ink"
        >
          {user.name.slice(0, 1).toUpperCase()}
        </span>
        {user.name}
      </NavLink>
      <button
        type="button"
        className="text-graphite-soft hover:text-ink"
        onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate("/sign-in") })}
      >
        Sign out
      </button>
    </div>
  );
}
