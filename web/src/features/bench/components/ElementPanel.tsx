import { Suspense, lazy } from "react";
import { Panel } from "../../../components/Panel";
import { ToolButton } from "../../../components/ToolButton";
import { useBenchStore } from "../model/store";
import { PlaneOfInterest } from "./PlaneOfInterest";
import { RotatedReadout } from "./RotatedReadout";
import { RotationControls } from "./RotationControls";
import { useOutOfDate } from "../hooks/use-out-of-date";

// three.js and react-three-fiber are large: the element loads as its own chunk.
const Element3D = lazy(() => import("./Element3D"));

/** A small colour key mark beside its words. */
function Swatch({ className }: { className: string }) {
  return <span aria-hidden="true" className={`inline-block h-[3px] w-3 align-middle ${className}`} />;
}

/** Panel 3: the element the engineer turns, its frame and the components in that frame. */
export function ElementPanel() {
  const outOfDate = useOutOfDate();
  const unit = useBenchStore((s) => s.unit);
  const dragTarget = useBenchStore((s) => s.dragTarget);
  const act = useBenchStore((s) => s.act);
  return (
    <Panel
      outOfDate={outOfDate}
      id="element"
      index="3"
      title="Element"
      subtitle={`frame x′ y′ z′, ${unit}`}
      tools={
        <div role="group" aria-label="A drag turns" className="flex items-center gap-1">
          <span className="text-[12px] text-graphite-soft">Drag turns</span>
          <ToolButton pressed={dragTarget === "element"} onClick={() => act.setDragTarget("element")}>
            element
          </ToolButton>
          <ToolButton pressed={dragTarget === "view"} onClick={() => act.setDragTarget("view")}>
            view
          </ToolButton>
        </div>
      }
      bodyClassName="grid grid-cols-[minmax(0,0.8fr)_minmax(0,1fr)] gap-3 px-3 py-2"
    >
      <div className="flex min-h-0 flex-col gap-1">
        <div className="mx-auto aspect-square h-[215px] max-w-full">
          <Suspense fallback={<p className="p-4 text-[13px] text-graphite-soft">Loading the 3D element…</p>}>
            <Element3D />
          </Suspense>
        </div>
        <p className="text-[11px] leading-4 text-graphite-soft">
          Arrows on the x′ y′ z′ faces, length by size: <Swatch className="bg-tension" /> out = tension,{" "}
          <Swatch className="bg-compression" /> in = compression, <Swatch className="bg-ink" /> along = shear.
          Focus the element for keys: arrows 5°, Shift 15°, Alt 1°.
        </p>
      </div>
      <div className="min-w-0 space-y-2">
        <RotatedReadout />
        <RotationControls />
        <PlaneOfInterest />
      </div>
    </Panel>
  );
}
