import { mkdir } from "node:fs/promises";
import path from "node:path";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RunningServer } from "../../api/server";
import { launchChromium, screenshotDir, signUpInContext } from "../support/browser";
import { startTestServer } from "../support/server";

const shot = (page: Page, name: string) =>
  page.screenshot({ path: path.join(screenshotDir, `bench-input-${name}.png`), fullPage: true });

/** Reads a paste into the bench through its paste box. */
async function pasteIntoBox(page: Page, text: string) {
  await page.getByLabel(/Paste a tensor/).fill(text);
  await page.getByRole("button", { name: "Read", exact: true }).click();
}

// The paste-format rules checked here (ambiguous commas, the two offered orders, listing rows) are
// Sigmacube's product rules; the two shear orders are common practice, no source.
describe("input an engineer pastes, and results that never outlive their input (Chromium)", () => {
  let server: RunningServer;
  let browser: Browser;
  let closeBrowser: () => Promise<void>;
  let context: BrowserContext;
  let page: Page;
  const errors: string[] = [];

  beforeAll(async () => {
    server = await startTestServer();
    ({ browser, close: closeBrowser } = await launchChromium());
    context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    await signUpInContext(context, server.url, "Oda Brennick");
    await context.grantPermissions(["clipboard-read", "clipboard-write"], { origin: server.url });
    page = await context.newPage();
    page.setDefaultTimeout(10_000);
    page.on("pageerror", (error) => errors.push(error.message));
    await mkdir(screenshotDir, { recursive: true });
    await page.goto(`${server.url}/bench`, { waitUntil: "networkidle" });
    await page.getByTestId("criteria-table").waitFor();
  });
  afterAll(async () => {
    await closeBrowser?.();
    await server?.close();
  });

  it("when a grid cell holds 'abc' or 1e300, then every results panel says it is out of date and shows no verdict; Esc brings the results back", async () => {
    await page.getByRole("radio", { name: "3×3" }).click();
    await expect
      .poll(() => page.getByTestId("criteria-table").getByText("passes").count())
      .toBeGreaterThan(0);
    const cell = page.getByLabel("σxx", { exact: true });
    await cell.fill("abc");
    await cell.press("Tab");
    await page.getByText("σxx: “abc” is not a number").waitFor();
    // Principal stresses, element, Mohr, envelopes and criteria: five panels, one notice each.
    await expect.poll(() => page.getByTestId("results-out-of-date").count()).toBe(5);
    expect(await page.getByTestId("criteria-table").count()).toBe(0);
    expect(await page.getByTestId("principal-table").count()).toBe(0);
    expect(await page.getByText(/✓ passes|≈ close|✗ fails/).count()).toBe(0);
    expect(await page.getByRole("button", { name: "Copy results as text" }).isDisabled()).toBe(true);
    await shot(page, "out-of-date");

    await cell.focus();
    await cell.press("Escape");
    await cell.press("Tab");
    await expect.poll(() => page.getByTestId("results-out-of-date").count()).toBe(0);
    await page.getByTestId("criteria-table").waitFor();

    await cell.fill("1e300");
    await cell.press("Enter");
    await page.getByText(/σxx: is larger than 1e\+12 in magnitude/).waitFor();
    await expect.poll(() => page.getByTestId("results-out-of-date").count()).toBe(5);
    await cell.press("Escape");
    await expect.poll(() => page.getByTestId("results-out-of-date").count()).toBe(0);
  });

  it("when '1,5 2 3' is pasted with the decimal mark on 'ask', then it is refused as ambiguous with a choice; the comma choice reads σx = 1.5 and is remembered for this user after a reload", async () => {
    await pasteIntoBox(page, "1,5 2 3");
    await page.getByText(/'1,5' is ambiguous: the comma may be a decimal comma \(1\.5\)/).waitFor();
    await shot(page, "ambiguous-comma");
    await page.getByRole("button", { name: "Comma is the decimal mark (1,5 = 1.5)" }).click();
    await page.getByText(/Read as plane stress σx σy τxy/).waitFor();
    expect(await page.getByLabel("σx (MPa)").inputValue()).toBe("1.5");
    expect(await page.getByLabel("σy (MPa)").inputValue()).toBe("2");
    expect(await page.getByLabel("τxy (MPa)").inputValue()).toBe("3");

    await page.reload({ waitUntil: "networkidle" });
    expect(await page.getByLabel("Decimal mark").inputValue()).toBe(",");
    await pasteIntoBox(page, "12,5 30 4");
    await page.getByText(/Read as plane stress/).waitFor();
    expect(await page.getByLabel("σx (MPa)").inputValue()).toBe("12.5");

    // Another person in the same browser keeps their own choice.
    const other = await browser.newContext({ viewport: { width: 1280, height: 800 } });
    await signUpInContext(other, server.url, "Lev Marsh");
    const otherPage = await other.newPage();
    await otherPage.goto(`${server.url}/bench`, { waitUntil: "networkidle" });
    expect(await otherPage.getByLabel("Decimal mark").inputValue()).toBe("ask");
    await other.close();

    await page.getByLabel("Decimal mark").selectOption("ask");
    await pasteIntoBox(page, "150,0,,25");
    await page.getByText(/empty field \(two commas with nothing between them\) in '150,0,,25'/).waitFor();
  });

  it("when six bare values are pasted, then the paste box offers the two common orders in σ/τ symbols, and the chosen one places τyz and τxz", async () => {
    await pasteIntoBox(page, "150 20 0 25 5 -3");
    const choice = page.getByRole("button", { name: "Read as σx σy σz τxy τxz τyz" });
    await choice.waitFor();
    expect(await page.getByRole("button", { name: "Read as σx σy σz τxy τyz τxz" }).count()).toBe(1);
    expect(await page.getByText(/options\.order/).count()).toBe(0);
    await shot(page, "order-choice");
    await choice.click();
    await page.getByRole("radio", { name: "Six" }).click();
    expect(await page.getByLabel("τyz (MPa)").inputValue()).toBe("-3");
    expect(await page.getByLabel("τzx (MPa)").inputValue()).toBe("5");

    await pasteIntoBox(page, "Node SX SY SZ SXY SYZ SXZ\n101 150 20 0 25 0 0");
    await page.getByText(/Read as six components of node 101/).waitFor();
    expect(await page.getByLabel("σx (MPa)").inputValue()).toBe("150");
    expect(errors).toEqual([]);
  });
});

