import { useMemo, useState } from "react";
import { Link, useParams, useSearchParams } from "react-router-dom";
import { Caution } from "../../../components/Caution";
import { Panel } from "../../../components/Panel";
import { ToolButton } from "../../../components/ToolButton";
import { useLoadCases } from "../../../entities/load-case/queries";
import { useLocations } from "../../../entities/location/queries";
import { useProject } from "../../../entities/project/queries";
import { useWorkspace, useWorkspaceRole } from "../../../entities/workspace/queries";
import { fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import { readOnlyNote } from "../../../lib/role-note";
import { useDeleteLinearization } from "../api/delete-linearization";
import { useLinearization } from "../api/get-linearization";
import { useLinearizations } from "../api/list-linearizations";
import { usePreviewLinearization } from "../api/preview-linearization";
import { useSaveLinearization } from "../api/save-linearization";
import { useDebounced } from "../hooks/use-debounced";
import { LOCAL_COMPONENTS, distributionOf } from "../model/distribution";
import { EMPTY_FORM, formFieldOf, formOf, requestBodyOf, type LineForm } from "../model/line-form";
import { parsePathText } from "../model/path-text";
import { formWithPickedPath } from "../model/pick-form";
import { DistributionPlot } from "./DistributionPlot";
import { CheckFields, PathFields } from "./LineFields";
import { PointTablePick } from "./PointTablePick";
import { ChecksTable, PartsTable } from "./ResultTables";

const label = "block text-sm font-semibold text-graphite";
const input = "w-full rounded border border-rule-strong bg-panel px-2 py-1 text-[15px]";

/**
 * `/workspaces/:workspaceId/projects/:projectId/linearization?case=…&line=…`: a stress
 * classification line through a wall, split by the server into membrane, bending and peak and
 * checked against the category limits; saved under a load case. The case and the open line live
 * in the URL, so a link opens the same line.
 */
export function LinearizationPage() {
  const { workspaceId = "", projectId = "" } = useParams();
  const [search, setSearch] = useSearchParams();
  const workspace = useWorkspace(workspaceId);
  const { canEdit, role } = useWorkspaceRole(workspaceId);
  const project = useProject(workspaceId, projectId);
  const cases = useLoadCases(workspaceId, projectId);
  const locations = useLocations(workspaceId, projectId);
  const caseId = search.get("case") ?? cases.data?.[0]?.id ?? "";
  const lineId = search.get("line") ?? "";
  const saved = useLinearizations(workspaceId, projectId, caseId);
  const opened = useLinearization(workspaceId, projectId, caseId, lineId);
  const save = useSaveLinearization(workspaceId, projectId);
  const remove = useDeleteLinearization(workspaceId, projectId);

  const [form, setForm] = useState<LineForm>(EMPTY_FORM);
  const [formFor, setFormFor] = useState("");
  const [component, setComponent] = useState(1);
  // A saved line fills the form once when it is opened; the engineer's edits are not overwritten after.
  if (opened.data && formFor !== opened.data.id + opened.data.version) {
    setFormFor(opened.data.id + opened.data.version);
    setForm(formOf(opened.data));
  }
  const set = <K extends keyof LineForm>(key: K, value: LineForm[K]) =>
    setForm((f) => ({ ...f, [key]: value }));

  const parsed = useMemo(() => parsePathText(form.pathText), [form.pathText]);
  const request = useMemo(() => requestBodyOf(form), [form]);
  const body = useDebounced(request.ok ? request.body : null, 300);
  const preview = usePreviewLinearization(workspaceId, projectId, caseId, body);
  const serverErrors = Object.fromEntries(
    Object.entries(fieldErrorsOf(preview.error ?? save.error)).map(([k, v]) => [formFieldOf(k), v]),
  );
  const errors = { ...serverErrors, ...(request.ok ? {} : request.problems) };
  const result = preview.data;

  const chooseCase = (id: string) => {
    setSearch({ case: id });
    setForm(EMPTY_FORM);
    setFormFor("");
  };
  const open = (id: string) => setSearch({ case: caseId, line: id });
  const startNew = () => {
    setSearch({ case: caseId });
    setForm(EMPTY_FORM);
    setFormFor("");
  };
  const onSave = () => {
    if (!request.ok) return;
    save.mutate(
      {
        loadCaseId: caseId,
        body: request.body,
        ...(opened.data && lineId ? { id: opened.data.id, version: opened.data.version } : {}),
      },
      { onSuccess: (line) => setSearch({ case: caseId, line: line.id }) },
    );
  };

  if (project.isPending || cases.isPending)
    return <p className="text-graphite-soft">Opening the linearization…</p>;
  if (project.error || cases.error) return <FormMessage error={project.error ?? cases.error} />;
  const note = role ? readOnlyNote(role) : null;
  const distribution = result ? distributionOf(result, component) : null;
  const symbol = LOCAL_COMPONENTS[component].symbol;

  return (
    <div className="space-y-5">
      <header className="border-b border-rule pb-4">
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
            {project.data.name}
          </Link>{" "}
          /{" "}
          <Link
            to={`/workspaces/${workspaceId}/projects/${projectId}/comparison`}
            className="text-ink underline-offset-2 hover:underline"
          >
            Comparison
          </Link>
        </p>
        <h1 className="text-3xl font-semibold tracking-tight">Stress linearization</h1>
        <p className="mt-1 max-w-3xl text-graphite-soft">
          A line through the wall, split into membrane (the mean), bending (the linear part) and peak (the
          rest) of the stress <em>tensor</em>, the equivalent stress of each part, and the category checks for
          the way you classify the line. The server computes every result shown here.
        </p>
        {note && <p className="mt-2 text-sm text-graphite-soft">{note}</p>}
      </header>

      <Panel id="line" index="1" title="Line" subtitle="saved per load case">
        <div className="grid gap-3 p-3 sm:grid-cols-3">
          <div className="space-y-1">
            <label htmlFor="load-case" className={label}>
              Load case
            </label>
            <select
              id="load-case"
              className={input}
              value={caseId}
              onChange={(e) => chooseCase(e.target.value)}
            >
              {cases.data.length === 0 && <option value="">(add a load case to the project first)</option>}
              {cases.data.map((c) => (
                <option key={c.id} value={c.id}>
                  {c.name}
                </option>
              ))}
            </select>
          </div>
          <div className="space-y-1">
            <label htmlFor="line-name" className={label}>
              Name
            </label>
            <input
              id="line-name"
              className={input}
              value={form.name}
              placeholder="e.g. nozzle junction, inside to outside"
              onChange={(e) => set("name", e.target.value)}
            />
          </div>
          <div className="space-y-1">
            <label htmlFor="line-location" className={label}>
              Location
            </label>
            <select
              id="line-location"
              className={input}
              value={form.locationId}
              onChange={(e) => set("locationId", e.target.value)}
              aria-describedby={errors.locationId ? "line-location-error" : undefined}
            >
              <option value="">(none: the project&apos;s material)</option>
              {locations.data?.map((l) => (
                <option key={l.id} value={l.id}>
                  {l.name}
                </option>
              ))}
            </select>
            {errors.locationId && (
              <p id="line-location-error" className="text-sm text-fail">
                ✗ {errors.locationId}
              </p>
            )}
          </div>
        </div>
        <div className="border-t border-rule px-3 py-2">
          <p className="text-sm font-semibold text-graphite">Saved lines of this case</p>
          {saved.data && saved.data.linearizations.length > 0 ? (
            <ul className="mt-1 flex flex-wrap gap-2" data-testid="saved-lines">
              {saved.data.linearizations.map((l) => (
                <li key={l.id}>
                  <ToolButton pressed={l.id === lineId} onClick={() => open(l.id)}>
                    {l.name}
                  </ToolButton>
                </li>
              ))}
              <li>
                <ToolButton onClick={startNew}>+ new line</ToolButton>
              </li>
            </ul>
          ) : (
            <p className="text-sm text-graphite-soft">None yet.</p>
          )}
        </div>
      </Panel>

      <div className="grid gap-5 lg:grid-cols-2">
        <Panel
          id="path"
          index="2"
          title="Path"
          subtitle={`components in ${form.stressUnit}, positions in ${form.lengthUnit}`}
        >
          {caseId && (
            <PointTablePick
              key={caseId}
              workspaceId={workspaceId}
              projectId={projectId}
              caseId={caseId}
              lengthUnit={form.lengthUnit}
              onUse={(picked) => setForm((f) => formWithPickedPath(f, picked))}
            />
          )}
          <PathFields form={form} set={set} parsed={parsed} errors={errors} />
        </Panel>
        <Panel id="classification" index="3" title="Classification and allowables">
          <CheckFields
            form={form}
            set={set}
            errors={errors}
            locationHasMaterialNote="Sy and Su are read from the chosen location's material, else the project's default material, when the line is computed and saved; the results say which. S is always typed."
          />
        </Panel>
      </div>

      {preview.error && Object.keys(serverErrors).length === 0 && <FormMessage error={preview.error} />}
      {!result ? (
        <p className="text-graphite-soft">
          {request.ok ? "Linearizing…" : "Paste a path and give S to see the linearization and its checks."}
        </p>
      ) : (
        <section aria-label="Results" className={`space-y-5 ${preview.isFetching ? "opacity-70" : ""}`}>
          <Panel
            id="through-thickness"
            index="4"
            title="Through the thickness"
            subtitle={`local frame, ${result.stressUnit} against ${result.lengthUnit}`}
          >
            {/* The switches wrap in the body: six of them in the title row would not fit a phone. */}
            <div className="flex flex-wrap gap-1.5 px-3 pt-2" role="group" aria-label="Component shown">
              {LOCAL_COMPONENTS.map((c) => (
                <ToolButton
                  key={c.index}
                  pressed={component === c.index}
                  onClick={() => setComponent(c.index)}
                >
                  {c.symbol}
                </ToolButton>
              ))}
            </div>
            {distribution && (
              <DistributionPlot
                distribution={distribution}
                symbol={symbol}
                lengthUnit={result.lengthUnit}
                stressUnit={result.stressUnit}
              />
            )}
            <p className="px-3 pb-2 text-[13px] text-graphite-soft">
              {symbol} is {distribution?.bent ? "bent" : "not bent (its linear part stays in the peak)"};
              thickness t = <span className="num">{result.thickness}</span> {result.lengthUnit},{" "}
              {result.pointCount} points. {result.frameNote}
            </p>
          </Panel>

          <Panel
            id="checks"
            index="5"
            title="Category checks"
            subtitle={`${result.equivalent.label}, ${result.stressUnit}`}
          >
            <div className="space-y-2 p-3">
              {result.warnings.map((w) => (
                <p
                  key={w}
                  role="status"
                  className="rounded border border-close bg-close-wash px-3 py-2 text-sm text-close"
                >
                  <span aria-hidden="true">⚠ </span>
                  {w}
                </p>
              ))}
              <ChecksTable result={result} />
              <Caution />
            </div>
          </Panel>

          <Panel
            id="parts"
            index="6"
            title="Membrane, bending and peak"
            subtitle={`local frame, ${result.stressUnit}`}
          >
            <div className="space-y-2 p-3">
              <PartsTable result={result} />
              <details className="text-[13px] text-graphite-soft">
                <summary className="cursor-pointer">What was assumed, and the method&apos;s source</summary>
                <ul className="mt-1 list-disc space-y-1 pl-5">
                  {result.notes.map((n) => (
                    <li key={n}>{n}</li>
                  ))}
                  <li>{result.source}</li>
                </ul>
              </details>
            </div>
          </Panel>
        </section>
      )}

      {canEdit && (
        <div className="flex flex-wrap items-center gap-3">
          <button
            type="button"
            className={primaryButton}
            disabled={!request.ok || !caseId || save.isPending}
            onClick={onSave}
          >
            {lineId ? "Save changes" : "Save the line"}
          </button>
          {lineId && (
            <button type="button" className={quietButton} onClick={startNew}>
              Start a new line
            </button>
          )}
          {lineId && (
            <button
              type="button"
              className={quietButton}
              disabled={remove.isPending}
              onClick={() => {
                // Lines have no trash: say so before deleting for good.
                if (
                  !window.confirm(
                    `Delete the line "${form.name}" for good? The audit trail keeps its inputs.`,
                  )
                )
                  return;
                remove.mutate({ loadCaseId: caseId, id: lineId }, { onSuccess: startNew });
              }}
            >
              Delete this line
            </button>
          )}
          {remove.error && <FormMessage error={remove.error} />}
          {save.isSuccess && (
            <p role="status" className="text-sm">
              <span aria-hidden="true">✓ </span>Saved. It appears in the{" "}
              <Link
                to={`/workspaces/${workspaceId}/projects/${projectId}/comparison`}
                className="text-ink underline"
              >
                comparison
              </Link>
              .
            </p>
          )}
          {save.error && Object.keys(serverErrors).length === 0 && <FormMessage error={save.error} />}
        </div>
      )}
    </div>
  );
}
