import { mkdir } from "node:fs/promises";
import path from "node:path";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RunningServer } from "../../api/server";
import { launchChromium, screenshotDir, signUpInContext } from "../support/browser";
import { startTestServer } from "../support/server";

// Plane-stress handbook formulas (e.g. Hibbeler, Mechanics of Materials, stress transformation;
// recalled from memory): tan 2θp = 2τxy/(σx − σy), σ = (σx + σy)/2 ± √(((σx − σy)/2)² + τxy²).
const handbookThetaP = (sx: number, sy: number, txy: number) => (Math.atan2(2 * txy, sx - sy) * 90) / Math.PI;
const handbookPair = (sx: number, sy: number, txy: number) => {
  const c = (sx + sy) / 2;
  const r = Math.hypot((sx - sy) / 2, txy);
  return [c + r, c - r] as const;
};

const shot = (page: Page, name: string) =>
  page.screenshot({ path: path.join(screenshotDir, `bench-plane-${name}.png`) });

/** The rotated readout σ′ from its data attributes (full precision). */
async function readout(page: Page) {
  const v = await page.$$eval("[data-testid=rotated-readout] td[data-cell]", (cells) =>
    Object.fromEntries(cells.map((c) => [c.getAttribute("data-cell"), Number(c.getAttribute("data-value"))])),
  );
  return { xx: v["00"], yy: v["11"], zz: v["22"], xy: v["01"], yz: v["12"], zx: v["02"] };
}

/** The rotation as displayed: angle (2 decimals) about an axis (3 decimals). */
async function displayedAxisAngle(page: Page) {
  const text = (await page.getByTestId("rotation-description").innerText()).replace(/−/g, "-");
  const m = /turned\s*([-\d.]+)\s*°\s*about axis \(([-\d.]+), ([-\d.]+), ([-\d.]+)\)/.exec(text);
  if (!m) throw new Error(`rotation description not understood: ${text}`);
  return { angle: Number(m[1]), axis: [Number(m[2]), Number(m[3]), Number(m[4])] };
}

async function paste(page: Page, text: string) {
  await page.getByLabel(/Paste a tensor/).fill(text);
  await page.getByRole("button", { name: "Read", exact: true }).click();
}

/** Every text on the page, HTML and SVG, as one string. */
const allText = (page: Page) =>
  page.evaluate(() =>
    [
      document.body.innerText,
      ...[...document.querySelectorAll("svg text")].map((t) => t.textContent ?? ""),
    ].join("\n"),
  );

