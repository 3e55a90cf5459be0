import { useQuery } from "@tanstack/react-query";
import { useId, useState } from "react";
import { Link, useLocation } from "react-router-dom";
import type { StressTensor } from "../../../../../core";
import type { CalculatorRecord } from "../../../../../core/contract/calculator-inputs";
import type { StressUnitName } from "../../../../../core/contract/materials";
import { useSaveState } from "../../../entities/load-case/mutations";
import { loadCasesQueryOptions } from "../../../entities/load-case/queries";
import { locationsQueryOptions } from "../../../entities/location/queries";
import { projectsQueryOptions } from "../../../entities/project/queries";
import { useWorkspaces } from "../../../entities/workspace/queries";
import { FormMessage, primaryButton, quietButton } from "../../../lib/forms";
import { useSession } from "../../../lib/session";
import { editableWorkspaces, savedWords, stateToSave } from "../model/add-to-load-case";

/**
 * "Add to load case": saves the calculated state at a location of one of the person's load cases,
 * with the calculator's name, version and every input, so the project's history shows them and
 * "reopen in calculator" restores them. Signed-out visitors are offered the sign-in that returns here.
 */
export function AddToLoadCase(props: {
  record: CalculatorRecord;
  tensor: StressTensor;
  unit: StressUnitName;
}) {
  const session = useSession();
  const here = useLocation();
  const [open, setOpen] = useState(false);
  if (session.isPending) return null;
  if (!session.data?.user) {
    return (
      <Link
        to={`/sign-in?next=${encodeURIComponent(here.pathname + here.search)}`}
        className="text-sm text-ink underline"
      >
        Sign in to add this state to a load case
      </Link>
    );
  }
  if (!open) {
    return (
      <button
        type="button"
        className={quietButton}
        data-testid="add-to-load-case"
        onClick={() => setOpen(true)}
      >
        Add to load case…
      </button>
    );
  }
  return <AddToLoadCaseForm {...props} onClose={() => setOpen(false)} />;
}

function Picker(props: {
  label: string;
  value: string;
  onChange: (value: string) => void;
  options: { id: string; name: string }[] | undefined;
  empty: string;
}) {
  const id = useId();
  return (
    <div className="text-[13px]">
      <label htmlFor={id} className="block text-[12px] text-graphite-soft">
        {props.label}
      </label>
      <select
        id={id}
        value={props.value}
        onChange={(e) => props.onChange(e.target.value)}
        disabled={!props.options}
        className="mt-0.5 w-full rounded-sm border border-rule-strong bg-panel px-1 py-1"
      >
        <option value="">{props.options?.length === 0 ? props.empty : "— choose —"}</option>
        {props.options?.map((o) => (
          <option key={o.id} value={o.id}>
            {o.name}
          </option>
        ))}
      </select>
    </div>
  );
}

function AddToLoadCaseForm({
  record,
  tensor,
  unit,
  onClose,
}: {
  record: CalculatorRecord;
  tensor: StressTensor;
  unit: StressUnitName;
  onClose: () => void;
}) {
  const [workspaceId, setWorkspaceId] = useState("");
  const [projectId, setProjectId] = useState("");
  const [caseId, setCaseId] = useState("");
  const [locationId, setLocationId] = useState("");
  const [note, setNote] = useState("");
  const [saved, setSaved] = useState<string | null>(null);
  const noteId = useId();
  const workspaces = useWorkspaces();
  const projects = useQuery({ ...projectsQueryOptions(workspaceId), enabled: workspaceId !== "" });
  const cases = useQuery({
    ...loadCasesQueryOptions(workspaceId, projectId),
    enabled: workspaceId !== "" && projectId !== "",
  });
  const locations = useQuery({
    ...locationsQueryOptions(workspaceId, projectId),
    enabled: workspaceId !== "" && projectId !== "",
  });
  const save = useSaveState(workspaceId, projectId);
  const loadCase = cases.data?.find((c) => c.id === caseId);
  const location = locations.data?.find((l) => l.id === locationId);
  const ready = loadCase !== undefined && location !== undefined;

  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    if (!loadCase || !location) return;
    setSaved(null);
    save.mutate(stateToSave({ caseId, locationId, version: loadCase.version, tensor, unit, record, note }), {
      onSuccess: (answer) => {
        const state = answer.states.find((s) => s.locationId === locationId);
        setSaved(savedWords(state?.revision ?? 1, answer.name, location.name));
      },
    });
  };

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label="Add to load case"
      className="basis-full space-y-2 rounded-sm border border-rule bg-paper p-3"
    >
      <p className="text-[13px] text-graphite-soft">
        Saves this state in {unit} as a new revision, with the calculator's name, version and every input.
      </p>
      <div className="grid gap-2 sm:grid-cols-2">
        <Picker
          label="Workspace"
          value={workspaceId}
          onChange={(v) => {
            setWorkspaceId(v);
            setProjectId("");
            setCaseId("");
            setLocationId("");
          }}
          options={workspaces.data && editableWorkspaces(workspaces.data.workspaces)}
          empty="no workspace where you edit"
        />
        <Picker
          label="Project"
          value={projectId}
          onChange={(v) => {
            setProjectId(v);
            setCaseId("");
            setLocationId("");
          }}
          options={workspaceId ? projects.data : undefined}
          empty="no project here"
        />
        <Picker
          label="Load case"
          value={caseId}
          onChange={setCaseId}
          options={projectId ? cases.data : undefined}
          empty="no load case in this project"
        />
        <Picker
          label="Location"
          value={locationId}
          onChange={setLocationId}
          options={projectId ? locations.data : undefined}
          empty="no location in this project"
        />
      </div>
      <div className="text-[13px]">
        <label htmlFor={noteId} className="block text-[12px] text-graphite-soft">
          Note (optional)
        </label>
        <input
          id={noteId}
          value={note}
          maxLength={2000}
          onChange={(e) => setNote(e.target.value)}
          className="mt-0.5 w-full rounded-sm border border-rule-strong bg-panel px-2 py-1"
        />
      </div>
      {loadCase && location && loadCase.states.some((s) => s.locationId === location.id) && (
        <p className="text-[12px] text-graphite-soft">
          "{loadCase.name}" already has a state at "{location.name}": this one becomes its next revision (the
          earlier one stays in the history).
        </p>
      )}
      <FormMessage error={save.error} />
      {saved && (
        <p role="status" className="text-[13px]" data-testid="added-to-load-case">
          <span aria-hidden="true">✓ </span>
          {saved}{" "}
          <Link to={`/workspaces/${workspaceId}/projects/${projectId}`} className="text-ink underline">
            Open the project
          </Link>
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <button type="submit" className={primaryButton} disabled={!ready || save.isPending}>
          {save.isPending ? "Saving…" : "Save in the load case"}
        </button>
        <button type="button" className={quietButton} onClick={onClose}>
          Close
        </button>
      </div>
    </form>
  );
}
