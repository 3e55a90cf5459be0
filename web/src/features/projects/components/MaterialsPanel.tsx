import { useState, type FormEvent } from "react";
import { FROM_MEMORY_NOTE } from "../../../../../core";
import { STRESS_UNIT_NAMES, type StressUnitName } from "../../../../../core/contract/materials";
import { fieldErrorsOf } from "../../../lib/api-client";
import { FormMessage, primaryButton } from "../../../lib/forms";
import { Panel } from "../../../components/Panel";
import { Quantity } from "../../../components/Quantity";
import { useCreateMaterial, useDeleteMaterial } from "../../../entities/material/mutations";
import { useMaterials } from "../../../entities/material/queries";
import { ToolButton } from "../../../components/ToolButton";
import { formatStress } from "../../../lib/stress";
import { MaterialEditor } from "./MaterialEditor";

/** The workspace's material library and the built-in published list (read-only, with its standard). */
export function MaterialsPanel({
  workspaceId,
  unit,
  canEdit,
}: {
  workspaceId: string;
  unit: StressUnitName;
  canEdit: boolean;
}) {
  const list = useMaterials(workspaceId);
  const create = useCreateMaterial(workspaceId);
  const remove = useDeleteMaterial(workspaceId);
  const [editingId, setEditingId] = useState<string | null>(null);
  const [form, setForm] = useState({
    name: "",
    unit: unit as StressUnitName,
    yield: "",
    ultimateTension: "",
    reference: "",
  });
  const errors = fieldErrorsOf(create.error);
  const num = (v: string) => (v.trim() === "" ? null : Number(v));
  const submit = (e: FormEvent) => {
    e.preventDefault();
    create.mutate(
      {
        name: form.name,
        unit: form.unit,
        yield: num(form.yield),
        ultimateTension: num(form.ultimateTension),
        reference: form.reference,
      },
      { onSuccess: () => setForm({ ...form, name: "", yield: "", ultimateTension: "", reference: "" }) },
    );
  };
  return (
    <Panel id="materials" index="5" title="Materials" subtitle={`strengths in ${unit}`}>
      <table className="w-full text-[14px]">
        <thead>
          <tr className="border-b border-rule text-left text-[13px] text-graphite-soft">
            <th className="px-3 py-1.5">Material</th>
            <th className="px-3 py-1.5 text-right">Yield</th>
            <th className="px-3 py-1.5 text-right">Tensile</th>
            <th className="px-3 py-1.5">Source</th>
          </tr>
        </thead>
        <tbody>
          {list.data?.materials.map((m) =>
            editingId === m.id ? (
              <tr key={m.id} className="border-b border-rule">
                <td colSpan={4}>
                  <MaterialEditor workspaceId={workspaceId} material={m} onDone={() => setEditingId(null)} />
                </td>
              </tr>
            ) : (
              <tr key={m.id} className="border-b border-rule">
                <td className="px-3 py-1.5 font-semibold">{m.name}</td>
                <td className="px-3 py-1.5 text-right">
                  <Quantity
                    value={formatStress(m.yieldPa, unit)}
                    unit={m.yieldPa === null ? undefined : unit}
                  />
                </td>
                <td className="px-3 py-1.5 text-right">
                  <Quantity
                    value={formatStress(m.ultimateTensionPa, unit)}
                    unit={m.ultimateTensionPa === null ? undefined : unit}
                  />
                </td>
                <td className="px-3 py-1.5 text-graphite-soft">
                  {m.reference || "library, no reference"}
                  {canEdit && (
                    <ToolButton
                      className="ml-2"
                      aria-label={`Edit material ${m.name}`}
                      onClick={() => setEditingId(m.id)}
                    >
                      Edit
                    </ToolButton>
                  )}
                  {canEdit && (
                    <ToolButton
                      className="ml-2"
                      aria-label={`Delete material ${m.name}`}
                      onClick={() => remove.mutate(m.id)}
                    >
                      Delete
                    </ToolButton>
                  )}
                </td>
              </tr>
            ),
          )}
          {list.data?.published.map((m) => (
            <tr key={m.id} className="border-b border-rule">
              <td className="px-3 py-1.5">
                {m.name} <span className="text-graphite-soft">({m.standard})</span>
              </td>
              <td className="px-3 py-1.5 text-right">
                <Quantity
                  value={formatStress(m.yieldPa, unit)}
                  unit={m.yieldPa === null ? undefined : unit}
                />
              </td>
              <td className="px-3 py-1.5 text-right">
                <Quantity
                  value={formatStress(m.ultimateTensionPa, unit)}
                  unit={m.ultimateTensionPa === null ? undefined : unit}
                />
              </td>
              <td className="px-3 py-1.5 text-graphite-soft">published minimum, {m.scope}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="px-3 py-1.5 text-[13px] text-graphite-soft">Published values: {FROM_MEMORY_NOTE}.</p>
      {canEdit && (
        <form
          onSubmit={submit}
          noValidate
          className="flex flex-wrap items-end gap-2 border-t border-rule p-3 text-[13px]"
        >
          <input
            aria-label="Material name"
            placeholder="library material name"
            value={form.name}
            onChange={(e) => setForm({ ...form, name: e.target.value })}
            className="min-w-48 flex-1 rounded-sm border border-rule-strong bg-panel px-2 py-1"
          />
          <input
            aria-label="Yield strength"
            placeholder="yield"
            inputMode="decimal"
            value={form.yield}
            onChange={(e) => setForm({ ...form, yield: e.target.value })}
            className="num w-20 rounded-sm border border-rule-strong bg-panel px-2 py-1 text-right"
          />
          <input
            aria-label="Tensile strength"
            placeholder="tensile"
            inputMode="decimal"
            value={form.ultimateTension}
            onChange={(e) => setForm({ ...form, ultimateTension: e.target.value })}
            className="num w-20 rounded-sm border border-rule-strong bg-panel px-2 py-1 text-right"
          />
          <select
            aria-label="Strength unit"
            value={form.unit}
            onChange={(e) => setForm({ ...form, unit: e.target.value as StressUnitName })}
            className="rounded-sm border border-rule-strong bg-panel px-1 py-1"
          >
            {STRESS_UNIT_NAMES.map((u) => (
              <option key={u}>{u}</option>
            ))}
          </select>
          <input
            aria-label="Reference"
            placeholder="certificate / reference"
            value={form.reference}
            onChange={(e) => setForm({ ...form, reference: e.target.value })}
            className="min-w-40 rounded-sm border border-rule-strong bg-panel px-2 py-1"
          />
          <button type="submit" className={primaryButton} disabled={create.isPending}>
            Add to library
          </button>
          <div className="basis-full">
            <FormMessage>
              {Object.entries(errors)
                .map(([path, message]) => `${path}: ${message}`)
                .join("; ") || null}
            </FormMessage>
          </div>
        </form>
      )}
    </Panel>
  );
}
