import path from "node:path";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RunningServer } from "../../api/server";
import { launchChromium, screenshotDir, signUpInContext } from "../support/browser";
import { startTestServer } from "../support/server";

// The case issue 12 reported at 1920 × 1080: σ3 = 0 and σ2 a hair above it put their names on one
// spot (they read "σg2"). Core's label placement is unit-tested (core/diagrams/mohr.test.ts);
// this checks the drawn names in the browser at the sizes people use.
describe("Mohr's circle names at desktop sizes", () => {
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

  for (const viewport of [
    { width: 1920, height: 1080 },
    { width: 1280, height: 800 },
  ]) {
    it(`when σ2 = 1 MPa and σ3 = 0 at ${viewport.width} × ${viewport.height}, then the three principal names do not overlap`, async () => {
      const context = await browser.newContext({ viewport });
      await signUpInContext(context, server.url);
      const page = await context.newPage();
      page.setDefaultTimeout(10_000);
      // σxx = 150, σyy = 1 MPa, no shear: σ1 = 150, σ2 = 1, σ3 = 0 (plane stress, principal axes on x, y, z).
      await page.goto(`${server.url}/bench?s=150,1,0,0,0,0&u=MPa`, { waitUntil: "networkidle" });
      const svg = page.getByTestId("mohr-svg");
      await svg.waitFor();
      const boxes = await svg.locator("[data-testid^='mohr-principal-'] text").evaluateAll((texts) =>
        texts.map((t) => {
          const r = t.getBoundingClientRect();
          return { name: t.textContent ?? "", left: r.left, right: r.right, top: r.top, bottom: r.bottom };
        }),
      );
      expect(boxes).toHaveLength(3);
      const clashes: string[] = [];
      for (let i = 0; i < boxes.length; i++)
        for (let j = i + 1; j < boxes.length; j++) {
          const [a, b] = [boxes[i], boxes[j]];
          if (a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom)
            clashes.push(`${a.name} / ${b.name}`);
        }
      expect(clashes).toEqual([]);
      await svg.screenshot({ path: path.join(screenshotDir, `mohr-labels-${viewport.width}.png`) });
      await context.close();
    });
  }
});
