/**
 * Bounds on stresses as a person or a file enters them, declared once for the engine (the paste
 * parser, core/tensor/validate.ts) and the wire schemas (core/contract). Imports nothing.
 */

/**
 * The largest stress magnitude accepted where a person or a file enters a stress (the paste parser,
 * the bench's cells, the API's stress input: `MAX_STRESS_MAGNITUDE` in core/contract/materials.ts),
 * in the unit it is written in. No real stress is near it (1e12 GPa); it exists so that converting
 * to Pa (× 6.9e6 at most, from ksi), superposing and squaring (von Mises, invariants) stay far
 * below the overflow of doubles (σ² overflows above about 1.3e154), and so that a stray exponent
 * (1e300 typed for 1e3) is refused instead of silently flattening every other component to zero
 * beside it.
 */
export const MAX_INPUT_STRESS = 1e12;

/**
 * Default relative tolerance for the symmetry check of an entered 3×3 matrix (the paste parser's
 * and the API's): |σij − σji| may be up to this fraction of the largest absolute entry.
 */
export const SYMMETRY_REL_TOL = 1e-6;
