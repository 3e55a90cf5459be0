/**
 * The engine's name and version, written into every frozen record and report so a checker can
 * tell which computation produced a result. Raise ENGINE_VERSION whenever a change in core can
 * change a number or a verdict (a criterion, a tolerance, the eigen solver, the governing rule);
 * a record frozen by an older engine still shows the version it was frozen with. Imports nothing.
 */
export const ENGINE_NAME = "sigmacube-core";

/** year.month.serial of the last change to the results core computes. */
export const ENGINE_VERSION = "2026.12.1";
