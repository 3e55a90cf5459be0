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

/**
 * A parsed table cut into chunks of {@link POINTS_PER_CHUNK} points, each as binary columns:
 * components from the parser's interleaved xx yy zz xy yz zx per point to one column after
 * another (xx[n] yy[n] …), coordinates likewise (x[n] y[n] z[n]).
 */
export function* chunksOf(table: PointTable): Generator<NewPointTableChunk> {
  for (let start = 0, index = 0; start < table.count; start += POINTS_PER_CHUNK, index++) {
    const n = Math.min(POINTS_PER_CHUNK, table.count - start);
    const components = new Float64Array(6 * n);
    for (let k = 0; k < n; k++) {
      const from = 6 * (start + k);
      for (let c = 0; c < 6; c++) components[c * n + k] = table.components[from + c];
    }
    let coordinates: Buffer | null = null;
    if (table.coordinates) {
      const xyz = new Float64Array(3 * n);
      for (let k = 0; k < n; k++) {
        const from = 3 * (start + k);
        for (let c = 0; c < 3; c++) xyz[c * n + k] = table.coordinates[from + c];
      }
      coordinates = bytesOf(xyz);
    }
    const ids = table.ids;
    yield {
      chunkIndex: index,
      pointCount: n,
      components: bytesOf(components),
      coordinates,
      numericIds: ids instanceof Float64Array ? bytesOf(ids.slice(start, start + n)) : null,
      textIds: Array.isArray(ids) ? ids.slice(start, start + n) : null,
    };
  }
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
