/**
 * Derived results as memoised hooks over the store. Each hook subscribes only to the fields it
 * needs, so a drag (rotation only) re-derives the rotated readout and the face markers, not the
 * principal values, the criteria or the envelopes.
 */
import { useMemo } from "react";
import {
  benchRequirements,
  criteriaResults,
  envelopes,
  inPlaneCircle,
  isPlaneInXY,
  rotatedView,
  rotationDescription,
  stateSummary,
} from "../model/derive";
import { useBenchStore } from "../model/store";

/** Principal values and directions, τmax, von Mises, Tresca and the three circles. */
export function useSummary() {
  const tensor = useBenchStore((s) => s.tensor);
  return useMemo(() => stateSummary(tensor), [tensor]);
}

/** σ′ = RσRᵀ and the faces' (σn, τn). */
export function useRotated() {
  const tensor = useBenchStore((s) => s.tensor);
  const rotation = useBenchStore((s) => s.rotation);
  return useMemo(() => rotatedView(tensor, rotation), [tensor, rotation]);
}

/** The rotation as axis–angle, Euler angles and (when it is one) a turn about z. */
export function useRotationDescription() {
  const rotation = useBenchStore((s) => s.rotation);
  const sequence = useBenchStore((s) => s.eulerSequence);
  return useMemo(() => rotationDescription(rotation, sequence), [rotation, sequence]);
}

/** The in-plane circle when the state is plane stress in x–y, else null. */
export function useInPlane() {
  const tensor = useBenchStore((s) => s.tensor);
  return useMemo(() => (isPlaneInXY(tensor) ? inPlaneCircle(tensor) : null), [tensor]);
}

/** Every criterion's result against the chosen material and the required factors (the project's, or the bench's own). */
export function useCriteria() {
  const tensor = useBenchStore((s) => s.tensor);
  const unit = useBenchStore((s) => s.unit);
  const material = useBenchStore((s) => s.material);
  const required = useBenchStore((s) => s.requiredFactor);
  const project = useBenchStore((s) => s.projectRequirements);
  const behaviour = useBenchStore((s) => s.behaviour);
  const includeUnsuited = useBenchStore((s) => s.includeUnsuited);
  return useMemo(
    () =>
      criteriaResults(tensor, unit, material, benchRequirements(required, project), {
        behaviour,
        includeUnsuited,
      }),
    [tensor, unit, material, required, project, behaviour, includeUnsuited],
  );
}

/** Envelope polygons (MPa) for the chosen criteria. */
export function useEnvelopes() {
  const criteria = useBenchStore((s) => s.envelopeCriteria);
  const material = useBenchStore((s) => s.material);
  return useMemo(() => envelopes(criteria, material), [criteria, material]);
}
