import { useEffect, useMemo, useState } from "react";
import { Link, useNavigate, useParams, useSearchParams } from "react-router-dom";
import { COMPONENTS } from "../../../../../core";
import { materialLabel, type MaterialRef } from "../../../../../core/contract/materials";
import { Panel } from "../../../components/Panel";
import { useLoadCases } from "../../../entities/load-case/queries";
import { useMaterials } from "../../../entities/material/queries";
import { useDeletePointTable, useKeepPoints } from "../../../entities/point-table/mutations";
import { usePointTables } from "../../../entities/point-table/queries";
import { useProject } from "../../../entities/project/queries";
import { useWorkspaceRole } from "../../../entities/workspace/queries";
import { benchLinkForValues } from "../../../lib/bench-link";
import { FormMessage, primaryButton } from "../../../lib/forms";
import { displayUnit, editableStress } from "../../../lib/stress";
import { usePointTableRun } from "../hooks/use-point-table-run";
import { useTableUpload } from "../hooks/use-table-upload";
import { columnsBody, newestMapping, type MappingDraft } from "../model/column-mapping";
import { optionOfRef, refFromOption, specFor } from "../model/spec";
import { governingSelection, toggleIn } from "../model/selection";
import { pointId, tensorAt } from "../model/worst-points";
import { AddPointTable } from "./AddPointTable";
import { loadPointCloud } from "./point-cloud-chunk";
import { PointTableResults } from "./PointTableResults";
import { ProgressLine } from "./ProgressLine";
import type { TableSource } from "./SourcePicker";
import { StoredTableResults } from "./StoredTableResults";
import { StoredTables } from "./StoredTables";

/**
 * `/workspaces/:workspaceId/projects/:projectId/load-cases/:caseId/point-tables`: a load case's
 * finite-element point tables — add one (read and rated in the browser's workers), see what
 * governs, store it in the project and keep chosen points as locations; `?table=<id>` opens a
 * stored table's results as the server rated them.
 */
