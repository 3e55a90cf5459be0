import { safetyFactor, type Criterion, type Material } from "./safety-factor";

/**
 * The failure envelope of a criterion in the σA–σB plane of principal stresses for plane stress
 * (σ3 = 0 out of plane), traced as the safety-factor ray: in each direction φ the unit state
 * (σA, σB) = (cos φ, sin φ) scaled by its safety factor n lies exactly on the criterion's surface,
 * because that is what `safetyFactor` means. No envelope formula is restated here; each criterion's
 * shape (von Mises ellipse, Tresca hexagon, …) comes from `safetyFactor` itself.
 * @param criterion one of CRITERIA
 * @param material strengths (same unit as the returned points)
 * @param samples number of directions, evenly spaced over 360° (≥ 8; a multiple of 8 hits the
 *   corners on the axes and the ±45° diagonals exactly)
 * @returns closed polygon as [σA, σB] pairs, counter-clockwise from φ = 0; a direction in which the
 *   criterion never fails is left out
 * @throws RangeError for a missing strength (from `safetyFactor`) or samples < 8
 */
export function envelopeInPlane(criterion: Criterion, material: Material, samples = 720): [number, number][] {
  if (!Number.isInteger(samples) || samples < 8)
    throw new RangeError(`samples must be an integer ≥ 8, got ${samples}`);
  const points: [number, number][] = [];
  for (let i = 0; i < samples; i++) {
    const phi = (2 * Math.PI * i) / samples;
    const a = Math.cos(phi);
    const b = Math.sin(phi);
    const n = safetyFactor({ xx: a, yy: b, zz: 0, xy: 0, yz: 0, zx: 0 }, criterion, material);
    if (Number.isFinite(n)) points.push([n * a, n * b]);
  }
  return points;
}

/**
 * The point where the ray from the origin through a plane-stress state (σA, σB) meets the envelope:
 * n·(σA, σB), the picture of what the safety factor measures.
 * @param sA first in-plane principal stress
 * @param sB second in-plane principal stress
 * @param criterion one of CRITERIA
 * @param material strengths, same unit
 * @returns the point on the envelope and n, or null when the state never reaches it (n = ∞)
 */
export function envelopeHit(
  sA: number,
  sB: number,
  criterion: Criterion,
  material: Material,
): { point: [number, number]; n: number } | null {
  const n = safetyFactor({ xx: sA, yy: sB, zz: 0, xy: 0, yz: 0, zx: 0 }, criterion, material);
  if (!Number.isFinite(n)) return null;
  return { point: [n * sA, n * sB], n };
}
