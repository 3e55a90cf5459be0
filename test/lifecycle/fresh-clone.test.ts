/**
 * A fresh clone has nothing beside it: tests may read only files inside the repository. This scans
 * every file that tests load for path literals that leave the repository, so a fixture read from a
 * sibling folder fails here instead of on a user's machine with ENOENT.
 */
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { repoRoot } from "../../scripts/web-build";
import { findPathsOutsideRepo, NOT_A_FILE_PATH } from "./outside-paths";

/** Folders that hold no test code of ours. */
const SKIPPED_DIRS = new Set(["node_modules", "dist", ".git", ".data", "test-results"]);

/** Files a test run loads: test files anywhere, everything under test/, the fixtures in core/testing/. */
function testCodeFiles(dir: string, found: string[] = []): string[] {
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    if (SKIPPED_DIRS.has(entry.name)) continue;
    const full = path.join(dir, entry.name);
    const relative = path.relative(repoRoot, full);
    if (entry.isDirectory()) testCodeFiles(full, found);
    else if (
      /\.test\.tsx?$/.test(entry.name) ||
      (/\.(ts|mjs)$/.test(entry.name) &&
        (relative.startsWith(`test${path.sep}`) || relative.startsWith(path.join("core", "testing"))))
    )
      found.push(full);
  }
  return found;
}

describe("tests on a fresh clone", () => {
  it("when a test reads a sibling folder or a machine path, then the scan names the line", () => {
    // Built from pieces so that this file itself does not hold the paths it checks for.
    const oldRead = ["const casesFile = path.resolve(repoRoot, '../", "sibling", "/cases/cases.json');"];
    const source = [
      'import { startCluster } from "../../db/cluster";',
      oldRead.join(""),
      `const notes = readFileSync("/${"work"}/notes/x.md");`,
      'const fixture = readFileSync(path.join(here, "fixtures/a.json"));',
      `const sibling = readFileSync(path.resolve(repoRoot, "../${"other"}/data.csv"));`,
      `const segment = ".${"."}"; // sent in a URL (${NOT_A_FILE_PATH})`,
      `const unmarked = ".${"."}";`,
    ].join("\n");
    const hits = findPathsOutsideRepo(source, path.join(repoRoot, "test", "lifecycle"), repoRoot);
    expect(hits.map((h) => h.line)).toEqual([2, 3, 5, 7]);
  });

  it("when the test code is scanned, then no file names a path outside the repository", () => {
    const files = testCodeFiles(repoRoot);
    expect(files.length, "test files found").toBeGreaterThan(20);
    expect(files.map((f) => path.relative(repoRoot, f))).toContain(
      path.join("core", "reference-cases.test.ts"),
    );
    const escapes = files.flatMap((file) =>
      findPathsOutsideRepo(readFileSync(file, "utf8"), path.dirname(file), repoRoot).map(
        (hit) => `${path.relative(repoRoot, file)}:${hit.line} ${hit.literal} (${hit.why})`,
      ),
    );
    expect(escapes).toEqual([]);
  });
});
