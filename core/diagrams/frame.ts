/** The drawing frame of a diagram: its whole size and the margins round the plot, in SVG units. */
export type Frame = {
  width: number;
  height: number;
  margin: { left: number; right: number; top: number; bottom: number };
};

/** The plot area inside a frame's margins. */
export function plotArea(frame: Frame): { x: number; y: number; width: number; height: number } {
  const { width, height, margin: m } = frame;
  return { x: m.left, y: m.top, width: width - m.left - m.right, height: height - m.top - m.bottom };
}
