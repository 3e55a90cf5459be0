/**
 * The verdicts of a check, declared once for the engine (core/checks/verdict.ts says when each
 * applies) and the wire schemas (core/contract). Imports nothing.
 */

/** Every verdict: the factor reaches the required one, reaches it by less than the close band, or falls short. */
export const VERDICTS = ["pass", "close", "fail"] as const;

/** Verdict of one check. */
export type Verdict = (typeof VERDICTS)[number];
