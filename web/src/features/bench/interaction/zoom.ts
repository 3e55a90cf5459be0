/**
 * Zoom of a 2D diagram as a pure reducer: a scale factor about a focus point, in data units, on top
 * of the fitted view. "Fit" is the identity view.
 */

/** Zoom state: k ≥ 1 magnifies; (cx, cy) is the data point at the centre of the plot. null = fitted. */
export type ZoomView = { k: number; cx: number; cy: number } | null;

/** Limits, so a wheel cannot lose the diagram. */
export const ZOOM_LIMITS = { min: 0.25, max: 40 } as const;

/**
 * Zooms by `factor` keeping the data point `focus` fixed on screen.
 * @param view current view (null = fitted, centred on `fitCentre`)
 * @param factor > 1 zooms in
 * @param focus data point under the pointer
 * @param fitCentre centre of the fitted view
 */
export function zoomAt(
  view: ZoomView,
  factor: number,
  focus: readonly [number, number],
  fitCentre: readonly [number, number],
): ZoomView {
  const current = view ?? { k: 1, cx: fitCentre[0], cy: fitCentre[1] };
  const k = Math.min(ZOOM_LIMITS.max, Math.max(ZOOM_LIMITS.min, current.k * factor));
  const ratio = current.k / k;
  // The focus keeps its screen position: its offset from the centre scales by the zoom ratio.
  return {
    k,
    cx: focus[0] - (focus[0] - current.cx) * ratio,
    cy: focus[1] - (focus[1] - current.cy) * ratio,
  };
}
