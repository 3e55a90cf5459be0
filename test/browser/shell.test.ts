import { readdirSync } from "node:fs";
import { mkdir } from "node:fs/promises";
import path from "node:path";
import { AxeBuilder } from "@axe-core/playwright";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RunningServer } from "../../api/server";
import { launchChromium, screenshotDir } from "../support/browser";
import { startTestServer } from "../support/server";
import { webDist } from "../../scripts/web-build";

describe("the app shell in Chromium", () => {
  let server: RunningServer;
  let browser: Browser;
  let closeBrowser: () => Promise<void>;
  let page: Page;

  beforeAll(async () => {
    server = await startTestServer();
    ({ browser, close: closeBrowser } = await launchChromium());
    // axe needs a page from an explicit context.
    const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    page = await context.newPage();
    await mkdir(screenshotDir, { recursive: true });
  });
  afterAll(async () => {
    await closeBrowser?.();
    await server?.close();
  });

  it("when the home page loads, then the header, the purpose and the caution are there and the server reports healthy", async () => {
    const errors: string[] = [];
    page.on("pageerror", (error) => errors.push(error.message));
    await page.goto(server.url, { waitUntil: "networkidle" });
    await expect(page.getByRole("link", { name: "Sigmacube home" }).isVisible()).resolves.toBe(true);
    expect(await page.locator("h1").innerText()).toMatch(/calculation sheet/i);
    expect(await page.getByText("screening and checking tool").first().isVisible()).toBe(true);
    await page
      .getByRole("status")
      .getByText(/database PostgreSQL/)
      .waitFor();
    expect(await page.title()).toBe("Sigmacube");
    // Signed out, the page offers the way in; the sign-in link comes back to the bench.
    expect(await page.getByRole("link", { name: "Sign in to the bench" }).getAttribute("href")).toBe(
      "/sign-in?next=%2Fbench",
    );
    expect(errors).toEqual([]);
    await page.screenshot({ path: path.join(screenshotDir, "shell-home.png"), fullPage: true });
  });

  it("when the fonts have loaded, then the shipped text face and JetBrains Mono are in use", async () => {
    const fonts = await page.evaluate(async () => {
      await document.fonts.ready;
      const loaded = [...document.fonts]
        .filter((f) => f.status === "loaded")
        .map((f) => f.family.replace(/"/g, ""));
      return {
        loaded,
        sansCheck: document.fonts.check('16px "Source Sans 3 Variable"'),
        monoCheck: document.fonts.check('16px "JetBrains Mono"'),
        bodyFamily: getComputedStyle(document.body).fontFamily,
        numberFamily: getComputedStyle(document.querySelector(".num")!).fontFamily,
      };
    });
    expect(fonts.loaded).toContain("Source Sans 3 Variable");
    expect(fonts.loaded).toContain("JetBrains Mono");
    expect(fonts.sansCheck).toBe(true);
    expect(fonts.monoCheck).toBe(true);
    expect(fonts.bodyFamily).toMatch(/^"?Source Sans 3 Variable/);
    expect(fonts.numberFamily).toMatch(/^"?JetBrains Mono/);
  });

  it("when the app is built for the tests, then it is a production build (no React development runtime)", () => {
    // vitest sets NODE_ENV=test, which Vite would otherwise follow; npm start may serve this build.
    const assets = readdirSync(path.join(webDist, "assets"));
    expect(assets.some((file) => file.endsWith(".js"))).toBe(true);
    expect(assets.filter((file) => file.includes("jsx-dev-runtime"))).toEqual([]);
  });

  it("when fonts and assets load, then every request stays on the app's own origin (no CDN)", async () => {
    const foreign: string[] = [];
    page.on("request", (request) => {
      if (!request.url().startsWith(server.url) && !request.url().startsWith("data:"))
        foreign.push(request.url());
    });
    await page.reload({ waitUntil: "networkidle" });
    expect(foreign).toEqual([]);
  });

  it("when axe checks the home page, then there is no serious or critical violation", async () => {
    const results = await new AxeBuilder({ page }).analyze();
    const serious = results.violations.filter((v) => v.impact === "serious" || v.impact === "critical");
    expect(serious.map((v) => `${v.id}: ${v.help} (${v.nodes.length})`)).toEqual([]);
  });

  it("when an unknown page is opened, then the 404 page says so and links back", async () => {
    await page.goto(`${server.url}/no/such/page`, { waitUntil: "networkidle" });
    expect(await page.locator("h1").innerText()).toBe("No page at this address");
    expect(await page.getByText("/no/such/page").isVisible()).toBe(true);
    const results = await new AxeBuilder({ page }).analyze();
    expect(results.violations.filter((v) => v.impact === "serious" || v.impact === "critical")).toEqual([]);
    await page.screenshot({ path: path.join(screenshotDir, "shell-404.png") });
    await page.getByRole("link", { name: "Go to the overview" }).click();
    await page.waitForURL(`${server.url}/`);
  });
});
