/**
 * Geometry of Mohr's diagram, without React or a DOM, so the bench and a printed report draw the
 * same picture. Two pictures:
 * - 3D: the three circles from the principal stresses (upper halves, τn ≥ 0) and a marker per face
 *   of the turned element at (σn, τn);
 * - plane: the in-plane circle with the x′ and y′ face points, τx′y′ plotted positive downward so
 *   the x′ point turns the same way as the element.
 * Given the data, the zoom and a frame it returns the equal-aspect scales, ticks, the shapes to draw
 * and where every label goes, with no two labels overlapping.
 */
import { fixed, decimalsFor } from "./fixed-decimals";
import { plotArea, type Frame } from "./frame";
import { placeLabels, type LabelRequest, type LabelSpot, type PlacedLabel } from "./label-placement";
import { maxShearLabelRequest, pointLabelRequest, principalLabelRequest, staggered } from "./mohr-labels";
import { linearScale, type LinearScale } from "./linear-scale";
import { axisTicks, type AxisTicks } from "./tick-format";

/** The bench's Mohr diagram frame (viewBox 480 × 246). */
export const MOHR_FRAME: Frame = {
  width: 480,
  height: 246,
  margin: { left: 50, right: 14, top: 14, bottom: 36 },
};

/** Ticks asked of the σ and τ axes. */
const TICKS = { sigma: 7, tau: 6 } as const;

/** One Mohr circle: centre on the σ axis and radius. */
export type Circle = { center: number; radius: number };

/** A face of the turned element: its normal stress and the size of its shear. */
export type MohrFaceInput = { face: string; normal: number; shear: number };

/** The in-plane picture's data: circle, rotated x′ components, θ (null unless a turn about z) and names. */
export type MohrPlaneInput = {
  circle: { center: number; radius: number; s1: number; s2: number };
  sx: number;
  sy: number;
  txy: number;
  theta: number | null;
  /** names by the bench's one rule (σ1 ≥ σ2 ≥ σ3 of the 3D state), e.g. "σ1" */
  names: { major: string; minor: string; outOfPlane: string };
  sz: number;
};

/** Zoom on top of the fitted view: k ≥ 1 magnifies about the data point (cx, cy); null = fitted. */
export type MohrZoom = { k: number; cx: number; cy: number } | null;

export type MohrInput = {
  mode: "3d" | "plane";
  /** σ1 ≥ σ2 ≥ σ3 */
  principal: readonly [number, number, number];
  faces: readonly MohrFaceInput[];
  plane: MohrPlaneInput | null;
  zoom: MohrZoom;
  frame?: Frame;
};

/** A principal stress marked on the σ axis with its name ("1", "2" …, the σ written by the drawer). */
export type PrincipalMark = {
  key: "s1" | "s2" | "s3" | "major" | "minor" | "z";
  name: string;
  sigma: number;
  cx: number;
  cy: number;
  /** σz in the plane picture: drawn hollow and named "(z)" */
  outOfPlane: boolean;
  label: LabelSpot;
};

/** A marker with its label. */
export type MarkedPoint = { sigma: number; tau: number; cx: number; cy: number; label: LabelSpot };

export type MohrGeometry = {
  frame: Frame;
  plot: { x: number; y: number; width: number; height: number };
  /** σ → x and τ → y (τ up in 3D, down in the plane picture) */
  x: LinearScale;
  y: LinearScale;
  /** centre of the fitted view, the zoom's identity */
  fitCentre: readonly [number, number];
  /** the data region fitted before any zoom: every circle, point and the origin, with a margin */
  extent: { x0: number; x1: number; y0: number; y1: number };
  xTicks: AxisTicks;
  yTicks: AxisTicks;
  /** decimals for values written in the plot and its readouts */
  decimals: number;
  /** the σ axis (τ = 0) and the τ axis (σ = 0) across the plot */
  axisLines: { sigma: { x1: number; x2: number; y: number }; tau: { x: number; y1: number; y2: number } };
  /** Mohr's three circles (σ1,σ3), (σ1,σ2), (σ2,σ3) */
  circles: readonly [Circle, Circle, Circle];
  /** 3D: the three upper half-disks as SVG paths, outer first */
  halfDisks: readonly [string, string, string] | null;
  /** 3D: dashed line from the outer centre up to τmax */
  maxShearGuide: { x: number; y1: number; y2: number } | null;
  /** 3D: the faces' markers */
  faces: (MarkedPoint & { face: string })[];
  /** plane: the in-plane circle, its x′ and y′ points and the diameter between them (null when θ is not about z) */
  planeCircle: { cx: number; cy: number; r: number } | null;
  planePoints: { x: MarkedPoint; y: MarkedPoint } | null;
  principalMarks: PrincipalMark[];
  /** τmax (3D) or τmax, in-plane: the value, its text in the axis's power of ten, and where it goes */
  maxShear: { value: number; text: string; label: LabelSpot } | null;
  /** every label's box, for checks */
  labels: PlacedLabel[];
};

