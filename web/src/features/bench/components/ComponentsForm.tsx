import { NumberField } from "../../../components/NumberField";
import { COMPONENT_SYMBOLS, STRESS_COMPONENTS } from "../../../lib/stress";
import { stressInputProblem, type Component } from "../../../../../core";
import { editable } from "../model/format";
import { useBenchStore } from "../model/store";

const SIX: readonly { c: Component; label: string }[] = STRESS_COMPONENTS.map((c) => ({
  c,
  label: COMPONENT_SYMBOLS[c].short,
}));

/**
 * The six-component form, or the plane-stress form (σx, σy, τxy) which also sets σz = τyz = τzx = 0.
 */
export function ComponentsForm({ plane }: { plane: boolean }) {
  const tensor = useBenchStore((s) => s.tensor);
  const unit = useBenchStore((s) => s.unit);
  const act = useBenchStore((s) => s.act);
  const fields = plane ? SIX.filter((f) => f.c === "xx" || f.c === "yy" || f.c === "xy") : SIX;
  const outOfPlane = tensor.zz !== 0 || tensor.yz !== 0 || tensor.zx !== 0;
  return (
    <div>
      <div className="grid grid-cols-3 gap-x-2 gap-y-1.5">
        {fields.map(({ c, label }) => (
          <NumberField
            key={c}
            label={`${label} (${unit})`}
            value={tensor[c]}
            format={editable}
            onCommit={(v) => act.setComponent(c, v ?? 0)}
            check={stressInputProblem}
            onValidityChange={(valid) => act.setInputValidity(label, valid)}
          />
        ))}
      </div>
      {plane && (
        <p className="mt-1.5 text-[12px] text-graphite-soft">
          Plane stress: σz = τyz = τzx = 0.
          {outOfPlane && (
            <>
              {" "}
              <button
                type="button"
                className="text-ink underline"
                onClick={() => act.setTensor({ ...tensor, zz: 0, yz: 0, zx: 0 })}
              >
                Set the out-of-plane components to zero
              </button>
            </>
          )}
        </p>
      )}
    </div>
  );
}
