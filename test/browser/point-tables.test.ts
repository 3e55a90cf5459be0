import { createHash } from "node:crypto";
import { readFileSync, readdirSync } from "node:fs";
import path from "node:path";
import { AxeBuilder } from "@axe-core/playwright";
import type { BrowserContext, Page } from "playwright-core";
import { beforeAll, describe, expect, it } from "vitest";
import { seededRandom } from "../../core/testing/fixtures";
import { screenshotDir, signUpInContext } from "../support/browser";
import { signedInBrowser } from "../support/signed-in-browser";

/**
 * Whether the server half of point tables is in this checkout: the API mounts its routes from
 * api/routes/*.ts (project-area.ts and its neighbours), so one of them names "point-tables".
 * The web half was built before the server half was merged; until then the tests that store a
 * table are skipped, and the lead runs them after the merge.
 */
const serverHasPointTables = readdirSync(path.resolve("api/routes"))
  .filter((f) => f.endsWith(".ts"))
  .some((f) => readFileSync(path.resolve("api/routes", f), "utf8").includes("point-tables"));

const ROWS = 100_000;
/** The one point far above the rest: uniaxial 300 MPa, so von Mises = Tresca = 300 MPa (formula). */
const HOT_ID = 77_777;

/**
 * A generated table: id, x y z on a plate, six components in MPa. Every point but one carries a
 * mild state (|σ| < 50 MPa); point HOT_ID carries σxx = 300 MPa: against SA-516 Grade 70's
 * Sy = 260 MPa (the published grade's figure in the product) n = 0.87 < 1.5, so it fails and governs.
 */
function generatedTable(): Buffer {
  const lines = ["id,x,y,z,sxx,syy,szz,sxy,syz,szx"];
  const random = seededRandom(12_345);
  for (let i = 1; i <= ROWS; i++) {
    const x = (i % 400) * 0.5;
    const y = Math.floor(i / 400) * 0.5;
    const s =
      i === HOT_ID
        ? [300, 0, 0, 0, 0, 0]
        : Array.from({ length: 6 }, (_, k) => Number(((random() - 0.5) * (k < 3 ? 90 : 40)).toFixed(2)));
    lines.push([i, x, y, 0, ...s].join(","));
  }
  return Buffer.from(lines.join("\n") + "\n");
}

async function projectWithCase(page: Page, origin: string) {
  const headers = { Origin: origin };
  const post = async (url: string, data: unknown) => {
    const r = await page.request.post(`${origin}/api${url}`, { data, headers });
    if (r.status() >= 300) throw new Error(`${url}: ${r.status()} ${await r.text()}`);
    return r.json();
  };
  const ws = (await post("/workspaces", { name: "Nozzle team" })).workspace.id as string;
  const project = (
    await post(`/workspaces/${ws}/projects`, {
      name: "Nozzle N2",
      requirements: [
        { criterion: "von-mises", requiredFactor: 1.5 },
        { criterion: "tresca", requiredFactor: 1.5 },
      ],
      defaultMaterial: { kind: "published", id: "sa516-70" },
    })
  ).project.id as string;
  const caseId = (
    await post(`/workspaces/${ws}/projects/${project}/load-cases`, { name: "Operating", category: "design" })
  ).loadCase.id as string;
  return {
    path: `/workspaces/${ws}/projects/${project}/load-cases/${caseId}/point-tables`,
    projectPath: `/workspaces/${ws}/projects/${project}`,
    workspacePath: `/workspaces/${ws}`,
  };
}

