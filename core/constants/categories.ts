/**
 * How a load-case category is matched to the factors a project gives for it, declared once for
 * the engine (core/checks/requirements.ts) and the wire schemas (core/contract). Imports nothing.
 */

/**
 * How a category is matched: trimmed and case-insensitive, so "Test" on a load case finds the
 * factors given for "test". The empty category (a case with none) always takes the defaults.
 */
export function categoryKey(category: string): string {
  return category.trim().toLowerCase();
}
