/**
 * Mohr's diagram in SVG, drawn with d3 scales and axes. Two pictures:
 * - 3D: the three circles with the admissible region between them shaded and a marker for each face
 *   of the turned element at (σn, τn), τn the magnitude of the face's shear (upper half only);
 * - plane: the in-plane circle with the x′ and y′ face points, τx′y′ plotted positive downward so
 *   the x′ point turns the same way as the element; dragging it (or arrow keys on it) turns the element.
 * It draws and dispatches; every value comes from core through the store's derived results.
 */
import { axisBottom, axisLeft, scaleLinear, select } from "d3";
import {
  useEffect,
  useMemo,
  useRef,
  useState,
  type KeyboardEvent,
  type PointerEvent,
  type WheelEvent,
} from "react";
import type { MohrCircle, PlaneStressResult } from "../../../../../core";
import { markCommit, markMoveStart } from "../hooks/perf-marks";
import {
  beginMohrDrag,
  endMohrDrag,
  moveMohrDrag,
  mohrDragTheta,
  MOHR_IDLE,
  type MohrDragState,
} from "../interaction/mohr-drag";
import { zoomAt, type ZoomView } from "../interaction/zoom";
import { ToolButton } from "../../../components/ToolButton";
import type { FacePoint } from "../model/derive";
import { axisTickFormat } from "../../../lib/number-format";
import { decimalsFor, fixed } from "../model/format";

const W = 480;
const H = 246;
const M = { left: 50, right: 14, top: 14, bottom: 36 };
const PW = W - M.left - M.right;
const PH = H - M.top - M.bottom;

export type MohrDiagramProps = {
  unit: string;
  mode: "3d" | "plane";
  circles: readonly [MohrCircle, MohrCircle, MohrCircle];
  principal: readonly [number, number, number];
  faces: readonly FacePoint[];
  /**
   * plane mode: the in-plane circle, the rotated x′ components, θ (null when not a turn about z) and
   * the names of the in-plane pair and of σz by the bench's one rule (σ1 ≥ σ2 ≥ σ3 of the 3D state)
   */
  plane: {
    circle: PlaneStressResult;
    sx: number;
    sy: number;
    txy: number;
    theta: number | null;
    names: { major: string; minor: string; outOfPlane: string };
    sz: number;
  } | null;
  onTheta: (theta: number) => void;
  zoom: ZoomView;
  onZoom: (view: ZoomView) => void;
};

/** Equal-aspect scales fitted to the data (circles must stay circles), then zoomed. */
function useScales(xMin: number, xMax: number, yMin: number, yMax: number, zoom: ZoomView, tauDown: boolean) {
  return useMemo(() => {
    const spanX = Math.max(xMax - xMin, 1e-12);
    const spanY = Math.max(yMax - yMin, 1e-12);
    const perUnit = Math.min(PW / spanX, PH / spanY) * (zoom?.k ?? 1);
    const cx = zoom?.cx ?? (xMin + xMax) / 2;
    const cy = zoom?.cy ?? (yMin + yMax) / 2;
    const halfX = PW / 2 / perUnit;
    const halfY = PH / 2 / perUnit;
    const x = scaleLinear()
      .domain([cx - halfX, cx + halfX])
      .range([M.left, M.left + PW]);
    const y = scaleLinear()
      .domain([cy - halfY, cy + halfY])
      .range(tauDown ? [M.top, M.top + PH] : [M.top + PH, M.top]);
    return { x, y, perUnit, fitCentre: [(xMin + xMax) / 2, (yMin + yMax) / 2] as const };
  }, [xMin, xMax, yMin, yMax, zoom, tauDown]);
}

/** Path of the upper half of a circle (3D picture, τn ≥ 0). */
function halfDisk(c: MohrCircle, x: (v: number) => number, y: (v: number) => number): string {
  const r = Math.abs(x(c.center + c.radius) - x(c.center));
  const left = x(c.center - c.radius);
  const right = x(c.center + c.radius);
  const base = y(0);
  return `M${left},${base} A${r},${r} 0 0 1 ${right},${base} Z`;
}

/** A symbol with a real subscript inside SVG text (Unicode subscript letters fall back to other fonts). */
function SvgSym({ base, sub, after = " " }: { base: string; sub: string; after?: string }) {
  return (
    <>
      {base}
      <tspan dy={3} fontSize="0.75em">
        {sub}
      </tspan>
      {/* Back to the baseline; `after` carries what follows the subscript (a space, or a comma). */}
      <tspan dy={-3}>{after}</tspan>
    </>
  );
}

