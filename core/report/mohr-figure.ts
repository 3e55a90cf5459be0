import { mohrGeometry, type Frame, type LabelSpot } from "../diagrams";

/**
 * The Mohr diagram of one state as the report draws it: the bench's 3D picture (three half-disks,
 * the τmax guide, the x, y and z faces as points, σ1 σ2 σ3 on the axis) taken from core/diagrams'
 * geometry and reduced to plain coordinates, so the PDF and the print page draw the same figure.
 */
export type ReportMohr = {
  width: number;
  height: number;
  plot: { x: number; y: number; width: number; height: number };
  /** SVG paths of the three upper half-disks, outer first. */
  halfDisks: readonly [string, string, string];
  sigmaAxis: { x1: number; x2: number; y: number };
  tauAxis: { x: number; y1: number; y2: number };
  maxShearGuide: { x: number; y1: number; y2: number };
  xTicks: { at: number; label: string }[];
  yTicks: { at: number; label: string }[];
  xTitle: string;
  yTitle: string;
  /** σ1, σ2, σ3 on the σ axis. */
  principal: { cx: number; cy: number; text: string; label: LabelSpot }[];
  /** The x, y and z faces of the element at (σn, τn). */
  faces: { cx: number; cy: number; text: string; label: LabelSpot }[];
  maxShear: { text: string; label: LabelSpot };
};

/** The report's figure frame: the bench's margins, a little smaller so it fits beside a table. */
export const REPORT_MOHR_FRAME: Frame = {
  width: 420,
  height: 220,
  margin: { left: 50, right: 14, top: 14, bottom: 36 },
};

/**
 * The figure of one state.
 * @param principal σ1 ≥ σ2 ≥ σ3 in the display unit
 * @param c the six components in the display unit (for the x, y, z face points)
 * @param unit the display unit's name, for the axis titles
 */
export function reportMohr(
  principal: readonly [number, number, number],
  c: { xx: number; yy: number; zz: number; xy: number; yz: number; zx: number },
  unit: string,
): ReportMohr {
  const faces = [
    { face: "x", normal: c.xx, shear: Math.hypot(c.xy, c.zx) },
    { face: "y", normal: c.yy, shear: Math.hypot(c.xy, c.yz) },
    { face: "z", normal: c.zz, shear: Math.hypot(c.zx, c.yz) },
  ];
  const g = mohrGeometry({ mode: "3d", principal, faces, plane: null, zoom: null, frame: REPORT_MOHR_FRAME });
  return {
    width: g.frame.width,
    height: g.frame.height,
    plot: g.plot,
    halfDisks: g.halfDisks!,
    sigmaAxis: g.axisLines.sigma,
    tauAxis: g.axisLines.tau,
    maxShearGuide: g.maxShearGuide!,
    xTicks: g.xTicks.ticks.map((t) => ({ at: t.at, label: t.label })),
    yTicks: g.yTicks.ticks.map((t) => ({ at: t.at, label: t.label })),
    xTitle: `σn, ${g.xTicks.multiplier}${unit}`,
    yTitle: `τn, ${g.yTicks.multiplier}${unit}`,
    principal: g.principalMarks.map((m) => ({ cx: m.cx, cy: m.cy, text: `σ${m.name}`, label: m.label })),
    faces: g.faces.map((f) => ({ cx: f.cx, cy: f.cy, text: f.face, label: f.label })),
    maxShear: { text: `τmax = ${g.maxShear!.text}`, label: g.maxShear!.label },
  };
}
