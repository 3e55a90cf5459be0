import { createHash } from "node:crypto";
import path from "node:path";
import type { Browser, BrowserContext } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RunningServer } from "../../api/server";
import { launchChromium, screenshotDir, signUpInContext } from "../support/browser";
import { startTestServer } from "../support/server";

/**
 * A linear hoop stress σyy = 200 − 20·d MPa through a 10 mm wall at 11 points, with σxx = −1 and
 * σzz = 50 MPa: membrane 100 MPa and bending ±100 MPa of the hoop stress (a linear distribution
 * is membrane + bending, common practice, no source).
 */
const PATH_TEXT = [
  "d\tsxx\tsyy\tszz\tsxy\tsyz\tszx",
  ...Array.from({ length: 11 }, (_, i) => [i, -1, 200 - 20 * i, 50, 0, 0, 0].join("\t")),
].join("\n");

/**
 * The same wall as a stored finite-element point table: nodes along global x at x = 0 … 10 mm,
 * listed from the outside in, plus nodes of a neighbouring wall 3 mm away that must not be picked.
 */
const TABLE_CSV = [
  "node,x,y,z,sxx,syy,szz,sxy,syz,szx",
  ...Array.from({ length: 11 }, (_, k) => {
    const i = 10 - k;
    return [500 + i, i, 0, 0, -1, 200 - 20 * i, 50, 0, 0, 0].join(",");
  }),
  ...Array.from({ length: 11 }, (_, i) => [600 + i, i, 3, 0, 0, 999, 0, 0, 0, 0].join(",")),
  "",
].join("\n");