/** Label width on the σ axis (px of the viewBox) under which two names would touch. */
const NAME_GAP = 20;

/**
 * The marks in σ order, each with where its name goes: centred under its dot, or, when it would
 * touch a neighbour's name, pushed to the outer side (the lower value's name to the left, the
 * higher one's to the right).
 */
function staggered<T extends { v: number }>(marks: readonly T[], x: (v: number) => number) {
  const out = [...marks]
    .sort((a, b) => a.v - b.v)
    .map((m) => ({ ...m, anchor: "middle" as "middle" | "start" | "end", dx: 0 }));
  for (let i = 1; i < out.length; i++) {
    if (Math.abs(x(out[i].v) - x(out[i - 1].v)) >= NAME_GAP) continue;
    if (out[i - 1].anchor === "middle") Object.assign(out[i - 1], { anchor: "end", dx: -3 });
    Object.assign(out[i], { anchor: "start", dx: 3 });
  }
  return out;
}

/** How far (px) to lift each of a few labels so that none sits on an earlier one at the same spot. */
function liftOverlapping(points: readonly (readonly [number, number])[]): number[] {
  const lifts: number[] = [];
  points.forEach(([px, py], i) => {
    let lift = 0;
    for (let j = 0; j < i; j++) {
      const [qx, qy] = points[j];
      if (Math.abs(px - qx) < 18 && Math.abs(py - lift - (qy - lifts[j])) < 16) lift += 16;
    }
    lifts.push(lift);
  });
  return lifts;
}

