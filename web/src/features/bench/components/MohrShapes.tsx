/**
 * What Mohr's diagram draws inside its plot, from core/diagrams' geometry: the 3D picture (three
 * half-disks, the τmax guide, a marker per face), the in-plane picture (circle, x′ and y′ points,
 * the x′ point being the slider that turns the element), the principal stresses on the σ axis and
 * the τmax label. Every position, label spot included, comes from the geometry.
 */
import type { KeyboardEvent, PointerEvent } from "react";
import type { LabelSpot, MohrGeometry, MohrPlaneInput } from "../../../../../core/diagrams";
import { SvgSym } from "../../../components/SvgSym";
import { fixed } from "../model/format";

const LABEL = "fill-graphite font-mono text-[12px]";

/** SVG text attributes for a placed label. */
const at = (l: LabelSpot) => ({ x: l.x, y: l.y, textAnchor: l.anchor });

export function Mohr3DShapes({ g, unit }: { g: MohrGeometry; unit: string }) {
  if (!g.halfDisks || !g.maxShearGuide) return null;
  const d = g.decimals;
  return (
    <g data-testid="mohr-3d">
      <path d={g.halfDisks[0]} className="fill-ink-wash stroke-ink" strokeWidth={1.5} />
      <path d={g.halfDisks[1]} className="fill-panel stroke-ink" strokeWidth={1.1} />
      <path d={g.halfDisks[2]} className="fill-panel stroke-ink" strokeWidth={1.1} />
      <line
        x1={g.maxShearGuide.x}
        x2={g.maxShearGuide.x}
        y1={g.maxShearGuide.y1}
        y2={g.maxShearGuide.y2}
        className="stroke-graphite-soft"
        strokeDasharray="3 3"
      />
      {g.faces.map((f) => (
        <g key={f.face} data-testid={`mohr-face-${f.face}`} data-sigma={f.sigma} data-tau={f.tau}>
          <circle cx={f.cx} cy={f.cy} r={5} className="fill-panel stroke-graphite" strokeWidth={1.6}>
            <title>{`${f.face} face: σn = ${fixed(f.sigma, d)} ${unit}, τn = ${fixed(f.tau, d)} ${unit}`}</title>
          </circle>
          <text {...at(f.label)} className={LABEL}>
            {f.face}
          </text>
        </g>
      ))}
    </g>
  );
}

export function MohrPlaneShapes({
  g,
  plane,
  unit,
  onPointerDown,
  onKeyDown,
}: {
  g: MohrGeometry;
  plane: MohrPlaneInput;
  unit: string;
  onPointerDown: (event: PointerEvent<SVGCircleElement>) => void;
  onKeyDown: (event: KeyboardEvent<SVGCircleElement>) => void;
}) {
  if (!g.planeCircle) return null;
  const d = g.decimals;
  const p = g.planePoints;
  return (
    <g data-testid="mohr-plane">
      <circle
        cx={g.planeCircle.cx}
        cy={g.planeCircle.cy}
        r={g.planeCircle.r}
        className="fill-ink-wash stroke-ink"
        strokeWidth={1.5}
        fillOpacity={0.5}
      />
      {p && plane.theta !== null && (
        <>
          <line x1={p.x.cx} y1={p.x.cy} x2={p.y.cx} y2={p.y.cy} className="stroke-ink" strokeWidth={1.2} />
          <g data-testid="mohr-point-y′">
            <circle cx={p.y.cx} cy={p.y.cy} r={5} className="fill-panel stroke-graphite" strokeWidth={1.6}>
              <title>{`y′ face: σy′ = ${fixed(plane.sy, d)} ${unit}, −τx′y′ = ${fixed(-plane.txy, d)} ${unit}`}</title>
            </circle>
            <text {...at(p.y.label)} className={LABEL}>
              y′
            </text>
          </g>
          <g data-testid="mohr-point-x′" data-sigma={plane.sx} data-tau={plane.txy}>
            <circle
              cx={p.x.cx}
              cy={p.x.cy}
              r={7}
              tabIndex={0}
              role="slider"
              aria-label="x′ face point: drag round the circle, or use the arrow keys, to turn the element about z"
              aria-valuemin={-180}
              aria-valuemax={180}
              aria-valuenow={Number(plane.theta.toFixed(2))}
              aria-valuetext={`θ = ${fixed(plane.theta, 2)}°`}
              onPointerDown={onPointerDown}
              onKeyDown={onKeyDown}
              className="cursor-grab fill-ink stroke-panel outline-none focus-visible:stroke-tension"
              strokeWidth={2}
            >
              <title>{`x′ face: σx′ = ${fixed(plane.sx, d)} ${unit}, τx′y′ = ${fixed(plane.txy, d)} ${unit}`}</title>
            </circle>
            <text {...at(p.x.label)} className="fill-ink font-mono text-[12px] font-semibold">
              x′
            </text>
          </g>
        </>
      )}
    </g>
  );
}

/** The principal stresses on the σ axis, named σ1 … (σz hollow, "(z)") and the τmax label. */
export function MohrAxisMarks({ g }: { g: MohrGeometry }) {
  return (
    <>
      {g.principalMarks.map((m) => (
        <g key={m.key} data-testid={`mohr-principal-${m.key}`} data-name={`σ${m.name}`} data-sigma={m.sigma}>
          <circle
            cx={m.cx}
            cy={m.cy}
            r={2.5}
            className={m.outOfPlane ? "fill-panel stroke-graphite" : "fill-graphite"}
          />
          <text {...at(m.label)} className={LABEL}>
            <SvgSym base="σ" sub={m.name} after={m.outOfPlane ? " (z)" : " "} />
          </text>
        </g>
      ))}
      {g.maxShear && (
        <text {...at(g.maxShear.label)} className={LABEL}>
          <SvgSym base="τ" sub={g.planeCircle ? "max, in-plane" : "max"} />= {g.maxShear.text}
        </text>
      )}
    </>
  );
}
