/**
 * Pure geometry of Sigmacube's diagrams — Mohr's circles, the failure envelopes and the comparison's
 * utilisation chart: extents, scales, ticks, shapes and label positions as plain numbers and
 * strings, so the browser and a printed report draw the same pictures. No DOM, no React, no Node.
 */
export type { Frame } from "./frame";
export { plotArea } from "./frame";
export type { LinearScale } from "./linear-scale";
export { linearScale, niceTicks } from "./linear-scale";
export type { BandScale } from "./band-scale";
export { bandScale } from "./band-scale";
export type { AxisTicks, Tick, TickFormat } from "./tick-format";
export { axisTickFormat, axisTicks } from "./tick-format";
export type { MinusSign } from "./fixed-decimals";
export { decimalsFor, fixed } from "./fixed-decimals";
export type { Box, LabelRequest, LabelSpot, PlacedLabel, TextAnchor, TextSize } from "./label-placement";
export { boxesOverlap, labelBox, monoTextSize, placeLabels } from "./label-placement";
export { polylinePath } from "./polyline";
export type {
  Circle,
  MarkedPoint,
  MohrFaceInput,
  MohrGeometry,
  MohrInput,
  MohrPlaneInput,
  MohrZoom,
  PrincipalMark,
} from "./mohr";
export { MOHR_FRAME, mohrCirclesOf, mohrGeometry } from "./mohr";
export { MOHR_LABEL_FONT } from "./mohr-labels";
export type { EnvelopeGeometry, EnvelopeInput } from "./envelope";
export {
  ENVELOPE_FRAME,
  ENVELOPE_MARGIN,
  envelopeExtent,
  envelopeGeometry,
  onEnvelopePlot,
} from "./envelope";
export type { UtilisationBar, UtilisationChartGeometry } from "./utilisation-chart";
export {
  CHART,
  CHART_LABEL_CHARS,
  CHART_ROWS,
  utilisationAxis,
  utilisationChartGeometry,
} from "./utilisation-chart";