describe("point tables in the browser: reading and rating", () => {
  const world = signedInBrowser("Pia Tabler");
  let file: Buffer;
  beforeAll(() => {
    file = generatedTable();
  });

  it("when a 100,000-row file is dropped in, then the mapping is guessed, the workers rate it, and the governing point and the caution are shown", async () => {
    const page = await world.editor.newPage();
    page.setDefaultTimeout(30_000);
    const { path: tablesPath, projectPath } = await projectWithCase(page, world.server.url);
    // the load case's row links to its point tables
    await page.goto(`${world.server.url}${projectPath}`, { waitUntil: "networkidle" });
    await page.getByRole("link", { name: "Point tables" }).click();
    await page.waitForURL(`**${tablesPath}`);

    await page
      .getByTestId("point-table-file")
      .setInputFiles({ name: "nozzle.csv", mimeType: "text/csv", buffer: file });
    // the guess from the header names: σxx is column 5
    await expect.poll(() => page.getByLabel("Role of column 5", { exact: true }).inputValue()).toBe("xx");
    expect(await page.getByLabel("Role of column 1", { exact: true }).inputValue()).toBe("id");
    await page.getByRole("button", { name: "Read and rate the points" }).click();
    const results = page.getByTestId("point-table-results");
    await results.waitFor();
    expect(await results.innerText()).toContain(`${ROWS.toLocaleString("en-US")} points read and rated`);
    const governing = await page.getByTestId("governing-points").innerText();
    expect(governing).toContain(String(HOT_ID));
    expect(governing).toContain("fails");
    expect(await page.getByTestId("results-caution").count()).toBe(1);
    // the worst list starts with the hot point, and its bench link carries its state
    const firstRow = page.getByTestId("worst-points").locator("tbody tr").first();
    expect(await firstRow.innerText()).toContain(String(HOT_ID));
    expect(await firstRow.getByRole("link", { name: "bench" }).getAttribute("href")).toMatch(
      /^\/bench\?s=300,0,0,0,0,0&u=MPa$/,
    );
    await page.screenshot({ path: path.join(screenshotDir, "point-tables-results.png"), fullPage: true });
  });

  it("when a column is given a second role, then the mapping names the component left without one and reading waits", async () => {
    const page = await world.editor.newPage();
    const { path: tablesPath } = await projectWithCase(page, world.server.url);
    await page.goto(`${world.server.url}${tablesPath}`, { waitUntil: "networkidle" });
    await page
      .getByTestId("point-table-file")
      .setInputFiles({ name: "small.csv", mimeType: "text/csv", buffer: file.subarray(0, 4000) });
    // column 5 holds σxx; making it the id leaves σxx without a column
    await page.getByLabel("Role of column 5", { exact: true }).selectOption("id");
    expect(await page.getByTestId("mapping-issues").innerText()).toContain("Choose the column that holds xx");
    expect(await page.getByRole("button", { name: "Read and rate the points" }).isDisabled()).toBe(true);
  });

  it("when the page is phone-wide, then the results fit without the page scrolling sideways", async () => {
    const page = await world.editor.newPage();
    await page.setViewportSize({ width: 390, height: 800 });
    const { path: tablesPath } = await projectWithCase(page, world.server.url);
    await page.goto(`${world.server.url}${tablesPath}`, { waitUntil: "networkidle" });
    await page
      .getByTestId("point-table-file")
      .setInputFiles({ name: "small.csv", mimeType: "text/csv", buffer: file.subarray(0, 40_000) });
    await page.getByRole("button", { name: "Read and rate the points" }).click();
    await page.getByTestId("point-table-results").waitFor();
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    await page.screenshot({ path: path.join(screenshotDir, "point-tables-phone.png"), fullPage: true });
    expect(overflow).toBeLessThanOrEqual(0);
  });
});

