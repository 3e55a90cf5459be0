/**
 * The yield and fracture criteria core rates a state with, declared once for the engine
 * (core/criteria) and the wire schemas (core/contract). Imports nothing.
 */

/** Every accepted criterion, in the order screens list them. */
export const CRITERIA = ["von-mises", "tresca", "max-principal", "mohr-coulomb", "modified-mohr"] as const;

/** A yield or fracture criterion. */
export type Criterion = (typeof CRITERIA)[number];
