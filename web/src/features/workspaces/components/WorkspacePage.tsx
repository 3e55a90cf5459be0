import { NavLink, Outlet, useParams } from "react-router-dom";
import { roleAtLeast } from "../../../../../core/contract/workspaces";
import { ApiError } from "../../../lib/api-client";
import { FormMessage } from "../../../lib/forms";
import { useWorkspace } from "../../../entities/workspace/queries";
import { CopyLinkButton } from "../../../components/CopyLinkButton";
import { RoleBadge } from "./RoleBadge";

/** `/workspaces/:workspaceId/*`: the workspace's header and tabs; pages inside render below. */
export function WorkspacePage() {
  const { workspaceId = "" } = useParams();
  const workspace = useWorkspace(workspaceId);
  if (workspace.isPending) return <p className="text-graphite-soft">Loading…</p>;
  if (workspace.error) {
    const notFound = workspace.error instanceof ApiError && [400, 404].includes(workspace.error.status);
    return notFound ? (
      <section className="mx-auto max-w-xl py-12 text-center">
        <h1 className="text-2xl font-semibold">No workspace here for you</h1>
        <p className="mt-2 text-graphite-soft">
          Either it does not exist or you are not a member. Ask its owner for an invitation or a share link.
        </p>
      </section>
    ) : (
      <FormMessage error={workspace.error} />
    );
  }
  const w = workspace.data;
  const tabs = [
    { to: "projects", label: "Projects", show: true },
    { to: "members", label: "Members", show: true },
    { to: "invitations", label: "Invitations", show: roleAtLeast(w.role, "owner") },
    { to: "share-links", label: "Share links", show: roleAtLeast(w.role, "editor") },
    { to: "settings", label: "Settings", show: roleAtLeast(w.role, "owner") },
  ].filter((t) => t.show);
  return (
    <div className="space-y-6">
      <header className="flex flex-wrap items-end justify-between gap-4 border-b border-rule pb-4">
        <div>
          <p className="text-sm font-semibold uppercase tracking-[0.14em] text-ink">Workspace</p>
          <h1 className="text-3xl font-semibold tracking-tight">{w.name}</h1>
          <p className="mt-1 text-graphite-soft">
            You are <RoleBadge role={w.role} /> · <span className="num">{w.memberCount}</span>{" "}
            {w.memberCount === 1 ? "member" : "members"}
          </p>
        </div>
        <CopyLinkButton />
      </header>
      <nav aria-label="Workspace" className="flex gap-1">
        {tabs.map((t) => (
          <NavLink
            key={t.to}
            to={t.to}
            className={({ isActive }) =>
              `rounded px-3 py-1.5 text-[15px] ${isActive ? "bg-ink-wash font-semibold text-ink" : "text-graphite-soft hover:text-ink"}`
            }
          >
            {t.label}
          </NavLink>
        ))}
      </nav>
      <Outlet context={w} />
    </div>
  );
}
