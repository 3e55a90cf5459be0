import path from "node:path";
import { mkdir } from "node:fs/promises";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RunningServer } from "../../api/server";
import { launchChromium, screenshotDir, signUpInContext } from "../support/browser";
import { startTestServer } from "../support/server";

// Item 10 of issue 10: the Content-Security-Policy the server sends must not break the built app.
// Every page kind is opened in Chromium while the browser's own CSP violation events are recorded.
declare global {
  interface Window {
    cspViolations: string[];
  }
}

describe("the built app under its Content-Security-Policy in Chromium", () => {
  let server: RunningServer;
  let browser: Browser;
  let closeBrowser: () => Promise<void>;
  let context: BrowserContext;
  let page: Page;
  const consoleProblems: string[] = [];
  let workspaceId = "";
  let projectId = "";

  const post = async (url: string, data: unknown) => {
    const response = await context.request.post(`${server.url}/api${url}`, {
      data,
      headers: { Origin: server.url },
    });
    expect(response.status(), await response.text()).toBe(201);
    return response.json();
  };

  beforeAll(async () => {
    server = await startTestServer();
    ({ browser, close: closeBrowser } = await launchChromium());
    context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    await context.addInitScript(() => {
      window.cspViolations = [];
      document.addEventListener("securitypolicyviolation", (e) => {
        window.cspViolations.push(
          `${e.violatedDirective} blocked ${e.blockedURI || "inline"} at ${e.sourceFile}:${e.lineNumber}`,
        );
      });
    });
    await signUpInContext(context, server.url, "Mira Castellan");
    workspaceId = (await post("/workspaces", { name: "Policy checks" })).workspace.id;
    projectId = (await post(`/workspaces/${workspaceId}/projects`, { name: "Header vessel" })).project.id;
    const base = `/workspaces/${workspaceId}/projects/${projectId}`;
    const location = (await post(`${base}/locations`, { name: "nozzle" })).location.id;
    await post(`${base}/load-cases`, {
      name: "Design",
      states: [
        {
          locationId: location,
          stress: { unit: "MPa", components: { xx: 120, yy: 60, zz: 0, xy: 15, yz: 0, zx: 0 } },
        },
      ],
    });
    page = await context.newPage();
    page.on("console", (message) => {
      if (/Content Security Policy|Refused to/i.test(message.text())) consoleProblems.push(message.text());
    });
    page.on("pageerror", (error) => consoleProblems.push(error.message));
    await mkdir(screenshotDir, { recursive: true });
  });
  afterAll(async () => {
    await closeBrowser?.();
    await server?.close();
  });

  it("when the bench opens, then the 3D element draws with WebGL, the fonts load, and nothing is refused", async () => {
    const response = await page.goto(`${server.url}/bench`, { waitUntil: "networkidle" });
    expect(response?.headers()["content-security-policy"]).toContain("script-src 'self'");
    await page.getByTestId("element-3d").waitFor();
    const hasWebGl = await page.evaluate(() => {
      const canvas = document.querySelector("[data-testid=element-3d] canvas") as HTMLCanvasElement | null;
      return Boolean(canvas?.getContext("webgl2") ?? canvas?.getContext("webgl"));
    });
    expect(hasWebGl).toBe(true);
    const loadedFonts = await page.evaluate(async () => {
      await document.fonts.ready;
      return [...document.fonts].filter((f) => f.status === "loaded").map((f) => f.family.replace(/"/g, ""));
    });
    expect(loadedFonts.some((f) => /JetBrains Mono/.test(f))).toBe(true);
    expect(loadedFonts.some((f) => /Source Sans/.test(f))).toBe(true);
    // The stylesheet applies (a page without its CSS falls back to the browser's serif).
    expect(await page.evaluate(() => getComputedStyle(document.body).fontFamily)).toMatch(/Source Sans/);
    expect(await page.evaluate(() => window.cspViolations)).toEqual([]);
    expect(consoleProblems).toEqual([]);
    await page.screenshot({ path: path.join(screenshotDir, "csp-bench.png") });
  });

  for (const [label, route] of [
    ["the workspaces list", () => "/workspaces"],
    ["the projects of a workspace", () => `/workspaces/${workspaceId}/projects`],
    ["a project", () => `/workspaces/${workspaceId}/projects/${projectId}`],
    ["the comparison", () => `/workspaces/${workspaceId}/projects/${projectId}/comparison`],
    ["the account page", () => "/account"],
    ["the members of a workspace", () => `/workspaces/${workspaceId}/members`],
    ["the workspace settings", () => `/workspaces/${workspaceId}/settings`],
    ["the development mailbox", () => "/dev/mailbox"],
    ["a page that does not exist", () => "/no-such-page"],
  ] as const) {
    it(`when ${label} opens, then no resource or style is refused by the policy`, async () => {
      await page.goto(`${server.url}${route()}`, { waitUntil: "networkidle" });
      await page.locator("main").first().waitFor();
      expect(await page.evaluate(() => window.cspViolations)).toEqual([]);
      expect(consoleProblems).toEqual([]);
    });
  }

  it("when a worker is started from a blob, then it runs (worker-src allows what a built worker needs)", async () => {
    const answer = await page.evaluate(
      () =>
        new Promise<number>((resolve, reject) => {
          const source = new Blob(["postMessage(6 * 7)"], { type: "text/javascript" });
          const worker = new Worker(URL.createObjectURL(source));
          worker.onmessage = (e) => resolve(e.data as number);
          worker.onerror = () => reject(new Error("worker refused"));
        }),
    );
    expect(answer).toBe(42);
  });

  it("when a script is injected inline, then the browser refuses it (the policy is in force)", async () => {
    const ran = await page.evaluate(async () => {
      const script = document.createElement("script");
      script.textContent = "window.inlineRan = true";
      document.head.append(script);
      await new Promise((resolve) => setTimeout(resolve, 50));
      return (window as unknown as { inlineRan?: boolean }).inlineRan === true;
    });
    expect(ran).toBe(false);
    expect((await page.evaluate(() => window.cspViolations)).join("\n")).toMatch(/script-src/);
  });
});
