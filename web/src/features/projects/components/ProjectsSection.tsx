import { useState, type ChangeEvent, type FormEvent } from "react";
import { Link, useParams } from "react-router-dom";
import { ApiError, fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import { Panel } from "../../../components/Panel";
import { ToolButton } from "../../../components/ToolButton";
import { useCreateProject, useDeleteProject, useImportProject } from "../../../entities/project/mutations";
import { useProjects } from "../../../entities/project/queries";
import { useRestore } from "../../../entities/trash/mutations";
import { useTrash } from "../../../entities/trash/queries";
import { useWorkspaceRole } from "../../../entities/workspace/queries";
import { PurgeButton } from "./PurgeButton";
import { ActivityPanel } from "./ActivityPanel";

/** `/workspaces/:workspaceId/projects`: the workspace's projects, a new one, an import, the trash. */
export function ProjectsSection() {
  const { workspaceId = "" } = useParams();
  const role = useWorkspaceRole(workspaceId);
  const projects = useProjects(workspaceId);
  const create = useCreateProject(workspaceId);
  const remove = useDeleteProject(workspaceId);
  const [name, setName] = useState("");
  const canEdit = role.canEdit;

  const submit = (e: FormEvent) => {
    e.preventDefault();
    create.mutate({ name }, { onSuccess: () => setName("") });
  };

  return (
    <div className="space-y-5">
      <Panel id="projects" title="Projects" subtitle="each with its locations, load cases and checks">
        <ul className="divide-y divide-rule">
          {projects.data?.length === 0 && <li className="p-4 text-graphite-soft">No projects yet.</li>}
          {projects.data?.map((p) => (
            <li key={p.id} className="flex flex-wrap items-center gap-4 px-4 py-3">
              <Link
                to={`/workspaces/${workspaceId}/projects/${p.id}`}
                className="text-lg font-semibold text-ink underline-offset-2 hover:underline"
              >
                {p.name}
              </Link>
              <span className="text-sm text-graphite-soft">
                <span className="num">{p.counts.locations}</span> locations ·{" "}
                <span className="num">{p.counts.loadCases}</span> load cases ·{" "}
                <span className="num">{p.counts.combinations}</span> combinations
              </span>
              <Link
                to={`/workspaces/${workspaceId}/projects/${p.id}/comparison`}
                className="text-sm text-ink underline-offset-2 hover:underline"
              >
                Comparison
              </Link>
              {canEdit && (
                <ToolButton
                  className="ml-auto"
                  aria-label={`Delete project ${p.name}`}
                  onClick={() => remove.mutate(p.id)}
                >
                  Delete
                </ToolButton>
              )}
            </li>
          ))}
        </ul>
        {canEdit && (
          <form
            onSubmit={submit}
            noValidate
            className="flex flex-wrap items-start gap-2 border-t border-rule p-3"
          >
            <label className="sr-only" htmlFor="new-project">
              New project name
            </label>
            <input
              id="new-project"
              placeholder="e.g. CT-7 shell and heads"
              value={name}
              onChange={(e) => setName(e.target.value)}
              className="min-w-64 flex-1 rounded-sm border border-rule-strong bg-panel px-2 py-1"
            />
            <button type="submit" className={primaryButton} disabled={create.isPending}>
              New project
            </button>
            <ImportButton workspaceId={workspaceId} />
            <div className="basis-full">
              <FormMessage>{fieldErrorsOf(create.error).name}</FormMessage>
            </div>
          </form>
        )}
      </Panel>
      {canEdit && <TrashPanel workspaceId={workspaceId} isOwner={role.role === "owner"} />}
      <ActivityPanel workspaceId={workspaceId} index="" />
    </div>
  );
}

/** Reads a chosen export file and imports it; refusals list every reason the server gave. */
function ImportButton({ workspaceId }: { workspaceId: string }) {
  const importProject = useImportProject(workspaceId);
  const [readError, setReadError] = useState<string | null>(null);
  const onFile = async (e: ChangeEvent<HTMLInputElement>) => {
    const file = e.target.files?.[0];
    e.target.value = "";
    if (!file) return;
    try {
      setReadError(null);
      importProject.mutate(JSON.parse(await file.text()));
    } catch {
      setReadError("That file is not JSON; choose a Sigmacube project export.");
    }
  };
  const reasons =
    importProject.error instanceof ApiError && Array.isArray(importProject.error.details)
      ? (importProject.error.details as { path: string; message: string }[])
      : [];
  return (
    <>
      <label className={`${quietButton} cursor-pointer`}>
        Import JSON
        <input type="file" accept="application/json,.json" className="sr-only" onChange={onFile} />
      </label>
      <div className="basis-full space-y-1">
        <FormMessage>{readError}</FormMessage>
        {importProject.error && (
          <FormMessage>
            The file was not imported (nothing was written).{" "}
            {reasons.length > 0
              ? reasons.map((r) => `${r.path}: ${r.message}`).join("; ")
              : importProject.error.message}
          </FormMessage>
        )}
        {importProject.data && (
          <p className="text-sm text-pass">✓ Imported “{importProject.data.project.name}”.</p>
        )}
      </div>
    </>
  );
}

function TrashPanel({ workspaceId, isOwner }: { workspaceId: string; isOwner: boolean }) {
  const trash = useTrash(workspaceId, true);
  const restore = useRestore(workspaceId);
  if (!trash.data || trash.data.items.length === 0) return null;
  return (
    <Panel
      id="trash"
      title="Trash"
      subtitle={`restorable for ${trash.data.retentionDays} days by owners and editors`}
    >
      <ul className="divide-y divide-rule text-[14px]">
        {trash.data.items.map((item) => (
          <li key={`${item.kind}:${item.id}`} className="flex flex-wrap items-center gap-3 px-3 py-2">
            <span className="rounded-sm bg-paper-deep px-1 text-[12px] text-graphite-soft">{item.kind}</span>
            <span className="font-semibold">{item.name}</span>
            {item.project && <span className="text-graphite-soft">in {item.project.name}</span>}
            <span className="text-[12px] text-graphite-faint">
              deleted {new Date(item.deletedAt).toLocaleDateString()} by {item.deletedBy?.name ?? "someone"} ·
              goes for good {new Date(item.purgeAt).toLocaleDateString()}
            </span>
            <button
              type="button"
              className={`${quietButton} ml-auto`}
              onClick={() => restore.mutate({ kind: item.kind, id: item.id, projectId: item.project?.id })}
            >
              Restore
            </button>
            {isOwner && <PurgeButton workspaceId={workspaceId} item={item} />}
          </li>
        ))}
      </ul>
      <FormMessage error={restore.error} />
    </Panel>
  );
}
