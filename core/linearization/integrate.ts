/**
 * The two integrals of linearization, per component, over a line of thickness t with x from 0 to t:
 *   membrane σm = (1/t) ∫ σ dx,
 *   bending  σb = (6/t²) ∫ σ (t/2 − x) dx,
 * so that σm + σb·(1 − 2x/t) is the straight line through the distribution with the same force and
 * moment; σb is its value above σm at x = 0 (and −σb at x = t).
 *
 * Rule: the trapezoidal rule's assumption, σ varying linearly between neighbouring points, whatever
 * their spacing. The membrane integral is then exactly the trapezoidal sum; for the bending one the
 * piecewise-linear σ is integrated exactly against the linear weight (t/2 − x) on each interval
 * (h/6·(2σa wa + σa wb + σb wa + 2σb wb), the exact integral of a product of two linear functions),
 * rather than applying the trapezoidal sum to the product σ·(t/2 − x). Both choices
 * converge as 1/N²; this one reproduces a linear distribution exactly with any number and spacing of
 * points, so a linear stress never shows a spurious peak.
 */

/**
 * Membrane and bending parts of all six components.
 * @param x N distances from the first point, strictly increasing, x[0] = 0, x[N − 1] = t
 * @param local 6N components in the local frame (stride 6)
 * @param membrane out: six membrane components (stress unit)
 * @param bending out: six bending components at x = 0 (stress unit), before any are set to zero by
 *   the bending rule
 */
export function membraneAndBending(
  x: Float64Array,
  local: Float64Array,
  membrane: Float64Array,
  bending: Float64Array,
): void {
  const n = x.length;
  const t = x[n - 1];
  const half = t / 2;
  membrane.fill(0);
  bending.fill(0);
  for (let i = 1; i < n; i++) {
    const h = x[i] - x[i - 1];
    const wa = half - x[i - 1];
    const wb = half - x[i];
    const a = 6 * (i - 1);
    const b = 6 * i;
    for (let c = 0; c < 6; c++) {
      const sa = local[a + c];
      const sb = local[b + c];
      membrane[c] += 0.5 * h * (sa + sb);
      bending[c] += (h / 6) * (2 * sa * wa + sa * wb + sb * wa + 2 * sb * wb);
    }
  }
  const bendScale = 6 / (t * t);
  for (let c = 0; c < 6; c++) {
    membrane[c] /= t;
    bending[c] *= bendScale;
  }
}