describe("the project page's state form takes a pasted matrix (Chromium)", () => {
  let server: RunningServer;
  let browser: Browser;
  let closeBrowser: () => Promise<void>;

  beforeAll(async () => {
    server = await startTestServer();
    ({ browser, close: closeBrowser } = await launchChromium());
  });
  afterAll(async () => {
    await closeBrowser?.();
    await server?.close();
  });

  it("when a 3×3 matrix is pasted into σxx, then all six fields take it and the saved state holds those components", async () => {
    const context = await browser.newContext({ viewport: { width: 1360, height: 900 } });
    await signUpInContext(context, server.url, "Ines Harrowby");
    await context.grantPermissions(["clipboard-read", "clipboard-write"], { origin: server.url });
    const headers = { Origin: server.url };
    const post = async (url: string, data: unknown) => {
      const r = await context.request.post(url, { data, headers });
      expect(r.status(), await r.text()).toBe(201);
      return r.json();
    };
    const workspaceId = (await post(`${server.url}/api/workspaces`, { name: "Harrowby Vessels" })).workspace
      .id;
    const api = `${server.url}/api/workspaces/${workspaceId}`;
    const projectId = (
      await post(`${api}/projects`, {
        name: "Nozzle N2",
        defaultMaterial: { kind: "published", id: "sa516-70" },
      })
    ).project.id;
    await post(`${api}/projects/${projectId}/locations`, { name: "nozzle crotch" });
    const caseId = (
      await post(`${api}/projects/${projectId}/load-cases`, { name: "Design", category: "design" })
    ).loadCase.id;

    const page = await context.newPage();
    page.setDefaultTimeout(10_000);
    await page.goto(`${server.url}/workspaces/${workspaceId}/projects/${projectId}`, {
      waitUntil: "networkidle",
    });
    await page.getByRole("button", { name: "Enter Design at nozzle crotch" }).click();
    await page.getByLabel("σxx (MPa)").click();
    await page.evaluate((t) => navigator.clipboard.writeText(t), "120\t-25\t0\n-25\t60\t10\n0\t10\t-30");
    await page.keyboard.press("Control+V");
    await page.getByText(/Read a 3×3 matrix \(no unit written: MPa\)/).waitFor();
    expect(await page.getByLabel("σxx (MPa)").inputValue()).toBe("120");
    expect(await page.getByLabel("σyy (MPa)").inputValue()).toBe("60");
    expect(await page.getByLabel("τxy (MPa)").inputValue()).toBe("-25");
    expect(await page.getByLabel("τyz (MPa)").inputValue()).toBe("10");
    expect(await page.getByLabel("Source").inputValue()).toBe("pasted");
    await shot(page, "state-form-paste");
    await page.getByRole("button", { name: "Save state" }).click();
    await page.getByRole("button", { name: "Edit Design at nozzle crotch" }).waitFor();
    const saved = await (
      await context.request.get(`${api}/projects/${projectId}/load-cases/${caseId}`)
    ).json();
    // 1 MPa = 1e6 Pa (SI prefix, common practice, no source).
    expect(saved.loadCase.states[0].componentsPa).toEqual({
      xx: 120e6,
      yy: 60e6,
      zz: -30e6,
      xy: -25e6,
      yz: 10e6,
      zx: 0,
    });

    // A row of six bare values asks for the order here too.
    await page.getByRole("button", { name: "Edit Design at nozzle crotch" }).click();
    await page.getByLabel(/Or paste a matrix or a row/).fill("150 20 0 25 5 -3");
    await page.getByRole("button", { name: "Read", exact: true }).click();
    await page.getByRole("button", { name: "Read as σx σy σz τxy τyz τxz" }).click();
    expect(await page.getByLabel("τyz (MPa)").inputValue()).toBe("5");
    expect(await page.getByLabel("τzx (MPa)").inputValue()).toBe("-3");
    await context.close();
  });
});
