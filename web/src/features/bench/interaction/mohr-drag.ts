/**
 * Dragging the x′ point round the plane-stress Mohr circle as a pure reducer. On this diagram the
 * shear τx′y′ is plotted positive DOWNWARD, which makes the point go round the circle in the same
 * sense as the element turns, by twice the angle: the x′ point sits at screen angle
 * 2θ − 2θp measured counter-clockwise from the σ axis (with θp core's principal angle). So a drag
 * that carries the point counter-clockwise on screen by Δφ turns the element counter-clockwise
 * about z by Δφ/2.
 */

/** τ is plotted positive downward on the in-plane Mohr diagram (the screen's y grows with τ). */
export const TAU_POSITIVE_DOWN = true;

/** A point on the diagram in stress coordinates: σ (right) and τ (positive down). */
export type DiagramPoint = { sigma: number; tau: number };

/** Drag state: idle, or the angle θ and pointer angle at the start and the unwrapped sweep so far. */
export type MohrDragState =
  { dragging: false } | { dragging: true; theta0: number; lastPhi: number; swept: number; center: number };

/** Nothing held. */
export const MOHR_IDLE: MohrDragState = { dragging: false };

/**
 * Screen angle (counter-clockwise positive, degrees) of a diagram point about the centre: since τ
 * grows downward, "up" on screen is −τ.
 */
export function screenAngle(p: DiagramPoint, center: number): number {
  return (Math.atan2(TAU_POSITIVE_DOWN ? -p.tau : p.tau, p.sigma - center) * 180) / Math.PI;
}

/** Starts dragging at pointer `p` while the element stands at θ (degrees about z). */
export function beginMohrDrag(p: DiagramPoint, theta: number, center: number): MohrDragState {
  return { dragging: true, theta0: theta, lastPhi: screenAngle(p, center), swept: 0, center };
}

/** Shortest signed difference between two angles, degrees, in (−180, 180]. */
function wrap(d: number): number {
  let x = ((((d + 180) % 360) + 360) % 360) - 180;
  if (x === -180) x = 180;
  return x;
}

/** Carries the drag to pointer `p`: the sweep is unwrapped, so several turns round the circle add up. */
export function moveMohrDrag(state: MohrDragState, p: DiagramPoint): MohrDragState {
  if (!state.dragging) return state;
  const phi = screenAngle(p, state.center);
  return { ...state, lastPhi: phi, swept: state.swept + wrap(phi - state.lastPhi) };
}

/** The element's angle about z for the drag so far: θ₀ + (swept angle)/2, reduced to (−180°, 180°]. */
export function mohrDragTheta(state: MohrDragState): number | null {
  if (!state.dragging) return null;
  return wrap(state.theta0 + state.swept / 2);
}

/** Ends the drag. */
export function endMohrDrag(): MohrDragState {
  return MOHR_IDLE;
}
