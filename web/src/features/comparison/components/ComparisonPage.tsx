import { CopyLinkButton } from "../../../components/CopyLinkButton";
import { useState, type ReactNode } from "react";
import { Link, useParams } from "react-router-dom";
import { governingSentence } from "../../../../../core/contract/comparison";
import { CRITERION_LABELS, type CriterionName } from "../../../../../core/contract/projects";
import { RESULTS_CAUTION } from "../../../../../core/contract/cautions";
import { Caution } from "../../../components/Caution";
import { Panel } from "../../../components/Panel";
import { Verdict } from "../../../components/Verdict";
import { ToolButton } from "../../../components/ToolButton";
import { downloadText, toCsv } from "../../../lib/csv";
import { FormMessage } from "../../../lib/forms";
import { useComparison } from "../../../entities/comparison/queries";
import { useProject } from "../../../entities/project/queries";
import { useWorkspace } from "../../../entities/workspace/queries";
import { displayUnit } from "../../../lib/stress";
import { comparisonTable } from "../model/rows";
import { ComparisonTable } from "./ComparisonTable";
import { LinearizationChecks } from "./LinearizationChecks";
import { PointTableChecks } from "./PointTableChecks";
import { UtilisationChart } from "./UtilisationChart";

/**
 * `/workspaces/:workspaceId/projects/:projectId/comparison`: which case governs, and by how much.
 * `review` is the review status the app composes in below the header (features do not import each other).
 */
