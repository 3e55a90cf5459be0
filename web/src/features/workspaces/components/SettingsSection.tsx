import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { useNavigate, useOutletContext } from "react-router-dom";
import {
  updateWorkspaceBodySchema,
  type UpdateWorkspaceBody,
  type Workspace,
} from "../../../../../core/contract/workspaces";
import { applyServerErrors, Field, FormMessage, primaryButton } from "../../../lib/forms";
import { useDeleteWorkspace, useRenameWorkspace } from "../../../entities/workspace/mutations";
import { deleteConfirmed, sectionRefusal } from "../model/roles";
import { SectionRefusal } from "./SectionRefusal";

/** `/workspaces/:id/settings` (owners): rename the workspace, or delete it after typing its name. */
export function SettingsSection() {
  const workspace = useOutletContext<Workspace>();
  const refusal = sectionRefusal(workspace.role, "settings");
  if (refusal) return <SectionRefusal headingId="settings-heading" title="Settings" reason={refusal} />;
  return (
    <div className="max-w-xl space-y-10">
      <RenameForm workspace={workspace} />
      <DeleteWorkspace workspace={workspace} />
    </div>
  );
}

function RenameForm({ workspace }: { workspace: Workspace }) {
  const rename = useRenameWorkspace();
  const form = useForm<UpdateWorkspaceBody>({
    resolver: zodResolver(updateWorkspaceBodySchema),
    defaultValues: { name: workspace.name },
  });
  const onSubmit = form.handleSubmit((body) =>
    rename.mutate(
      { workspaceId: workspace.id, ...body },
      {
        onSuccess: (renamed) => form.reset({ name: renamed.name }),
        onError: (error) => applyServerErrors(error, form.setError, ["name"]),
      },
    ),
  );
  return (
    <section aria-labelledby="rename-heading" className="space-y-3">
      <h2 id="rename-heading" className="text-lg font-semibold">
        Name
      </h2>
      <form onSubmit={onSubmit} noValidate className="space-y-3">
        <Field
          id="workspace-rename"
          label="Workspace name"
          error={form.formState.errors.name?.message}
          {...form.register("name")}
        />
        <div className="flex items-center gap-3">
          <button
            type="submit"
            className={primaryButton}
            disabled={rename.isPending || !form.formState.isDirty}
          >
            Rename
          </button>
          {rename.isSuccess && !form.formState.isDirty && (
            <span role="status" className="text-sm text-pass">
              ✓ Renamed
            </span>
          )}
        </div>
      </form>
    </section>
  );
}

function DeleteWorkspace({ workspace }: { workspace: Workspace }) {
  const del = useDeleteWorkspace();
  const navigate = useNavigate();
  const [typed, setTyped] = useState("");
  const matches = deleteConfirmed(typed, workspace.name);
  return (
    <section
      aria-labelledby="delete-heading"
      className="space-y-3 rounded border border-fail/40 bg-panel p-5"
    >
      <h2 id="delete-heading" className="text-lg font-semibold text-fail">
        Delete this workspace
      </h2>
      <p className="text-sm text-graphite-soft">
        Deleting removes every project, load case and calculation record in it for every member. It cannot be
        undone. Export the projects you want to keep first.
      </p>
      <FormMessage error={del.error} />
      <form
        onSubmit={(event) => {
          event.preventDefault();
          if (matches) del.mutate(workspace.id, { onSuccess: () => navigate("/workspaces") });
        }}
        className="space-y-3"
      >
        <Field
          id="workspace-delete-confirm"
          label={`Type the workspace's name (${workspace.name}) to confirm`}
          autoComplete="off"
          value={typed}
          onChange={(event) => setTyped(event.target.value)}
        />
        <button
          type="submit"
          disabled={!matches || del.isPending}
          className="rounded border border-fail px-3 py-1.5 text-sm font-semibold text-fail hover:bg-fail-wash disabled:opacity-50"
        >
          Delete {workspace.name} for everyone
        </button>
      </form>
    </section>
  );
}
