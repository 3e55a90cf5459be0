import { startTransition, useEffect, useState } from "react";
import { cloudViewInSlices, type CloudView } from "../model/cloud-view";

/**
 * What the 3D view draws: `made` when the workers made it, else made here a slice at a time
 * (a stored table, rated on the page), again whenever the utilisation changes; null until ready
 * or when the table has no coordinates.
 */
export function useCloudView(
  coordinates: Float64Array | null,
  utilisation: Float64Array,
  made: CloudView | null | undefined,
): CloudView | null {
  const [here, setHere] = useState<{ of: Float64Array; view: CloudView } | null>(null);
  const needed = made == null && coordinates !== null;
  useEffect(() => {
    if (!needed || coordinates === null) return;
    let cancelled = false;
    void cloudViewInSlices(coordinates, utilisation, { isCancelled: () => cancelled }).then((view) => {
      if (view !== null && !cancelled) startTransition(() => setHere({ of: utilisation, view }));
    });
    return () => {
      cancelled = true;
    };
  }, [needed, coordinates, utilisation]);
  if (coordinates === null) return null;
  if (made != null) return made;
  return here !== null && here.of === utilisation ? here.view : null;
}
