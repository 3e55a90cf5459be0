import { useRef, useState } from "react";
import { NumberField } from "../../../components/NumberField";
import { ToolButton } from "../../../components/ToolButton";
import type { Vec3 } from "../../../../../core";
import { useRotationDescription } from "../hooks/use-derived";
import { EULER_SEQUENCES, type EulerSequence } from "../model/bench-state";
import { useBenchStore } from "../model/store";

const fmt = (v: number) => Number(v.toFixed(3)).toString();

/**
 * Snapping buttons and exact angles. Typed values describe the element's frame measured from the
 * original axes (not a further turn), in the chosen description.
 */
export function RotationControls() {
  const view = useBenchStore((s) => s.rotationView);
  const sequence = useBenchStore((s) => s.eulerSequence);
  const act = useBenchStore((s) => s.act);
  const rot = useRotationDescription();
  // Drafts of the typed description, in a ref as well as state: Enter in a field commits the draft
  // and submits the form in the same tick, so apply() must see the value committed just before it.
  type Drafts = { axis: Vec3 | null; angle: number | null; euler: Vec3 | null };
  const empty: Drafts = { axis: null, angle: null, euler: null };
  const [drafts, setDrafts] = useState<Drafts>(empty);
  const latest = useRef<Drafts>(empty);
  const draft = (patch: Partial<Drafts>) => {
    latest.current = { ...latest.current, ...patch };
    setDrafts(latest.current);
  };
  const shownAxis = drafts.axis ?? rot.axisAngle.axis;
  const shownAngle = drafts.angle ?? rot.axisAngle.angleDeg;
  const shownEuler = drafts.euler ?? rot.euler;

  function apply() {
    const d = latest.current;
    if (view === "axis-angle")
      act.setAxisAngle(d.axis ?? rot.axisAngle.axis, d.angle ?? rot.axisAngle.angleDeg);
    else act.setEuler(sequence, d.euler ?? rot.euler);
    draft({ axis: null, angle: null, euler: null });
  }

  return (
    <div className="space-y-1.5 text-[13px]">
      <div className="flex flex-wrap items-center gap-1" role="group" aria-label="Snap the element">
        <span className="text-[12px] text-graphite-soft">Snap to</span>
        <ToolButton onClick={() => act.snapToPrincipal()} title="Turn x′ y′ z′ onto the principal directions">
          Principal
        </ToolButton>
        <ToolButton
          onClick={() => act.snapToMaxShear()}
          title="Turn the element so τmax acts on the x′ and y′ faces"
        >
          Max shear
        </ToolButton>
        <ToolButton onClick={() => act.resetRotation()} title="Back to x y z">
          Original
        </ToolButton>
      </div>
      <div className="flex items-center gap-2">
        <span className="text-[12px] text-graphite-soft">Describe by</span>
        <ToolButton pressed={view === "axis-angle"} onClick={() => act.setRotationView("axis-angle")}>
          axis + angle
        </ToolButton>
        <ToolButton pressed={view === "euler"} onClick={() => act.setRotationView("euler")}>
          Euler
        </ToolButton>
        {view === "euler" && (
          <select
            aria-label="Euler sequence (intrinsic)"
            value={sequence}
            onChange={(e) => act.setEulerSequence(e.target.value as EulerSequence)}
            className="num rounded-sm border border-rule bg-white px-1 py-0.5 text-[12px]"
          >
            {EULER_SEQUENCES.map((s) => (
              <option key={s} value={s}>
                {s}
              </option>
            ))}
          </select>
        )}
      </div>
      <form
        className={`grid items-end gap-1 ${view === "axis-angle" ? "grid-cols-[1fr_1fr_1fr_1.35fr_auto]" : "grid-cols-[1fr_1fr_1fr_auto]"}`}
        onSubmit={(e) => {
          e.preventDefault();
          apply();
        }}
      >
        {view === "axis-angle" ? (
          <>
            {(["axis x", "axis y", "axis z"] as const).map((label, k) => (
              <NumberField
                key={label}
                label={label}
                value={shownAxis[k]}
                format={fmt}
                className="min-w-0"
                inputClassName="!px-1 !text-[12px]"
                onCommit={(v) => {
                  const next: [number, number, number] = [...shownAxis];
                  next[k] = v ?? 0;
                  draft({ axis: next });
                }}
              />
            ))}
            <NumberField
              label="angle"
              value={shownAngle}
              format={fmt}
              unit="°"
              className="min-w-0"
              onCommit={(v) => draft({ angle: v ?? 0 })}
            />
          </>
        ) : (
          (["first", "second", "third"] as const).map((label, k) => (
            <NumberField
              key={label}
              label={`${sequence[k]} ${label}`}
              value={shownEuler[k]}
              format={fmt}
              unit="°"
              className="min-w-0"
              onCommit={(v) => {
                const next: [number, number, number] = [...shownEuler];
                next[k] = v ?? 0;
                draft({ euler: next });
              }}
            />
          ))
        )}
        <button
          type="submit"
          className="rounded-sm border border-ink px-2 py-0.5 text-[13px] font-semibold text-ink hover:bg-ink-wash"
        >
          Set
        </button>
      </form>
    </div>
  );
}
