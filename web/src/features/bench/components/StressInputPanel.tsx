import { useId } from "react";
import { Panel } from "../../../components/Panel";
import { ToolButton } from "../../../components/ToolButton";
import type { InputForm } from "../model/bench-state";
import { EXAMPLE_STATES } from "../model/examples";
import { useBenchStore } from "../model/store";
import { ComponentsForm } from "./ComponentsForm";
import { PasteBox } from "./PasteBox";
import { TensorGrid } from "./TensorGrid";
import { UnitPicker } from "./UnitPicker";

const FORMS: readonly { form: InputForm; label: string }[] = [
  { form: "grid", label: "3×3" },
  { form: "six", label: "Six" },
  { form: "plane", label: "Plane stress" },
];

/** Panel 1: the stress state the engineer has, in x y z and the chosen unit. */
export function StressInputPanel() {
  const form = useBenchStore((s) => s.inputForm);
  const unit = useBenchStore((s) => s.unit);
  const canUndo = useBenchStore((s) => s.history.past.length > 0);
  const canRedo = useBenchStore((s) => s.history.future.length > 0);
  const act = useBenchStore((s) => s.act);
  const exampleId = useId();
  return (
    <Panel
      id="state"
      index="1"
      title="Stress state"
      subtitle={unit}
      tools={
        <>
          <ToolButton disabled={!canUndo} onClick={() => act.undo()} aria-keyshortcuts="Control+Z">
            Undo
          </ToolButton>
          <ToolButton disabled={!canRedo} onClick={() => act.redo()} aria-keyshortcuts="Control+Shift+Z">
            Redo
          </ToolButton>
        </>
      }
      bodyClassName="space-y-2 px-3 py-2"
    >
      <div
        role="radiogroup"
        aria-label="Input form"
        className="flex gap-px rounded-sm border border-rule bg-rule text-[13px]"
      >
        {FORMS.map((f) => (
          <button
            key={f.form}
            type="button"
            role="radio"
            aria-checked={form === f.form}
            onClick={() => act.setInputForm(f.form)}
            className={`flex-1 whitespace-nowrap px-1 py-0.5 ${form === f.form ? "bg-ink-wash font-semibold text-ink" : "bg-panel text-graphite-soft hover:text-ink"}`}
          >
            {f.label}
          </button>
        ))}
      </div>
      {form === "grid" ? <TensorGrid /> : <ComponentsForm plane={form === "plane"} />}
      <UnitPicker />
      <PasteBox />
      <div className="flex items-center gap-2 text-[13px]">
        <label htmlFor={exampleId} className="shrink-0 text-graphite-soft">
          Start from
        </label>
        <select
          id={exampleId}
          value=""
          onChange={(e) => e.target.value && act.loadExample(e.target.value)}
          className="min-w-0 flex-1 rounded-sm border border-rule bg-white px-1 py-0.5"
        >
          <option value="">an example (CT-7 demo)…</option>
          {EXAMPLE_STATES.map((e) => (
            <option key={e.id} value={e.id} title={e.detail}>
              {e.title}
            </option>
          ))}
        </select>
      </div>
    </Panel>
  );
}
