import { useMemo, useState } from "react";
import type { PathFromPointTable } from "../../../../../core/contract/linearizations";
import { usePointTables } from "../../../entities/point-table/queries";
import { fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage, quietButton } from "../../../lib/forms";
import { usePathFromPointTable } from "../api/path-from-point-table";
import { useDebounced } from "../hooks/use-debounced";
import type { LineForm } from "../model/line-form";
import { VectorField } from "./VectorField";
import { EMPTY_PICK, pickableTables, pickRequestOf, pickSummary, type PickForm } from "../model/pick-form";

const input = "w-full rounded border border-rule-strong bg-panel px-2 py-1 text-[15px]";
const label = "block text-sm font-semibold text-graphite";

/**
 * Picking the path out of a stored finite-element point table of the load case: the engineer
 * chooses the table, types the two ends and a tolerance, sees how many points the server finds
 * near the line, and puts them in the path box. The server picks (core's `pickPath`); this only
 * draws and asks.
 */
export function PointTablePick({
  workspaceId,
  projectId,
  caseId,
  lengthUnit,
  onUse,
}: {
  workspaceId: string;
  projectId: string;
  caseId: string;
  lengthUnit: LineForm["lengthUnit"];
  onUse: (picked: PathFromPointTable) => void;
}) {
  const tables = usePointTables(workspaceId, projectId, caseId);
  const [form, setForm] = useState<PickForm>(EMPTY_PICK);
  const request = useMemo(() => pickRequestOf(form, lengthUnit), [form, lengthUnit]);
  const body = useDebounced(request.ok ? request.body : null, 300);
  const picked = usePathFromPointTable(workspaceId, projectId, caseId, body);
  const serverErrors = fieldErrorsOf(picked.error);
  const typed = form.tableId !== "" || form.tolerance !== "" || [...form.start, ...form.end].some((v) => v);
  const errors: Record<string, string | undefined> = {
    ...serverErrors,
    ...(request.ok || !typed ? {} : request.problems),
  };
  const choices = pickableTables(tables.data ?? []);
  const set = <K extends keyof PickForm>(key: K, value: PickForm[K]) =>
    setForm((f) => ({ ...f, [key]: value }));
  const answer = request.ok ? picked.data : undefined;

  return (
    <details className="border-b border-rule px-3 py-2" data-testid="pick-from-table">
      <summary className="cursor-pointer text-sm font-semibold text-graphite">
        Pick from a point table of this load case
      </summary>
      <div className="mt-2 space-y-3">
        {tables.error && <FormMessage error={tables.error} />}
        <div className="space-y-1">
          <label htmlFor="pick-table" className={label}>
            Point table
          </label>
          <select
            id="pick-table"
            className={input}
            value={form.tableId}
            onChange={(e) => set("tableId", e.target.value)}
            aria-describedby={errors.tableId ? "pick-table-error" : undefined}
          >
            <option value="">
              {choices.length === 0 ? "(no point table stored under this load case)" : "(choose a table)"}
            </option>
            {choices.map((t) => (
              <option key={t.id} value={t.id} disabled={!t.hasCoordinates}>
                {t.fileName} — {t.pointCount} points{t.hasCoordinates ? "" : " (no x y z: cannot pick)"}
              </option>
            ))}
          </select>
          {errors.tableId && (
            <p id="pick-table-error" className="text-sm text-fail">
              <span aria-hidden="true">✗ </span>
              {errors.tableId}
            </p>
          )}
        </div>
        <div className="grid gap-3 sm:grid-cols-2">
          <VectorField
            id="pick-start"
            legend="First end"
            value={form.start}
            onChange={(v) => set("start", v)}
            error={errors.start}
          />
          <VectorField
            id="pick-end"
            legend="Second end"
            value={form.end}
            onChange={(v) => set("end", v)}
            error={errors.end}
          />
        </div>
        <div className="space-y-1">
          <label htmlFor="pick-tolerance" className={label}>
            Tolerance{" "}
            <span className="font-normal text-graphite-soft">
              ({lengthUnit}, the table&apos;s coordinates)
            </span>
          </label>
          <input
            id="pick-tolerance"
            inputMode="decimal"
            className={`${input} num w-32`}
            value={form.tolerance}
            onChange={(e) => set("tolerance", e.target.value)}
            aria-describedby={errors.tolerance ? "pick-tolerance-error" : undefined}
          />
          <p className="text-[13px] text-graphite-soft">
            Points no farther than this from the straight segment between the ends are taken, projected onto
            it and sorted from the first end to the second. Give the ends on the two surfaces, in the
            table&apos;s coordinates.
          </p>
          {errors.tolerance && (
            <p id="pick-tolerance-error" className="text-sm text-fail">
              <span aria-hidden="true">✗ </span>
              {errors.tolerance}
            </p>
          )}
        </div>
        {picked.error && Object.keys(serverErrors).length === 0 && <FormMessage error={picked.error} />}
        {answer && (
          <div className={`space-y-2 ${picked.isFetching ? "opacity-70" : ""}`}>
            <p role="status" className="text-sm" data-testid="pick-summary">
              {pickSummary(answer)}
            </p>
            {answer.notes.map((n) => (
              <p key={n} className="text-[13px] text-graphite-soft">
                {n}
              </p>
            ))}
            {answer.warnings.map((w) => (
              <p key={w} className="rounded border border-close bg-close-wash px-3 py-2 text-sm text-close">
                <span aria-hidden="true">⚠ </span>
                {w}
              </p>
            ))}
            <button
              type="button"
              className={quietButton}
              disabled={answer.path === null}
              onClick={() => onUse(answer)}
            >
              Use these {answer.path?.points.length ?? answer.pointCount} points as the path
            </button>
          </div>
        )}
      </div>
    </details>
  );
}
