/**
 * The trackball drag as a pure reducer: pointer positions in, the element's frame out. The 3D view
 * dispatches pointer events here and draws what comes back; the turn itself is composed by core
 * (rotationFromAxisAngle, multiplyMat3) in the bench's `turnElement` convention.
 */
import {
  multiplyMat3,
  orthonormalize,
  rotationFromAxisAngle,
  type Mat3,
  type Vec3,
} from "../../../../../core";

/** A pointer position in the view, normalised: x right, y up, both in [−1, 1] over the canvas. */
export type ViewPoint = readonly [number, number];

/**
 * The camera's axes written in the element's original x y z frame: rows are the screen's right, up
 * and towards-the-viewer directions.
 */
export type ViewBasis = Mat3;

/** Drag state: idle, or holding the frame and pointer at the start of the drag. */
export type TrackballState =
  { dragging: false } | { dragging: true; start: Vec3; startRotation: Mat3; basis: ViewBasis };

/** Nothing held. */
export const TRACKBALL_IDLE: TrackballState = { dragging: false };

/**
 * A view point lifted onto the trackball: a unit sphere near the centre, blending into a hyperbolic
 * sheet outside (so a drag past the ball keeps turning smoothly rather than jumping).
 */
export function liftToBall(p: ViewPoint): Vec3 {
  const [x, y] = p;
  const r2 = x * x + y * y;
  const z = r2 <= 0.5 ? Math.sqrt(1 - r2) : 0.5 / Math.sqrt(r2);
  const n = Math.hypot(x, y, z);
  return [x / n, y / n, z / n];
}

/** Starts a drag. */
export function beginTrackball(point: ViewPoint, rotation: Mat3, basis: ViewBasis): TrackballState {
  return { dragging: true, start: liftToBall(point), startRotation: rotation, basis };
}

/**
 * The turn a drag from the start point to `point` asks for, as an axis in x y z and an angle:
 * the axis is start × current on the ball (in view axes, then written in x y z through the basis)
 * and the angle the arc between them, so the ball's surface follows the pointer.
 */
export function trackballTurn(
  state: TrackballState,
  point: ViewPoint,
): { axis: Vec3; angleDeg: number } | null {
  if (!state.dragging) return null;
  const a = state.start;
  const b = liftToBall(point);
  const c: Vec3 = [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
  const s = Math.hypot(c[0], c[1], c[2]);
  if (s < 1e-12) return null;
  const angleDeg = (Math.atan2(s, a[0] * b[0] + a[1] * b[1] + a[2] * b[2]) * 180) / Math.PI;
  const [right, up, back] = state.basis;
  const axis: Vec3 = [
    c[0] * right[0] + c[1] * up[0] + c[2] * back[0],
    c[0] * right[1] + c[1] * up[1] + c[2] * back[1],
    c[0] * right[2] + c[1] * up[2] + c[2] * back[2],
  ];
  return { axis, angleDeg };
}

/**
 * The element's frame during the drag: the frame at the start turned by {@link trackballTurn}
 * about an axis fixed in x y z (R = R₀ · Rturn, as `turnElement` composes it).
 */
export function trackballRotation(state: TrackballState, point: ViewPoint): Mat3 | null {
  if (!state.dragging) return null;
  const turn = trackballTurn(state, point);
  if (turn === null) return state.startRotation;
  return orthonormalize(multiplyMat3(state.startRotation, rotationFromAxisAngle(turn.axis, turn.angleDeg)));
}

/** Ends a drag. */
export function endTrackball(): TrackballState {
  return TRACKBALL_IDLE;
}
