import { NavLink, Outlet, useParams } from "react-router-dom";
import { FormMessage } from "../../../lib/forms";
import { useWorkspace } from "../../../entities/workspace/queries";
import { readOnlyNote } from "../../../lib/role-note";
import { CopyLinkButton } from "../../../components/CopyLinkButton";
import { isNotThere } from "../model/errors";
import { membersWord, workspaceTabs } from "../model/roles";
import { RoleBadge } from "./RoleBadge";

/** `/workspaces/:workspaceId/*`: the workspace's header and tabs; pages inside render below. */
export function WorkspacePage() {
  const { workspaceId = "" } = useParams();
  const workspace = useWorkspace(workspaceId);
  if (workspace.isPending) return <p className="text-graphite-soft">Loading…</p>;
  if (workspace.error) {
    const notFound = isNotThere(workspace.error);
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
  const tabs = workspaceTabs(w.role);
  return (
    <div className="space-y-6">
      <header className="flex flex-wrap items-end justify-between gap-4 border-b border-rule pb-4">
        <div>
          <p className="text-sm font-semibold uppercase tracking-[0.14em] text-ink">Workspace</p>
          <h1 className="text-3xl font-semibold tracking-tight">{w.name}</h1>
          <p className="mt-1 text-graphite-soft">
            You are <RoleBadge role={w.role} /> · <span className="num">{w.memberCount}</span>{" "}
            {membersWord(w.memberCount)}
          </p>
          {readOnlyNote(w.role) && (
            <p className="mt-1 max-w-3xl text-sm text-graphite-soft">{readOnlyNote(w.role)}</p>
          )}
        </div>
        <CopyLinkButton />
      </header>
      <nav aria-label="Workspace" className="flex flex-wrap gap-1">
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
