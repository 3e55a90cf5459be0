import { useState } from "react";
import { NumberField } from "../../../components/NumberField";
import { ToolButton } from "../../../components/ToolButton";
import type { Vec3 } from "../../../../../core";
import { useRotationDescription } from "../hooks/use-derived";
import { EULER_SEQUENCES, type EulerSequence } from "../model/bench-state";
import { useBenchStore } from "../model/store";

const fmt = (v: number) => Number(v.toFixed(4)).toString();

/**
 * Snapping buttons and exact angles. Typed values describe the element's frame measured from the
 * original axes (not a further turn), in the chosen description.
 */
export function RotationControls() {
  const view = useBenchStore((s) => s.rotationView);
  const sequence = useBenchStore((s) => s.eulerSequence);
  const act = useBenchStore((s) => s.act);
  const rot = useRotationDescription();
  // Drafts for the typed description; re-seeded from the live rotation whenever the view changes.
  const [axis, setAxis] = useState<Vec3 | null>(null);
  const [angle, setAngle] = useState<number | null>(null);
  const [euler, setEuler] = useState<Vec3 | null>(null);
  const shownAxis = axis ?? rot.axisAngle.axis;
  const shownAngle = angle ?? rot.axisAngle.angleDeg;
  const shownEuler = euler ?? rot.euler;

  function apply() {
    if (view === "axis-angle") act.setAxisAngle(shownAxis, shownAngle);
    else act.setEuler(sequence, shownEuler);
    setAxis(null);
    setAngle(null);
    setEuler(null);
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
        className="flex items-end gap-1"
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
                className="w-14"
                onCommit={(v) => {
                  const next: [number, number, number] = [...shownAxis];
                  next[k] = v ?? 0;
                  setAxis(next);
                }}
              />
            ))}
            <NumberField
              label="angle"
              value={shownAngle}
              format={fmt}
              unit="°"
              className="w-20"
              onCommit={(v) => setAngle(v ?? 0)}
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
              className="w-[4.6rem]"
              onCommit={(v) => {
                const next: [number, number, number] = [...shownEuler];
                next[k] = v ?? 0;
                setEuler(next);
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
