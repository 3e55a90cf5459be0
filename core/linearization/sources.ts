/**
 * Where the linearization method and the category limits come from. Every one was recalled from
 * memory while writing this code, not read from the standard, and says so: the engineer checks it
 * against the code edition they work to.
 */

export const RECALLED = "recalled from memory, verify against the code edition you work to";

/** The method: membrane, bending, peak; bending of the normal components perpendicular to the line. */
export const METHOD_SOURCE =
  "ASME BPVC Section VIII Division 2, Annex 5-A (linearization of stress results for stress " +
  "classification: membrane (1/t)∫σ dx of all components; bending (6/t²)∫σ(t/2 − x)dx of the normal " +
  "components perpendicular to the line only; peak = total − membrane − bending) — " +
  RECALLED;

/** What Annex 5-A's rule leaves out of the bending, and what it asks of the frame. */
export const ANNEX_5A_NOTE =
  "Bending was taken for σyy and σzz only (the normal stresses perpendicular to the line, Annex 5-A): " +
  "the linear parts of the through-thickness stress σxx and of the shears stay in the peak. The result " +
  "therefore depends on the in-plane axes: give secondAxis as the hoop or meridional direction of the " +
  "component when the default frame does not match them.";

/** Bending every component, as some practices do; departs from Annex 5-A's rule. */
export const BEND_ALL_NOTE =
  "Bending was taken for all six components (the 'bend every component' option), not only the two " +
  "normal components perpendicular to the line as Annex 5-A describes: the shear and through-thickness " +
  "components' linear parts count as bending instead of peak. Use it only where your practice asks for it.";

/** Equivalent stresses. */
export const EQUIVALENT_SOURCE = {
  "von-mises":
    "von Mises equivalent stress of each linearized tensor: the default of current editions of ASME " +
    "BPVC Section VIII Division 2, Part 5 — " +
    RECALLED,
  tresca:
    "Tresca stress intensity σ1 − σ3 of each linearized tensor, as older editions of ASME BPVC Section " +
    "VIII Division 2 and EN 13445-3 Annex C use — " +
    RECALLED,
} as const;

/** General primary membrane: Pm ≤ S. */
export const PM_SOURCE =
  "ASME BPVC Section VIII Division 2, Part 5 elastic stress analysis (general primary membrane " +
  "equivalent stress Pm ≤ S) — " +
  RECALLED;

/**
 * Local primary membrane PL ≤ SPL and primary membrane + bending ≤ SPL. SPL = 1.5S here; current
 * editions allow SPL = max(1.5S, Sy) unless Sy/Su > 0.7 or S is time-dependent (recalled from
 * memory); 1.5S is never larger, so this is on the safe side.
 */
export const PL_SOURCE =
  "ASME BPVC Section VIII Division 2, Part 5 elastic stress analysis (local primary membrane PL ≤ SPL " +
  "and primary membrane + bending PL + Pb ≤ SPL, with SPL = 1.5S used here; current editions may allow " +
  "SPL = max(1.5S, Sy) except when Sy/Su > 0.7 or S is time-dependent) — " +
  RECALLED;

/** Primary + secondary range: PL + Pb + Q ≤ SPS. */
export const SPS_SOURCE =
  "ASME BPVC Section VIII Division 2, Part 5 elastic stress analysis (primary plus secondary " +
  "equivalent stress range PL + Pb + Q ≤ SPS = max(3S, 2Sy), limited to 3S when Sy/Su > 0.7 or S is " +
  "governed by time-dependent properties; S and Sy averaged over the cycle's highest and lowest " +
  "temperatures) — " +
  RECALLED;
