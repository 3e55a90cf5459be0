/**
 * Issue 9 §7: `npm start` from a clone the postgres user cannot enter (a root user's home, a
 * mode-700 temp folder) keeps its private cluster where PostgreSQL can reach it.
 */
import { chmod, chown, mkdir, mkdtemp, rm, symlink } from "node:fs/promises";
import { execFileSync } from "node:child_process";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { ClusterError, chooseDataDir, prepareDataDir, serverCanEnter, startCluster } from "../../db/cluster";

const isRoot = process.getuid?.() === 0;
const never = async () => false;
const always = async () => true;

describe("where npm start keeps its private cluster", () => {
  it("when SIGMACUBE_DATA_DIR is set, then that folder is used whatever the checkout", async () => {
    const choice = await chooseDataDir({ explicit: "some/data", checkoutDir: "/x/app", canEnter: never });
    expect(choice).toEqual({
      dir: path.resolve("some/data"),
      reason: "set by SIGMACUBE_DATA_DIR",
      kind: "explicit",
    });
  });

  it("when PostgreSQL can enter the checkout, then the cluster lives in its .data folder", async () => {
    const choice = await chooseDataDir({ checkoutDir: "/x/app", canEnter: always });
    expect(choice).toMatchObject({ dir: "/x/app/.data", kind: "checkout" });
  });

  it("when PostgreSQL cannot enter the checkout, then a folder per checkout under the system folder is used and the log says why", async () => {
    const asked: string[] = [];
    const canEnter = async (dir: string) => (asked.push(dir), false);
    const first = await chooseDataDir({
      checkoutDir: "/x/home/work/sigmacube",
      canEnter,
      systemDir: "/x/system-tmp",
    });
    const again = await chooseDataDir({
      checkoutDir: "/x/home/work/sigmacube/",
      canEnter,
      systemDir: "/x/system-tmp",
    });
    const other = await chooseDataDir({
      checkoutDir: "/x/home/other/sigmacube",
      canEnter,
      systemDir: "/x/system-tmp",
    });
    expect(first.kind).toBe("system");
    expect(first.dir).toMatch(/^\/x\/system-tmp\/sigmacube-[0-9a-f]{12}$/);
    expect(again.dir, "the same checkout finds the same data on every start").toBe(first.dir);
    expect(other.dir, "two checkouts never share a cluster").not.toBe(first.dir);
    expect(first.reason).toMatch(/cannot enter \/x\/home\/work\/sigmacube/);
    expect(asked[0]).toBe("/x/home/work/sigmacube");
  });
});

describe.runIf(isRoot)("the postgres user's reach, for real (as root)", () => {
  const dirs: string[] = [];
  afterAll(async () => {
    for (const dir of dirs) await rm(dir, { recursive: true, force: true });
  });

  it("when a folder is mode 700 and owned by root, then serverCanEnter says no, and yes for a folder inside a 755 one", async () => {
    const closed = await mkdtemp(path.join(os.tmpdir(), "sigmacube-closed-")); // mkdtemp makes mode 700
    const open = await mkdtemp(path.join(os.tmpdir(), "sigmacube-open-"));
    dirs.push(closed, open);
    await chmod(open, 0o755);
    expect(await serverCanEnter(closed)).toBe(false);
    expect(await serverCanEnter(open)).toBe(true);
    const choice = await chooseDataDir({ checkoutDir: closed, canEnter: serverCanEnter });
    expect(choice.kind).toBe("system");
  });

  it("when the per-checkout folder is made, then it is mode 755; when one exists but is a link or someone else's, then it is refused", async () => {
    const systemDir = await mkdtemp(path.join(os.tmpdir(), "sigmacube-system-"));
    dirs.push(systemDir);
    const dir = path.join(systemDir, "sigmacube-aaaaaaaaaaaa");
    await prepareDataDir({ dir, reason: "test", kind: "system" });
    expect(execFileSync("stat", ["-c", "%a", dir], { encoding: "utf8" }).trim()).toBe("755");

    const link = path.join(systemDir, "sigmacube-bbbbbbbbbbbb");
    await symlink(dir, link);
    await expect(prepareDataDir({ dir: link, reason: "test", kind: "system" })).rejects.toThrow(
      /not a folder owned by this user/,
    );
    const foreign = path.join(systemDir, "sigmacube-cccccccccccc");
    await mkdir(foreign);
    const postgresUid = Number(execFileSync("id", ["-u", "postgres"], { encoding: "utf8" }));
    await chown(foreign, postgresUid, postgresUid);
    await expect(prepareDataDir({ dir: foreign, reason: "test", kind: "system" })).rejects.toThrow(
      ClusterError,
    );
  });

  it("when SIGMACUBE_DATA_DIR points into a folder the postgres user cannot enter, then starting says so and what to do", async () => {
    const closed = await mkdtemp(path.join(os.tmpdir(), "sigmacube-closed-"));
    dirs.push(closed);
    await expect(startCluster({ baseDir: path.join(closed, "postgres") })).rejects.toThrow(
      /postgres user cannot enter .*SIGMACUBE_DATA_DIR/s,
    );
  });
});
