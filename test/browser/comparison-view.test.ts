import path from "node:path";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RunningServer } from "../../api/server";
import { launchChromium, screenshotDir } from "../support/browser";
import { browserTeam, type BrowserTeam } from "../support/browser-team";
import { startTestServer } from "../support/server";

describe("the comparison's view, headers and chart legend", () => {
  let server: RunningServer;
  let browser: Browser;
  let closeBrowser: () => Promise<void>;
  let team: BrowserTeam;

  beforeAll(async () => {
    server = await startTestServer();
    ({ browser, close: closeBrowser } = await launchChromium());
    team = await browserTeam(browser, server.url);
  }, 60_000);
  afterAll(async () => {
    await closeBrowser?.();
    await server?.close();
  });

  it("when the table is filtered and sorted, then Copy link to this page carries both, and the copied link opens the same view", async () => {
    const page = await team.contexts.owner.newPage();
    page.setDefaultTimeout(10_000);
    await page.goto(`${server.url}${team.projectPath}/comparison`, { waitUntil: "networkidle" });
    await page.getByLabel("Verdict").selectOption("close");
    await page.getByLabel("Filter rows").fill("mid");
    await page.getByRole("button", { name: /von Mises σvm/ }).click();
    const header = page.getByRole("columnheader", { name: /von Mises σvm/ });
    const sortedAs = await header.getAttribute("aria-sort");
    expect(sortedAs).not.toBeNull();
    const link = (await page
      .getByRole("button", { name: "Copy link to this page" })
      .getAttribute("data-link"))!;
    const params = new URL(link).searchParams;
    expect(params.get("f.verdict")).toBe("close");
    expect(params.get("q")).toBe("mid");
    expect(params.get("sort")).toMatch(/^-?vonMisesPa$/);

    const other = await team.contexts.viewer.newPage();
    other.setDefaultTimeout(10_000);
    await other.goto(link, { waitUntil: "networkidle" });
    expect(await other.getByLabel("Verdict").inputValue()).toBe("close");
    expect(await other.getByLabel("Filter rows").inputValue()).toBe("mid");
    expect(await other.getByRole("columnheader", { name: /von Mises σvm/ }).getAttribute("aria-sort")).toBe(
      sortedAs,
    );
    // Only the close row (the hydrostatic test, n = 1.58 against 1.5) is left.
    const rows = other.locator("tbody tr");
    expect(await rows.count()).toBe(1);
    expect(await rows.first().innerText()).toContain("Hydrostatic test");
  });

  it("when the comparison opens, then every column header names what it holds, stresses with their unit, and no header is empty", async () => {
    const page = await team.contexts.viewer.newPage();
    page.setDefaultTimeout(10_000);
    await page.goto(`${server.url}${team.projectPath}/comparison`, { waitUntil: "networkidle" });
    const headers = await page.locator("thead th").allInnerTexts();
    const words = headers.map((h) => h.replace(/[▲▼↕]/g, "").trim());
    expect(words.filter((h) => h === "")).toEqual([]);
    for (const stress of ["σ₁", "σ₂", "σ₃", "von Mises σvm", "Tresca σ₁−σ₃", "Max shear τmax"])
      expect(words).toContain(`${stress}, MPa`);
    expect(words).toContain("von Mises safety factor n / required");
    expect(words.some((h) => h.includes("S/n") || h.includes("SF /"))).toBe(false);
    // Each "Open in bench" link says which row it opens after its visible words.
    await page.getByRole("link", { name: /^Open in bench\W*Hydrostatic test at mid-shell$/ }).waitFor();
  });

  it("when the utilisation chart is drawn, then its dashed close-band line and the allowable line are named in a legend with their values", async () => {
    const page = await team.contexts.viewer.newPage();
    page.setDefaultTimeout(10_000);
    await page.goto(`${server.url}${team.projectPath}/comparison`, { waitUntil: "networkidle" });
    const legend = page.locator("figure figcaption");
    await legend.waitFor();
    const text = await legend.innerText();
    // 1/1.1 = 0.909…, the product's close band (n within 10 % above the required factor).
    expect(text).toContain("close-band edge, u = 1/1.1 ≈ 0.91");
    expect(text).toContain("allowable, u = 1");
    await page.screenshot({ path: path.join(screenshotDir, "comparison-legend.png"), fullPage: true });
  });
});