describe.skipIf(!serverHasPointTables)(
  "point tables in the browser: storing and keeping (needs the server half)",
  () => {
    const world = signedInBrowser("Kip Storer");

    it("when one upload is cancelled and another completes, then one table is stored, and the governing point kept as a location shows in the comparison", async () => {
      const page = await world.editor.newPage();
      page.setDefaultTimeout(30_000);
      const file = generatedTable();
      const { path: tablesPath } = await projectWithCase(page, world.server.url);
      await page.goto(`${world.server.url}${tablesPath}`, { waitUntil: "networkidle" });
      await page
        .getByTestId("point-table-file")
        .setInputFiles({ name: "nozzle.csv", mimeType: "text/csv", buffer: file });
      await page.getByRole("button", { name: "Read and rate the points" }).click();
      await page.getByTestId("point-table-results").waitFor();

      // The first upload is slowed (Chromium's network emulation) so that Cancel comes before its end.
      const cdp = await page.context().newCDPSession(page);
      await cdp.send("Network.enable");
      await cdp.send("Network.emulateNetworkConditions", {
        offline: false,
        latency: 0,
        downloadThroughput: -1,
        uploadThroughput: 256 * 1024,
      });
      await page.getByRole("button", { name: "Store the table in the project" }).click();
      const progress = page.getByTestId("upload-progress");
      await progress.waitFor();
      await progress.getByRole("button", { name: "Cancel" }).click();
      await page.getByText("The upload was cancelled; nothing of it was kept.").waitFor();
      await cdp.send("Network.emulateNetworkConditions", {
        offline: false,
        latency: 0,
        downloadThroughput: -1,
        uploadThroughput: -1,
      });

      await page.getByRole("button", { name: "Store the table in the project" }).click();
      await page.getByTestId("upload-done").waitFor();
      expect(await page.getByTestId("upload-done").innerText()).toContain(ROWS.toLocaleString("en-US"));
      await expect.poll(() => page.getByTestId("stored-tables").locator("tbody tr").count()).toBe(1);

      // von Mises and Tresca are governed by the same point, so one point is chosen
      await page.getByRole("button", { name: "Keep 1 chosen point as locations" }).click();
      const kept = page.getByTestId("kept-locations");
      await kept.waitFor();
      const names = (await kept.innerText()).replace(/^Kept as locations: /, "").split(".")[0];
      await kept.getByRole("link", { name: "See them in the comparison" }).click();
      await page.waitForURL("**/comparison**");
      await page.getByText(names).first().waitFor();
      await page.screenshot({
        path: path.join(screenshotDir, "point-tables-comparison.png"),
        fullPage: true,
      });
    });
  },
);

/**
 * Stores `file` as a point table through the API, as the page's "Store the table in the project"
 * does (declare, then send the bytes), and answers the table's id.
 */
async function storeThroughApi(
  page: Page,
  origin: string,
  tablesPath: string,
  file: Buffer,
): Promise<string> {
  const headers = { Origin: origin };
  const declared = await page.request.post(`${origin}/api${tablesPath}`, {
    headers,
    data: {
      fileName: "nozzle.csv",
      sizeBytes: file.length,
      sha256: createHash("sha256").update(file).digest("hex"),
      layout: { separator: ",", decimal: ".", skipRows: 0, header: true },
      columns: { id: 0, x: 1, y: 2, z: 3, xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9 },
      unit: "MPa",
      idKind: "number",
    },
  });
  if (declared.status() !== 201) throw new Error(`declare: ${declared.status()} ${await declared.text()}`);
  const tableId = ((await declared.json()) as { id: string }).id;
  const sent = await page.request.put(`${origin}/api${tablesPath}/${tableId}/content`, {
    headers: { ...headers, "Content-Type": "text/csv" },
    data: file,
    timeout: 120_000,
  });
  if (sent.status() !== 200) throw new Error(`content: ${sent.status()} ${await sent.text()}`);
  return tableId;
}

/** A new account in its own context, joined to the workspace with `role` through a share link. */
async function member(
  world: { browser: { newContext: (o: object) => Promise<BrowserContext> } },
  owner: Page,
  origin: string,
  workspacePath: string,
  role: "viewer" | "reviewer",
  name: string,
): Promise<BrowserContext> {
  const headers = { Origin: origin };
  const link = await owner.request.post(`${origin}/api${workspacePath}/share-links`, {
    headers,
    data: { role, expiresInDays: 1 },
  });
  const url = ((await link.json()) as { url: string }).url;
  const context = await world.browser.newContext({ viewport: { width: 1280, height: 900 } });
  await signUpInContext(context, origin, name);
  const joined = await context.request.post(`${origin}/api/share-links/${url.split("/").pop()}/join`, {
    headers,
  });
  if (joined.status() >= 300) throw new Error(`join: ${joined.status()} ${await joined.text()}`);
  return context;
}

