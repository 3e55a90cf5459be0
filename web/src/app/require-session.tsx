import type { ReactNode } from "react";
import { Navigate, Outlet, useLocation } from "react-router-dom";
import { useSession } from "../lib/session";

/**
 * Lets a signed-in person through; sends anyone else to /sign-in with `next` set to the
 * exact address they asked for, so they come back to it. Use as a layout route
 * (`{ element: <RequireSession />, children: [...] }`) or around one element.
 */
export function RequireSession({ children }: { children?: ReactNode }) {
  const session = useSession();
  const location = useLocation();
  if (session.isPending) return <p className="text-graphite-soft">Checking your session…</p>;
  if (!session.data?.user) {
    const next = `${location.pathname}${location.search}${location.hash}`;
    return <Navigate to={`/sign-in?next=${encodeURIComponent(next)}`} replace />;
  }
  return children ?? <Outlet />;
}