describe("the linearization page", () => {
  let server: RunningServer;
  let browser: Browser;
  let closeBrowser: () => Promise<void>;
  let owner: BrowserContext;
  let projectPath: string;
  let caseId: string;

  beforeAll(async () => {
    server = await startTestServer();
    ({ browser, close: closeBrowser } = await launchChromium());
    owner = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    await signUpInContext(owner, server.url, "Lin Owner");
    const post = async (url: string, data: unknown) => {
      const r = await owner.request.post(`${server.url}/api${url}`, {
        data,
        headers: { Origin: server.url },
      });
      if (r.status() >= 300) throw new Error(`${url}: ${r.status()} ${await r.text()}`);
      return r.json();
    };
    const ws = `/workspaces/${(await post("/workspaces", { name: "Wall checks" })).workspace.id}`;
    const projectId = (await post(`${ws}/projects`, { name: "Nozzle N2" })).project.id;
    projectPath = `${ws}/projects/${projectId}`;
    await post(`${projectPath}/locations`, { name: "nozzle junction" });
    caseId = (await post(`${projectPath}/load-cases`, { name: "Design pressure" })).loadCase.id;
    const declared = await post(`${projectPath}/load-cases/${caseId}/point-tables`, {
      fileName: "junction-nodes.csv",
      sizeBytes: Buffer.byteLength(TABLE_CSV),
      sha256: createHash("sha256").update(TABLE_CSV).digest("hex"),
      layout: { separator: ",", decimal: ".", skipRows: 0, header: true },
      columns: { id: 0, x: 1, y: 2, z: 3, xx: 4, yy: 5, zz: 6, xy: 7, yz: 8, zx: 9 },
      unit: "MPa",
      idKind: "number",
    });
    const put = await owner.request.put(
      `${server.url}/api${projectPath}/load-cases/${caseId}/point-tables/${declared.id}/content`,
      { data: TABLE_CSV, headers: { Origin: server.url, "Content-Type": "text/csv" } },
    );
    if (put.status() !== 200) throw new Error(`point table content: ${put.status()} ${await put.text()}`);
  }, 60_000);
  afterAll(async () => {
    await closeBrowser?.();
    await server?.close();
  });

  it("when an editor pastes a path, then the category checks appear with their sources; when the line is saved, then it is listed in the comparison", async () => {
    const page = await owner.newPage();
    page.setDefaultTimeout(15_000);
    await page.goto(`${server.url}${projectPath}/linearization?case=${caseId}`, { waitUntil: "networkidle" });
    await page.getByLabel("Name", { exact: true }).fill("Junction, inside to outside");
    await page.getByLabel("Location", { exact: true }).selectOption({ label: "nozzle junction" });
    await page.getByLabel("Points from one surface to the other").fill(PATH_TEXT);
    await page.getByLabel("Allowable S").fill("138");
    await expect.poll(() => page.getByTestId("path-read").innerText()).toContain("Read 11 points");

    const checks = page.getByTestId("checks-table");
    await checks.waitFor();
    const rows = await checks.locator("tbody tr").allInnerTexts();
    expect(rows.map((r) => r.split("\t")[0].trim())).toEqual(["PL ≤ 1.5S", "PL + Pb ≤ 1.5S"]);
    // Membrane + bending at the inside: (−1, 200, 50) MPa, von Mises √32751 = 180.97 MPa against 1.5 × 138 = 207
    // (von Mises formula, common practice, no source): ratio 0.874, a pass.
    expect(rows[1]).toContain("181.0");
    expect(rows[1]).toContain("207.0");
    expect(rows[1]).toContain("0.874");
    expect(rows[1]).toContain("passes");
    expect(await page.getByText(/Source of PL ≤ 1\.5S.*recalled from memory/).count()).toBe(1);
    await page.getByTestId("distribution-plot").waitFor();
    expect(await page.getByTestId("results-caution").count()).toBe(1);
    await page.screenshot({ path: path.join(screenshotDir, "linearization.png"), fullPage: true });

    await page.getByRole("button", { name: "Save the line" }).click();
    await page.getByRole("status").filter({ hasText: "Saved." }).waitFor();
    await page
      .getByTestId("saved-lines")
      .getByRole("button", { name: "Junction, inside to outside" })
      .waitFor();

    await page.getByRole("link", { name: "comparison", exact: true }).click();
    const table = page.getByTestId("linearization-checks");
    await table.waitFor();
    const text = await table.innerText();
    expect(text).toContain("Junction, inside to outside");
    expect(text).toContain("Design pressure at nozzle junction");
    expect(text).toContain("PL + Pb ≤ 1.5S");
    await page.screenshot({
      path: path.join(screenshotDir, "linearization-in-comparison.png"),
      fullPage: true,
    });
  });

  it("when an editor picks the path from a stored point table by its two ends and a tolerance, then the page says how many points it found and the path gives the same checks as the pasted one", async () => {
    const page = await owner.newPage();
    page.setDefaultTimeout(15_000);
    await page.goto(`${server.url}${projectPath}/linearization?case=${caseId}`, { waitUntil: "networkidle" });
    await page.getByText("Pick from a point table of this load case").click();
    await page
      .getByLabel("Point table", { exact: true })
      .selectOption({ label: "junction-nodes.csv — 22 points" });
    for (const [axis, value] of [
      ["x", "0"],
      ["y", "0"],
      ["z", "0"],
    ]) {
      await page.getByLabel(`First end ${axis}`).fill(value);
    }
    for (const [axis, value] of [
      ["x", "10"],
      ["y", "0"],
      ["z", "0"],
    ]) {
      await page.getByLabel(`Second end ${axis}`).fill(value);
    }
    await page.getByLabel(/^Tolerance/).fill("0.5");
    await expect
      .poll(() => page.getByTestId("pick-summary").innerText())
      .toContain('11 points of "junction-nodes.csv" within the tolerance');
    expect(await page.getByTestId("pick-summary").innerText()).toContain("Ready to use: 11 points in MPa");
    await page.getByRole("button", { name: "Use these 11 points as the path" }).click();
    await expect.poll(() => page.getByTestId("path-read").innerText()).toContain("Read 11 points");
    expect(await page.getByLabel("Points from one surface to the other").inputValue()).toMatch(
      /^distance\ts/,
    );
    await page.getByLabel("Allowable S").fill("138");
    const checks = page.getByTestId("checks-table");
    await checks.waitFor();
    // The same wall as PATH_TEXT, sorted from x = 0 (inside) out: membrane + bending at the inside
    // is (−1, 200, 50) MPa, von Mises 181.0 against 207.0, ratio 0.874 (von Mises formula, common
    // practice, no source).
    await expect.poll(async () => (await checks.locator("tbody tr").allInnerTexts())[1]).toContain("0.874");
    await page.screenshot({ path: path.join(screenshotDir, "linearization-picked.png"), fullPage: true });
    await page.close();
  });

  it("when a saved line is opened at phone width, then its checks are shown and the page does not scroll sideways", async () => {
    const phone = await browser.newContext({ viewport: { width: 390, height: 844 } });
    await phone.addCookies(await owner.cookies());
    const page = await phone.newPage();
    page.setDefaultTimeout(15_000);
    await page.goto(`${server.url}${projectPath}/linearization?case=${caseId}`, { waitUntil: "networkidle" });
    await page
      .getByTestId("saved-lines")
      .getByRole("button", { name: "Junction, inside to outside" })
      .click();
    await page.getByTestId("checks-table").waitFor();
    expect(await page.getByLabel("Points from one surface to the other").inputValue()).toContain("syy");
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await page.screenshot({ path: path.join(screenshotDir, "linearization-phone.png"), fullPage: true });
    await phone.close();
  });
});
