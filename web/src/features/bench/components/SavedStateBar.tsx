import { useEffect, useRef, useState } from "react";
import { Link } from "react-router-dom";
import { convertStress } from "../../../../../core";
import { SUPERPOSITION_CAUTION } from "../../../../../core/contract/combinations";
import { loadCaseResponseSchema, type LoadCase } from "../../../../../core/contract/load-cases";
import { ToolButton } from "../../../components/ToolButton";
import { useSaveState } from "../../../entities/load-case/mutations";
import { useLoadCase } from "../../../entities/load-case/queries";
import { useLocation } from "../../../entities/location/queries";
import { useMaterials } from "../../../entities/material/queries";
import { useProject } from "../../../entities/project/queries";
import { useWorkspaceRole } from "../../../entities/workspace/queries";
import { ApiError } from "../../../lib/api-client";
import {
  parseBenchSource,
  parseCombinationSource,
  type BenchSource,
  type CombinationSource,
} from "../../../lib/bench-link";
import { FormMessage } from "../../../lib/forms";
import { STRESS_COMPONENTS } from "../../../lib/stress";
import { useBenchStore } from "../model/store";
import { selectInputValid, type BenchState } from "../model/bench-state";
import {
  benchFieldsOf,
  benchMaterialOf,
  combinationRequirementsFor,
  projectRequirementsFor,
} from "../model/project-requirements";

/** A copy's basis: the case version it started from, and the values and revision saved at it. */
type Basis = { version: number; saved: Pick<BenchState, "tensor" | "unit">; revision: number };

function basisOf(loadCase: LoadCase, locationId: string): Basis | null {
  const saved = benchFieldsOf(loadCase, locationId);
  const state = loadCase.states.find((s) => s.locationId === locationId);
  return saved && state ? { version: loadCase.version, saved, revision: state.revision } : null;
}

/** Whether the bench's tensor differs from the saved one (compared in Pa, to 1e-9 relative). */
function differs(a: Pick<BenchState, "tensor" | "unit">, b: Pick<BenchState, "tensor" | "unit">): boolean {
  const pa = (x: Pick<BenchState, "tensor" | "unit">) =>
    STRESS_COMPONENTS.map((k) => convertStress(x.tensor[k], x.unit, "Pa"));
  const [pa1, pa2] = [pa(a), pa(b)];
  const scale = Math.max(1, ...pa1.map(Math.abs), ...pa2.map(Math.abs));
  return pa1.some((v, i) => Math.abs(v - pa2[i]) > 1e-9 * scale);
}

/**
 * When the bench was opened from a project (`?source=workspace/project/case/location`): loads
 * the saved state, says where it comes from, and lets editors save edits back as a new
 * revision over the version they started from. A 409 shows who won and offers to reload
 * their values or keep this copy and save over the newer version. Reviewers and viewers see it
 * read-only. Renders nothing for a plain bench.
 */
/**
 * What the bench holds, for its heading: a saved state opened from a project, a combination's
 * superposed state, or a state that lives only on this page.
 * @param search the address's query string on arrival
 */
export function benchOrigin(search: string): "saved" | "combination" | "unsaved" {
  if (parseBenchSource(search)) return "saved";
  if (new URLSearchParams(search).get("combination")) return "combination";
  return "unsaved";
}

export function SavedStateBar() {
  const [source] = useState<BenchSource | null>(() => parseBenchSource(window.location.search));
  // Read once on arrival: the bench rewrites its address, keeping only `source`.
  const [combination] = useState(() => new URLSearchParams(window.location.search).get("combination"));
  const [from] = useState(() => parseCombinationSource(window.location.search));
  if (combination && !source) return <CombinationNote name={combination} from={from} />;
  if (!source) return null;
  return <SavedState source={source} />;
}