export function PointTablesPage() {
  const { workspaceId = "", projectId = "", caseId = "" } = useParams();
  const ids = useMemo(() => ({ workspaceId, projectId, caseId }), [workspaceId, projectId, caseId]);
  const navigate = useNavigate();
  // the stored table whose results are open: in the address, so a copied link opens them again
  const [search, setSearch] = useSearchParams();
  const openTableId = search.get("table");
  const role = useWorkspaceRole(workspaceId);
  const project = useProject(workspaceId, projectId);
  const cases = useLoadCases(workspaceId, projectId);
  const materials = useMaterials(workspaceId);
  const stored = usePointTables(workspaceId, projectId, caseId);
  const remove = useDeletePointTable(workspaceId, projectId, caseId);
  const keep = useKeepPoints(workspaceId, projectId, caseId);
  const run = usePointTableRun();
  const upload = useTableUpload(ids);
  const [chosenMaterial, setChosenMaterial] = useState<MaterialRef | null>(null);
  const [source, setSource] = useState<{ source: TableSource; draft: MappingDraft } | null>(null);
  const [selected, setSelected] = useState<ReadonlySet<number>>(new Set());
  const [selectedFor, setSelectedFor] = useState<unknown>(null);
  useEffect(() => void loadPointCloud(), []);

  const loadCase = cases.data?.find((c) => c.id === caseId);
  if (project.isPending || cases.isPending) return <p className="text-graphite-soft">Loading…</p>;
  if (project.error) return <FormMessage error={project.error} />;
  if (loadCase === undefined)
    return <p className="py-12 text-center text-graphite-soft">No such load case in this project.</p>;

  const p = project.data;
  const materialRef = chosenMaterial ?? p.defaultMaterial;
  const choice = specFor(p, loadCase.category, materialRef, materials.data);
  const result = run.state.status === "done" ? run.state.result : null;
  // the governing points are chosen for keeping when a new result arrives
  if (result !== null && selectedFor !== result) {
    setSelectedFor(result);
    setSelected(governingSelection(result.evaluation));
  }
  const unit = source?.draft.unit ?? displayUnit(p.unitSystem);
  const canEdit = role.canEdit;

  const benchHref = (index: number) => {
    if (result === null) return "/bench";
    const t = tensorAt(result.table.components, index);
    return benchLinkForValues(
      Object.fromEntries(COMPONENTS.map((c) => [c, editableStress(t[c], unit)])) as typeof t,
      unit,
    );
  };

  const store = () => {
    if (source === null) return;
    const body =
      source.source.kind === "file"
        ? source.source.file
        : new Blob([source.source.text], { type: "text/plain" });
    const d = source.draft;
    void upload.start(body, {
      fileName: source.source.kind === "file" ? source.source.file.name : source.source.name,
      layout: { separator: d.separator, decimal: d.decimal, skipRows: d.skipRows, header: d.header },
      columns: columnsBody(d),
      unit: d.unit,
      idKind: d.idKind,
    });
  };

  const keepChosen = () => {
    if (result === null || upload.state.status !== "done") return;
    keep.mutate({
      tableId: upload.state.tableId,
      points: [...selected].map((i) => pointId(result.table, i)),
    });
  };

  return (
    <div className="space-y-5">
      <header className="border-b border-rule pb-4">
        <p className="text-sm text-graphite-soft">
          <Link
            to={`/workspaces/${workspaceId}/projects/${projectId}`}
            className="text-ink underline-offset-2 hover:underline"
          >
            {p.name}
          </Link>{" "}
          / load case {loadCase.name}
          {loadCase.category && ` (${loadCase.category})`}
        </p>
        <h1 className="text-3xl font-semibold tracking-tight">Point tables</h1>
        <p className="mt-1 max-w-3xl text-graphite-soft">
          Stress points from a finite-element model, read and rated in this browser against the project&apos;s
          checks for this load case.
        </p>
      </header>

      <Panel
        id="add-point-table"
        index="1"
        title="Add a point table"
        subtitle="first rows, columns, unit and layout"
      >
        <div className="flex flex-wrap items-center gap-2 px-3 pt-3 text-sm">
          <label htmlFor="point-material" className="font-semibold">
            Material
          </label>
          <select
            id="point-material"
            className="rounded border border-rule-strong bg-panel px-2 py-1"
            value={optionOfRef(materialRef)}
            onChange={(e) => setChosenMaterial(refFromOption(e.target.value))}
          >
            <option value="">choose…</option>
            {materials.data?.materials.map((m) => (
              <option key={m.id} value={`workspace:${m.id}`}>
                {materialLabel(m)}
              </option>
            ))}
            {materials.data?.published.map((m) => (
              <option key={m.id} value={`published:${m.id}`}>
                {materialLabel(m)}
              </option>
            ))}
          </select>
          {"problem" in choice && <span className="text-fail">{choice.problem}</span>}
        </div>
        <AddPointTable
          remembered={newestMapping(stored.data ?? [])}
          fallbackUnit={displayUnit(p.unitSystem)}
          spec={"spec" in choice ? choice.spec : null}
          includeUnsuited={p.includeUnsuitedCriteria}
          run={run.state}
          onStart={(input, s, draft) => {
            setSource({ source: s, draft });
            run.start(input);
          }}
          onCancel={run.cancel}
          onSourceChange={() => (run.reset(), setSource(null))}
        />
      </Panel>

      {result !== null && run.state.status === "done" && (
        <Panel
          id="point-results"
          index="2"
          title="What governs"
          subtitle={`stresses in ${unit}; utilisation u = n required / n`}
        >
          <PointTableResults
            table={result.table}
            evaluation={result.evaluation}
            cloud={result.cloud}
            unit={unit}
            summary={
              <p>
                <span className="num">{result.table.count.toLocaleString("en-US")}</span> points read and
                rated in <span className="num">{run.state.seconds.toFixed(2)} s</span> ({result.workers}{" "}
                worker
                {result.workers === 1 ? "" : "s"}) in this browser.
              </p>
            }
            withCaution
            timings={result.timings}
            selection={canEdit ? { selected, onToggle: (i) => setSelected(toggleIn(selected, i)) } : null}
            benchHref={benchHref}
            onPick={(i) => void navigate(benchHref(i))}
          />
          {canEdit && (
            <div className="space-y-2 border-t border-rule p-3">
              {upload.state.status !== "done" && upload.state.status !== "sending" && (
                <button
                  type="button"
                  className={primaryButton}
                  onClick={store}
                  disabled={upload.state.status === "hashing"}
                >
                  Store the table in the project
                </button>
              )}
              {upload.state.status === "sending" && (
                <ProgressLine
                  testId="upload-progress"
                  label="Sending the file"
                  fraction={upload.state.fraction}
                  onCancel={upload.cancel}
                />
              )}
              {upload.state.status === "cancelled" && (
                <p className="text-sm text-graphite-soft">
                  The upload was cancelled; nothing of it was kept.
                </p>
              )}
              {upload.state.status === "failed" && <FormMessage error={upload.state.error} />}
              {upload.state.status === "done" && (
                <p className="text-sm" data-testid="upload-done">
                  Stored:{" "}
                  <span className="num">{upload.state.summary.pointCount.toLocaleString("en-US")}</span>{" "}
                  points.
                </p>
              )}
              <div className="flex flex-wrap items-center gap-2">
                <button
                  type="button"
                  className={primaryButton}
                  disabled={upload.state.status !== "done" || selected.size === 0 || keep.isPending}
                  onClick={keepChosen}
                >
                  Keep {selected.size} chosen point{selected.size === 1 ? "" : "s"} as locations
                </button>
                {upload.state.status !== "done" && (
                  <span className="text-sm text-graphite-soft">
                    Store the table first: a kept point takes its state from the stored table.
                  </span>
                )}
              </div>
              {keep.error && <FormMessage error={keep.error} />}
              {keep.data && (
                <p className="text-sm" data-testid="kept-locations">
                  Kept as locations: {keep.data.locations.map((l) => l.name).join(", ")}.{" "}
                  <Link
                    to={`/workspaces/${workspaceId}/projects/${projectId}/comparison`}
                    className="text-ink underline-offset-2 hover:underline"
                  >
                    See them in the comparison
                  </Link>
                </p>
              )}
            </div>
          )}
        </Panel>
      )}

      <Panel id="stored-point-tables" index={result !== null ? "3" : "2"} title="Stored in this load case">
        {stored.error ? (
          <div className="p-3">
            <FormMessage error={stored.error} />
          </div>
        ) : (
          <StoredTables
            ids={ids}
            tables={stored.data ?? []}
            canEdit={canEdit}
            openTableId={openTableId}
            onDelete={(id) => {
              remove.mutate(id);
              if (id === openTableId) setSearch({}, { replace: true });
            }}
          />
        )}
      </Panel>

      {openTableId !== null && (
        <Panel
          id="stored-table-results"
          index={result !== null ? "4" : "3"}
          title="Results of a stored table"
          subtitle={`as the server rated it; utilisation u = n required / n`}
          tools={
            <Link to={{ search: "" }} className="text-sm text-ink underline-offset-2 hover:underline">
              Close
            </Link>
          }
        >
          <StoredTableResults
            key={openTableId}
            ids={ids}
            tableId={openTableId}
            canEdit={canEdit}
            project={p}
            category={loadCase.category}
            materials={materials.data}
            withCaution={result === null}
          />
        </Panel>
      )}
    </div>
  );
}
