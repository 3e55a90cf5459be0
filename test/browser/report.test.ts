import path from "node:path";
import type { Browser, BrowserContext } from "playwright-core";
import { extractText } from "unpdf";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RunningServer } from "../../api/server";
import { launchChromium, screenshotDir, signUpInContext } from "../support/browser";
import { startTestServer } from "../support/server";

const SECTIONS = ["cover", "scope", "inputs", "method", "location-1", "location-2", "comparison", "cautions"];

describe("the draft report's print page", () => {
  let server: RunningServer;
  let browser: Browser;
  let closeBrowser: () => Promise<void>;
  let owner: BrowserContext;
  let projectPath: string;

  beforeAll(async () => {
    server = await startTestServer();
    ({ browser, close: closeBrowser } = await launchChromium());
    owner = await browser.newContext({ viewport: { width: 1280, height: 800 }, acceptDownloads: true });
    await signUpInContext(owner, server.url, "Rhea Reportwright");
    const post = async (url: string, data: unknown) => {
      const response = await owner.request.post(`${server.url}/api${url}`, {
        data,
        headers: { Origin: server.url },
      });
      if (response.status() >= 300) throw new Error(`${url}: ${response.status()} ${await response.text()}`);
      return response.json();
    };
    const ws = `/workspaces/${(await post("/workspaces", { name: "Report checks" })).workspace.id}`;
    const projectId = (
      await post(`${ws}/projects`, {
        name: "CT-7 shell",
        defaultMaterial: { kind: "published", id: "sa516-70" },
      })
    ).project.id;
    projectPath = `${ws}/projects/${projectId}`;
    const shell = (await post(`${projectPath}/locations`, { name: "mid-shell" })).location.id;
    const head = (await post(`${projectPath}/locations`, { name: "head junction" })).location.id;
    const mpa = (xx: number, yy: number, xy = 0) => ({
      unit: "MPa",
      components: { xx, yy, zz: 0, xy, yz: 0, zx: 0 },
    });
    await post(`${projectPath}/load-cases`, {
      name: "Design",
      category: "design",
      states: [
        { locationId: shell, stress: mpa(120, 60) },
        { locationId: head, stress: mpa(90, -30, 40) },
      ],
    });
    await post(`${projectPath}/load-cases`, {
      name: "Hydrostatic test",
      category: "test",
      states: [
        { locationId: shell, stress: mpa(160, 80) },
        { locationId: head, stress: mpa(150, -60, 50) },
      ],
    });
  }, 90_000);
  afterAll(async () => {
    await closeBrowser?.();
    await server?.close();
  });

  it("when opened from the project page's “Report (draft)” link, then every section, one Mohr figure per row, the watermark and the caution (once) are there", async () => {
    const page = await owner.newPage();
    page.setDefaultTimeout(15_000);
    await page.goto(`${server.url}${projectPath}`, { waitUntil: "networkidle" });
    await page.getByRole("link", { name: "Report (draft)" }).click();
    await page.getByTestId("report-section-cautions").waitFor();
    for (const id of SECTIONS) expect(await page.getByTestId(`report-section-${id}`).count(), id).toBe(1);
    expect(await page.getByTestId("report-section-location-1").locator("h2").innerText()).toBe(
      "Location: mid-shell",
    );
    // Two load cases at each of two locations: four states, each with its Mohr figure.
    expect(await page.locator("[data-report] figure svg").count()).toBe(4);
    expect(await page.getByTestId("report-watermark").innerText()).toBe("DRAFT — not checked");
    expect(await page.getByTestId("results-caution").count()).toBe(1);
    expect(await page.getByTestId("report-section-comparison").innerText()).toMatch(
      /^Governs: .+ at .+, SF \d/m,
    );
    await page.screenshot({ path: path.join(screenshotDir, "report-page.png"), fullPage: false });
    await page.close();
  });

  it("when printed, then navigation and buttons are left out, each location starts a new page, and page.pdf() gives a PDF whose every page carries the watermark, the draft it is and “page n of m”", async () => {
    const page = await owner.newPage();
    page.setDefaultTimeout(15_000);
    await page.goto(`${server.url}${projectPath}/report`, { waitUntil: "networkidle" });
    await page.getByTestId("report-section-cautions").waitFor();
    await page.emulateMedia({ media: "print" });
    expect(await page.locator("body header").first().isVisible()).toBe(false);
    expect(await page.getByRole("button", { name: "Download PDF" }).isVisible()).toBe(false);
    expect(await page.getByRole("button", { name: "Print" }).isVisible()).toBe(false);
    const breaks = await page
      .locator("[data-testid^=report-section-location]")
      .evaluateAll((sections) => sections.map((s) => getComputedStyle(s).breakBefore));
    expect(breaks).toEqual(["page", "page"]);
    const pdf = await page.pdf({ preferCSSPageSize: true, printBackground: true });
    expect(pdf.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    const { text, totalPages } = await extractText(new Uint8Array(pdf), { mergePages: false });
    expect(totalPages).toBeGreaterThan(3);
    text.forEach((pageText, i) => {
      const flat = pageText.replace(/\s+/g, " ");
      expect(flat, `printed page ${i + 1}`).toContain("DRAFT — not checked");
      expect(flat, `printed page ${i + 1}`).toContain(`page ${i + 1} of ${totalPages}`);
      expect(flat, `printed page ${i + 1}`).toContain("DRAFT of CT-7 shell · project");
    });
    await page.close();
  });

  it("when Download PDF is pressed on the project page, then the server's PDF is saved under its file name", async () => {
    const page = await owner.newPage();
    page.setDefaultTimeout(30_000);
    await page.goto(`${server.url}${projectPath}`, { waitUntil: "networkidle" });
    const [download] = await Promise.all([
      page.waitForEvent("download"),
      page.getByRole("button", { name: "Download PDF" }).click(),
    ]);
    expect(download.suggestedFilename()).toBe("ct-7-shell-draft-report.pdf");
    const file = await download.path();
    expect(file).not.toBeNull();
    await page.close();
  });
});
