/**
 * The words of the cautions that stand beside every result: on screen, in copied text, in
 * exports and in reports. One place, so the wording never drifts between them.
 */

/** Beside every verdict and in every report or export. */
export const RESULTS_CAUTION =
  "Sigmacube is a screening and checking tool. Results assume linear-elastic material and small strains; the governing design code and a licensed engineer decide whether a design is acceptable.";