/** Mohr's three circles from σ1 ≥ σ2 ≥ σ3: centre (σi + σj)/2, radius (σi − σj)/2. */
export function mohrCirclesOf(principal: readonly [number, number, number]): [Circle, Circle, Circle] {
  const [s1, s2, s3] = principal;
  const circle = (a: number, b: number): Circle => ({ center: a / 2 + b / 2, radius: a / 2 - b / 2 });
  return [circle(s1, s3), circle(s1, s2), circle(s2, s3)];
}

/** Equal-aspect scales fitted to the extent (circles must stay circles), then zoomed. */
function fittedScales(
  ext: MohrGeometry["extent"],
  zoom: MohrZoom,
  plot: MohrGeometry["plot"],
  tauDown: boolean,
): { x: LinearScale; y: LinearScale; fitCentre: readonly [number, number] } {
  const spanX = Math.max(ext.x1 - ext.x0, 1e-12);
  const spanY = Math.max(ext.y1 - ext.y0, 1e-12);
  const perUnit = Math.min(plot.width / spanX, plot.height / spanY) * (zoom?.k ?? 1);
  const cx = zoom?.cx ?? (ext.x0 + ext.x1) / 2;
  const cy = zoom?.cy ?? (ext.y0 + ext.y1) / 2;
  const halfX = plot.width / 2 / perUnit;
  const halfY = plot.height / 2 / perUnit;
  const bottom = plot.y + plot.height;
  return {
    x: linearScale([cx - halfX, cx + halfX], [plot.x, plot.x + plot.width]),
    y: linearScale([cy - halfY, cy + halfY], tauDown ? [plot.y, bottom] : [bottom, plot.y]),
    fitCentre: [(ext.x0 + ext.x1) / 2, (ext.y0 + ext.y1) / 2],
  };
}

/**
 * The whole picture's geometry.
 * @param input principal stresses, faces, plane data and zoom, in one stress unit
 */
