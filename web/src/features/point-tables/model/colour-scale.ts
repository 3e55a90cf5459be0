/**
 * Utilisation as colour: cividis, a sequential scale designed to read alike to colour-blind eyes
 * and in greyscale (d3-scale-chromatic, through d3), from 0 to an open top at 1.5, so the required factor
 * (u = 1) sits two thirds along. The legend is the product's own: a strip with ticks at round
 * utilisations and the line u = 1 named as the required factor.
 */
import { interpolateCividis } from "d3";

/** The top of the scale: every utilisation at or above it takes the last colour. */
export const COLOUR_TOP = 1.5;
/** Entries of the colour table the scatter reads (one per step of 1.5/255). */
export const COLOUR_STEPS = 256;

/** The colour table: `COLOUR_STEPS` RGB triples in 0..1, from u = 0 to u = COLOUR_TOP. */
export function colourTable(): Float32Array {
  const out = new Float32Array(3 * COLOUR_STEPS);
  for (let k = 0; k < COLOUR_STEPS; k++) {
    const rgb = /rgb\((\d+), (\d+), (\d+)\)/.exec(interpolateCividis(k / (COLOUR_STEPS - 1)));
    if (rgb === null) throw new Error("interpolateCividis gave an unexpected colour string");
    for (let c = 0; c < 3; c++) out[3 * k + c] = Number(rgb[c + 1]) / 255;
  }
  return out;
}

/** The table entry for a utilisation (NaN — no criterion rated — takes the first). */
export function colourStep(u: number): number {
  if (!(u > 0)) return 0;
  return Math.min(COLOUR_STEPS - 1, Math.round((u / COLOUR_TOP) * (COLOUR_STEPS - 1)));
}

/** Writes one RGB triple per point into `out` (3 per point), from the table. */
export function fillColours(utilisation: Float64Array, table: Float32Array, out: Float32Array): Float32Array {
  if (out.length < 3 * utilisation.length) throw new RangeError("out must hold 3 entries per point");
  for (let i = 0; i < utilisation.length; i++) {
    const k = 3 * colourStep(utilisation[i]);
    out[3 * i] = table[k];
    out[3 * i + 1] = table[k + 1];
    out[3 * i + 2] = table[k + 2];
  }
  return out;
}

/** A CSS colour for a utilisation (legend, histogram bars). */
export const utilisationColour = (u: number) => interpolateCividis(colourStep(u) / (COLOUR_STEPS - 1));

export type LegendTick = { u: number; at: number; label: string; required: boolean };

/**
 * The legend's ticks: every `step` from 0 to the top (the last labelled "≥"), each with its place
 * along the strip (0..1); the tick at u = 1 is the required factor.
 */
export function legendTicks(step = 0.25): LegendTick[] {
  if (!(step > 0)) throw new RangeError(`step must be > 0, got ${step}`);
  const ticks: LegendTick[] = [];
  const n = Math.round(COLOUR_TOP / step);
  for (let k = 0; k <= n; k++) {
    const u = Number((k * step).toFixed(6));
    ticks.push({
      u,
      at: u / COLOUR_TOP,
      label: k === n ? `≥ ${u.toFixed(2)}` : u.toFixed(2),
      required: u === 1,
    });
  }
  return ticks;
}
