import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { Link, useNavigate } from "react-router-dom";
import { createWorkspaceBodySchema, type CreateWorkspaceBody } from "../../../../../core/contract/workspaces";
import { applyServerErrors, Field, FormMessage, primaryButton } from "../../../lib/forms";
import { useCreateWorkspace } from "../../../entities/workspace/mutations";
import { useWorkspaces } from "../../../entities/workspace/queries";
import { RoleBadge } from "./RoleBadge";

/** `/workspaces`: the caller's workspaces and their role in each. */
export function WorkspacesPage() {
  const workspaces = useWorkspaces();
  return (
    <div className="space-y-6">
      <header className="flex items-center justify-between">
        <h1 className="text-2xl font-semibold tracking-tight">Workspaces</h1>
        <Link to="/workspaces/new" className={primaryButton}>
          New workspace
        </Link>
      </header>
      {workspaces.isPending && <p className="text-graphite-soft">Loading…</p>}
      <FormMessage error={workspaces.error} />
      {workspaces.data && workspaces.data.workspaces.length === 0 && (
        <p className="rounded border border-rule bg-panel p-6 text-graphite-soft">
          You are not in any workspace yet. Create one for your team, or open an invitation or share link a
          colleague sent you.
        </p>
      )}
      {workspaces.data && workspaces.data.workspaces.length > 0 && (
        <ul className="divide-y divide-rule rounded border border-rule bg-panel">
          {workspaces.data.workspaces.map((w) => (
            <li key={w.id} className="flex items-center justify-between px-5 py-4">
              <Link
                to={`/workspaces/${w.id}`}
                className="text-lg font-semibold text-ink underline-offset-2 hover:underline"
              >
                {w.name}
              </Link>
              <span className="flex items-center gap-4 text-sm text-graphite-soft">
                <span>
                  <span className="num">{w.memberCount}</span> {w.memberCount === 1 ? "member" : "members"}
                </span>
                <RoleBadge role={w.role} />
              </span>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

/** `/workspaces/new`: the creator becomes the owner. */
export function NewWorkspacePage() {
  const create = useCreateWorkspace();
  const navigate = useNavigate();
  const form = useForm<CreateWorkspaceBody>({
    resolver: zodResolver(createWorkspaceBodySchema),
    defaultValues: { name: "" },
  });
  const onSubmit = form.handleSubmit((body) =>
    create.mutate(body, {
      onSuccess: (workspace) => navigate(`/workspaces/${workspace.id}`),
      onError: (error) => applyServerErrors(error, form.setError, ["name"]),
    }),
  );
  return (
    <section className="mx-auto max-w-lg rounded border border-rule bg-panel p-8">
      <h1 className="text-2xl font-semibold tracking-tight">New workspace</h1>
      <p className="mt-2 text-graphite-soft">
        A workspace holds a team's projects, load cases and calculation records. You will be its owner.
      </p>
      <form onSubmit={onSubmit} noValidate className="mt-6 space-y-4">
        <Field
          id="workspace-name"
          label="Workspace name"
          placeholder="Quillon Engineering"
          error={form.formState.errors.name?.message}
          {...form.register("name")}
        />
        <button type="submit" className={primaryButton} disabled={create.isPending}>
          Create workspace
        </button>
      </form>
    </section>
  );
}
