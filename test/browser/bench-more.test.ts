import { mkdir } from "node:fs/promises";
import path from "node:path";
import { AxeBuilder } from "@axe-core/playwright";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RunningServer } from "../../api/server";
import { planeStress, principalValues, safetyFactor, type StressTensor } from "../../core";
import { launchChromium, screenshotDir, signUpInContext } from "../support/browser";
import { startTestServer } from "../support/server";

/** Reads σ′ from the readout's data attributes (full precision) as a tensor. */
async function readout(page: Page): Promise<StressTensor> {
  const v = await page.$$eval("[data-testid=rotated-readout] td[data-cell]", (cells) =>
    Object.fromEntries(cells.map((c) => [c.getAttribute("data-cell"), Number(c.getAttribute("data-value"))])),
  );
  return { xx: v["00"], yy: v["11"], zz: v["22"], xy: v["01"], yz: v["12"], zx: v["02"] };
}

/** Reads a paste into the bench through its paste box. */
async function pasteIntoBox(page: Page, text: string) {
  await page.getByLabel(/Paste a tensor/).fill(text);
  await page.getByRole("button", { name: "Read", exact: true }).click();
}

/** The nine grid cells' shown values, row by row. */
async function gridValues(page: Page): Promise<string[]> {
  const names = ["σxx", "τxy", "τxz", "τyx", "σyy", "τyz", "τzx", "τzy", "σzz"];
  const out: string[] = [];
  for (const name of names) out.push(await page.getByLabel(name, { exact: true }).inputValue());
  return out;
}

/** Numbers in a text, true minus signs read as minus. */
const numbers = (text: string) => (text.replace(/−/g, "-").match(/-?\d+(?:\.\d+)?/g) ?? []).map(Number);

/** The Mohr plot's σ and τ domains (data units) as the page draws them. */
async function mohrDomain(page: Page) {
  const svg = page.getByTestId("mohr-svg");
  const sigma = ((await svg.getAttribute("data-domain-sigma")) ?? "").split(" ").map(Number);
  const tau = ((await svg.getAttribute("data-domain-tau")) ?? "").split(" ").map(Number);
  return { sigma: [Math.min(...sigma), Math.max(...sigma)], tau: [Math.min(...tau), Math.max(...tau)] };
}

const STATE: StressTensor = { xx: 80, yy: -40, zz: 10, xy: 30, yz: -15, zx: 5 };

