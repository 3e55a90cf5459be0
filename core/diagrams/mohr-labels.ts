/**
 * Where the labels of Mohr's diagram would like to go, as requests for the collision pass in
 * label-placement.ts: the principal stresses' names on the σ axis, the face points' names and the
 * τmax label, each with its natural spot first (where the diagram has always put it) and its
 * alternatives after.
 */
import { monoTextSize, type LabelRequest, type LabelSpot } from "./label-placement";

/** Font size of the labels inside the plot (SVG units). */
export const MOHR_LABEL_FONT = 12;

/** Label width on the σ axis (SVG units) under which two centred names would touch. */
const NAME_GAP = 20;

/** Height of one label line: how far a point's label is lifted when its first spot is taken. */
const LIFT = 16;

/**
 * The natural place of each σ-axis name: centred under its dot, or, when it would touch a
 * neighbour's name, pushed to the outer side (the lower value's name to the left, the higher one's
 * to the right). The collision pass then resolves what this simple rule cannot (three names on one spot).
 */
export function staggered<T extends { cx: number }>(
  marks: readonly T[],
): (T & { anchor: LabelSpot["anchor"]; dx: number })[] {
  const out = [...marks]
    .sort((a, b) => a.cx - b.cx)
    .map((m) => ({ ...m, anchor: "middle" as LabelSpot["anchor"], dx: 0 }));
  for (let i = 1; i < out.length; i++) {
    if (Math.abs(out[i].cx - out[i - 1].cx) >= NAME_GAP) continue;
    if (out[i - 1].anchor === "middle") Object.assign(out[i - 1], { anchor: "end", dx: -3 });
    Object.assign(out[i], { anchor: "start", dx: 3 });
  }
  return out;
}

/**
 * A principal stress's name "σ1" (σz's "σ2 (z)") on the σ axis: 14 units below it, or 6 above it
 * for the in-plane pair of the plane picture; it steps further away from the axis when crowded.
 */
export function principalLabelRequest(
  m: {
    key: string;
    name: string;
    outOfPlane: boolean;
    cx: number;
    cy: number;
    anchor: LabelSpot["anchor"];
    dx: number;
  },
  above: boolean,
): LabelRequest {
  const y = above ? m.cy - 6 : m.cy + 14;
  return {
    id: `principal-${m.key}`,
    size: monoTextSize(MOHR_LABEL_FONT, "σ", m.name, m.outOfPlane ? " (z)" : " "),
    candidates: [
      { x: m.cx + m.dx, y, anchor: m.anchor },
      { x: m.cx - 3, y, anchor: "end" },
      { x: m.cx + 3, y, anchor: "start" },
    ],
    step: above ? -1 : 1,
  };
}

/** A point's name (x′, y′, z′): up and to the right of it, lifted a line or two, then to its left. */
export function pointLabelRequest(
  id: string,
  text: string,
  cx: number,
  cy: number,
  dx: number,
  dy: number,
): LabelRequest {
  return {
    id,
    size: monoTextSize(MOHR_LABEL_FONT, text),
    candidates: [
      { x: cx + dx, y: cy - dy, anchor: "start" },
      { x: cx + dx, y: cy - dy - LIFT, anchor: "start" },
      { x: cx + dx, y: cy - dy - 2 * LIFT, anchor: "start" },
      { x: cx - dx, y: cy - dy, anchor: "end" },
    ],
    step: -1,
  };
}

/** "τmax = 79.06" at its spot, stepping away from the circle when taken. */
export function maxShearLabelRequest(spot: LabelSpot, sub: string, text: string, step: -1 | 1): LabelRequest {
  return {
    id: "max-shear",
    size: monoTextSize(MOHR_LABEL_FONT, "τ", sub, ` = ${text}`),
    candidates: [spot],
    step,
  };
}
