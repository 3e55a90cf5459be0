/**
 * The Mohr diagram's pointer, wheel and keyboard handling: the hover readout, dragging the x′ point
 * round the in-plane circle (the pure reducer in interaction/mohr-drag.ts), zooming about the
 * pointer or the plot's centre (interaction/zoom.ts), and arrow keys on the x′ point.
 */
import {
  useRef,
  useState,
  type KeyboardEvent,
  type PointerEvent,
  type RefObject,
  type WheelEvent,
} from "react";
import type { MohrGeometry } from "../../../../../core/diagrams";
import {
  beginMohrDrag,
  endMohrDrag,
  moveMohrDrag,
  mohrDragTheta,
  MOHR_IDLE,
  type MohrDragState,
} from "../interaction/mohr-drag";
import { zoomAt, type ZoomView } from "../interaction/zoom";
import { markMoveStart } from "./perf-marks";

/** What the handlers need of the in-plane picture: θ about z and the circle's centre. */
type PlaneTurn = { theta: number | null; circle: { center: number } } | null;

/** Wheel and button zoom steps. */
const WHEEL_ZOOM = 1.15;
const BUTTON_ZOOM = 1.25;

export function useMohrPointer({
  svg,
  geometry,
  plane,
  onTheta,
  zoom,
  onZoom,
}: {
  svg: RefObject<SVGSVGElement | null>;
  geometry: Pick<MohrGeometry, "x" | "y" | "fitCentre">;
  plane: PlaneTurn;
  onTheta: (theta: number) => void;
  zoom: ZoomView;
  onZoom: (view: ZoomView) => void;
}) {
  const [hover, setHover] = useState<{ sigma: number; tau: number } | null>(null);
  const drag = useRef<MohrDragState>(MOHR_IDLE);
  const { x, y, fitCentre } = geometry;

  /** A client point as diagram coordinates (σ, τ), through the SVG's own transform. */
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
    onZoom(zoomAt(zoom, event.deltaY < 0 ? WHEEL_ZOOM : 1 / WHEEL_ZOOM, [p.sigma, p.tau], fitCentre));
  }

  /** Buttons zoom about the centre of the plot, for keyboard users and those without a wheel. */
  function zoomByButton(zoomIn: boolean) {
    const centre: [number, number] = [zoom?.cx ?? fitCentre[0], zoom?.cy ?? fitCentre[1]];
    onZoom(zoomAt(zoom, zoomIn ? BUTTON_ZOOM : 1 / BUTTON_ZOOM, centre, fitCentre));
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

  return {
    hover,
    svgHandlers: { onPointerMove, onPointerUp, onPointerLeave: () => setHover(null), onWheel },
    pointHandlers: { onPointerDown: onPointDown, onKeyDown: onPointKey },
    zoomByButton,
  };
}
