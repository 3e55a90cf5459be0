/**
 * Label placement for diagrams: estimated text boxes and one collision-avoidance pass, so that no
 * two labels of a picture ever overlap, whatever the numbers (equal or near-equal principal
 * stresses put several names on one spot). Each label offers positions in order of preference,
 * the first being where it reads best; the pass keeps the first that is free and, when none is,
 * steps the label a line at a time (up or down, as the label asks) until it is.
 */

/** Where SVG text is anchored on its x (the text-anchor attribute). */
export type TextAnchor = "start" | "middle" | "end";

/** A text position: the baseline point and the anchor, as SVG text takes them. */
export type LabelSpot = { x: number; y: number; anchor: TextAnchor };

/** An axis-aligned box (top-left corner, width, height) in SVG units. */
export type Box = { x: number; y: number; width: number; height: number };

/** The size of a text: its advance width and how far it reaches above and below its baseline. */
export type TextSize = { width: number; ascent: number; descent: number };

/** Advance of one character of the diagrams' monospaced face (JetBrains Mono: 600/1000 em). */
export const MONO_ADVANCE_EM = 0.6;
/** Subscripts are set at this fraction of the font size and this far below the baseline (SVG units). */
export const SUBSCRIPT = { scale: 0.75, drop: 3 } as const;

/**
 * The size of a label set in the monospaced face: `text` at `fontSize`, then an optional subscript
 * and what follows it on the baseline (how the diagrams write σ₁, τmax).
 */
export function monoTextSize(fontSize: number, text: string, sub = "", after = ""): TextSize {
  const chars = (s: string) => [...s].length;
  const em = fontSize * MONO_ADVANCE_EM;
  return {
    width: em * (chars(text) + chars(after)) + em * SUBSCRIPT.scale * chars(sub),
    // Cap height and descenders of the face, plus the subscript's drop when there is one.
    ascent: 0.8 * fontSize,
    descent: 0.25 * fontSize + (sub ? SUBSCRIPT.drop : 0),
  };
}

/** The box a text of `size` covers at `spot`. */
export function labelBox(spot: LabelSpot, size: TextSize): Box {
  const left =
    spot.anchor === "start" ? spot.x : spot.anchor === "end" ? spot.x - size.width : spot.x - size.width / 2;
  return { x: left, y: spot.y - size.ascent, width: size.width, height: size.ascent + size.descent };
}

/** True when two boxes share any area (touching edges do not count). */
export function boxesOverlap(a: Box, b: Box): boolean {
  return a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
}

/** One label to place: its size, its positions in order of preference, and which way it may step. */
export type LabelRequest = {
  id: string;
  size: TextSize;
  /** At least one position; the first is the natural one. */
  candidates: readonly LabelSpot[];
  /** When every candidate is taken: step up (−1) or down (+1) from the first one, a line at a time. */
  step: -1 | 1;
};

/** A placed label: where it goes and the box it covers. */
export type PlacedLabel = LabelSpot & { id: string; box: Box };

/** Space kept between two labels' boxes (SVG units). */
export const LABEL_GAP = 1;

/** `box` grown by half the gap on every side, so that two grown boxes never come closer than the gap. */
function padded(box: Box): Box {
  const g = LABEL_GAP / 2;
  return { x: box.x - g, y: box.y - g, width: box.width + LABEL_GAP, height: box.height + LABEL_GAP };
}

/** True when the box lies inside `area` (labels outside the plot are clipped away). */
function inside(box: Box, area: Box | undefined): boolean {
  if (!area) return true;
  return (
    box.x >= area.x &&
    box.y >= area.y &&
    box.x + box.width <= area.x + area.width &&
    box.y + box.height <= area.y + area.height
  );
}

/**
 * Places every label so that no two boxes overlap, in the order given (earlier labels win their
 * natural spot).
 * @param requests labels in order of importance
 * @param area the drawing area, if labels should stay inside it: an alternative inside it is
 * preferred, and a label steps the other way when its own way would leave it
 * @returns one placed label per request, in the same order
 */
export function placeLabels(requests: readonly LabelRequest[], area?: Box): PlacedLabel[] {
  const placed: PlacedLabel[] = [];
  const free = (box: Box) => placed.every((p) => !boxesOverlap(padded(box), padded(p.box)));
  for (const r of requests) {
    if (r.candidates.length === 0) throw new RangeError(`label ${r.id}: no candidate position`);
    const options = r.candidates.map((spot) => ({ spot, box: labelBox(spot, r.size) }));
    // The natural spot when it is free (even if it runs past the area's edge, as it always has);
    // otherwise a free alternative inside the area, then any free alternative, then a step.
    const chosen =
      (free(options[0].box) ? options[0] : undefined) ??
      options.find((o) => free(o.box) && inside(o.box, area)) ??
      options.find((o) => free(o.box)) ??
      stepClear(options[0].spot, r, free, area);
    placed.push({ ...chosen.spot, id: r.id, box: chosen.box });
  }
  return placed;
}

/**
 * Steps a label from `start` a line at a time in its own direction until its box is free; if that
 * leaves the area first, tries the other direction. Terminates: the placed boxes are finitely many,
 * so some step clears them all.
 */
function stepClear(
  start: LabelSpot,
  r: LabelRequest,
  free: (box: Box) => boolean,
  area: Box | undefined,
): { spot: LabelSpot; box: Box } {
  const line = r.size.ascent + r.size.descent + LABEL_GAP;
  let fallback: { spot: LabelSpot; box: Box } | null = null;
  for (const dir of [r.step, -r.step]) {
    for (let k = 1; ; k++) {
      const spot = { ...start, y: start.y + dir * k * line };
      const box = labelBox(spot, r.size);
      if (free(box)) {
        if (inside(box, area)) return { spot, box };
        fallback ??= { spot, box };
        break;
      }
    }
  }
  // Free of every label but outside the area both ways: still never on another label.
  return fallback!;
}
