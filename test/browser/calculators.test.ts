import { mkdir } from "node:fs/promises";
import path from "node:path";
import { AxeBuilder } from "@axe-core/playwright";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RunningServer } from "../../api/server";
import {
  convertStress,
  deltaRosette,
  hollowShaftStress,
  microstrain,
  stressFromStrain,
  thickCylinder,
  thickSphere,
  thinSphere,
  type StressTensor,
} from "../../core";
import { launchChromium, screenshotDir, signUpInContext } from "../support/browser";
import { startTestServer } from "../support/server";

const KEYS = ["xx", "yy", "zz", "xy", "yz", "zx"] as const;

/** The bench's readout of σ′ (no rotation yet, so the state as received), at full precision. */
async function benchReadout(page: Page): Promise<StressTensor> {
  await page.getByTestId("rotated-readout").waitFor();
  const v = await page.$$eval("[data-testid=rotated-readout] td[data-cell]", (cells) =>
    Object.fromEntries(cells.map((c) => [c.getAttribute("data-cell"), Number(c.getAttribute("data-value"))])),
  );
  return { xx: v["00"], yy: v["11"], zz: v["22"], xy: v["01"], yz: v["12"], zx: v["02"] };
}

function expectClose(a: StressTensor, b: StressTensor, rel = 1e-9) {
  const scale = Math.max(...KEYS.map((k) => Math.abs(b[k])));
  for (const k of KEYS) expect(Math.abs(a[k] - b[k]), k).toBeLessThanOrEqual(rel * scale);
}

async function type(page: Page, label: string, value: string) {
  const field = page.getByLabel(label, { exact: true });
  await field.click();
  await field.fill(value);
  await field.press("Enter");
}

/**
 * Picks a radio option. The choice lives in the address, which the router applies in a transition,
 * so the radio turns checked a moment after the click (on a loaded machine, after check() has looked).
 */
async function pick(page: Page, name: string) {
  const radio = page.getByRole("radio", { name, exact: true });
  if (!(await radio.isChecked())) await radio.click();
  await expect.poll(() => radio.isChecked()).toBe(true);
}

/** The value a calculator shows in a row of its state table, at full precision. */
const shown = async (page: Page, id: string) =>
  Number(await page.getByTestId(`calc-${id}`).locator("td[data-value]").getAttribute("data-value"));

