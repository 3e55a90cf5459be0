/**
 * Issue 9 §7: `npm test` (its "pretest" script) and `npm start` set a fresh machine up: npm
 * dependencies when node_modules does not match the lock file, Debian's postgresql and chromium
 * when missing — installed as root, otherwise a message that says exactly what to install.
 * scripts/setup.mjs runs here from a copy in a temp "checkout" with a small lock file of its own,
 * as the unprivileged user `nobody` when the tests run as root, so nothing is ever installed.
 */
import { spawnSync } from "node:child_process";
import { chmod, copyFile, mkdir, mkdtemp, rm, writeFile } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { repoRoot } from "../../scripts/web-build";

const isRoot = process.getuid?.() === 0;
let checkout = "";

/** Runs node with `args` as an unprivileged user, in the temp checkout. */
function runUnprivileged(args: string[], env: Record<string, string> = {}) {
  const command = isRoot ? "runuser" : process.execPath;
  const argv = isRoot ? ["-u", "nobody", "--", process.execPath, ...args] : args;
  const result = spawnSync(command, argv, {
    cwd: checkout,
    env: { PATH: process.env.PATH ?? "", ...env },
    encoding: "utf8",
  });
  return { code: result.status, stdout: result.stdout, stderr: result.stderr };
}

/** Whether setup.mjs in the temp checkout finds the npm dependencies missing or stale. */
function dependenciesMissing(): boolean {
  const module = JSON.stringify(path.join(checkout, "scripts", "setup.mjs"));
  const result = runUnprivileged([
    "--input-type=module",
    "-e",
    `const m = await import(${module}); console.log(JSON.stringify(m.dependenciesMissing()));`,
  ]);
  expect(result.stderr).toBe("");
  return JSON.parse(result.stdout) as boolean;
}

const lock = (packages: Record<string, unknown>) => JSON.stringify({ lockfileVersion: 3, packages });
const wanted = {
  "": { name: "x" },
  "node_modules/alpha": { version: "1.2.3" },
  "node_modules/@esbuild/other-platform": { version: "0.1.0", optional: true },
};

describe("the set-up that npm test and npm start run first", () => {
  beforeAll(async () => {
    checkout = await mkdtemp(path.join(os.tmpdir(), "sigmacube-setup-"));
    await mkdir(path.join(checkout, "scripts"));
    await mkdir(path.join(checkout, "node_modules"));
    await copyFile(path.join(repoRoot, "scripts", "setup.mjs"), path.join(checkout, "scripts", "setup.mjs"));
    await writeFile(path.join(checkout, "package-lock.json"), lock(wanted));
    for (const dir of [checkout, path.join(checkout, "scripts"), path.join(checkout, "node_modules")]) {
      await chmod(dir, 0o755);
    }
  });
  afterAll(async () => {
    await rm(checkout, { recursive: true, force: true });
  });

  const installed = (packages: Record<string, unknown>) =>
    writeFile(path.join(checkout, "node_modules", ".package-lock.json"), lock(packages));

  it("when node_modules holds the locked versions (platform-only optional packages absent), then nothing is missing", async () => {
    await installed({ "node_modules/alpha": { version: "1.2.3" } });
    expect(dependenciesMissing()).toBe(false);
  });

  it("when node_modules has another version, lacks a package or was never installed, then npm ci is due", async () => {
    await installed({ "node_modules/alpha": { version: "1.2.2" } });
    expect(dependenciesMissing()).toBe(true);
    await installed({});
    expect(dependenciesMissing()).toBe(true);
    await rm(path.join(checkout, "node_modules", ".package-lock.json"));
    expect(dependenciesMissing()).toBe(true);
  });

  it("when everything is there, then the set-up exits 0 without a word (npm test stays fast)", async () => {
    await installed({ "node_modules/alpha": { version: "1.2.3" } });
    // The real PostgreSQL check applies; any existing file stands in for Chromium.
    const result = runUnprivileged(["scripts/setup.mjs", "test"], { CHROMIUM_PATH: process.execPath });
    expect(result).toEqual({ code: 0, stdout: "", stderr: "" });
  });

  it("when Chromium is missing and the user is not root, then it exits 1 and says exactly what to install", async () => {
    await installed({ "node_modules/alpha": { version: "1.2.3" } });
    const result = runUnprivileged(["scripts/setup.mjs", "test"], { CHROMIUM_PATH: "/nonexistent/chromium" });
    expect(result.code).toBe(1);
    expect(result.stderr).toContain("npm test needs Debian packages that are not installed: chromium.");
    expect(result.stderr).toContain("sudo apt-get install -y chromium");
    expect(result.stderr).toContain("CHROMIUM_PATH");
  });

  it("when npm start runs, then Chromium is not asked for", async () => {
    await installed({ "node_modules/alpha": { version: "1.2.3" } });
    const result = runUnprivileged(["scripts/setup.mjs", "start"], {
      CHROMIUM_PATH: "/nonexistent/chromium",
    });
    expect(result).toEqual({ code: 0, stdout: "", stderr: "" });
  });
});