/** A combination's superposed state is not stored anywhere: it is shown view-only, with the superposition caution. */
function CombinationNote({ name, from }: { name: string; from: CombinationSource | null }) {
  return (
    <section
      aria-label="Combination state"
      className="space-y-0.5 rounded-sm border border-ink/40 bg-ink-wash px-3 py-1.5 text-[13px]"
    >
      <p>
        Combination: <strong>{name}</strong> · view only (a superposed state is computed, not saved; edit its
        load cases instead)
      </p>
      {from && <CombinationCheck from={from} />}
      <p className="text-graphite-soft">
        <span aria-hidden="true">⚠ </span>
        {SUPERPOSITION_CAUTION}
      </p>
    </section>
  );
}

/** Applies the check the comparison made of the combination there: the project's default factors and the location's material. */
function CombinationCheck({ from }: { from: CombinationSource }) {
  const act = useBenchStore((s) => s.act);
  const project = useProject(from.workspaceId, from.projectId);
  const location = useLocation(from.workspaceId, from.projectId, from.locationId);
  const materials = useMaterials(from.workspaceId);
  useEffect(() => {
    if (!project.data || !location.data || !materials.data) return;
    const material = benchMaterialOf(location.data.material ?? project.data.defaultMaterial, materials.data);
    act.applyShared({
      ...(material ? { material } : {}),
      projectRequirements: combinationRequirementsFor(project.data),
      behaviour: "from-data",
      includeUnsuited: project.data.includeUnsuitedCriteria,
    });
  }, [project.data, location.data, materials.data, act]);
  if (!project.data || !location.data) return null;
  return (
    <p className="text-graphite-soft">
      At <strong>{location.data.name}</strong> in {project.data.name}, checked with the project&apos;s default
      factors and this location&apos;s material.
    </p>
  );
}

