/**
 * What the 3D view hands to three.js for the points it draws: their positions in a box of
 * half-size 1 around the origin (the whole table's box, proportions kept), a colour per point from
 * the utilisation colour table (colour-scale.ts), and the bounding sphere three.js would compute
 * from those positions. Made as steps (steps.ts): in a worker in one go, on the page a slice at a
 * time; on the page in one task these took about 250 ms for a million points
 * (scripts/bench/point-tables-browser.ts with BENCH_POINT_PROFILE=1).
 */
import { colourTable, fillColours } from "./colour-scale";
import { runSteps, sweep, type Steps } from "./steps";

export type CloudBuffers = {
  /** 3 per drawn point, in the unit box */
  positions: Float32Array;
  /** 3 per drawn point, RGB in 0..1 */
  colours: Float32Array;
  /** of the positions, as three.js's BufferGeometry.computeBoundingSphere gives it */
  sphere: { centre: [number, number, number]; radius: number };
};

/**
 * Positions, colours and bounding sphere of the points in `indices` (every point when null), for
 * `coordinates` (3 per point) and `utilisation` (1 per point).
 */
export const cloudBuffers = (
  coordinates: Float64Array,
  utilisation: Float64Array,
  indices: Uint32Array | null = null,
): CloudBuffers => runSteps(cloudBuffersSteps(coordinates, utilisation, indices));

/** {@link cloudBuffers} as steps of at most `slice` points each. */
export function* cloudBuffersSteps(
  coordinates: Float64Array,
  utilisation: Float64Array,
  indices: Uint32Array | null,
  slice = Infinity,
): Steps<CloudBuffers> {
  const n = utilisation.length;
  if (coordinates.length !== 3 * n) throw new RangeError("coordinates must hold 3 entries per point");
  const { lo, hi } = yield* boundingBox(coordinates, slice);
  const mid = lo.map((l, a) => (l + hi[a]) / 2);
  const span = Math.max(...hi.map((h, a) => h - lo[a])) || 1;
  const drawn = indices === null ? n : indices.length;
  const positions = new Float32Array(3 * drawn);
  const colours = new Float32Array(3 * drawn);
  const table = colourTable();
  const drawnU = new Float64Array(Math.min(drawn, slice));
  yield* sweep(drawn, slice, (from, to) => {
    for (let k = from; k < to; k++) {
      const i = indices === null ? k : indices[k];
      for (let a = 0; a < 3; a++) positions[3 * k + a] = (2 * (coordinates[3 * i + a] - mid[a])) / span;
      drawnU[k - from] = utilisation[i];
    }
    fillColours(drawnU.subarray(0, to - from), table, colours.subarray(3 * from, 3 * to));
  });
  const sphere = yield* boundingSphere(positions, slice);
  return { positions, colours, sphere };
}

/** The smallest and largest x, y and z of points stored as x y z triples, `slice` points a step. */
function* boundingBox(
  xyz: Float64Array | Float32Array,
  slice: number,
): Steps<{ lo: number[]; hi: number[] }> {
  const lo = [Infinity, Infinity, Infinity];
  const hi = [-Infinity, -Infinity, -Infinity];
  yield* sweep(xyz.length / 3, slice, (from, to) => {
    for (let i = 3 * from; i < 3 * to; i += 3) {
      for (let a = 0; a < 3; a++) {
        const v = xyz[i + a];
        if (v < lo[a]) lo[a] = v;
        if (v > hi[a]) hi[a] = v;
      }
    }
  });
  return { lo, hi };
}

/** The centre of the positions' bounding box and the largest distance from it (three.js's way). */
function* boundingSphere(positions: Float32Array, slice: number): Steps<CloudBuffers["sphere"]> {
  const n = positions.length / 3;
  if (n === 0) return { centre: [0, 0, 0], radius: 0 };
  const { lo, hi } = yield* boundingBox(positions, slice);
  const [cx, cy, cz] = lo.map((l, a) => (l + hi[a]) / 2);
  let most = 0;
  yield* sweep(n, slice, (from, to) => {
    for (let i = 3 * from; i < 3 * to; i += 3) {
      const dx = positions[i] - cx;
      const dy = positions[i + 1] - cy;
      const dz = positions[i + 2] - cz;
      most = Math.max(most, dx * dx + dy * dy + dz * dz);
    }
  });
  return { centre: [cx, cy, cz], radius: Math.sqrt(most) };
}