export function ComparisonPage({ review }: { review?: ReactNode } = {}) {
  const { workspaceId = "", projectId = "" } = useParams();
  const workspace = useWorkspace(workspaceId);
  const project = useProject(workspaceId, projectId);
  const [page, setPage] = useState(1);
  const comparison = useComparison(workspaceId, projectId, page);
  const [chartCriterion, setChartCriterion] = useState<CriterionName | null>(null);

  if (comparison.isPending || project.isPending)
    return <p className="text-graphite-soft">Computing the comparison…</p>;
  if (comparison.error || project.error) return <FormMessage error={comparison.error ?? project.error} />;
  const c = comparison.data;
  const p = project.data;
  const unit = displayUnit(p.unitSystem);
  const criterion = chartCriterion ?? c.requirements[0]?.criterion ?? "von-mises";
  // The server's evaluator picked it (core's one governing rule); nothing is re-ranked here.
  const top = c.governingOverall;
  const pointTables = c.pointTables ?? [];
  // A project checked only through point tables or classification lines has no case × location row:
  // say so in place of an empty table and an empty chart, and point at the sections that do rate it.
  const onlyBesideRows = c.paging.totalRows === 0 && (pointTables.length > 0 || c.linearizations.length > 0);
  // Sections are numbered in the order they appear.
  const utilisationIndex = 2;
  const byLocationIndex = onlyBesideRows ? 2 : 3;
  const sectionAfterRows = byLocationIndex + (c.governingByLocation.length > 0 ? 1 : 0);

  return (
    <div className="space-y-5">
      <header className="flex flex-wrap items-end justify-between gap-4 border-b border-rule pb-4">
        <div>
          <p className="text-sm text-graphite-soft">
            <Link
              to={`/workspaces/${workspaceId}/projects`}
              className="text-ink underline-offset-2 hover:underline"
            >
              {workspace.data?.name ?? "Workspace"}
            </Link>{" "}
            /{" "}
            <Link
              to={`/workspaces/${workspaceId}/projects/${projectId}`}
              className="text-ink underline-offset-2 hover:underline"
            >
              {p.name}
            </Link>
          </p>
          <h1 className="text-3xl font-semibold tracking-tight">Comparison</h1>
          <p className="mt-1 text-graphite-soft">
            Every load case and combination at every location, against the project default{" "}
            {c.requirements.map((r) => `${CRITERION_LABELS[r.criterion]} n ≥ ${r.requiredFactor}`).join(", ")}
            {c.categoryRequirements.length > 0 && (
              <>
                ; per category:{" "}
                {c.categoryRequirements
                  .map(
                    (cat) =>
                      `${cat.category} ${
                        Object.entries(cat.factors)
                          .map(([k, v]) => `${CRITERION_LABELS[k as CriterionName]} n ≥ ${v}`)
                          .join(", ") || "(default)"
                      }`,
                  )
                  .join("; ")}
              </>
            )}
            . Each row says which factors it used.
          </p>
          <p className="mt-1 text-[13px] text-graphite-soft">
            Tresca is shown two ways: the equivalent stress σ₁ − σ₃ (compared with the yield strength) and the
            maximum shear τmax = (σ₁ − σ₃)/2 (compared with half of it).{" "}
            {c.includeUnsuitedCriteria
              ? "Criteria that do not suit a material (ductile vs brittle) are rated on this project's request and can govern."
              : "Criteria that do not suit a location's material (fracture criteria on a ductile metal, yield criteria on a brittle one) are marked not applicable and left out of the governing search."}
          </p>
        </div>
        <div className="flex flex-wrap items-center gap-2">
          <CopyLinkButton />
          <ToolButton
            onClick={() => downloadText(`${p.name} comparison.csv`, toCsv(comparisonTable(c, unit)))}
          >
            Export CSV
          </ToolButton>
        </div>
      </header>
      {review}

      <section aria-label="Governing case" className="rounded-sm border border-rule bg-panel px-4 py-3">
        {top ? (
          <p className="flex flex-wrap items-center gap-3 text-lg">
            <Verdict state={top.verdict} />
            <strong data-testid="governing-summary">{c.summary}</strong>
          </p>
        ) : (
          <p className="text-graphite-soft">
            Nothing could be evaluated yet: enter states and choose a material with the strengths the criteria
            need.
          </p>
        )}
        {c.governing.length > 1 && (
          <ul className="mt-2 space-y-0.5 text-[14px] text-graphite-soft">
            {c.governing.map((g) => (
              <li key={g.criterion}>
                <Verdict state={g.verdict} /> {CRITERION_LABELS[g.criterion]}: {governingSentence(g)}
              </li>
            ))}
          </ul>
        )}
        <div className="mt-2 space-y-0.5">
          {/* The results caution itself stands at the foot of the page (<Caution />); the rest here. */}
          {c.cautions
            .filter((text) => text !== RESULTS_CAUTION)
            .map((text) => (
              <p key={text} className="text-[13px] text-graphite-soft">
                <span aria-hidden="true">⚠ </span>
                {text}
              </p>
            ))}
        </div>
      </section>

      <Panel
        id="comparison-table"
        index="1"
        title="Cases × locations"
        subtitle={`principal stresses σ₁ ≥ σ₂ ≥ σ₃ in ${unit}; SF against the required factor`}
      >
        {onlyBesideRows ? (
          <p className="px-3 py-3 text-graphite-soft" data-testid="no-case-rows">
            No load case has a stress state at a location of this project yet, so there is no case × location
            row. This project is rated through its{" "}
            {[
              pointTables.length > 0 && "finite-element point tables",
              c.linearizations.length > 0 && "stress classification lines",
            ]
              .filter(Boolean)
              .join(" and ")}{" "}
            below; states entered on the{" "}
            <Link
              to={`/workspaces/${workspaceId}/projects/${projectId}`}
              className="text-ink underline underline-offset-2"
            >
              project page
            </Link>{" "}
            join this table.
          </p>
        ) : (
          <ComparisonTable
            comparison={c}
            unit={unit}
            workspaceId={workspaceId}
            paging={c.paging}
            onPage={setPage}
          />
        )}
        {c.skipped.length > 0 && (
          <p className="border-t border-rule px-3 py-2 text-[13px] text-graphite-soft">
            Not compared:{" "}
            {c.skipped.map((s) => `${s.caseName} at ${s.locationName} (${s.reason})`).join("; ")}.
          </p>
        )}
      </Panel>

      {!onlyBesideRows && (
        <Panel
          id="utilisation"
          index={String(utilisationIndex)}
          title="Utilisation per case"
          subtitle="u = required factor / safety factor; the allowable is u = 1"
          tools={c.requirements.map((r) => (
            <ToolButton
              key={r.criterion}
              pressed={criterion === r.criterion}
              onClick={() => setChartCriterion(r.criterion)}
            >
              {CRITERION_LABELS[r.criterion]}
            </ToolButton>
          ))}
        >
          <UtilisationChart comparison={c} criterion={criterion} />
        </Panel>
      )}

      {c.governingByLocation.length > 0 && (
        <Panel id="by-location" index={String(byLocationIndex)} title="Governing case per location">
          <ul className="divide-y divide-rule text-[14px]">
            {c.governingByLocation.map((l) => (
              <li key={l.locationId} className="px-3 py-2">
                <span className="font-semibold">{l.locationName}</span>:{" "}
                {l.governing.length === 0
                  ? "nothing evaluated"
                  : l.governing.map((g) => (
                      <span key={g.criterion} className="mr-4 inline-flex items-center gap-1.5">
                        {CRITERION_LABELS[g.criterion]} — {g.caseName}, SF{" "}
                        <span className="num">{g.factor === null ? "∞" : g.factor.toFixed(2)}</span>
                        <Verdict state={g.verdict} />
                      </span>
                    ))}
              </li>
            ))}
          </ul>
        </Panel>
      )}
      {c.linearizations.length > 0 && (
        <Panel
          id="linearizations"
          index={String(sectionAfterRows)}
          title="Stress classification lines"
          subtitle="category checks of each saved line"
        >
          <LinearizationChecks lines={c.linearizations} workspaceId={workspaceId} projectId={projectId} />
        </Panel>
      )}
      {pointTables.length > 0 && (
        <Panel
          id="point-tables"
          index={String(sectionAfterRows + (c.linearizations.length > 0 ? 1 : 0))}
          title="Finite-element point tables"
          subtitle="governing point of each table per criterion; they take part in the governing check above"
        >
          <PointTableChecks tables={pointTables} workspaceId={workspaceId} projectId={projectId} />
        </Panel>
      )}
      <Caution />
    </div>
  );
}