/** The governing point per criterion as the server reports it (GET …/:tableId), by criterion. */
async function serverGoverning(page: Page, origin: string, tablesPath: string, tableId: string) {
  const detail = (await (await page.request.get(`${origin}/api${tablesPath}/${tableId}`)).json()) as {
    evaluation: { perCriterion: { criterion: string; governing: { id: number | string } | null }[] };
  };
  return detail.evaluation.perCriterion.map((c) => ({ criterion: c.criterion, id: c.governing?.id ?? null }));
}

describe.skipIf(!serverHasPointTables)(
  "point tables in the browser: opening a stored table's results",
  () => {
    const world = signedInBrowser("Ola Opener", { width: 1280, height: 900 });
    let file: Buffer;
    let tables: { path: string; projectPath: string; workspacePath: string };
    let tableId: string;
    let page: Page;
    beforeAll(async () => {
      file = generatedTable();
      page = await world.editor.newPage();
      page.setDefaultTimeout(30_000);
      tables = await projectWithCase(page, world.server.url);
      tableId = await storeThroughApi(page, world.server.url, tables.path, file);
    }, 180_000);

    it("when an editor opens a stored table's results from the list, then the address names the table, the governing point per criterion is the one the server reports, the worst list draws only a window of its rows, axe finds nothing serious, and the governing point can be kept", async () => {
      await page.goto(`${world.server.url}${tables.path}`, { waitUntil: "networkidle" });
      await page.getByRole("link", { name: "Open the results of nozzle.csv" }).click();
      await page.waitForURL(`**${tables.path}?table=${tableId}`);
      const results = page.getByTestId("stored-table-results");
      await results.waitFor();

      const server = await serverGoverning(page, world.server.url, tables.path, tableId);
      // von Mises and Tresca: the hot point HOT_ID governs both (uniaxial 300 MPa, formula)
      expect(server.map((c) => c.id)).toEqual([HOT_ID, HOT_ID]);
      const rows = page.getByTestId("governing-points").locator("tbody tr");
      expect(await rows.count()).toBe(server.length);
      for (let k = 0; k < server.length; k++) {
        const cells = await rows.nth(k).locator("td").allInnerTexts();
        // cells: n required, governing point, x y z, n, u, verdict, …
        expect(cells[1]).toBe(String(server[k].id));
      }
      expect(await page.getByTestId("governing-points").innerText()).toContain("fails");
      expect(await page.getByTestId("results-caution").count()).toBe(1);
      expect(await results.innerText()).toContain(`${ROWS.toLocaleString("en-US")} points stored`);
      // this browser's rating of every point agrees with the server's
      expect(await page.getByTestId("rating-disagrees").count()).toBe(0);

      // the worst list: 1,000 points listed, a window of them drawn; scrolled to the end, the last is drawn
      const worst = page.getByTestId("worst-points");
      const firstRow = worst.locator("tbody tr:not([aria-hidden])").first();
      expect(await firstRow.innerText()).toContain(String(HOT_ID));
      expect(await firstRow.getByRole("link", { name: "bench" }).getAttribute("href")).toMatch(
        /^\/bench\?s=300,0,0,0,0,0&u=MPa$/,
      );
      expect(await worst.locator("tbody tr:not([aria-hidden])").count()).toBeLessThan(60);
      await worst.evaluate((el) => el.scrollTo(0, el.scrollHeight));
      await expect
        .poll(() => worst.locator("tbody tr:not([aria-hidden])").last().locator("td").nth(1).innerText())
        .not.toBe(String(HOT_ID));
      expect(await worst.locator("tbody tr:not([aria-hidden])").count()).toBeLessThan(60);
      // an editor may keep the governing point
      expect(await page.getByRole("button", { name: "Keep 1 chosen point as locations" }).count()).toBe(1);

      const axe = await new AxeBuilder({ page }).include('[data-testid="stored-table-results"]').analyze();
      expect(axe.violations.filter((v) => v.impact === "serious" || v.impact === "critical")).toEqual([]);
      await page.screenshot({
        path: path.join(screenshotDir, "point-tables-stored-1280.png"),
        fullPage: true,
      });

      // the governing point, ticked to begin with, is kept as a location from the stored table
      await page.getByRole("button", { name: "Keep 1 chosen point as locations" }).click();
      const kept = page.getByTestId("stored-kept-locations");
      await kept.waitFor();
      expect(await kept.innerText()).toContain(String(HOT_ID));
    });

    it("when a viewer and a reviewer open the copied link, then they see the same governing point and nothing to keep or delete", async () => {
      const server = await serverGoverning(page, world.server.url, tables.path, tableId);
      for (const [role, name] of [
        ["viewer", "Vida Reader"],
        ["reviewer", "Rhea Checker"],
      ] as const) {
        const context = await member(world, page, world.server.url, tables.workspacePath, role, name);
        const reader = await context.newPage();
        reader.setDefaultTimeout(30_000);
        await reader.goto(`${world.server.url}${tables.path}?table=${tableId}`, { waitUntil: "networkidle" });
        await reader.getByTestId("stored-table-results").waitFor();
        const rows = reader.getByTestId("governing-points").locator("tbody tr");
        for (let k = 0; k < server.length; k++) {
          expect((await rows.nth(k).locator("td").allInnerTexts())[1]).toBe(String(server[k].id));
        }
        expect(await reader.getByRole("button", { name: /Keep .* as locations/ }).count()).toBe(0);
        expect(await reader.getByRole("checkbox", { name: /Keep point/ }).count()).toBe(0);
        expect(await reader.getByRole("button", { name: /Delete point table/ }).count()).toBe(0);
        await context.close();
      }
    });

    it("when the points' download is cancelled, then nothing is shown until the engineer downloads them again", async () => {
      const slow = await world.editor.newPage();
      slow.setDefaultTimeout(30_000);
      const cdp = await slow.context().newCDPSession(slow);
      await cdp.send("Network.enable");
      // 7.2 MB of columns at 256 kB/s: the download is still running when Cancel is pressed
      await cdp.send("Network.emulateNetworkConditions", {
        offline: false,
        latency: 0,
        downloadThroughput: 256 * 1024,
        uploadThroughput: -1,
      });
      await slow.goto(`${world.server.url}${tables.path}?table=${tableId}`);
      const progress = slow.getByTestId("columns-progress");
      await progress.waitFor();
      await progress.getByRole("button", { name: "Cancel" }).click();
      await slow.getByTestId("columns-cancelled").waitFor();
      expect(await slow.getByTestId("stored-table-results").count()).toBe(0);
      await cdp.send("Network.emulateNetworkConditions", {
        offline: false,
        latency: 0,
        downloadThroughput: -1,
        uploadThroughput: -1,
      });
      await slow.getByRole("button", { name: "Open the results again" }).click();
      await slow.getByTestId("stored-table-results").waitFor();
      expect(await slow.getByTestId("governing-points").innerText()).toContain(String(HOT_ID));
      await slow.close();
    });

    it("when the stored results are opened phone-wide, then they fit without the page scrolling sideways", async () => {
      const phone = await world.editor.newPage();
      phone.setDefaultTimeout(30_000);
      await phone.setViewportSize({ width: 390, height: 800 });
      await phone.goto(`${world.server.url}${tables.path}?table=${tableId}`, { waitUntil: "networkidle" });
      await phone.getByTestId("stored-table-results").waitFor();
      const overflow = await phone.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
      await phone.screenshot({
        path: path.join(screenshotDir, "point-tables-stored-390.png"),
        fullPage: true,
      });
      expect(overflow).toBeLessThanOrEqual(0);
      await phone.close();
    });
  },
);
