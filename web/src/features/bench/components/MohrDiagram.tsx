/**
 * Mohr's diagram in SVG. Two pictures:
 * - 3D: the three circles with the admissible region between them shaded and a marker for each face
 *   of the turned element at (σn, τn), τn the magnitude of the face's shear (upper half only);
 * - plane: the in-plane circle with the x′ and y′ face points, τx′y′ plotted positive downward so
 *   the x′ point turns the same way as the element; dragging it (or arrow keys on it) turns the element.
 * It draws and dispatches: scales, ticks, shapes and label places come from core/diagrams/mohr.ts,
 * the pointer handling from hooks/use-mohr-pointer.ts, every value from core through the store.
 */
import { useEffect, useMemo, useRef } from "react";
import { mohrGeometry, type MohrFaceInput, type MohrPlaneInput } from "../../../../../core/diagrams";
import { SvgAxis } from "../../../components/SvgAxis";
import { SvgSym } from "../../../components/SvgSym";
import { ToolButton } from "../../../components/ToolButton";
import { markCommit } from "../hooks/perf-marks";
import { useMohrPointer } from "../hooks/use-mohr-pointer";
import type { ZoomView } from "../interaction/zoom";
import { fixed } from "../model/format";
import { Mohr3DShapes, MohrAxisMarks, MohrPlaneShapes } from "./MohrShapes";

export type MohrDiagramProps = {
  unit: string;
  mode: "3d" | "plane";
  /** σ1 ≥ σ2 ≥ σ3: the three circles are drawn from them */
  principal: readonly [number, number, number];
  faces: readonly MohrFaceInput[];
  /**
   * plane mode: the in-plane circle, the rotated x′ components, θ (null when not a turn about z) and
   * the names of the in-plane pair and of σz by the bench's one rule (σ1 ≥ σ2 ≥ σ3 of the 3D state)
   */
  plane: MohrPlaneInput | null;
  onTheta: (theta: number) => void;
  zoom: ZoomView;
  onZoom: (view: ZoomView) => void;
};

export function MohrDiagram(props: MohrDiagramProps) {
  const { unit, mode, principal, faces, plane, onTheta, zoom, onZoom } = props;
  const svg = useRef<SVGSVGElement>(null);
  const g = useMemo(
    () => mohrGeometry({ mode, principal, faces, plane, zoom }),
    [mode, principal, faces, plane, zoom],
  );
  const { hover, svgHandlers, pointHandlers, zoomByButton } = useMohrPointer({
    svg,
    geometry: g,
    plane,
    onTheta,
    zoom,
    onZoom,
  });
  const { frame, plot } = g;
  const m = frame.margin;
  const bottom = plot.y + plot.height;

  // Commit mark for the benchmark's Mohr-drag variant.
  useEffect(() => markCommit(), [plane?.theta]);

  const clip = "mohr-clip";
  return (
    <figure className="relative m-0">
      <svg
        ref={svg}
        viewBox={`0 0 ${frame.width} ${frame.height}`}
        className="block h-auto w-full touch-none select-none"
        role="group"
        aria-label={
          mode === "plane"
            ? "In-plane Mohr circle with the x′ and y′ face points"
            : "Mohr's three circles with the faces of the turned element"
        }
        {...svgHandlers}
        data-testid="mohr-svg"
        data-domain-sigma={g.x.domain.join(" ")}
        data-domain-tau={g.y.domain.join(" ")}
        data-zoomed={zoom === null ? "no" : "yes"}
      >
        <defs>
          <pattern id="mohr-grid" width="16" height="16" patternUnits="userSpaceOnUse">
            <path d="M16 0H0V16" fill="none" stroke="rgb(29 90 85 / 0.07)" strokeWidth="1" />
          </pattern>
          <clipPath id={clip}>
            <rect x={plot.x} y={plot.y} width={plot.width} height={plot.height} />
          </clipPath>
        </defs>
        <rect x={plot.x} y={plot.y} width={plot.width} height={plot.height} fill="url(#mohr-grid)" />
        <g clipPath={`url(#${clip})`}>
          <line
            x1={g.axisLines.sigma.x1}
            x2={g.axisLines.sigma.x2}
            y1={g.axisLines.sigma.y}
            y2={g.axisLines.sigma.y}
            className="stroke-graphite-faint"
            strokeWidth={1}
          />
          <line
            x1={g.axisLines.tau.x}
            x2={g.axisLines.tau.x}
            y1={g.axisLines.tau.y1}
            y2={g.axisLines.tau.y2}
            className="stroke-graphite-faint"
            strokeWidth={1}
          />
          {mode === "3d" ? (
            <Mohr3DShapes g={g} unit={unit} />
          ) : (
            plane && <MohrPlaneShapes g={g} plane={plane} unit={unit} {...pointHandlers} />
          )}
          <MohrAxisMarks g={g} />
        </g>
        <SvgAxis
          orient="bottom"
          ticks={g.xTicks.ticks}
          range={g.x.range}
          transform={`translate(0 ${bottom})`}
          className="font-mono text-[11px] text-graphite-soft"
        />
        <SvgAxis
          orient="left"
          ticks={g.yTicks.ticks}
          range={g.y.range}
          transform={`translate(${plot.x} 0)`}
          className="font-mono text-[11px] text-graphite-soft"
        />
        {/* On the bottom edge, clear of the tick labels above it. */}
        <text
          x={plot.x + plot.width}
          y={frame.height - 3}
          textAnchor="end"
          className="fill-graphite text-[12px]"
        >
          <SvgSym base="σ" sub="n" after="," /> {g.xTicks.multiplier}
          {unit} (tension +)
        </text>
        <text
          transform={`translate(13 ${plot.y + plot.height / 2}) rotate(-90)`}
          textAnchor="middle"
          className="fill-graphite text-[12px]"
        >
          {mode === "plane" ? (
            <>
              <SvgSym base="τ" sub="x′y′" after="," /> {g.yTicks.multiplier}
              {unit} — positive downward ↓
            </>
          ) : (
            <>
              <SvgSym base="τ" sub="n" after="," /> {g.yTicks.multiplier}
              {unit} (magnitude)
            </>
          )}
        </text>
        {hover && (
          <text
            x={plot.x + 6}
            y={plot.y + 14}
            className="fill-graphite stroke-panel font-mono text-[11px]"
            // A halo in the panel colour keeps the readout legible over circles and grid.
            strokeWidth={3}
            strokeLinejoin="round"
            paintOrder="stroke"
            data-testid="mohr-hover"
          >
            σ = {fixed(hover.sigma, g.decimals)}, τ = {fixed(hover.tau, g.decimals)} {unit}
          </text>
        )}
      </svg>
      <div
        role="group"
        aria-label="Zoom the diagram"
        className="absolute flex gap-1"
        style={{
          right: `${((m.right + 4) / frame.width) * 100}%`,
          top: `${((m.top + 4) / frame.height) * 100}%`,
        }}
      >
        <ToolButton
          aria-label="Zoom in"
          title="Zoom in"
          onClick={() => zoomByButton(true)}
          className="px-1.5"
        >
          +
        </ToolButton>
        <ToolButton
          aria-label="Zoom out"
          title="Zoom out"
          onClick={() => zoomByButton(false)}
          className="px-1.5"
        >
          −
        </ToolButton>
      </div>
    </figure>
  );
}