export function mohrGeometry(input: MohrInput): MohrGeometry {
  const frame = input.frame ?? MOHR_FRAME;
  const plot = plotArea(frame);
  const { mode, faces, zoom } = input;
  const plane = mode === "plane" ? input.plane : null;
  const [s1, s2, s3] = input.principal;
  const circles = mohrCirclesOf(input.principal);
  const tauDown = mode === "plane";

  // Fitted extent: all circles, the origin, and a margin.
  const big = Math.max(Math.abs(s1), Math.abs(s3), circles[0].radius, 1e-9);
  const pad = 0.08 * big;
  const extent = plane
    ? {
        x0: Math.min(plane.circle.s2, 0) - pad,
        x1: Math.max(plane.circle.s1, 0) + pad,
        y0: -plane.circle.radius - pad,
        y1: plane.circle.radius + pad,
      }
    : { x0: Math.min(s3, 0) - pad, x1: Math.max(s1, 0) + pad, y0: -0.12 * big, y1: circles[0].radius + pad };
  const { x, y, fitCentre } = fittedScales(extent, zoom, plot, tauDown);
  const X = x.map;
  const Y = y.map;
  const xTicks = axisTicks(x, TICKS.sigma);
  const yTicks = axisTicks(y, TICKS.tau);
  const decimals = decimalsFor(big);
  // A value written inside the plot, in the axis's power of ten so that it stays as short as the ticks.
  const short = (v: number) =>
    xTicks.multiplier === ""
      ? fixed(v, decimals)
      : `${fixed(v / xTicks.scale, decimalsFor(Math.abs(v / xTicks.scale)))} ${xTicks.multiplier.trim()}`;

  const halfDisk = (c: Circle) => {
    const r = Math.abs(X(c.center + c.radius) - X(c.center));
    return `M${X(c.center - c.radius)},${Y(0)} A${r},${r} 0 0 1 ${X(c.center + c.radius)},${Y(0)} Z`;
  };

  // Principal stresses on the σ axis, named by the one rule (σ1 ≥ σ2 ≥ σ3 in 3D).
  const markData: Omit<PrincipalMark, "label" | "cx" | "cy">[] =
    mode === "3d"
      ? [
          { key: "s1", name: "1", sigma: s1, outOfPlane: false },
          { key: "s2", name: "2", sigma: s2, outOfPlane: false },
          { key: "s3", name: "3", sigma: s3, outOfPlane: false },
        ]
      : plane
        ? [
            { key: "major", name: plane.names.major.slice(1), sigma: plane.circle.s1, outOfPlane: false },
            { key: "minor", name: plane.names.minor.slice(1), sigma: plane.circle.s2, outOfPlane: false },
            { key: "z", name: plane.names.outOfPlane.slice(1), sigma: plane.sz, outOfPlane: true },
          ]
        : [];
  const marks = staggered(markData.map((m) => ({ ...m, cx: X(m.sigma), cy: Y(0) })));

  // Labels in order of importance: principal names, face points, then τmax.
  const requests: LabelRequest[] = marks.map((m) =>
    principalLabelRequest(m, mode === "plane" && !m.outOfPlane),
  );

  const facePoints = mode === "3d" ? faces.map((f) => ({ f, cx: X(f.normal), cy: Y(f.shear) })) : [];
  for (const { f, cx, cy } of facePoints)
    requests.push(pointLabelRequest(`face-${f.face}`, f.face, cx, cy, 7, 6));

  const planeXY =
    plane && plane.theta !== null
      ? {
          x: { sigma: plane.sx, tau: plane.txy, cx: X(plane.sx), cy: Y(plane.txy) },
          y: { sigma: plane.sy, tau: -plane.txy, cx: X(plane.sy), cy: Y(-plane.txy) },
        }
      : null;
  if (planeXY)
    for (const k of ["x", "y"] as const)
      requests.push(pointLabelRequest(`point-${k}′`, `${k}′`, planeXY[k].cx, planeXY[k].cy, 9, 7));

  const maxShearValue = plane ? plane.circle.radius : mode === "3d" ? circles[0].radius : null;
  const maxShearText = maxShearValue === null ? "" : short(maxShearValue);
  if (maxShearValue !== null) {
    const spot: LabelSpot = plane
      ? { x: X(plane.circle.center), y: Y(-plane.circle.radius) + 16, anchor: "middle" }
      : { x: X(circles[0].center) + 4, y: Y(circles[0].radius) - 5, anchor: "start" };
    requests.push(maxShearLabelRequest(spot, plane ? "max, in-plane" : "max", maxShearText, plane ? 1 : -1));
  }

  const labels = placeLabels(requests, plot);
  const spotOf = (id: string): LabelSpot => {
    const l = labels.find((p) => p.id === id)!;
    return { x: l.x, y: l.y, anchor: l.anchor };
  };

  return {
    frame,
    plot,
    x,
    y,
    fitCentre,
    extent,
    xTicks,
    yTicks,
    decimals,
    axisLines: {
      sigma: { x1: plot.x, x2: plot.x + plot.width, y: Y(0) },
      tau: { x: X(0), y1: plot.y, y2: plot.y + plot.height },
    },
    circles,
    halfDisks: mode === "3d" ? [halfDisk(circles[0]), halfDisk(circles[1]), halfDisk(circles[2])] : null,
    maxShearGuide: mode === "3d" ? { x: X(circles[0].center), y1: Y(0), y2: Y(circles[0].radius) } : null,
    faces: facePoints.map(({ f, cx, cy }) => ({
      face: f.face,
      sigma: f.normal,
      tau: f.shear,
      cx,
      cy,
      label: spotOf(`face-${f.face}`),
    })),
    planeCircle: plane
      ? {
          cx: X(plane.circle.center),
          cy: Y(0),
          r: Math.abs(X(plane.circle.center + plane.circle.radius) - X(plane.circle.center)),
        }
      : null,
    planePoints: planeXY && {
      x: { ...planeXY.x, label: spotOf("point-x′") },
      y: { ...planeXY.y, label: spotOf("point-y′") },
    },
    principalMarks: marks.map((m) => ({
      key: m.key,
      name: m.name,
      sigma: m.sigma,
      cx: m.cx,
      cy: m.cy,
      outOfPlane: m.outOfPlane,
      label: spotOf(`principal-${m.key}`),
    })),
    maxShear:
      maxShearValue === null
        ? null
        : { value: maxShearValue, text: maxShearText, label: spotOf("max-shear") },
    labels,
  };
}
