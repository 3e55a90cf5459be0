/**
 * What the 3D view of a rated table draws, made in a worker instead of on the page: the points'
 * positions in a box of half-size 1 around the origin (proportions kept), a colour per point from
 * the utilisation colour table (colour-scale.ts), and the bounding sphere three.js would compute
 * from those positions. On the page these took about 250 ms of one task for a million points
 * (scripts/bench/point-tables-browser.ts with BENCH_POINT_PROFILE=1). Opt-in (`cloud: true` in the
 * pipeline's input): the arrays cost 24 bytes a point in the page's heap.
 */
import { colourTable, fillColours } from "./colour-scale";

export type CloudBuffers = {
  /** 3 per point, in the unit box */
  positions: Float32Array;
  /** 3 per point, RGB in 0..1 */
  colours: Float32Array;
  /** of the positions, as three.js's BufferGeometry.computeBoundingSphere gives it */
  sphere: { centre: [number, number, number]; radius: number };
};

/** Positions, colours and bounding sphere for `coordinates` (3 per point) and `utilisation` (1 per point). */
export function cloudBuffers(coordinates: Float64Array, utilisation: Float64Array): CloudBuffers {
  const n = utilisation.length;
  if (coordinates.length !== 3 * n) throw new RangeError("coordinates must hold 3 entries per point");
  const lo = [Infinity, Infinity, Infinity];
  const hi = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < 3 * n; i += 3) {
    for (let a = 0; a < 3; a++) {
      const v = coordinates[i + a];
      if (v < lo[a]) lo[a] = v;
      if (v > hi[a]) hi[a] = v;
    }
  }
  const mid = lo.map((l, a) => (l + hi[a]) / 2);
  const span = Math.max(...hi.map((h, a) => h - lo[a])) || 1;
  const positions = new Float32Array(3 * n);
  for (let i = 0; i < 3 * n; i += 3) {
    for (let a = 0; a < 3; a++) positions[i + a] = (2 * (coordinates[i + a] - mid[a])) / span;
  }
  return {
    positions,
    colours: fillColours(utilisation, colourTable(), new Float32Array(3 * n)),
    sphere: boundingSphere(positions),
  };
}

/** The centre of the positions' bounding box and the largest distance from it (three.js's way). */
function boundingSphere(positions: Float32Array): CloudBuffers["sphere"] {
  if (positions.length === 0) return { centre: [0, 0, 0], radius: 0 };
  const lo = [Infinity, Infinity, Infinity];
  const hi = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < positions.length; i += 3) {
    for (let a = 0; a < 3; a++) {
      const v = positions[i + a];
      if (v < lo[a]) lo[a] = v;
      if (v > hi[a]) hi[a] = v;
    }
  }
  const [cx, cy, cz] = lo.map((l, a) => (l + hi[a]) / 2);
  let most = 0;
  for (let i = 0; i < positions.length; i += 3) {
    const dx = positions[i] - cx;
    const dy = positions[i + 1] - cy;
    const dz = positions[i + 2] - cz;
    most = Math.max(most, dx * dx + dy * dy + dz * dz);
  }
  return { centre: [cx, cy, cz], radius: Math.sqrt(most) };
}
