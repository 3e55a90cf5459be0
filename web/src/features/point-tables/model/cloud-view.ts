/**
 * Everything the 3D view draws from a rated table: which points (cloud-sample.ts: all up to
 * 200,000, else a stated sample) and their positions, colours and bounding sphere
 * (cloud-buffers.ts). The workers make it beside the rating and transfer it; for a stored table,
 * whose points are rated on the page, the page makes it a slice at a time.
 */
import { cloudBuffersSteps, type CloudBuffers } from "./cloud-buffers";
import { MAX_DRAWN_POINTS, cloudSampleSteps, type CloudSample } from "./cloud-sample";
import { runSteps, runStepsInSlices, type Steps } from "./steps";

export type CloudView = CloudBuffers & { sample: CloudSample };

/** Points handled between two pauses on the page: a pass over them stays well under 50 ms. */
export const CLOUD_SLICE = 65_536;

/** The view of `coordinates` (3 per point) coloured by `utilisation`, as steps of at most `slice` points. */
export function* cloudViewSteps(
  coordinates: Float64Array,
  utilisation: Float64Array,
  { maxDrawn = MAX_DRAWN_POINTS, slice = Infinity }: { maxDrawn?: number; slice?: number } = {},
): Steps<CloudView> {
  const sample = yield* cloudSampleSteps(utilisation, maxDrawn, slice);
  const buffers = yield* cloudBuffersSteps(coordinates, utilisation, sample.indices, slice);
  return { ...buffers, sample };
}

/** The view in one go (in a worker). */
export const cloudView = (
  coordinates: Float64Array,
  utilisation: Float64Array,
  maxDrawn = MAX_DRAWN_POINTS,
) => runSteps(cloudViewSteps(coordinates, utilisation, { maxDrawn }));

/** The view made on the page a slice at a time; null when cancelled. */
export const cloudViewInSlices = (
  coordinates: Float64Array,
  utilisation: Float64Array,
  options: {
    isCancelled?: () => boolean;
    pause?: () => Promise<void>;
    slice?: number;
    /** points drawn at most (default: the view's budget) */
    maxDrawn?: number;
  } = {},
) =>
  runStepsInSlices(
    cloudViewSteps(coordinates, utilisation, {
      slice: options.slice ?? CLOUD_SLICE,
      maxDrawn: options.maxDrawn ?? MAX_DRAWN_POINTS,
    }),
    options,
  );

/** The buffers of a view's arrays, each once, to transfer. */
export function cloudViewTransferables(view: CloudView | null): ArrayBuffer[] {
  if (view === null) return [];
  const buffers: ArrayBuffer[] = [view.positions.buffer as ArrayBuffer, view.colours.buffer as ArrayBuffer];
  if (view.sample.indices !== null) buffers.push(view.sample.indices.buffer as ArrayBuffer);
  return buffers;
}
