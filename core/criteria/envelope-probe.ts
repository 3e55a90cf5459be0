import { envelopeHit } from "./envelope";
import type { Criterion, Material } from "./safety-factor";

/** One envelope as seen from a probed point of the σA–σB plane. */
export type EnvelopeProbeHit = {
  criterion: Criterion;
  /** factor along the ray from the origin: n·(σA, σB) lies on this envelope (n > 1 inside, n < 1 outside) */
  n: number;
  /** distance from the probed point to the envelope along that ray, same unit as the stresses */
  distance: number;
};

/** What a point of the envelope plot means: each envelope's factor along the ray, and the nearest one. */
export type EnvelopeProbe = {
  hits: EnvelopeProbeHit[];
  /** the envelope the ray meets closest to the point (smallest |n − 1|·|p|), or null when none is met */
  nearest: EnvelopeProbeHit | null;
};

/**
 * Reads a point (σA, σB) of the plane-stress envelope plot: for each criterion, the factor n that
 * scales the point onto its envelope (the same safety-factor ray `envelopeHit` draws), the distance
 * to the envelope along that ray, and which envelope is nearest along it.
 * @param sA first in-plane principal stress at the point
 * @param sB second in-plane principal stress at the point
 * @param criteria the envelopes drawn
 * @param material strengths, same unit as sA and sB
 * @returns the hits (criteria whose strengths are missing, or that the ray never meets, are left
 *   out) and the nearest; no hits at the origin
 */
export function probeEnvelopes(
  sA: number,
  sB: number,
  criteria: readonly Criterion[],
  material: Material,
): EnvelopeProbe {
  const length = Math.hypot(sA, sB);
  const hits: EnvelopeProbeHit[] = [];
  if (length > 0 && Number.isFinite(length)) {
    for (const criterion of criteria) {
      let hit: ReturnType<typeof envelopeHit> = null;
      try {
        hit = envelopeHit(sA, sB, criterion, material);
      } catch {
        // A missing strength: that envelope is not drawn either.
      }
      if (hit) hits.push({ criterion, n: hit.n, distance: Math.abs(hit.n - 1) * length });
    }
  }
  let nearest: EnvelopeProbeHit | null = null;
  for (const h of hits) if (nearest === null || h.distance < nearest.distance) nearest = h;
  return { hits, nearest };
}