function SavedState({ source }: { source: BenchSource }) {
  const { workspaceId, projectId, loadCaseId, locationId } = source;
  const act = useBenchStore((s) => s.act);
  const tensor = useBenchStore((s) => s.tensor);
  const unit = useBenchStore((s) => s.unit);
  const workspace = useWorkspaceRole(workspaceId);
  const project = useProject(workspaceId, projectId);
  const location = useLocation(workspaceId, projectId, locationId);
  const materials = useMaterials(workspaceId);
  // Fetched fresh on every opening: a cached copy would hand the bench an old version to save over.
  const loadCase = useLoadCase(workspaceId, projectId, loadCaseId, true);
  // The version this copy is based on, and the values saved at it: first as loaded (kept when a
  // save refreshes the case), then as saved or reloaded here.
  const [loadedBasis, setLoadedBasis] = useState<Basis | null>(null);
  const arrived = loadCase.data ? basisOf(loadCase.data, locationId) : null;
  if (!loadedBasis && arrived) setLoadedBasis(arrived);
  const [laterBasis, setBasis] = useState<Basis | null>(null);
  const basis = laterBasis ?? loadedBasis;
  const [conflict, setConflict] = useState<{ currentVersion: number; current: LoadCase } | null>(null);
  const [savedNote, setSavedNote] = useState<string | null>(null);
  const inputValid = useBenchStore(selectInputValid); // a cell holding no valid stress is never saved
  const applied = useRef(false);

  // Puts the saved values into the bench's store once they arrive.
  useEffect(() => {
    if (!loadedBasis || applied.current) return;
    applied.current = true;
    act.applyShared(loadedBasis.saved);
  }, [loadedBasis, act]);

  // The check the project makes: its required factor per criterion for the case's category (the
  // comparison's lookup), its choice on unsuited criteria, and the location's (or project's) material.
  // (Keyed on the case's category, not the record: a save here refreshes the record, and that
  // must not put back a material or factors changed on the bench since.)
  const category = loadCase.data?.category;
  useEffect(() => {
    if (!project.data || !location.data || !materials.data || category === undefined) return;
    const material = benchMaterialOf(location.data.material ?? project.data.defaultMaterial, materials.data);
    act.applyShared({
      ...(material ? { material } : {}),
      projectRequirements: projectRequirementsFor(project.data, category),
      behaviour: "from-data",
      includeUnsuited: project.data.includeUnsuitedCriteria,
    });
  }, [project.data, location.data, materials.data, category, act]);

  const save = useSaveState(workspaceId, projectId, {
    onSuccess: (saved) => {
      const next = basisOf(saved, locationId)!;
      setBasis(next);
      const revision = next.revision;
      setConflict(null);
      setSavedNote(`Saved as revision ${revision} (load case version ${saved.version}).`);
    },
    onError: (error) => {
      if (error instanceof ApiError && error.status === 409) {
        const details = error.details as { currentVersion: number; current: unknown };
        setConflict({
          currentVersion: details.currentVersion,
          current: loadCaseResponseSchema.shape.loadCase.parse(details.current),
        });
      }
    },
  });
  const saveOver = (version: number) =>
    save.mutate({
      caseId: loadCaseId,
      locationId,
      version,
      stress: { unit, components: tensor },
      source: "typed",
      note: "edited in the bench",
    });

  const failed = [workspace, project, location, loadCase].find((q) => q.error);
  if (failed) {
    return (
      <FormMessage>
        This saved state cannot be opened:{" "}
        {failed.error instanceof Error ? failed.error.message : "unknown error"}
      </FormMessage>
    );
  }
  if (!workspace.data || !project.data || !location.data || !loadCase.data || !basis) {
    return <p className="text-[13px] text-graphite-soft">Loading the saved state…</p>;
  }
  const canEdit = workspace.canEdit;
  const changed = differs({ tensor, unit }, basis.saved);

  return (
    <section
      aria-label="Saved state"
      className="flex flex-wrap items-center gap-x-3 gap-y-1 rounded-sm border border-ink/40 bg-ink-wash px-3 py-1.5 text-[13px]"
    >
      <span>
        Saved state: <strong>{loadCase.data.name}</strong> at <strong>{location.data.name}</strong> in{" "}
        <Link
          to={`/workspaces/${workspaceId}/projects/${projectId}`}
          className="text-ink underline-offset-2 hover:underline"
        >
          {project.data.name}
        </Link>{" "}
        · revision <span className="num">{basis.revision}</span> · case version{" "}
        <span className="num">{basis.version}</span>
      </span>
      <Link
        to={`/workspaces/${workspaceId}/projects/${projectId}/comparison`}
        className="text-ink underline-offset-2 hover:underline"
      >
        Comparison
      </Link>
      {/* Every role sees whether the values on the bench are still the saved ones. */}
      <span
        className={changed ? "font-semibold text-graphite" : "text-graphite-soft"}
        data-testid="saved-state-status"
      >
        {changed ? "edited here — not saved" : "unchanged"}
      </span>
      {canEdit ? (
        <>
          <ToolButton
            onClick={() => (setSavedNote(null), saveOver(basis.version))}
            disabled={!changed || save.isPending || !!conflict || !inputValid}
          >
            Save to project
          </ToolButton>
        </>
      ) : (
        <span className="text-graphite-soft">
          View only: as {workspace.data.role} you can explore this state but not save it.
        </span>
      )}
      {savedNote && !changed && <span className="text-pass">✓ {savedNote}</span>}
      {conflict && (
        <div
          role="alert"
          className="basis-full space-y-1 rounded-sm border border-fail bg-fail-wash px-2 py-1.5 text-fail"
        >
          <p>
            ✗ Someone saved this load case while you were editing (it is now version {conflict.currentVersion}
            ). Nothing was overwritten.
          </p>
          <div className="flex gap-2">
            <ToolButton
              onClick={() => {
                const fields = benchFieldsOf(conflict.current, locationId);
                if (fields) act.applyShared(fields);
                const revision =
                  conflict.current.states.find((s) => s.locationId === locationId)?.revision ??
                  basis.revision;
                if (fields) setBasis({ version: conflict.currentVersion, saved: fields, revision });
                setConflict(null);
              }}
            >
              Reload their values
            </ToolButton>
            <ToolButton
              onClick={() => {
                setConflict(null);
                saveOver(conflict.currentVersion);
              }}
            >
              Keep my copy and save over version {conflict.currentVersion}
            </ToolButton>
          </div>
        </div>
      )}
      {save.error && !conflict && !(save.error instanceof ApiError && save.error.status === 409) && (
        <FormMessage error={save.error} />
      )}
    </section>
  );
}