describe("the bench in Chromium: camera, grid paste, zoom and hover readouts", () => {
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
    await signUpInContext(context, server.url, "Teo Valdric");
    await context.grantPermissions(["clipboard-read", "clipboard-write"], { origin: server.url });
    page = await context.newPage();
    page.on("pageerror", (error) => errors.push(error.message));
    await mkdir(screenshotDir, { recursive: true });
    await page.goto(`${server.url}/bench`, { waitUntil: "networkidle" });
    await page.getByTestId("element-3d").waitFor();
  });
  afterAll(async () => {
    await closeBrowser?.();
    await server?.close();
  });

  it("when a 3×3 block is pasted from the clipboard while a grid cell has focus, then the grid takes the tensor (core's principal values) and keeps focus; a bad block shows the error and keeps the old values", async () => {
    await page.getByRole("radio", { name: "3×3" }).click();
    const cell = page.getByLabel("σxx", { exact: true });
    await cell.click();
    await page.evaluate((t) => navigator.clipboard.writeText(t), "120\t-25\t0\n-25\t60\t10\n0\t10\t-30");
    await page.keyboard.press("Control+V");
    await expect
      .poll(() => gridValues(page))
      .toEqual(["120", "-25", "0", "-25", "60", "10", "0", "10", "-30"]);
    // The focused cell shows the pasted value too, and still has focus.
    expect(await cell.inputValue()).toBe("120");
    await expect
      .poll(() => page.evaluate(() => document.activeElement?.getAttribute("id")))
      .toBe(await cell.getAttribute("id"));
    const pasted: StressTensor = { xx: 120, yy: 60, zz: -30, xy: -25, yz: 10, zx: 0 };
    const [s1] = principalValues(pasted);
    const shown = numbers(await page.getByTestId("sigma 1").locator("td").first().innerText())[0];
    expect(Math.abs(shown - s1)).toBeLessThanOrEqual(0.05 + 1e-9); // shown to 1 decimal here
    // A block with a letter O for a zero: the error names the place and nothing changes.
    await page.getByLabel("σyy", { exact: true }).click();
    await page.evaluate((t) => navigator.clipboard.writeText(t), "120 -25 0\n-25 6O 10\n0 10 -30");
    await page.keyboard.press("Control+V");
    const alert = page.getByRole("alert").filter({ hasText: "Not read" });
    await alert.waitFor();
    expect(await alert.innerText()).toMatch(/line 2/);
    expect(await gridValues(page)).toEqual(["120", "-25", "0", "-25", "60", "10", "0", "10", "-30"]);
    await page.screenshot({ path: path.join(screenshotDir, "bench-grid-paste-error.png") });
  });

  it("when the drag turns the view, then the picture changes but σ′ and the rotation do not; back on element, the same drag turns σ′", async () => {
    await pasteIntoBox(page, "80 30 5\n30 -40 -15\n5 -15 10");
    await page.getByRole("button", { name: "view", exact: true }).click();
    const element = page.getByTestId("element-3d");
    const before = await readout(page);
    const rotationBefore = await page.getByTestId("rotation-description").innerText();
    const shotBefore = await element.screenshot();
    const box = (await element.boundingBox())!;
    const drag = async () => {
      const cx = box.x + box.width / 2;
      const cy = box.y + box.height / 2;
      await page.mouse.move(cx - 40, cy);
      await page.mouse.down();
      for (let k = 1; k <= 20; k++) await page.mouse.move(cx - 40 + k * 4, cy - k);
      await page.mouse.up();
    };
    await drag();
    await page.waitForTimeout(200);
    const shotAfter = await element.screenshot();
    expect(shotAfter.equals(shotBefore)).toBe(false); // the camera moved
    expect(await readout(page)).toEqual(before);
    expect(await page.getByTestId("rotation-description").innerText()).toBe(rotationBefore);
    await page.screenshot({ path: path.join(screenshotDir, "bench-orbit-view.png") });
    await page.getByRole("button", { name: "element", exact: true }).click();
    await drag();
    const turned = await readout(page);
    expect(Math.abs(turned.xx - before.xx)).toBeGreaterThan(1);
    expect(errors).toEqual([]);
  });

  it("when the Mohr diagram is zoomed with the wheel and Fit is pressed, then the σ axis spans the circles (σ3 to σ1 from core) again", async () => {
    await page.getByRole("button", { name: "Original" }).click();
    const [s1, , s3] = principalValues(STATE);
    const fit = page.getByRole("button", { name: "Fit", exact: true });
    const fitted = await mohrDomain(page);
    expect(fitted.sigma[0]).toBeLessThanOrEqual(s3);
    expect(fitted.sigma[1]).toBeGreaterThanOrEqual(s1);
    expect(await fit.isDisabled()).toBe(true);
    const svg = (await page.getByTestId("mohr-svg").boundingBox())!;
    await page.mouse.move(svg.x + svg.width / 2, svg.y + svg.height / 2);
    for (let k = 0; k < 5; k++) await page.mouse.wheel(0, -100);
    await expect
      .poll(async () => (await mohrDomain(page)).sigma[1] - (await mohrDomain(page)).sigma[0])
      .toBeLessThan(s1 - s3);
    await page.screenshot({ path: path.join(screenshotDir, "bench-mohr-zoomed.png") });
    await fit.click();
    const again = await mohrDomain(page);
    expect(again).toEqual(fitted);
    expect(again.sigma[0]).toBeLessThanOrEqual(s3);
    expect(again.sigma[1]).toBeGreaterThanOrEqual(s1);
    expect(await fit.isDisabled()).toBe(true);
    // Without a wheel: the buttons zoom about the plot's centre (1.25× a press), Fit undoes it.
    await page.getByRole("button", { name: "Zoom in", exact: true }).click();
    await page.getByRole("button", { name: "Zoom in", exact: true }).click();
    const inByButtons = await mohrDomain(page);
    const span = (d: { sigma: number[] }) => d.sigma[1] - d.sigma[0];
    expect(span(inByButtons)).toBeCloseTo(span(fitted) / 1.25 ** 2, 6);
    expect((inByButtons.sigma[0] + inByButtons.sigma[1]) / 2).toBeCloseTo(
      (fitted.sigma[0] + fitted.sigma[1]) / 2,
      6,
    );
    await page.getByRole("button", { name: "Fit", exact: true }).focus();
    await page.keyboard.press("Enter");
    expect(await mohrDomain(page)).toEqual(fitted);
  });

  it("when the pointer rests on σ1 on the Mohr diagram's axis, then the hover readout shows σ ≈ σ1 and τ ≈ 0 in MPa", async () => {
    const [s1] = principalValues(STATE);
    const { sigma, tau } = await mohrDomain(page);
    const box = (await page.getByTestId("mohr-svg").boundingBox())!;
    // viewBox 480 × 246 with the plot at x 50…466, y 14…210 (MohrDiagram's margins); τ up in 3D view.
    const scale = box.width / 480;
    const px = box.x + (50 + ((s1 - sigma[0]) / (sigma[1] - sigma[0])) * 416) * scale;
    const py = box.y + (14 + ((tau[1] - 0) / (tau[1] - tau[0])) * 196) * scale;
    await page.mouse.move(px, py);
    const hover = page.getByTestId("mohr-hover");
    await hover.waitFor();
    await page.screenshot({ path: path.join(screenshotDir, "bench-mohr-hover.png") });
    const text = await hover.textContent();
    expect(text).toMatch(/MPa/);
    const [sigmaShown, tauShown] = numbers(text ?? "");
    const perPixel = (sigma[1] - sigma[0]) / (416 * scale);
    expect(Math.abs(sigmaShown - s1)).toBeLessThan(2 * perPixel + 0.01);
    expect(Math.abs(tauShown)).toBeLessThan(2 * perPixel + 0.01);
    await page.mouse.move(box.x - 20, box.y - 20);
    await expect.poll(() => hover.count()).toBe(0);
  });

  it("when the envelope plot has focus, then its readout starts on the state with the nearest envelope's factor from core, and the arrow keys move the point", async () => {
    await pasteIntoBox(page, "80 -40 30");
    const plane = planeStress(80, -40, 30);
    const ab = [plane.s1, plane.s2];
    const state: StressTensor = { xx: 80, yy: -40, zz: 0, xy: 30, yz: 0, zx: 0 };
    // The bench's default material is EN 10025-2 S355 (Sy 355 MPa) with von Mises and Tresca drawn.
    const nVm = safetyFactor(state, "von-mises", { yield: 355 });
    const nTr = safetyFactor(state, "tresca", { yield: 355 });
    // Both envelopes lie on the same ray, so the nearest is the one whose n is closer to 1.
    const nearest =
      Math.abs(nTr - 1) < Math.abs(nVm - 1) ? { name: "Tresca", n: nTr } : { name: "von Mises", n: nVm };
    await page.getByTestId("envelope-svg").focus();
    const probe = page.getByTestId("envelope-probe");
    await expect.poll(() => probe.innerText()).toMatch(/nearest along its ray/);
    const first = await probe.innerText();
    const [a0, b0] = numbers(first);
    expect(Math.abs(a0 - ab[0])).toBeLessThan(0.06);
    expect(Math.abs(b0 - ab[1])).toBeLessThan(0.06);
    expect(first).toContain(nearest.name);
    expect(Number(await page.getByTestId("envelope-probe-n").innerText())).toBeCloseTo(nearest.n, 2);
    await page.keyboard.press("ArrowRight");
    const moved = await probe.innerText();
    const [a1, b1] = numbers(moved);
    expect(a1).toBeGreaterThan(a0);
    expect(b1).toBeCloseTo(b0, 1);
    // At the moved point, n along its ray is again core's safety factor of that plane state.
    const at: StressTensor = { xx: a1, yy: b1, zz: 0, xy: 0, yz: 0, zx: 0 };
    const nAt = [safetyFactor(at, "von-mises", { yield: 355 }), safetyFactor(at, "tresca", { yield: 355 })];
    const nShown = Number(await page.getByTestId("envelope-probe-n").innerText());
    expect(Math.min(...nAt.map((n) => Math.abs(n - nShown)))).toBeLessThan(0.02);
    await page.screenshot({ path: path.join(screenshotDir, "bench-envelope-probe.png") });
    const results = await new AxeBuilder({ page }).analyze();
    const serious = results.violations
      .filter((v) => v.impact === "serious" || v.impact === "critical")
      .map((v) => `${v.id}: ${v.help} (${v.nodes.length}) ${v.nodes[0]?.target}`);
    expect(serious).toEqual([]);
  });

  it("when the pointer moves over the envelope plot, then the readout follows it and leaves with it", async () => {
    const stateMark = (await page.getByTestId("envelope-state").boundingBox())!;
    await page.mouse.move(stateMark.x + stateMark.width / 2, stateMark.y + stateMark.height / 2);
    const plane = planeStress(80, -40, 30);
    const [a, b] = numbers(await page.getByTestId("envelope-probe").innerText());
    const tol = 0.03 * Math.max(Math.abs(plane.s1), Math.abs(plane.s2));
    expect(Math.abs(a - plane.s1)).toBeLessThan(tol);
    expect(Math.abs(b - plane.s2)).toBeLessThan(tol);
    await page.mouse.move(5, 5);
    await page.getByTestId("element-3d").focus();
    await expect.poll(() => page.getByTestId("envelope-probe").innerText()).toMatch(/Point at the plot/);
    expect(errors).toEqual([]);
  });
});
