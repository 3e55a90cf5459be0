import { useState } from "react";
import { NumberField } from "../../../components/NumberField";
import { Panel } from "../../../components/Panel";
import { ToolButton } from "../../../components/ToolButton";
import { useInPlane, useRotated, useRotationDescription, useSummary } from "../hooks/use-derived";
import type { ZoomView } from "../interaction/zoom";
import { principalName } from "../model/derive";
import { useBenchStore } from "../model/store";
import { MohrDiagram } from "./MohrDiagram";
import { useOutOfDate } from "../hooks/use-out-of-date";

const fmt = (v: number) => Number(v.toFixed(3)).toString();

/** Panel 4: the diagram that explains the state, linked to the element. */
export function MohrPanel() {
  const outOfDate = useOutOfDate();
  const unit = useBenchStore((s) => s.unit);
  const mode = useBenchStore((s) => s.mohrView);
  const act = useBenchStore((s) => s.act);
  const summary = useSummary();
  const { rotated, faces } = useRotated();
  const rot = useRotationDescription();
  const inPlane = useInPlane();
  const [zoom, setZoom] = useState<ZoomView>(null);
  const planeMode = mode === "plane" && inPlane !== null;
  const named = summary.principal.plane;
  const plane = inPlane &&
    named && {
      circle: inPlane,
      sx: rotated.xx,
      sy: rotated.yy,
      txy: rotated.xy,
      theta: rot.aboutZ,
      sz: summary.principal.values[named.outOfPlane],
      names: {
        major: principalName(named.inPlaneMajor),
        minor: principalName(named.inPlaneMinor),
        outOfPlane: principalName(named.outOfPlane),
      },
    };
  return (
    <Panel
      outOfDate={outOfDate}
      id="mohr"
      index="4"
      title="Mohr's circles"
      subtitle={planeMode ? `in-plane x–y, ${unit}` : `3D, faces of x′ y′ z′, ${unit}`}
      tools={
        <>
          <ToolButton pressed={!planeMode} onClick={() => act.setMohrView("3d")}>
            3D
          </ToolButton>
          <ToolButton
            pressed={planeMode}
            disabled={inPlane === null}
            title={inPlane === null ? "Needs plane stress in x–y: σz = τyz = τzx = 0" : undefined}
            onClick={() => act.setMohrView("plane")}
          >
            In-plane
          </ToolButton>
          <ToolButton
            onClick={() => setZoom(null)}
            disabled={zoom === null}
            title="Zoom to fit (the mouse wheel zooms)"
          >
            Fit
          </ToolButton>
        </>
      }
      bodyClassName="flex flex-col px-2 pb-2 pt-1"
    >
      <MohrDiagram
        unit={unit}
        mode={planeMode ? "plane" : "3d"}
        principal={summary.principal.values}
        faces={faces}
        plane={plane}
        onTheta={(theta) => act.setPlaneAngle(theta)}
        zoom={zoom}
        onZoom={setZoom}
      />
      <div className="flex items-start gap-3 px-1 text-[12px] leading-4 text-graphite-soft">
        {planeMode ? (
          <>
            <p className="flex-1" data-testid="shear-convention">
              Shear convention: τx′y′ &gt; 0 acts in +y′ on the +x′ face, plotted{" "}
              <strong className="font-semibold">downward</strong>: the x′ point turns the same way as the
              element, by 2θ.
              {rot.aboutZ === null &&
                " The element is now tilted out of x–y: drag or type θ to turn it about z from the original axes."}
            </p>
            <NumberField
              label="θ about z"
              value={rot.aboutZ ?? 0}
              format={fmt}
              unit="°"
              className="w-24 shrink-0"
              onCommit={(v) => act.setPlaneAngle(v ?? 0)}
            />
          </>
        ) : (
          <p data-testid="shear-convention">
            τₙ = size of each face's shear (≥ 0); every plane through the point lies in the shaded region.
          </p>
        )}
      </div>
    </Panel>
  );
}
