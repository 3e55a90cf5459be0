import path from "node:path";

export type OutsidePath = { line: number; literal: string; why: string };

/**
 * System folders a test must not read from: a user's clone does not have our machine's layout.
 * `/usr/…` (Chromium, PostgreSQL binaries) is the installed software tests drive, not data.
 */
const FOREIGN_ROOTS = /^\/(work|home|root|tmp|srv|mnt|media|var|etc|opt)(\/|$)/;

/** An import specifier is resolved by the module loader against its own file only. */
const IMPORT_LINE = /^\s*(import|export)\b|\bfrom\s+["']|\bimport\(|\bvi\.mock\(/;

/** The marker comment that exempts a line from the scan, e.g. a parent-folder segment sent in a URL. */
export const NOT_A_FILE_PATH = "scan: not a file path";

/**
 * Finds string literals in `source` (a file in `fileDir`) that point outside `repoRoot`: a relative
 * path that climbs above the repository from the file or from the repository root (where tests run
 * and where `path.resolve(repoRoot, …)` starts), or a foreign absolute path.
 */
export function findPathsOutsideRepo(source: string, fileDir: string, repoRoot: string): OutsidePath[] {
  const inside = (resolved: string) => resolved === repoRoot || resolved.startsWith(repoRoot + path.sep);
  const hits: OutsidePath[] = [];
  source.split("\n").forEach((text, index) => {
    // A line that says so holds a URL or other non-file text that merely looks like a path.
    if (text.includes(NOT_A_FILE_PATH)) return;
    for (const match of text.matchAll(/(["'`])((?:(?!\1)[^\\\n]|\\.)*)\1/g)) {
      const literal = match[2];
      const line = index + 1;
      if (FOREIGN_ROOTS.test(literal)) {
        hits.push({ line, literal, why: "absolute path outside the repository" });
      } else if (/^\.\.?(\/|$)/.test(literal)) {
        if (!inside(path.resolve(fileDir, literal))) {
          hits.push({ line, literal, why: "climbs out of the repository from its own file" });
        } else if (!IMPORT_LINE.test(text) && !inside(path.resolve(repoRoot, literal))) {
          hits.push({ line, literal, why: "climbs out of the repository from the repository root" });
        }
      }
    }
  });
  return hits;
}
