/**
 * The six independent components of a symmetric stress tensor, declared once for the engine
 * (core/tensor) and the wire schemas (core/contract). Imports nothing.
 */

/** The six component names in the batch storage order: xx yy zz xy yz zx. */
export const COMPONENTS = ["xx", "yy", "zz", "xy", "yz", "zx"] as const;

/** One of the six component names. */
export type Component = (typeof COMPONENTS)[number];
