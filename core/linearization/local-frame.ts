import { rotateTensor } from "../tensor/rotate";
import { frameWithFirstAxis } from "../tensor/rotation-tools";
import type { Mat3, Vec3 } from "../tensor/types";
import { unitVector } from "./path";

/**
 * The line's local frame and the stresses turned into it. Local x runs along the line
 * (through-thickness), y is the second axis, z = x × y, so the frame is right-handed.
 */

/** A second axis whose part perpendicular to the line is shorter than this fraction of it is refused. */
const PARALLEL_REL_TOL = 1e-6;

export type LocalFrame = { frame: Mat3; frameNote: string; notes: string[] };

function cross(a: Vec3, b: Vec3): Vec3 {
  return [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
}

/**
 * The local frame of a line.
 * @param direction unit direction of the line (stresses' frame)
 * @param secondAxis the caller's second axis, or undefined for the default
 * @returns rows = local x, y, z in the stresses' frame, and what was chosen
 * @throws RangeError when `secondAxis` is zero, not finite, or parallel to the line
 */
export function localFrame(direction: Vec3, secondAxis: Vec3 | undefined): LocalFrame {
  const notes: string[] = [];
  if (secondAxis === undefined) {
    // core's frameWithFirstAxis: y = (global z × line) normalised, or (global x × line) when the line
    // is within about 25.8° of global z (|line·z| ≥ 0.9), z = line × y.
    const frame = frameWithFirstAxis(direction);
    return {
      frame,
      frameNote:
        "Default frame: y = (global z × line) normalised, or (global x × line) when the line is within " +
        "about 26° of global z; z = line × y. For a radial line in a vessel whose axis is global z, y is " +
        "the hoop direction and z the axial one. Give secondAxis when your in-plane axes differ.",
      notes,
    };
  }
  const s = unitVector(secondAxis, "secondAxis");
  const along = s[0] * direction[0] + s[1] * direction[1] + s[2] * direction[2];
  const perp: Vec3 = [s[0] - along * direction[0], s[1] - along * direction[1], s[2] - along * direction[2]];
  const len = Math.hypot(perp[0], perp[1], perp[2]);
  if (!(len > PARALLEL_REL_TOL)) {
    throw new RangeError("secondAxis must not be parallel to the line (it gives the in-plane y axis)");
  }
  const y: Vec3 = [perp[0] / len, perp[1] / len, perp[2] / len];
  if (Math.abs(along) > PARALLEL_REL_TOL) {
    const deg = (Math.asin(Math.min(1, Math.abs(along))) * 180) / Math.PI;
    notes.push(
      `secondAxis was ${deg.toPrecision(3)}° off perpendicular to the line; its part along the line was removed.`,
    );
  }
  return {
    frame: [direction, y, cross(direction, y)],
    frameNote: "Caller's frame: y = secondAxis made perpendicular to the line; z = line × y.",
    notes,
  };
}

/**
 * Every point's tensor in the local frame (σ' = R σ Rᵀ with core's rotateTensor).
 * @param stresses 6N components, stride 6 (xx yy zz xy yz zx), already checked finite
 * @param frame rows = local axes in the stresses' frame
 * @returns 6N local components, same layout and unit
 */
export function toLocalFrame(stresses: Float64Array, frame: Mat3): Float64Array {
  const out = new Float64Array(stresses.length);
  for (let o = 0; o < stresses.length; o += 6) {
    const t = rotateTensor(
      {
        xx: stresses[o],
        yy: stresses[o + 1],
        zz: stresses[o + 2],
        xy: stresses[o + 3],
        yz: stresses[o + 4],
        zx: stresses[o + 5],
      },
      frame,
    );
    out[o] = t.xx;
    out[o + 1] = t.yy;
    out[o + 2] = t.zz;
    out[o + 3] = t.xy;
    out[o + 4] = t.yz;
    out[o + 5] = t.zx;
  }
  return out;
}