describe("plane stress on the bench in Chromium", () => {
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
    await signUpInContext(context, server.url, "Aino Brecklund");
    page = await context.newPage();
    page.setDefaultTimeout(15_000);
    page.on("pageerror", (error) => errors.push(error.message));
    await mkdir(screenshotDir, { recursive: true });
    await page.goto(`${server.url}/bench`, { waitUntil: "networkidle" });
    await page.getByTestId("element-3d").waitFor();
  });
  afterAll(async () => {
    await closeBrowser?.();
    await server?.close();
  });

  it("when σx = 150, σy = 0, τxy = 25 MPa snaps to principal, then the element turns 9.22° counter-clockwise about z, x′ carries σ1 = 154.06, y′ σ3 = −4.06, z′ σ2 = 0, and the in-plane Mohr x′ point sits on σ1 (handbook tan 2θp = 2τxy/(σx − σy), recalled from memory)", async () => {
    await paste(page, "150 0 25");
    await page.getByRole("button", { name: "Principal", exact: true }).click();
    const thetaP = handbookThetaP(150, 0, 25);
    const [major, minor] = handbookPair(150, 0, 25);
    const turned = await displayedAxisAngle(page);
    expect(turned.axis).toEqual([0, 0, 1]);
    expect(turned.angle).toBeCloseTo(thetaP, 2);
    expect(turned.angle).toBeCloseTo(9.22, 2);
    const r = await readout(page);
    expect(r.xx).toBeCloseTo(major, 9);
    expect(r.yy).toBeCloseTo(minor, 9);
    expect(r.zz).toBe(0);
    expect(Math.abs(r.xy) + Math.abs(r.yz) + Math.abs(r.zx)).toBeLessThan(1e-9);
    expect(await page.getByTestId("principal-axis-names").innerText()).toBe(
      "On principal axes: x′ σ1, y′ σ3, z′ σ2",
    );

    // The principal panel: the same names, θp and the max-shear angles θp ∓ 45° with the convention in words.
    // Shown to 1 decimal here (four significant figures of 154.06).
    const num = async (id: string) =>
      Number(
        (await page.getByTestId(id).locator("td").first().innerText())
          .split("MPa")[0]
          .replace(/−/g, "-")
          .replace(/[^\d.eE+-]/g, ""),
      );
    expect(await num("sigma 1")).toBeCloseTo(154.06, 1);
    expect(await num("sigma 2")).toBe(0);
    expect(await num("sigma 3")).toBeCloseTo(-4.06, 1);
    expect(Number(await page.getByTestId("theta-p").getAttribute("data-value"))).toBeCloseTo(thetaP, 10);
    expect(await page.getByTestId("theta-p").innerText()).toMatch(/θp = 9\.22\s*° \(x to σ1\)/);
    expect(await page.getByTestId("theta-s").innerText()).toMatch(/−35\.78\s*°, 54\.22\s*°/);
    expect(await page.getByTestId("theta-s").innerText()).not.toMatch(/acts on planes at 45° to z/);
    expect(await page.getByTestId("angle-convention").innerText()).toMatch(
      /counter-clockwise positive seen from \+z/,
    );
    expect(await page.getByTestId("principal-in-plane").innerText()).toBe(
      "In plane x–y: σ1 and σ3; along z: σ2 = σz.",
    );
    expect(await page.getByTestId("principal-naming-rule").innerText()).toMatch(/σ1 ≥ σ2 ≥ σ3/);

    // The in-plane Mohr circle names its points by the same rule, and its x′ point is on σ1 at θ = θp.
    await page.getByRole("button", { name: "In-plane" }).click();
    const point = page.getByRole("slider", { name: /x′ face point/ });
    expect(Number(await point.getAttribute("aria-valuenow"))).toBeCloseTo(9.22, 2);
    const x = page.getByTestId("mohr-point-x′");
    expect(Number(await x.getAttribute("data-sigma"))).toBeCloseTo(major, 9);
    expect(Math.abs(Number(await x.getAttribute("data-tau")))).toBeLessThan(1e-9);
    expect(await page.getByTestId("mohr-principal-major").getAttribute("data-name")).toBe("σ1");
    expect(await page.getByTestId("mohr-principal-minor").getAttribute("data-name")).toBe("σ3");
    expect(await page.getByTestId("mohr-principal-z").getAttribute("data-name")).toBe("σ2");
    expect(await page.getByTestId("mohr-principal-minor").textContent()).toMatch(/^σ3/);
    await shot(page, "snap-150-0-25");

    // Snapping to max shear turns about z by θp − 45° and puts +τmax (the circle's radius) on x′.
    await page.getByRole("button", { name: "Max shear", exact: true }).click();
    const shear = await displayedAxisAngle(page);
    expect(shear.axis).toEqual([0, 0, -1]);
    expect(shear.angle).toBeCloseTo(45 - thetaP, 2);
    expect((await readout(page)).xy).toBeCloseTo((major - minor) / 2, 9);
    expect(errors).toEqual([]);
  });

  it("when pure shear τxy = 25 snaps to principal, then the element turns 45° about z and σ′ = diag(25, −25, 0); when both in-plane stresses are tensile, then they are σ1 and σ2 and τmax is said to act out of plane (common practice, no source)", async () => {
    await paste(page, "0 0 25");
    await page.getByRole("button", { name: "Principal", exact: true }).click();
    const turned = await displayedAxisAngle(page);
    expect(turned.axis).toEqual([0, 0, 1]);
    expect(turned.angle).toBeCloseTo(45, 9);
    const r = await readout(page);
    expect(r.xx).toBeCloseTo(25, 9);
    expect(r.yy).toBeCloseTo(-25, 9);
    expect(r.zz).toBe(0);
    expect(Number(await page.getByTestId("theta-p").getAttribute("data-value"))).toBeCloseTo(45, 10);
    // Both in-plane stresses tensile: the in-plane pair is σ1, σ2, the zero σz is σ3, and τmax = σ1/2
    // acts out of plane (common practice, no source).
    await paste(page, "100 50 0");
    expect(await page.getByTestId("principal-in-plane").innerText()).toBe(
      "In plane x–y: σ1 and σ2; along z: σ3 = σz.",
    );
    expect(await page.getByTestId("theta-s").innerText()).toMatch(/τmax itself acts on planes at 45° to z/);
  });

  it("when the element sits on a frame that leaves tiny negative residues, then no −0.000 (or -0.00) is shown anywhere, HTML or SVG", async () => {
    for (const state of ["150 0 25", "0 0 25", "80 -40 30"]) {
      await paste(page, state);
      for (const snap of ["Principal", "Max shear"]) {
        await page.getByRole("button", { name: snap, exact: true }).click();
        for (const view of ["3D", "In-plane"]) {
          await page.getByRole("button", { name: view, exact: true }).click();
          const text = await allText(page);
          expect(text, `${state}, ${snap}, ${view}`).not.toMatch(/(^|[^\d.])[−-]0(\.0+)?(?![\d.])/m);
        }
      }
    }
  });

  it("when the bench shows results, then the caution appears once, beside the criteria; on the home page the footer carries it once", async () => {
    const cautions = page.getByTestId("results-caution");
    expect(await cautions.count()).toBe(1);
    expect(
      await page.locator('section[aria-labelledby="criteria-title"]').getByTestId("results-caution").count(),
    ).toBe(1);
    await page.goto(server.url, { waitUntil: "networkidle" });
    expect(await page.getByTestId("results-caution").count()).toBe(1);
    expect(await page.locator("footer").getByTestId("results-caution").count()).toBe(1);
    await page.goto(`${server.url}/bench`, { waitUntil: "networkidle" });
    await page.getByTestId("element-3d").waitFor();
    expect(await page.getByTestId("results-caution").count()).toBe(1);
    expect(await page.locator("footer").getByTestId("results-caution").count()).toBe(0);
  });

  it.each([
    ["Pa", "1.5e8"],
    ["kPa", "150000"],
    ["psi", "21755.7"],
  ])(
    "when the unit is %s at 1280×800, then no grid or table cell is cut and neither axis ticks nor readouts overlap",
    async (unit, sxx) => {
      await paste(page, "150 0 25 MPa");
      await page.getByRole("button", { name: "Principal", exact: true }).click();
      await page.getByLabel("Unit", { exact: true }).selectOption(unit);
      await page.getByRole("radio", { name: "3×3", exact: true }).click();
      // 150 MPa converted (1 psi = 6894.757 Pa, NIST SP 811).
      await expect.poll(() => page.getByLabel("σxx", { exact: true }).inputValue()).toBe(sxx);
      for (const view of ["3D", "In-plane"]) {
        await page.getByRole("button", { name: view, exact: true }).click();
        await page.waitForTimeout(200);
        await shot(page, `${unit}-${view === "3D" ? "3d" : "plane"}`);
        const cut = await page.evaluate(() =>
          [...document.querySelectorAll("main input, main td, main th")]
            .filter((el) => el.scrollWidth > el.clientWidth + 1)
            .map((el) => `${el.tagName} ${(el as HTMLInputElement).value ?? ""}${el.textContent}`),
        );
        expect(cut, view).toEqual([]);
        const overlaps = await page.evaluate(() => {
          const hit: string[] = [];
          const overlap = (a: DOMRect, b: DOMRect) =>
            a.left < b.right - 0.5 &&
            b.left < a.right - 0.5 &&
            a.top < b.bottom - 0.5 &&
            b.top < a.bottom - 0.5;
          const pairs = (texts: Element[], what: string) => {
            const boxes = texts
              .map((el) => ({ text: el.textContent, r: el.getBoundingClientRect() }))
              .filter((b) => b.r.width > 0);
            for (let i = 0; i < boxes.length; i++)
              for (let j = i + 1; j < boxes.length; j++)
                if (overlap(boxes[i].r, boxes[j].r)) hit.push(`${what}: ${boxes[i].text} / ${boxes[j].text}`);
          };
          for (const svg of document.querySelectorAll("main svg")) {
            const frame = svg.getBoundingClientRect();
            for (const text of svg.querySelectorAll("text")) {
              const r = text.getBoundingClientRect();
              if (r.width > 0 && (r.left < frame.left - 1 || r.right > frame.right + 1))
                hit.push(`cut at the edge: ${text.textContent}`);
            }
            // Each axis's ticks against each other; every other label against every label and tick.
            for (const axis of svg.querySelectorAll("g")) {
              const ticks = [...axis.querySelectorAll(":scope > g.tick text")];
              if (ticks.length > 0) pairs(ticks, "ticks");
            }
            const labels = [...svg.querySelectorAll("text")].filter((el) => !el.closest("g.tick"));
            const ticks = [...svg.querySelectorAll("g.tick text")];
            pairs(labels, "labels");
            for (const label of labels)
              for (const tick of ticks)
                if (overlap(label.getBoundingClientRect(), tick.getBoundingClientRect()))
                  hit.push(`label on tick: ${label.textContent} / ${tick.textContent}`);
          }
          return hit;
        });
        expect(overlaps, view).toEqual([]);
      }
      expect(errors).toEqual([]);
    },
  );
});
