import type { PointTable } from "../../core";
import type { NewPointTableChunk, PointTableChunkRow } from "./point-tables";

/** Points per stored chunk row: 65,536 points are about 3 MB of components, one bytea each. */
export const POINTS_PER_CHUNK = 65_536;

// The stored and sent binary columns are little-endian float64. Float64Array uses the
// machine's byte order, which is little-endian on every platform Node supports today (x64,
// arm64); refuse to start on another rather than store bytes in the wrong order.
if (new Uint8Array(new Float64Array([1]).buffer)[7] !== 0x3f) {
  throw new Error("point tables need a little-endian machine (Float64Array byte order)");
}

/** `n` doubles as bytes, without copying when the array fills its own buffer. */
function bytesOf(values: Float64Array): Buffer {
  return Buffer.from(values.buffer, values.byteOffset, values.byteLength);
}

/** A Buffer's bytes as doubles (copied: a Buffer from pg need not sit on an 8-byte boundary). */
export function doublesOf(bytes: Buffer): Float64Array {
  const out = new Float64Array(bytes.byteLength / 8);
  new Uint8Array(out.buffer).set(bytes);
  return out;
}

/** How many chunks of {@link POINTS_PER_CHUNK} points a table of `count` points is stored as. */
export function chunkCountOf(count: number): number {
  return Math.ceil(count / POINTS_PER_CHUNK);
}

/**
 * Chunk `index` of a parsed table (its points `index`·{@link POINTS_PER_CHUNK} on) as binary
 * columns, each in a buffer of its own: components from the parser's interleaved xx yy zz xy yz zx
 * per point to one column after another (xx[n] yy[n] …), coordinates likewise (x[n] y[n] z[n]).
 */
export function chunkAt(table: PointTable, index: number): NewPointTableChunk {
  const start = index * POINTS_PER_CHUNK;
  const n = Math.min(POINTS_PER_CHUNK, table.count - start);
  if (!(n > 0)) throw new RangeError(`chunk ${index} is past the table's ${table.count} points`);
  const components = new Float64Array(6 * n);
  for (let c = 0; c < 6; c++) {
    const column = c * n;
    for (let k = 0, from = 6 * start + c; k < n; k++, from += 6)
      components[column + k] = table.components[from];
  }
  let coordinates: Buffer | null = null;
  if (table.coordinates) {
    const xyz = new Float64Array(3 * n);
    for (let c = 0; c < 3; c++) {
      const column = c * n;
      for (let k = 0, from = 3 * start + c; k < n; k++, from += 3) xyz[column + k] = table.coordinates[from];
    }
    coordinates = bytesOf(xyz);
  }
  const ids = table.ids;
  return {
    chunkIndex: index,
    pointCount: n,
    components: bytesOf(components),
    coordinates,
    numericIds: ids instanceof Float64Array ? bytesOf(ids.slice(start, start + n)) : null,
    textIds: Array.isArray(ids) ? ids.slice(start, start + n) : null,
  };
}

/** A parsed table cut into chunks of {@link POINTS_PER_CHUNK} points ({@link chunkAt}), in order. */
export function* chunksOf(table: PointTable): Generator<NewPointTableChunk> {
  for (let index = 0; index < chunkCountOf(table.count); index++) yield chunkAt(table, index);
}

/** A stored chunk's points as core's evaluator takes them: interleaved xx yy zz xy yz zx per point. */
export function interleavedComponents(chunk: {
  components: Buffer | null;
  pointCount: number;
}): Float64Array {
  if (chunk.components === null) throw new Error("the chunk was read without its components");
  const n = chunk.pointCount;
  const columns = doublesOf(chunk.components);
  const out = new Float64Array(6 * n);
  for (let c = 0; c < 6; c++) {
    for (let k = 0; k < n; k++) out[6 * k + c] = columns[c * n + k];
  }
  return out;
}

/** A stored chunk's ids: its numbers, its text, or the 1-based row numbers when no id column is mapped. */
export function chunkIds(
  chunk: Pick<PointTableChunkRow, "numericIds" | "textIds" | "pointCount" | "chunkIndex">,
): (number | string)[] {
  if (chunk.textIds) return chunk.textIds;
  if (chunk.numericIds) return Array.from(doublesOf(chunk.numericIds));
  const first = chunk.chunkIndex * POINTS_PER_CHUNK + 1;
  return Array.from({ length: chunk.pointCount }, (_, k) => first + k);
}
