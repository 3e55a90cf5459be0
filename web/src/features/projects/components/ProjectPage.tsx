import type { ReactNode } from "react";
import { DownloadButton } from "../../../components/DownloadButton";
import { CopyLinkButton } from "../../../components/CopyLinkButton";
import { Link, useParams } from "react-router-dom";
import { FormMessage, quietButton } from "../../../lib/forms";
import { useCombinations } from "../../../entities/combination/queries";
import { useLoadCases } from "../../../entities/load-case/queries";
import { useLocations } from "../../../entities/location/queries";
import { useProject } from "../../../entities/project/queries";
import { useWorkspaceRole } from "../../../entities/workspace/queries";
import { displayUnit } from "../../../lib/stress";
import { isNotThere } from "../model/errors";
import { readOnlyNote } from "../../../lib/role-note";
import { ActivityPanel } from "./ActivityPanel";
import { CombinationsPanel } from "./CombinationsPanel";
import { LoadCasesPanel } from "./LoadCasesPanel";
import { LocationsPanel } from "./LocationsPanel";
import { MaterialsPanel } from "./MaterialsPanel";
import { RequirementsPanel } from "./RequirementsPanel";

/**
 * `/workspaces/:workspaceId/projects/:projectId`: a project's inputs, in the order a check is set up.
 * `review` is the review status the app composes in below the header (features do not import each other).
 */
export function ProjectPage({ review }: { review?: ReactNode } = {}) {
  const { workspaceId = "", projectId = "" } = useParams();
  const role = useWorkspaceRole(workspaceId);
  const project = useProject(workspaceId, projectId);
  const locations = useLocations(workspaceId, projectId);
  const cases = useLoadCases(workspaceId, projectId);
  const combinations = useCombinations(workspaceId, projectId);

  if (project.isPending || role.isPending) return <p className="text-graphite-soft">Loading…</p>;
  if (project.error) {
    if (isNotThere(project.error)) {
      return (
        <p className="py-12 text-center text-graphite-soft">
          No project here for you: it does not exist, is in the trash, or you are not a member.
        </p>
      );
    }
    return <FormMessage error={project.error} />;
  }
  const p = project.data;
  const unit = displayUnit(p.unitSystem);
  const canEdit = role.canEdit;
  const readOnly = role.role ? readOnlyNote(role.role) : null;
  return (
    <div className="space-y-5">
      <header className="flex flex-wrap items-end justify-between gap-4 border-b border-rule pb-4">
        <div>
          <p className="text-sm text-graphite-soft">
            <Link
              to={`/workspaces/${workspaceId}/projects`}
              className="text-ink underline-offset-2 hover:underline"
            >
              {role.data?.name ?? "Workspace"}
            </Link>{" "}
            / project
          </p>
          <h1 className="text-3xl font-semibold tracking-tight">{p.name}</h1>
          {p.description && <p className="mt-1 max-w-3xl text-graphite-soft">{p.description}</p>}
          {readOnly && <p className="mt-1 max-w-3xl text-sm text-graphite-soft">{readOnly}</p>}
        </div>
        <div className="flex flex-wrap items-center gap-2">
          <CopyLinkButton />
          <Link to={`/workspaces/${workspaceId}/projects/${projectId}/comparison`} className={quietButton}>
            Comparison
          </Link>
          <Link to={`/workspaces/${workspaceId}/projects/${projectId}/linearization`} className={quietButton}>
            Linearization
          </Link>
          <Link to={`/workspaces/${workspaceId}/projects/${projectId}/report`} className={quietButton}>
            Report (draft)
          </Link>
          <DownloadButton
            path={`/workspaces/${workspaceId}/projects/${projectId}/report.pdf`}
            fileName="draft-report.pdf"
            label="Download PDF"
            className={quietButton}
          />
          <a
            href={`/api/workspaces/${workspaceId}/projects/${projectId}/export`}
            download
            className={quietButton}
          >
            Export JSON
          </a>
        </div>
      </header>
      {review}
      <RequirementsPanel key={p.version} project={p} canEdit={canEdit} />
      <LocationsPanel
        workspaceId={workspaceId}
        projectId={projectId}
        locations={locations.data ?? []}
        canEdit={canEdit}
      />
      <LoadCasesPanel
        workspaceId={workspaceId}
        projectId={projectId}
        cases={cases.data ?? []}
        locations={locations.data ?? []}
        unit={unit}
        canEdit={canEdit}
        allowableCategories={p.categoryRequirements.map((c) => c.category)}
      />
      <CombinationsPanel
        workspaceId={workspaceId}
        projectId={projectId}
        combinations={combinations.data ?? []}
        cases={cases.data ?? []}
        canEdit={canEdit}
      />
      <MaterialsPanel workspaceId={workspaceId} unit={unit} canEdit={canEdit} />
      <ActivityPanel workspaceId={workspaceId} projectId={projectId} index="6" />
    </div>
  );
}
