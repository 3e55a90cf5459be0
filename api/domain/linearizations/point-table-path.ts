import { MIN_POINTS, pickPath, pointsNearSegment, type StressUnit } from "../../../core";
import { pascalsPer } from "../../../core/units/stress";
import { LINEARIZATION_LIMITS } from "../../../core/contract/limits";
import type { PathFromPointTable, PathFromPointTableBody } from "../../../core/contract/linearizations";
import { readChunk, type PointTableRow } from "../../../db/repositories/point-tables";
import { doublesOf, interleavedComponents } from "../../../db/repositories/point-table-chunks";

/**
 * Points near the line kept for sorting at most. Past this the pick still counts every point
 * near the line but keeps none: a tolerance that takes in ten times as many points as a line may
 * hold is a tolerance to narrow, and holding them all (up to the table's million) is not needed to
 * say so.
 */
const MAX_CANDIDATES = 10 * LINEARIZATION_LIMITS.pointsPerLine;

const nextTurn = () => new Promise<void>((resolve) => setImmediate(resolve));

/** A stored column-by-column chunk's coordinates (x[n] y[n] z[n]) as x y z per point. */
function interleavedCoordinates(bytes: Buffer, n: number): Float64Array {
  const columns = doublesOf(bytes);
  const out = new Float64Array(3 * n);
  for (let c = 0; c < 3; c++) {
    for (let k = 0; k < n; k++) out[3 * k + c] = columns[c * n + k];
  }
  return out;
}

/**
 * A component back in the table's own unit (the store keeps pascals), cut to 15 significant
 * digits so a value typed as 212.5 MPa comes back as 212.5 and not as 212.50000000000003.
 */
const inUnit = (pa: number, perUnit: number) => Number((pa / perUnit).toPrecision(15));

/**
 * Picks a stress classification line out of a stored point table with core's `pickPath`: reads
 * the table one stored chunk at a time (its coordinates and components, through the point-table
 * repository's `readChunk`), keeps the points within the tolerance of the segment (core's
 * `pointsNearSegment`), then sorts and merges them. Yields the event loop between chunks, so a
 * table of a million points does not hold the API. The path comes back in the table's stress unit,
 * placed by distance along the segment, in the shape the linearization's `path` takes.
 * @param table a ready table with coordinates (the caller checks both)
 */
export async function pathFromStoredTable(
  table: Pick<PointTableRow, "id" | "fileName" | "unit">,
  body: PathFromPointTableBody,
): Promise<PathFromPointTable> {
  const keptXyz: number[] = [];
  const keptStress: number[] = [];
  let near = 0;
  for (let chunkIndex = 0; ; chunkIndex++) {
    const chunk = await readChunk(table.id, chunkIndex, { coordinates: true, ids: false });
    if (chunk === null) break;
    if (chunk.coordinates === null) continue;
    const n = chunk.pointCount;
    const xyz = interleavedCoordinates(chunk.coordinates, n);
    const picked = pointsNearSegment(xyz, body.start, body.end, body.tolerance);
    near += picked.indices.length;
    if (near <= MAX_CANDIDATES && picked.indices.length > 0) {
      const components = interleavedComponents(chunk);
      for (const i of picked.indices) {
        keptXyz.push(xyz[3 * i], xyz[3 * i + 1], xyz[3 * i + 2]);
        for (let c = 0; c < 6; c++) keptStress.push(components[6 * i + c]);
      }
    }
    await nextTurn();
  }

  const unit = table.unit as StressUnit;
  const perUnit = pascalsPer(unit);
  const tableView = { id: table.id, fileName: table.fileName, unit };
  if (near > MAX_CANDIDATES) {
    return {
      table: tableView,
      found: near,
      pointCount: near,
      lineLength: Math.hypot(...body.end.map((v, i) => v - body.start[i])),
      path: null,
      notes: [],
      warnings: [
        `${near} points lie within the tolerance of the line; a line holds at most ${LINEARIZATION_LIMITS.pointsPerLine}. Narrow the tolerance.`,
      ],
    };
  }
  const picked = pickPath(
    Float64Array.from(keptXyz),
    Float64Array.from(keptStress),
    body.start,
    body.end,
    body.tolerance,
  );
  const warnings = [...picked.warnings];
  // Core warns about a non-finite component; such a path could not be linearized, so none is offered.
  let usable = picked.count >= MIN_POINTS && picked.stresses.every(Number.isFinite);
  if (picked.count > LINEARIZATION_LIMITS.pointsPerLine) {
    usable = false;
    warnings.push(
      `${picked.count} places along the line; a line holds at most ${LINEARIZATION_LIMITS.pointsPerLine} (limit "pointsPerLine"). Narrow the tolerance.`,
    );
  }
  const s = picked.stresses;
  return {
    table: tableView,
    found: picked.found,
    pointCount: picked.count,
    lineLength: picked.lineLength,
    path: usable
      ? {
          positions: "distance",
          lengthUnit: body.lengthUnit,
          stressUnit: unit,
          lineDirection: [...picked.direction],
          points: Array.from(picked.distances, (distance, k) => ({
            // 12 digits keep the text readable; merged places are far more than that apart.
            distance: Number(distance.toPrecision(12)),
            xx: inUnit(s[6 * k], perUnit),
            yy: inUnit(s[6 * k + 1], perUnit),
            zz: inUnit(s[6 * k + 2], perUnit),
            xy: inUnit(s[6 * k + 3], perUnit),
            yz: inUnit(s[6 * k + 4], perUnit),
            zx: inUnit(s[6 * k + 5], perUnit),
          })),
        }
      : null,
    notes: picked.notes,
    warnings,
  };
}
