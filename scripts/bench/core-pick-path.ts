import { pickPath, pointsNearSegment } from "../../core/index";
import { seededRandom } from "../../core/testing/fixtures";
import { bestRate } from "./support/best-rate";

const POINTS = 1_000_000;

/**
 * Picking a path out of a point table at the row limit: core's pointsNearSegment (the scan the
 * server runs over every stored chunk) on 1,000,000 seeded random points in a 100 mm cube, with a
 * line through it and a 0.5 mm tolerance, then pickPath's sort and merge of what it kept; against a
 * baseline measured in the same run, one pass summing the same coordinates (what reading them once
 * costs). No target is set; the ratio says what the geometry adds to reading the table's
 * coordinates, before the database read that dominates the route.
 */
export async function run(): Promise<void> {
  const rnd = seededRandom(20_261_203);
  const xyz = new Float64Array(3 * POINTS);
  for (let i = 0; i < xyz.length; i++) xyz[i] = rnd() * 100;
  const stresses = new Float64Array(6 * POINTS);
  for (let i = 0; i < stresses.length; i++) stresses[i] = (rnd() * 2 - 1) * 100;
  const start: [number, number, number] = [0, 50, 50];
  const end: [number, number, number] = [100, 50, 50];

  let sink = 0;
  const base = () => {
    let s = 0;
    for (let i = 0; i < xyz.length; i++) s += xyz[i];
    sink += s;
  };
  let kept = 0;
  const scan = () => {
    const near = pointsNearSegment(xyz, start, end, 0.5);
    kept = near.indices.length;
    sink += kept;
  };
  base();
  scan();
  const baseRate = bestRate(POINTS, base);
  const scanRate = bestRate(POINTS, scan);

  // The sort and merge run on what the scan kept only (as the server calls them).
  const near = pointsNearSegment(xyz, start, end, 0.5);
  const keptXyz = new Float64Array(3 * kept);
  const keptStress = new Float64Array(6 * kept);
  near.indices.forEach((i, k) => {
    keptXyz.set(xyz.subarray(3 * i, 3 * i + 3), 3 * k);
    keptStress.set(stresses.subarray(6 * i, 6 * i + 6), 6 * k);
  });
  const pickRate = bestRate(kept, () => {
    sink += pickPath(keptXyz, keptStress, start, end, 0.5).count;
  });

  const fmt = (r: number) => `${Math.round(r).toLocaleString("en-US").padStart(12)} points/s`;
  console.log(
    `${POINTS.toLocaleString("en-US")} seeded random points, ${kept} within 0.5 of the line; best of 3`,
  );
  console.log(`${"baseline: one pass summing the coordinates".padEnd(52)} ${fmt(baseRate)}`);
  console.log(
    `${"pointsNearSegment (distance to the segment)".padEnd(52)} ${fmt(scanRate)}  ${(baseRate / scanRate).toFixed(1)}× the baseline's time`,
  );
  console.log(`${"pickPath on the kept points (sort, merge)".padEnd(52)} ${fmt(pickRate)}`);
  if (!Number.isFinite(sink)) console.log("(unexpected non-finite checksum)");
}
