import { startTransition, useEffect, useState } from "react";
import { runStepsInSlices } from "../model/steps";
import { worstInBoxSteps, type CoordinateBox } from "../model/worst-points";

/** Points looked at between two yields to the page (a few milliseconds of work). */
const WORST_SLICE = 131_072;

/**
 * The worst points inside the box (model/worst-points.ts), found a slice of the table at a time so
 * a million points cost the page no long task; null while they are being found.
 */
export function useWorstInBox(
  utilisation: Float64Array,
  coordinates: Float64Array | null,
  box: CoordinateBox,
  limit: number,
): number[] | null {
  const [found, setFound] = useState<{ of: unknown[]; indices: number[] } | null>(null);
  useEffect(() => {
    let cancelled = false;
    const of = [utilisation, coordinates, box, limit];
    void runStepsInSlices(worstInBoxSteps(utilisation, coordinates, box, limit, WORST_SLICE), {
      isCancelled: () => cancelled,
    }).then((indices) => {
      if (indices !== null && !cancelled) startTransition(() => setFound({ of, indices }));
    });
    return () => {
      cancelled = true;
    };
  }, [utilisation, coordinates, box, limit]);
  const current =
    found !== null &&
    found.of[0] === utilisation &&
    found.of[1] === coordinates &&
    found.of[2] === box &&
    found.of[3] === limit;
  return current ? found.indices : null;
}