export function MohrDiagram(props: MohrDiagramProps) {
  const { unit, mode, circles, principal, faces, plane, onTheta, zoom, onZoom } = props;
  const svg = useRef<SVGSVGElement>(null);
  const xAxis = useRef<SVGGElement>(null);
  const yAxis = useRef<SVGGElement>(null);
  const [hover, setHover] = useState<{ sigma: number; tau: number } | null>(null);
  const drag = useRef<MohrDragState>(MOHR_IDLE);
  const [s1, s2, s3] = principal;
  const tauDown = mode === "plane";

  // Fitted extent: all circles, the origin, and a margin.
  const big = Math.max(Math.abs(s1), Math.abs(s3), circles[0].radius, 1e-9);
  const pad = 0.08 * big;
  const ext =
    mode === "plane" && plane
      ? {
          x0: Math.min(plane.circle.s2, 0) - pad,
          x1: Math.max(plane.circle.s1, 0) + pad,
          y0: -plane.circle.radius - pad,
          y1: plane.circle.radius + pad,
        }
      : {
          x0: Math.min(s3, 0) - pad,
          x1: Math.max(s1, 0) + pad,
          y0: -0.12 * big,
          y1: circles[0].radius + pad,
        };
  const { x, y, fitCentre } = useScales(ext.x0, ext.x1, ext.y0, ext.y1, zoom, tauDown);
  const d = decimalsFor(big);

  // Short tick labels in any unit: Pa values are written under a power of ten named by the title.
  const xTicks = useMemo(() => axisTickFormat(x.ticks(7)), [x]);
  const yTicks = useMemo(() => axisTickFormat(y.ticks(6)), [y]);
  useEffect(() => {
    if (xAxis.current)
      select(xAxis.current).call(
        axisBottom(x)
          .ticks(7)
          .tickSizeOuter(0)
          .tickFormat((v) => xTicks.format(Number(v))),
      );
    if (yAxis.current)
      select(yAxis.current).call(
        axisLeft(y)
          .ticks(6)
          .tickSizeOuter(0)
          .tickFormat((v) => yTicks.format(Number(v))),
      );
  }, [x, y, xTicks, yTicks]);

  // A value written inside the plot, in the axis's power of ten so that it stays as short as the ticks.
  const short = (v: number) =>
    xTicks.multiplier === ""
      ? fixed(v, d)
      : `${fixed(v / xTicks.scale, decimalsFor(Math.abs(v / xTicks.scale)))} ${xTicks.multiplier.trim()}`;

  // Principal stresses marked on the σ axis, named by the one rule (σ1 ≥ σ2 ≥ σ3 in 3D); a name
  // that would sit on its neighbour's moves to the side, away from it.
  const marks = staggered(
    mode === "3d"
      ? [
          { v: s1, name: "1", key: "s1" },
          { v: s2, name: "2", key: "s2" },
          { v: s3, name: "3", key: "s3" },
        ]
      : plane
        ? [
            { v: plane.circle.s1, name: plane.names.major.slice(1), key: "major" },
            { v: plane.circle.s2, name: plane.names.minor.slice(1), key: "minor" },
            { v: plane.sz, name: plane.names.outOfPlane.slice(1), key: "z" },
          ]
        : [],
    x,
  );
  // Face labels likewise step up when two faces sit on one spot (e.g. y′ and z′ at the origin).
  const faceLabelLift = liftOverlapping(faces.map((f) => [x(f.normal), y(f.shear)] as const));

  // Commit mark for the benchmark's Mohr-drag variant.
  useEffect(() => markCommit(), [plane?.theta]);

  function toData(clientX: number, clientY: number): { sigma: number; tau: number } {
    const el = svg.current!;
    const pt = el.createSVGPoint();
    pt.x = clientX;
    pt.y = clientY;
    const local = pt.matrixTransform(el.getScreenCTM()!.inverse());
    return { sigma: x.invert(local.x), tau: y.invert(local.y) };
  }

  function onPointerMove(event: PointerEvent<SVGSVGElement>) {
    const p = toData(event.clientX, event.clientY);
    setHover(p);
    if (drag.current.dragging) {
      markMoveStart();
      drag.current = moveMohrDrag(drag.current, p);
      const theta = mohrDragTheta(drag.current);
      if (theta !== null) onTheta(theta);
    }
  }

  function onPointDown(event: PointerEvent<SVGCircleElement>) {
    if (!plane || event.button !== 0) return;
    event.stopPropagation();
    svg.current!.setPointerCapture(event.pointerId);
    drag.current = beginMohrDrag(toData(event.clientX, event.clientY), plane.theta ?? 0, plane.circle.center);
  }

  function onPointerUp(event: PointerEvent<SVGSVGElement>) {
    if (drag.current.dragging) {
      drag.current = endMohrDrag();
      svg.current!.releasePointerCapture(event.pointerId);
    }
  }

  function onWheel(event: WheelEvent<SVGSVGElement>) {
    const p = toData(event.clientX, event.clientY);
    onZoom(zoomAt(zoom, event.deltaY < 0 ? 1.15 : 1 / 1.15, [p.sigma, p.tau], fitCentre));
  }

  /** Buttons zoom about the centre of the plot, for keyboard users and those without a wheel. */
  function zoomByButton(factor: number) {
    const centre: [number, number] = [zoom?.cx ?? fitCentre[0], zoom?.cy ?? fitCentre[1]];
    onZoom(zoomAt(zoom, factor, centre, fitCentre));
  }

  function onPointKey(event: KeyboardEvent<SVGCircleElement>) {
    if (!plane) return;
    const step = event.shiftKey ? 15 : event.altKey ? 0.1 : 1;
    const theta = plane.theta ?? 0;
    // Up/right = counter-clockwise on the circle = the element turns counter-clockwise.
    if (event.key === "ArrowRight" || event.key === "ArrowUp") onTheta(theta + step);
    else if (event.key === "ArrowLeft" || event.key === "ArrowDown") onTheta(theta - step);
    else return;
    event.preventDefault();
  }

  const X = (v: number) => x(v);
  const Y = (v: number) => y(v);
  const clip = "mohr-clip";

  return (
    <figure className="relative m-0">
      <svg
        ref={svg}
        viewBox={`0 0 ${W} ${H}`}
        className="block h-auto w-full touch-none select-none"
        role="group"
        aria-label={
          mode === "plane"
            ? "In-plane Mohr circle with the x′ and y′ face points"
            : "Mohr's three circles with the faces of the turned element"
        }
        onPointerMove={onPointerMove}
        onPointerUp={onPointerUp}
        onPointerLeave={() => setHover(null)}
        onWheel={onWheel}
        data-testid="mohr-svg"
        data-domain-sigma={x.domain().join(" ")}
        data-domain-tau={y.domain().join(" ")}
        data-zoomed={zoom === null ? "no" : "yes"}
      >
        <defs>
          <pattern id="mohr-grid" width="16" height="16" patternUnits="userSpaceOnUse">
            <path d="M16 0H0V16" fill="none" stroke="rgb(29 90 85 / 0.07)" strokeWidth="1" />
          </pattern>
          <clipPath id={clip}>
            <rect x={M.left} y={M.top} width={PW} height={PH} />
          </clipPath>
        </defs>
        <rect x={M.left} y={M.top} width={PW} height={PH} fill="url(#mohr-grid)" />
        <g clipPath={`url(#${clip})`}>
          <line
            x1={M.left}
            x2={M.left + PW}
            y1={Y(0)}
            y2={Y(0)}
            className="stroke-graphite-faint"
            strokeWidth={1}
          />
          <line
            x1={X(0)}
            x2={X(0)}
            y1={M.top}
            y2={M.top + PH}
            className="stroke-graphite-faint"
            strokeWidth={1}
          />
          {mode === "3d" ? (
            <g data-testid="mohr-3d">
              <path d={halfDisk(circles[0], X, Y)} className="fill-ink-wash stroke-ink" strokeWidth={1.5} />
              <path d={halfDisk(circles[1], X, Y)} className="fill-panel stroke-ink" strokeWidth={1.1} />
              <path d={halfDisk(circles[2], X, Y)} className="fill-panel stroke-ink" strokeWidth={1.1} />
              <line
                x1={X(circles[0].center)}
                x2={X(circles[0].center)}
                y1={Y(0)}
                y2={Y(circles[0].radius)}
                className="stroke-graphite-soft"
                strokeDasharray="3 3"
              />
              {faces.map((f) => (
                <g key={f.face} data-testid={`mohr-face-${f.face}`} data-sigma={f.normal} data-tau={f.shear}>
                  <circle
                    cx={X(f.normal)}
                    cy={Y(f.shear)}
                    r={5}
                    className="fill-panel stroke-graphite"
                    strokeWidth={1.6}
                  >
                    <title>{`${f.face} face: σn = ${fixed(f.normal, d)} ${unit}, τn = ${fixed(f.shear, d)} ${unit}`}</title>
                  </circle>
                  <text
                    x={X(f.normal) + 7}
                    y={Y(f.shear) - 6 - faceLabelLift[faces.indexOf(f)]}
                    className="fill-graphite font-mono text-[12px]"
                  >
                    {f.face}
                  </text>
                </g>
              ))}
            </g>
          ) : (
            plane && (
              <g data-testid="mohr-plane">
                <circle
                  cx={X(plane.circle.center)}
                  cy={Y(0)}
                  r={Math.abs(x(plane.circle.center + plane.circle.radius) - x(plane.circle.center))}
                  className="fill-ink-wash stroke-ink"
                  strokeWidth={1.5}
                  fillOpacity={0.5}
                />
                {plane.theta !== null && (
                  <>
                    <line
                      x1={X(plane.sx)}
                      y1={Y(plane.txy)}
                      x2={X(plane.sy)}
                      y2={Y(-plane.txy)}
                      className="stroke-ink"
                      strokeWidth={1.2}
                    />
                    <g data-testid="mohr-point-y′">
                      <circle
                        cx={X(plane.sy)}
                        cy={Y(-plane.txy)}
                        r={5}
                        className="fill-panel stroke-graphite"
                        strokeWidth={1.6}
                      >
                        <title>{`y′ face: σy′ = ${fixed(plane.sy, d)} ${unit}, −τx′y′ = ${fixed(-plane.txy, d)} ${unit}`}</title>
                      </circle>
                      <text
                        x={X(plane.sy) + 9}
                        y={Y(-plane.txy) - 7}
                        className="fill-graphite font-mono text-[12px]"
                      >
                        y′
                      </text>
                    </g>
                    <g data-testid="mohr-point-x′" data-sigma={plane.sx} data-tau={plane.txy}>
                      <circle
                        cx={X(plane.sx)}
                        cy={Y(plane.txy)}
                        r={7}
                        tabIndex={0}
                        role="slider"
                        aria-label="x′ face point: drag round the circle, or use the arrow keys, to turn the element about z"
                        aria-valuemin={-180}
                        aria-valuemax={180}
                        aria-valuenow={Number(plane.theta.toFixed(2))}
                        aria-valuetext={`θ = ${fixed(plane.theta, 2)}°`}
                        onPointerDown={onPointDown}
                        onKeyDown={onPointKey}
                        className="cursor-grab fill-ink stroke-panel outline-none focus-visible:stroke-tension"
                        strokeWidth={2}
                      >
                        <title>{`x′ face: σx′ = ${fixed(plane.sx, d)} ${unit}, τx′y′ = ${fixed(plane.txy, d)} ${unit}`}</title>
                      </circle>
                      <text
                        x={X(plane.sx) + 9}
                        y={Y(plane.txy) - 7}
                        className="fill-ink font-mono text-[12px] font-semibold"
                      >
                        x′
                      </text>
                    </g>
                  </>
                )}
              </g>
            )
          )}
          {marks.map(({ v, name, key, anchor, dx }) => (
            <g key={key} data-testid={`mohr-principal-${key}`} data-name={`σ${name}`} data-sigma={v}>
              <circle
                cx={X(v)}
                cy={Y(0)}
                r={2.5}
                className={key === "z" ? "fill-panel stroke-graphite" : "fill-graphite"}
              />
              <text
                x={X(v) + dx}
                y={mode === "plane" && key !== "z" ? Y(0) - 6 : Y(0) + 14}
                textAnchor={anchor}
                className="fill-graphite font-mono text-[12px]"
              >
                <SvgSym base="σ" sub={name} after={key === "z" ? " (z)" : " "} />
              </text>
            </g>
          ))}
          {mode === "3d" && (
            <text
              x={X(circles[0].center) + 4}
              y={Y(circles[0].radius) - 5}
              className="fill-graphite font-mono text-[12px]"
            >
              <SvgSym base="τ" sub="max" />= {short(circles[0].radius)}
            </text>
          )}
          {mode === "plane" && plane && (
            <text
              x={X(plane.circle.center)}
              y={Y(-plane.circle.radius) + 16}
              textAnchor="middle"
              className="fill-graphite font-mono text-[12px]"
            >
              <SvgSym base="τ" sub="max, in-plane" />= {short(plane.circle.radius)}
            </text>
          )}
        </g>
        <g
          ref={xAxis}
          transform={`translate(0 ${M.top + PH})`}
          className="font-mono text-[11px] text-graphite-soft"
          aria-hidden="true"
        />
        <g
          ref={yAxis}
          transform={`translate(${M.left} 0)`}
          className="font-mono text-[11px] text-graphite-soft"
          aria-hidden="true"
        />
        {/* On the bottom edge, clear of the tick labels above it. */}
        <text x={M.left + PW} y={H - 3} textAnchor="end" className="fill-graphite text-[12px]">
          <SvgSym base="σ" sub="n" after="," /> {xTicks.multiplier}
          {unit} (tension +)
        </text>
        <text
          transform={`translate(13 ${M.top + PH / 2}) rotate(-90)`}
          textAnchor="middle"
          className="fill-graphite text-[12px]"
        >
          {mode === "plane" ? (
            <>
              <SvgSym base="τ" sub="x′y′" after="," /> {yTicks.multiplier}
              {unit} — positive downward ↓
            </>
          ) : (
            <>
              <SvgSym base="τ" sub="n" after="," /> {yTicks.multiplier}
              {unit} (magnitude)
            </>
          )}
        </text>
        {hover && (
          <text
            x={M.left + 6}
            y={M.top + 14}
            className="fill-graphite stroke-panel font-mono text-[11px]"
            // A halo in the panel colour keeps the readout legible over circles and grid.
            strokeWidth={3}
            strokeLinejoin="round"
            paintOrder="stroke"
            data-testid="mohr-hover"
          >
            σ = {fixed(hover.sigma, d)}, τ = {fixed(hover.tau, d)} {unit}
          </text>
        )}
      </svg>
      <div
        role="group"
        aria-label="Zoom the diagram"
        className="absolute flex gap-1"
        style={{ right: `${((M.right + 4) / W) * 100}%`, top: `${((M.top + 4) / H) * 100}%` }}
      >
        <ToolButton
          aria-label="Zoom in"
          title="Zoom in"
          onClick={() => zoomByButton(1.25)}
          className="px-1.5"
        >
          +
        </ToolButton>
        <ToolButton
          aria-label="Zoom out"
          title="Zoom out"
          onClick={() => zoomByButton(1 / 1.25)}
          className="px-1.5"
        >
          −
        </ToolButton>
      </div>
    </figure>
  );
}