describe("the calculators in Chromium", () => {
  let server: RunningServer;
  let browser: Browser;
  let closeBrowser: () => Promise<void>;
  let context: BrowserContext;
  let page: Page;
  const errors: string[] = [];

  beforeAll(async () => {
    server = await startTestServer();
    ({ browser, close: closeBrowser } = await launchChromium());
    context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    // The bench is for signed-in users; the calculators themselves are open to everyone.
    await signUpInContext(context, server.url, "Rhea Castellan");
    page = await context.newPage();
    page.on("pageerror", (error) => errors.push(error.message));
    await mkdir(screenshotDir, { recursive: true });
  });
  afterAll(async () => {
    await closeBrowser?.();
    await server?.close();
  });

  /** Opens a calculator from the main navigation and its index. */
  async function open(title: string) {
    await page.goto(`${server.url}/`, { waitUntil: "networkidle" });
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Calculators" }).click();
    await page.getByRole("link", { name: title, exact: true }).click();
    await page.getByRole("heading", { level: 1, name: title }).waitFor();
  }

  /** Opens the same address in a fresh signed-out context and returns the page, to check a copied link. */
  async function reopen(url: string): Promise<{ other: Page; done: () => Promise<void> }> {
    const fresh = await browser.newContext();
    const other = await fresh.newPage();
    await other.goto(url, { waitUntil: "networkidle" });
    return { other, done: () => fresh.close() };
  }

  it("when a thin sphere is typed with its mean radius and σr = −p, then the page shows core's thinSphere on rᵢ = r − t/2, the bench receives the same state and a copied link reproduces the inputs", async () => {
    await open("Thin-walled cylinder and sphere");
    await pick(page, "sphere");
    await type(page, "Internal pressure p", "1.5");
    await type(page, "Radius r", "400");
    await pick(page, "mean radius");
    await type(page, "Wall thickness t", "8");
    await pick(page, "−p (inside face)");
    const expected = thinSphere(1.5, 396, 8, { radial: "inner-surface" }).tensor;
    expect(await shown(page, "xx")).toBeCloseTo(expected.xx, 9);
    expect(await shown(page, "zz")).toBe(-1.5);
    expect(await page.getByTestId("results-caution").count()).toBe(1);

    const { other, done } = await reopen(page.url());
    expect(await other.getByLabel("Radius r", { exact: true }).inputValue()).toBe("400");
    expect(await other.getByLabel("Wall thickness t", { exact: true }).inputValue()).toBe("8");
    expect(await other.getByRole("radio", { name: "sphere", exact: true }).isChecked()).toBe(true);
    expect(await other.getByRole("radio", { name: "mean radius", exact: true }).isChecked()).toBe(true);
    expect(
      Number(await other.getByTestId("calc-yy").locator("td[data-value]").getAttribute("data-value")),
    ).toBe(await shown(page, "yy"));
    await done();

    await page.getByTestId("send-to-bench").click();
    expectClose(await benchReadout(page), expected);
    expect(new URL(page.url()).searchParams.get("u")).toBe("MPa");
  });

  it("when the wall is thick (t/r > 0.1) and given by its mean radius, then the thin-wall page warns with the ratio for these inputs and the radius it used, and opens the thick-walled calculator with the same vessel and pressure, whose bore hoop stress is that ratio times the thin-wall one", async () => {
    await open("Thin-walled cylinder and sphere");
    await type(page, "Internal pressure p", "10");
    await type(page, "Radius r", "115");
    await pick(page, "mean radius");
    await type(page, "Wall thickness t", "30");
    const warning = page.getByTestId("thin-wall-warning");
    await warning.waitFor();
    // rᵢ = 115 − 15 = 100 mm, rₒ = 130 mm. Lamé bore hoop stress p(rₒ² + rᵢ²)/(rₒ² − rᵢ²) = 10·26900/6900
    // = 38.99 MPa against the thin-wall p·rᵢ/t = 33.33 MPa: ratio 1.170, shortfall 14.5 % (Lamé formula).
    const lame = (10 * (130 ** 2 + 100 ** 2)) / (130 ** 2 - 100 ** 2);
    const thin = (10 * 100) / 30;
    const text = await warning.innerText();
    expect(text).toContain("t/r = 0.300 (wall over inside radius) is above 0.1");
    expect(text).toContain(`${(lame / thin).toFixed(3)} × the thin-wall value of the inside-radius formula`);
    expect(text).toContain(`${((1 - thin / lame) * 100).toFixed(1)} % below the Lamé value`);
    expect(text).toContain("rᵢ = r − t/2 = 100 mm");
    expect(text).toContain("t over the mean radius is 0.261");
    expect(await shown(page, "yy")).toBeCloseTo(thin, 9);
    await page.getByTestId("open-thick").click();
    await page.getByRole("heading", { level: 1, name: "Thick-walled cylinder (Lamé)" }).waitFor();
    expect(await page.getByLabel("Inner radius rᵢ", { exact: true }).inputValue()).toBe("100");
    expect(await page.getByLabel("Outer radius rₒ", { exact: true }).inputValue()).toBe("130");
    expect(await page.getByLabel("Internal pressure pᵢ", { exact: true }).inputValue()).toBe("10");
    expect(await page.getByLabel("Radius r of the point", { exact: true }).inputValue()).toBe("100");
    expect(await shown(page, "yy")).toBeCloseTo(lame, 9);
  });

  it("when a cylinder's wall is checked by UG-27 and the unit set changes, then the page shows t = P·R/(S·E − 0.6P) on the corroded radius with the allowance, says the wall is too thin in words, and carries S and the allowance to psi and inches", async () => {
    await open("Thin-walled cylinder and sphere");
    await type(page, "Internal pressure p", "1.5");
    await type(page, "Radius r", "600");
    await type(page, "Wall thickness t", "8");
    await type(page, "Allowable stress S", "138");
    await type(page, "Joint efficiency E", "1");
    await type(page, "Corrosion allowance", "1.5");
    // UG-27(c)(1), recalled from memory: R = 600 + 1.5 = 601.5 mm, t = 1.5·601.5/(138 − 0.9) = 6.5810 mm,
    // 8.0810 mm with the allowance (hand arithmetic): more than the 8 mm typed.
    const required = (1.5 * 601.5) / (138 - 0.9) + 1.5;
    const total = page.getByTestId("ug27-required");
    await total.waitFor();
    expect(Number(await total.getAttribute("data-value"))).toBeCloseTo(required, 9);
    expect(await page.getByTestId("ug27-verdict").innerText()).toMatch(/wall too thin/);
    expect(await page.getByTestId("ug27").innerText()).toContain("recalled from memory");
    await page.screenshot({
      path: path.join(screenshotDir, "calculator-thin-wall-ug27.png"),
      fullPage: true,
    });

    await page.getByLabel(/^Units/).selectOption("us-psi");
    // 138 MPa = 20 015.1 psi and 1.5 mm = 0.0590551 in (1 psi = 6894.757 Pa, 1 in = 25.4 mm by definition).
    await expect
      .poll(async () => Number(await page.getByLabel("Allowable stress S", { exact: true }).inputValue()))
      .toBeCloseTo(138e6 / 6894.757293168, 3);
    expect(Number(await page.getByLabel("Corrosion allowance", { exact: true }).inputValue())).toBeCloseTo(
      1.5 / 25.4,
      9,
    );
    expect(Number(await total.getAttribute("data-value"))).toBeCloseTo(required / 25.4, 9);
    expect(await page.getByTestId("ug27-verdict").innerText()).toMatch(/wall too thin/);
  });

  it("when a thick cylinder in plane strain is typed (rᵢ = 1, rₒ = 2, pᵢ = 100), then the page and the bench show core's thickCylinder at the chosen radius and the plot names σθ, σz and σr with units", async () => {
    await open("Thick-walled cylinder (Lamé)");
    await type(page, "Inner radius rᵢ", "1");
    await type(page, "Outer radius rₒ", "2");
    await type(page, "Internal pressure pᵢ", "100");
    await type(page, "External pressure pₒ", "5");
    await type(page, "Radius r of the point", "1.25");
    await pick(page, "plane strain");
    await type(page, "Poisson's ratio ν", "0.3");
    const core = thickCylinder(
      {
        innerRadius: 1,
        outerRadius: 2,
        innerPressure: 100,
        outerPressure: 5,
        ends: "plane-strain",
        poissonRatio: 0.3,
      },
      1.25,
    );
    expect(await shown(page, "yy")).toBeCloseTo(core.hoop, 9);
    expect(await shown(page, "xx")).toBeCloseTo(core.axial, 9);
    const plot = page.getByTestId("through-wall-plot");
    const text = await plot.textContent();
    for (const label of ["σθ hoop", "σz axial", "σr radial", "radius r (mm)", "stress (MPa)"])
      expect(text).toContain(label);

    const { other, done } = await reopen(page.url());
    expect(await other.getByRole("radio", { name: "plane strain", exact: true }).isChecked()).toBe(true);
    expect(await other.getByLabel("Radius r of the point", { exact: true }).inputValue()).toBe("1.25");
    expect(await other.getByLabel("External pressure pₒ", { exact: true }).inputValue()).toBe("5");
    await done();

    await page.getByTestId("send-to-bench").click();
    expectClose(await benchReadout(page), core.tensor);
  });

  it("when a thick sphere is typed in US customary units (psi), then the bench receives core's thickSphere in psi and a copied link keeps the units", async () => {
    await open("Thick-walled sphere (Lamé)");
    await page.getByLabel(/^Units/).selectOption("us-psi");
    await type(page, "Inner radius rᵢ", "10");
    await type(page, "Outer radius rₒ", "14");
    await type(page, "Internal pressure pᵢ", "6000");
    await type(page, "External pressure pₒ", "0");
    await type(page, "Radius r of the point", "10");
    const core = thickSphere({ innerRadius: 10, outerRadius: 14, innerPressure: 6000 }, 10);
    expect(await shown(page, "xx")).toBeCloseTo(core.hoop, 7);
    expect(await page.getByTestId("calc-xx").innerText()).toContain("psi");

    const { other, done } = await reopen(page.url());
    expect(await other.getByLabel(/^Units/).inputValue()).toBe("us-psi");
    expect(await other.getByLabel("Internal pressure pᵢ", { exact: true }).inputValue()).toBe("6000");
    await done();

    await page.getByTestId("send-to-bench").click();
    expectClose(await benchReadout(page), core.tensor);
    expect(new URL(page.url()).searchParams.get("u")).toBe("psi");
  });

  it("when a hollow shaft's loads are typed in lbf·in with Kt, then the critical point sent to the bench is core's hollowShaftStress in ksi and a copied link reproduces the inputs", async () => {
    await open("Shaft under combined load");
    await page.getByLabel(/^Units/).selectOption("us-ksi");
    await pick(page, "hollow");
    await type(page, "Outer diameter D", "2");
    await type(page, "Bore diameter d", "1.2");
    await type(page, "Bending moment My", "3000");
    await type(page, "Bending moment Mz", "-1000");
    await type(page, "Torque T", "4000");
    await type(page, "Axial force P (tension +)", "-2000");
    await type(page, "Transverse shear Vy", "500");
    await type(page, "Kt bending", "1.8");
    await type(page, "Kt torsion", "1.4");
    await pick(page, "bore surface");
    await type(page, "Angle θ of the point, from +y towards +z", "200");
    const lbf = 4.4482216152605;
    const core = hollowShaftStress(
      { outerDiameter: 50.8, innerDiameter: 1.2 * 25.4 },
      {
        momentY: 3000 * lbf * 25.4,
        momentZ: -1000 * lbf * 25.4,
        torque: 4000 * lbf * 25.4,
        axialForce: -2000 * lbf,
        shearY: 500 * lbf,
      },
      { kt: { bending: 1.8, torsion: 1.4 }, point: { surface: "inner", angle: 200 } },
    );
    const ksi = (t: StressTensor): StressTensor => ({
      ...t,
      xx: convertStress(t.xx, "MPa", "ksi"),
      xy: convertStress(t.xy, "MPa", "ksi"),
    });
    expect(await shown(page, "xx")).toBeCloseTo(ksi(core.point!.tensor).xx, 9);
    expect(await shown(page, "crit-vm")).toBeCloseTo(convertStress(core.critical.vonMises, "MPa", "ksi"), 9);
    expect(await page.getByTestId("critical-point").innerText()).toContain(core.critical.angle.toFixed(2));

    const { other, done } = await reopen(page.url());
    expect(await other.getByLabel("Torque T", { exact: true }).inputValue()).toBe("4000");
    expect(await other.getByLabel("Kt bending", { exact: true }).inputValue()).toBe("1.8");
    expect(await other.getByRole("radio", { name: "bore surface", exact: true }).isChecked()).toBe(true);
    await done();

    await page.getByTestId("send-critical-to-bench").click();
    expectClose(await benchReadout(page), ksi(core.critical.tensor));
    expect(new URL(page.url()).searchParams.get("u")).toBe("ksi");
  });

  it("when a delta rosette's readings are typed with E and ν, then the plane-stress state sent to the bench is core's deltaRosette then stressFromStrain, and a copied link reproduces the readings", async () => {
    await open("Strain-gauge rosette");
    await pick(page, "delta 0/60/120°");
    await type(page, "Gauge 1 reading ε", "400");
    await type(page, "Gauge 2 reading ε", "-120");
    await type(page, "Gauge 3 reading ε", "250");
    await type(page, "Young's modulus E", "70");
    await type(page, "Poisson's ratio ν", "0.33");
    const core = stressFromStrain(deltaRosette(microstrain(400), microstrain(-120), microstrain(250)), {
      E: 70_000,
      nu: 0.33,
    });
    expect(await shown(page, "s1")).toBeCloseTo(core.s1, 9);

    const { other, done } = await reopen(page.url());
    expect(await other.getByRole("radio", { name: "delta 0/60/120°", exact: true }).isChecked()).toBe(true);
    expect(await other.getByLabel("Gauge 2 reading ε", { exact: true }).inputValue()).toBe("-120");
    expect(await other.getByLabel("Young's modulus E", { exact: true }).inputValue()).toBe("70");
    await done();

    await page.getByTestId("send-to-bench").click();
    expectClose(await benchReadout(page), core.tensor);
    expect(errors).toEqual([]);
  });

  it("when an input makes the formula impossible (outer radius below the bore), then the results give way to a refusal naming the field and nothing can be sent to the bench", async () => {
    await page.goto(`${server.url}/calculators/thick-sphere?ri=50&ro=40&pi=10&po=0&r=50`, {
      waitUntil: "networkidle",
    });
    const refusal = page.getByTestId("calc-error");
    await refusal.waitFor();
    expect(await refusal.innerText()).toMatch(/Outer radius rₒ must be larger than the inner radius/);
    expect(await page.getByTestId("send-to-bench").count()).toBe(0);
    await type(page, "Outer radius rₒ", "80");
    await page.getByTestId("send-to-bench").waitFor();
    expect(await refusal.count()).toBe(0);
  });

  it("when each calculator is shown at 390 px and 1280 px, then no page scrolls sideways, each carries the caution once and axe finds no serious or critical problem", async () => {
    for (const width of [390, 1280]) {
      await page.setViewportSize({ width, height: 900 });
      for (const slug of ["thin-wall", "thick-cylinder", "thick-sphere", "shaft", "rosette"]) {
        await page.goto(`${server.url}/calculators/${slug}`, { waitUntil: "networkidle" });
        await page.locator("#calc-results-title").waitFor();
        await page.screenshot({
          path: path.join(screenshotDir, `calculator-${slug}-${width}.png`),
          fullPage: true,
        });
        const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
        expect(overflow, `${slug} at ${width} px`).toBeLessThanOrEqual(0);
        expect(await page.getByTestId("results-caution").count()).toBe(1);
        if (width === 1280) {
          const results = await new AxeBuilder({ page }).analyze();
          const serious = results.violations
            .filter((v) => v.impact === "serious" || v.impact === "critical")
            .map((v) => `${slug}: ${v.id}: ${v.help} (${v.nodes.length}) ${v.nodes[0]?.target}`);
          expect(serious).toEqual([]);
        }
      }
    }
    expect(errors).toEqual([]);
  });
});
