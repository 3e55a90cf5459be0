/**
 * Where U+0000 (NUL) occurs in parsed input. PostgreSQL text cannot hold it (the driver
 * stored a NUL as a backslash and a zero), and no engineer's text needs it, so every text
 * field refuses it; a body-level search covers every field of every route at once.
 */

const NUL = "\u0000";

/** A path segment as it is reported: a NUL inside a key is shown escaped. */
const segment = (key: string | number) => String(key).replaceAll(NUL, "\\u0000");

/** A place in the input: its key and the place that holds it (paths are built only when needed). */
type Place = { key: string | number; parent: Place | null };

const pathOf = (place: Place | null): string[] => {
  const path: string[] = [];
  for (let p = place; p; p = p.parent) path.push(segment(p.key));
  return path.reverse();
};

/**
 * Paths (e.g. ["states", "0", "note"]) of every string or object key that holds a NUL.
 * Walks with its own stack: a body may nest deeper than the call stack allows.
 */
export function nulCharacterPaths(root: unknown): string[][] {
  const found: string[][] = [];
  const stack: { value: unknown; place: Place | null }[] = [{ value: root, place: null }];
  while (stack.length) {
    const { value, place } = stack.pop()!;
    if (typeof value === "string") {
      if (value.includes(NUL)) found.push(pathOf(place));
    } else if (value && typeof value === "object") {
      const isArray = Array.isArray(value);
      for (const [key, item] of Object.entries(value)) {
        const itemPlace = { key: isArray ? Number(key) : key, parent: place };
        if (key.includes(NUL)) found.push(pathOf(itemPlace));
        else if (typeof item === "string" || (item && typeof item === "object"))
          stack.push({ value: item, place: itemPlace });
      }
    }
  }
  return found.reverse();
}

export const NUL_MESSAGE = "must not contain the NUL character (U+0000)";
